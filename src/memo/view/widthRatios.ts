// How much narrower the deterministic model's intervals are than the stochastic model's: the
// width ratio at the widest level per horizon, for the forecast table's last column, and the
// sentence under the table that reads it (a chart of one number repeated says less).
import { atLevel, widestLevel } from '../intervalLevels.js';
import type { AnalysisRecord } from '../../analysis/record.js';
import { formatNumber } from '../format/formatNumber.js';
import { TEMPLATE_TEXT } from '../wording.js';

export interface WidthRatioRow {
  h: number;
  period: string;
  ratio: number;
}

/** Deterministic ÷ stochastic interval width at the widest level per horizon, for the rows both models have. */
export function widthRatios(record: Pick<AnalysisRecord, 'forecasts' | 'settings'>): WidthRatioRow[] {
  const level = widestLevel(record.settings);
  return record.forecasts.deterministic.flatMap((row, i) => {
    const interval = atLevel(row.intervals, level);
    const other = atLevel(record.forecasts.stochastic[i]?.intervals, level);
    if (interval === undefined || other === undefined) return [];
    return [{ h: row.h, period: row.period, ratio: (interval[1] - interval[0]) / (other[1] - other[0]) }];
  });
}

/** Ratios all this close to 1 read as "the two models' uncertainty hardly differs". */
const ABOUT_EQUAL = 0.02;

/** One sentence on the ratios: the two models about equally wide throughout, or the first and last ratio and which way they lie. */
export function widthNote(record: Pick<AnalysisRecord, 'forecasts' | 'settings'>): string {
  const rows = widthRatios(record);
  const first = rows[0];
  const last = rows.at(-1);
  if (first === undefined || last === undefined) return '';
  const ratios = rows.map((r) => r.ratio);
  const low = Math.min(...ratios);
  const high = Math.max(...ratios);
  const level = widestLevel(record.settings);
  const text = (v: number) => formatNumber(v, 2);
  if (Math.abs(low - 1) <= ABOUT_EQUAL && Math.abs(high - 1) <= ABOUT_EQUAL) return TEMPLATE_TEXT.widthFlat(level, text(low), text(high));
  const direction = high < 1 ? 'narrower' : low > 1 ? 'wider' : 'mixed';
  return TEMPLATE_TEXT.widthRange(level, { period: first.period, ratio: text(first.ratio) }, { period: last.period, ratio: text(last.ratio) }, direction);
}
