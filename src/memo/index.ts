// The memo stage: AnalysisRecords plus memo details in, a self-contained HTML memo and its PDF out.
//   MemoInput ─buildMemoView─▶ view (caveat rules, formatted numbers, charts as inline SVG)
//             ─Handlebars (templates/)─▶ memo.html ─headless Chromium─▶ memo.pdf
export { renderMemoHtml, assertSelfContained, type RenderMemoOptions } from './renderMemoHtml.js';
export { openPdfPrinter, printMemoPdf, DEFAULT_CHROMIUM, type PdfPrinter, type PdfPrinterOptions, type PrintOptions } from './print/pdfPrinter.js';
export { builtInTemplatesDir } from './loadTemplates.js';
export { collectCaveats, CAVEAT_RULES } from './caveats/caveatRules.js';
export type { Caveat, CaveatRule, CaveatSeverity } from './caveats/caveat.js';
export { memoStatus, type MemoStatus } from './view/memoStatus.js';
export type {
  Assumption,
  FileDigest,
  HistoryPoint,
  MemoDetails,
  MemoInput,
  MemoSeries,
  Paper,
  Reproducibility,
  Reviewer,
  SignOff,
  SignOffDecision,
} from './memoInput.js';
export type { BacktestPart, MemoRecord, RecommendationPart, StabilityPart } from './recordParts.js';
