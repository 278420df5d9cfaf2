// The forecast table: both models with an interval per level, and the width ratio at the
// widest level (named in the sentence under the table), at every horizon up to
// FORECAST_TABLE_ROWS and at the horizons shownHorizons picks beyond.
import { formatNumber } from '../format/formatNumber.js';
import { atLevel } from '../intervalLevels.js';
import type { AnalysisRecord } from '../../analysis/record.js';
import type { TrendModelKind } from '../../base/settings.js';
import { periodsPerYear } from '../../base/period.js';
import { shownHorizons } from './shownHorizons.js';
import { widthRatios } from './widthRatios.js';
import { LABELS, MODEL_NAME, TEMPLATE_TEXT } from '../wording.js';
import { modelTable, type ModelTable } from './modelTable.js';

export interface ForecastCells {
  point: string;
  /** One per level, ascending. */
  intervals: string[];
}

export type ForecastTable = ModelTable<{ h: number; period: string; cells: string[] }> & { caption: string; /** Which rows are left out, or empty when every horizon is shown. */ rowsNote: string };

/** Longer horizons print a selection of rows (shownHorizons). */
export const FORECAST_TABLE_ROWS = 8;

/** "575.36 – 580.31". */
export function intervalText(interval: [number, number] | undefined, decimals: number): string {
  if (interval === undefined) return formatNumber(null, decimals);
  return `${formatNumber(interval[0], decimals)}\u2009\u2013\u2009${formatNumber(interval[1], decimals)}`;
}

export function forecastCells(record: AnalysisRecord, model: TrendModelKind, index: number, decimals: number): ForecastCells {
  const row = record.forecasts[model][index];
  return {
    point: formatNumber(row?.point, decimals),
    intervals: record.settings.levels.map((level) => intervalText(atLevel(row?.intervals, level), decimals)),
  };
}

/** The column heads of one model's point and intervals. */
export function forecastHeads(record: AnalysisRecord): string[] {
  return [LABELS.point, ...record.settings.levels.map(TEMPLATE_TEXT.intervalHead)];
}

export function forecastTableView(record: AnalysisRecord, decimals: number, units: string): ForecastTable {
  const ratios = widthRatios(record);
  const horizon = record.forecasts.deterministic.length;
  const shown = new Set(shownHorizons(horizon, FORECAST_TABLE_ROWS, periodsPerYear(record.series.frequency)));
  const cells = (model: TrendModelKind, i: number): string[] => {
    const { point, intervals } = forecastCells(record, model, i, decimals);
    return [point, ...intervals];
  };
  const table = modelTable({
    levels: record.settings.levels,
    names: MODEL_NAME,
    leading: 2,
    modelHeads: forecastHeads(record),
    trailingHeads: [LABELS.ratio],
    rows: (models) =>
      record.forecasts.deterministic.flatMap((row, i) => (shown.has(row.h) ? [row] : []).map(() => ({
        h: row.h,
        period: row.period,
        cells: [...models.flatMap((model) => cells(model, i)), formatNumber(ratios[i]?.ratio, 2)],
      }))),
    cellsOf: (row) => [String(row.h), row.period, ...row.cells],
  });
  return { caption: TEMPLATE_TEXT.forecastCaption(units), rowsNote: shown.size === horizon ? '' : TEMPLATE_TEXT.rowsShown([...shown], 'forecasts.csv and record.json'), ...table };
}
