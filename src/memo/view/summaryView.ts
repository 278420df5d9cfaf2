// One card per series for the client's summary page: the recommended model, the forecast at
// the end of the horizon under both models with an interval per level, for a monthly or
// quarterly series the next full calendar year's figure (yearView.ts), and the top caveat.
import type { Caveat } from '../caveats/caveat.js';
import type { AnalysisRecord } from '../../analysis/record.js';
import type { TrendModelKind } from '../../base/settings.js';
import { evidenceWording } from '../evidenceWording.js';
import { LABELS, METHOD_NAME, MODEL_GLOSS, MODEL_NAME, NOT_RUN, TEMPLATE_TEXT } from '../wording.js';
import { forecastCells, forecastHeads, type ForecastCells } from './forecastTableView.js';
import { agreement } from './agreement.js';
import { rowsFit, SHEET_WIDTH } from './tableWidth.js';
import { summaryYear, type SummaryYear } from './yearView.js';

export interface SummaryCard {
  anchor: string;
  title: string;
  units: string;
  recommended: string | null;
  gloss: string;
  noRecommendation: string;
  /** Who settled the choice, and, when the backtest stopped short of the horizon, how far it reached. */
  decided: string;
  endPeriod: string;
  atEnd: string;
  /** Heads of the point and interval columns. */
  heads: string[];
  /** True when the table is too wide to sit beside the text. */
  tableBelow: boolean;
  models: (ForecastCells & { name: string; recommended: boolean })[];
  /** The next full calendar year under both models, or why the horizon gives none; null for annual series. */
  year: SummaryYear | null;
  caveat: { label: string; severity: Caveat['severity']; text: string } | null;
}

/** The room beside the card's text (templates/memo.css): the sheet less the text's 62 mm and a 5 mm gap. */
const BESIDE_TEXT = SHEET_WIDTH - 62 - 5;

export function summaryCard(a: { anchor: string; title: string; units?: string; record: AnalysisRecord; decimals: number; caveats: Caveat[] }): SummaryCard {
  const { record } = a;
  const model: TrendModelKind | undefined = record.recommendation?.model;
  const last = record.forecasts.deterministic.length - 1;
  const top = a.caveats[0];
  const endPeriod = record.forecasts.deterministic[last]?.period ?? record.series.last;
  const atEnd = TEMPLATE_TEXT.atPeriod(endPeriod);
  const heads = forecastHeads(record);
  const models = (['deterministic', 'stochastic'] as const).map((kind) => ({
    name: METHOD_NAME[kind],
    recommended: kind === model,
    ...forecastCells(record, kind, last, a.decimals),
  }));
  const year = summaryYear(record, a.decimals);
  // The recommended row carries a marker after its name.
  const modelRows = (list: typeof models) => list.map((row) => ({ cells: [row.recommended ? `${row.name} \u25C6` : row.name, row.point, ...row.intervals], bold: row.recommended }));
  const rows = [
    { cells: [atEnd, ...heads], bold: true },
    ...modelRows(models),
    ...(year === null || year.models.length === 0 ? [] : [{ cells: [year.head, ...heads], bold: true }, ...modelRows(year.models)]),
  ];
  return {
    anchor: a.anchor,
    title: a.title,
    units: a.units ?? '',
    recommended: model === undefined ? null : MODEL_NAME[model],
    gloss: model === undefined ? '' : MODEL_GLOSS[model],
    noRecommendation: NOT_RUN.recommendation,
    decided: [
      ...(record.recommendation === undefined ? [] : [evidenceWording.decidedBy[record.recommendation.decided_by]]),
      ...agreement(record),
      ...backtestReach(record),
    ].join(' '),
    endPeriod,
    atEnd,
    heads,
    tableBelow: !rowsFit(rows, BESIDE_TEXT),
    models,
    year,
    caveat: top === undefined ? null : { label: LABELS.severity[top.severity], severity: top.severity, text: top.text },
  };
}

/** The sentence on page 1 when the backtest did not reach the memo's horizon (none when it did, or did not run). */
export function backtestReach(record: AnalysisRecord): string[] {
  const reach = record.backtest?.settings.horizon;
  return reach === undefined || reach >= record.settings.horizon ? [] : [evidenceWording.shortBacktest(reach, record.settings.horizon)];
}
