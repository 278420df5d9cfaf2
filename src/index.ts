// trendbrief as a library: the same stages the command line runs, each a function of plain
// values. A memo is made like this:
//
//   config.yaml ─loadConfig─▶ RunPlan ──────────────────────────────┐  (config/: YAML, spec, plan)
//                                                                   │
//   series file ─readSeriesFile─▶ Series ┐                          │  (data/: CSV and .xlsx, periods, checks)
//   written settings ─resolveSettings────┴─▶ AnalysisSettings       │  (config/: one complete value)
//                                               │                   │
//   Series + AnalysisSettings ─analyseSeries─▶ AnalysisRecord       │  (models/, evidence/, backtest/ → analysis/)
//        (both trend models, forecasts, evidence, runBacktest,      │
//         the recommendation rule)                                  │
//                                               │                   │
//   MemoInput (records + memo details) ─renderMemo─▶ memo.html ─printMemoPdf─▶ memo.pdf   (memo/)
//                                                                   │
//   runMemo(config.yaml): all of the above into out/<memo id>/<as-of>/ ◀┘  (run/), checked by verifyMemoFolder
//
// Everything a user sees is read from the AnalysisRecord; nothing after it computes statistics.
// The memo renderer and the browser driver are loaded only when a memo is rendered or printed.
import type { MemoInput } from './memo/memoInput.js';
import type { PdfPrinterOptions, PrintOptions } from './memo/print/pdfPrinter.js';
import type { RenderMemoOptions } from './memo/renderMemoHtml.js';

export { InputError, formatProblem, type InputLocation, type InputProblem } from './base/problem.js';
export { FREQUENCIES, type Frequency } from './base/period.js';
export type { Series } from './base/series.js';
export { TREND_MODELS, levelKey } from './base/settings.js';
export type {
  AnalysisSettings,
  BacktestChoices,
  MissingPolicy,
  PointForecast,
  RecommendationChoices,
  RecommendationRule,
  RefitPolicy,
  Transform,
  TrendModelKind,
  WindowKind,
  YearFigure,
} from './base/settings.js';

export { loadConfig } from './config/loadConfig.js';
export { parseConfig } from './config/parseConfig.js';
export type { MemoDetails as PlannedMemo, OutputPlan, RunPlan, SeriesPlan } from './config/runPlan.js';
export { readingSettings, resolveSettings, type WrittenSettings } from './config/resolveSettings.js';
export { configSchemaText } from './config/toJsonSchema.js';

export { readSeriesCsv } from './data/readSeriesCsv.js';
export { readSeriesFile } from './data/readSeriesFile.js';
export { parseSeriesCsv, type SeriesOptions } from './data/parseSeriesCsv.js';

export { analyseSeries, requiredObservations, type AnalysisRun, type SeriesIdentity } from './analysis/analyseSeries.js';
export { runBacktest, type BacktestRun } from './backtest/runBacktest.js';
export { openOriginPool, type OriginPool } from './backtest/runOriginTasks.js';
export type * from './analysis/record.js';

export type { MemoInput, MemoSeries, Assumption, HistoryPoint } from './memo/memoInput.js';
export type { PdfPrinterOptions, PrintOptions } from './memo/print/pdfPrinter.js';
export type { RenderMemoOptions } from './memo/renderMemoHtml.js';

export { runMemo, type MemoRunResult, type RunMemoOptions } from './run/runMemo.js';
export { verifyMemoFolder, type VerifyResult } from './run/verifyMemoFolder.js';
export { recordSignOff, type RecordedSignOffResult, type SignOffRequest } from './run/recordSignOff.js';
export { contentDigest } from './run/contentDigest.js';
export { cli, type CliIo } from './cli.js';

/** The memo as one self-contained HTML document (inline CSS and SVG charts, no scripts, no links). */
export async function renderMemo(input: MemoInput, options: RenderMemoOptions = {}): Promise<string> {
  const { renderMemoHtml } = await import('./memo/renderMemoHtml.js');
  return renderMemoHtml(input, options);
}

/** The memo's HTML printed to PDF by headless Chromium (Debian's /usr/bin/chromium unless told otherwise). */
export async function printMemoPdf(html: string, options: PrintOptions & PdfPrinterOptions): Promise<Buffer> {
  const printer = await import('./memo/print/pdfPrinter.js');
  return printer.printMemoPdf(html, options);
}
