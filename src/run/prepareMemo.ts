// Everything a run writes, built in memory: a RunPlan's series read and analysed, the memo
// rendered (with the revisions section when the memo has an as-of period), record.json,
// forecasts.csv and the manifest. `run` writes these files; `verify` builds them again and
// compares.
//   RunPlan ─readSeriesCsv─▶ Series[] ─completeAnalysis─▶ AnalysisRecord[] ─▶ RecordDocument
//   ─compareRecords (earlier as-of record)─▶ MemoInput ─renderMemoHtml / printer─▶ OutputFile[]
import { basename, resolve } from 'node:path';
import type { AnalysisRecord } from '../analysis/record.js';
import type { InputProblem } from '../base/problem.js';
import { toolVersion } from '../base/toolVersion.js';
import type { OutputFormat, RunPlan } from '../config/runPlan.js';
import type { MemoInput } from '../memo/memoInput.js';
import type { PdfPrinter } from '../memo/print/pdfPrinter.js';
import { analysePlannedSeries, type SeriesTask } from './analysePlannedSeries.js';
import { assumptionsRegister } from './assumptionsRegister.js';
import { compareRecords } from './compareRecords.js';
import type { EarlierRecord } from './findEarlierRecord.js';
import { forecastsCsv } from './forecastsCsv.js';
import { buildManifest, manifestText, posixRelative, type ManifestInput } from './manifest.js';
import { readAllSeries } from './readPlannedSeries.js';
import { RECORD_DOCUMENT_SCHEMA, recordDocumentText, seriesHistory, type RecordDocument } from './recordDocument.js';
import { stampPdfDates } from './stampPdfDates.js';
import type { SeriesPool } from './seriesPool.js';
import type { OutputFile } from './writeOutputFolder.js';

export interface PrepareMemoOptions {
  /** Absolute folder the files are meant for; the manifest locates the inputs relative to it. */
  folder: string;
  formats: readonly OutputFormat[];
  /** A browser to print with; needed when the formats include pdf. */
  printer?: () => Promise<PdfPrinter>;
  /** The command as recorded in the manifest and the memo's appendix. */
  command: string;
  /** YYYY-MM-DD. */
  runDate: string;
  /** Worker threads for each series' backtest (without a pool); the results do not depend on it. */
  threads?: number;
  /** Worker threads that analyse whole series; shared by every memo of a batch. */
  pool?: SeriesPool;
  /** Called as each series finishes, for progress reports. */
  onSeriesDone?: (memoId: string, seriesId: string) => void;
  /** The previous as-of memo, or null when there is none; used only when the memo has an as-of period. */
  earlier: EarlierRecord | null;
}

export interface PreparedMemo {
  files: OutputFile[];
  records: AnalysisRecord[];
  document: RecordDocument;
  /** Warnings that do not stop the run: series whose data end well before memo.as_of. */
  warnings: InputProblem[];
}

export async function prepareMemo(plan: RunPlan, options: PrepareMemoOptions): Promise<PreparedMemo> {
  const { formats, runDate: date } = options;
  const loaded = readAllSeries(plan);
  // Series are independent: on a pool they run side by side, and their order is kept.
  const analyse = options.pool?.analyse ?? ((task: SeriesTask) => analysePlannedSeries({ ...task, threads: options.threads }));
  const records = await Promise.all(
    loaded.map(async (planned) => {
      const record = await analyse(planned);
      options.onSeriesDone?.(plan.memo.id, planned.plan.id);
      return record;
    }),
  );
  const configName = basename(plan.configFile);
  const memo: MemoInput['memo'] = {
    id: plan.memo.id,
    title: plan.memo.title,
    client: plan.memo.client ?? '',
    prepared_by: plan.memo.preparedBy ?? '',
    reference: plan.memo.reference ?? '',
    as_of: plan.memo.asOf ?? '',
    author: plan.memo.author ?? '',
    reviewers: plan.memo.reviewers.map((reviewer) => ({ name: reviewer.name, role: reviewer.role ?? '' })),
    sign_off: plan.memo.signOff.map((entry) => ({ ...entry })),
  };
  const history = loaded.map(({ series }) => seriesHistory(series));
  const document: RecordDocument = {
    schema: RECORD_DOCUMENT_SCHEMA,
    memo,
    run_date: date,
    records,
    history: loaded.map(({ plan: seriesPlan }, i) => ({ series_id: seriesPlan.id, values: history[i] })),
  };
  const earlier = plan.memo.asOf === undefined ? null : options.earlier;
  const input: MemoInput = {
    memo,
    paper: plan.output.paper,
    series: loaded.map(({ plan: seriesPlan, asOfGap }, i) => ({
      record: records[i],
      history: history[i],
      units: seriesPlan.units,
      notes: seriesPlan.notes,
      assumptions: assumptionsRegister(seriesPlan, records[i], configName),
      ...(asOfGap === undefined ? {} : { data_end: asOfGap.dataEnd }),
    })),
    reproducibility: {
      tool: toolVersion().name,
      version: toolVersion().version,
      command: options.command,
      run_date: date,
      config: { file: configName, sha256: plan.configSha256 },
      data: loaded.map(({ plan: seriesPlan, series }) => ({ file: seriesPlan.fileAsWritten, sha256: series.sha256 })),
    },
    revisions: plan.memo.asOf === undefined ? undefined : compareRecords(document, earlier?.document ?? null),
  };
  const files: OutputFile[] = [];
  if (formats.includes('html') || formats.includes('pdf')) {
    // The renderer (Handlebars, Vega) loads only for a run that renders.
    const { renderMemoHtml } = await import('../memo/renderMemoHtml.js');
    const html = await renderMemoHtml(input, { templatesDir: plan.output.templates?.folder });
    if (formats.includes('html')) files.push({ name: 'memo.html', content: html });
    if (formats.includes('pdf')) {
      if (options.printer === undefined) throw new Error('prepareMemo: pdf output needs a printer');
      const printer = await options.printer();
      const pdf = await printer.print(html, { paper: plan.output.paper, footer: plan.memo.reference ?? plan.memo.title });
      files.push({ name: 'memo.pdf', content: stampPdfDates(pdf, date) });
    }
  }
  if (formats.includes('json')) files.push({ name: 'record.json', content: recordDocumentText(document) });
  if (formats.includes('csv')) files.push({ name: 'forecasts.csv', content: forecastsCsv(records) });
  const from = (file: string) => posixRelative(options.folder, file);
  const inputs: ManifestInput[] = [
    { role: 'config', path: configName, from_output: from(resolve(plan.configFile)), sha256: plan.configSha256 },
    ...loaded.map(({ plan: seriesPlan, series }) => ({ role: 'data' as const, path: seriesPlan.fileAsWritten, from_output: from(seriesPlan.file), sha256: series.sha256 })),
  ];
  if (earlier !== null) inputs.push({ role: 'earlier-record', path: `${earlier.asOf}/record.json`, from_output: from(earlier.file), sha256: earlier.sha256 });
  const manifest = buildManifest({ tool: toolVersion(), run_date: date, command: options.command, inputs }, files);
  files.push({ name: 'manifest.json', content: manifestText(manifest) });
  return { files, records, document, warnings: loaded.flatMap(({ asOfGap }) => (asOfGap === undefined ? [] : [asOfGap.warning])) };
}
