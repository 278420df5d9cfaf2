// A memo folder's files assembled from a record document, without analysing anything: the
// content (record.json, forecasts.csv) and its digest, the sign-off log judged against that
// digest, the rendering (memo.html, memo.pdf) with the status it gives, the supersession note,
// the manifest and the copies of the inputs. `run` assembles what it has just analysed;
// `review` and `verify` assemble from the stored record.json and the copied config.
//   RecordDocument + inputs ─contentDigest─▶ digest ─judgeSignOffs─▶ MemoInput ─renderMemoHtml─▶ OutputFile[]
import { basename } from 'node:path';
import { toolVersion } from '../base/toolVersion.js';
import type { OutputFormat, RunPlan } from '../config/runPlan.js';
import type { MemoInput } from '../memo/memoInput.js';
import type { PdfPrinter } from '../memo/print/pdfPrinter.js';
import type { Supersedes } from '../memo/reviewPart.js';
import { assumptionsRegister } from './assumptionsRegister.js';
import type { ComparableDocument } from './comparableDocument.js';
import { compareRecords } from './compareRecords.js';
import { contentDigest } from './contentDigest.js';
import { forecastsCsv, type UnitsById } from './forecastsCsv.js';
import { forecastsWorkbook, WORKBOOK_FILE } from './forecastsWorkbook.js';
import { judgeSignOffs } from './judgeSignOffs.js';
import { buildManifest, manifestText, type ManifestInput } from './manifest.js';
import type { PlannedSeries } from './readPlannedSeries.js';
import { recordDocumentText, seriesHistory, type RecordDocument } from './recordDocument.js';
import { SIGN_OFF_LOG, type SignOffLog } from './signOffLog.js';
import { stampPdfDates } from './stampPdfDates.js';
import { SUPERSEDES_FILE, supersedesText } from './supersedesFile.js';
import type { OutputFile } from './writeOutputFolder.js';

export interface AssembleOptions {
  formats: readonly OutputFormat[];
  /** A browser to print with; needed when the formats include pdf. */
  printer?: () => Promise<PdfPrinter>;
  /** The command as recorded in the manifest and the memo's appendix. */
  command: string;
  /** The previous as-of memo's record document, or null; used only when the memo has an as-of period. */
  earlier: ComparableDocument | null;
  /** The manifest's inputs, each with the name of its copy. */
  inputs: readonly ManifestInput[];
  /** The copies themselves, written beside the memo. */
  copies: readonly OutputFile[];
  signOffs: SignOffLog;
  supersedes: Supersedes | null;
}

export interface AssembledMemo {
  files: OutputFile[];
  digest: string;
}

/** The series' units by id, from the config. */
export function unitsOf(plan: RunPlan): UnitsById {
  return new Map(plan.series.map((series) => [series.id, series.units]));
}

/** The files the content digest covers, as the formats ask for them. */
export function contentFiles(document: RecordDocument, formats: readonly OutputFormat[], units: UnitsById): OutputFile[] {
  const content: OutputFile[] = [];
  if (formats.includes('json')) content.push({ name: 'record.json', content: recordDocumentText(document) });
  if (formats.includes('csv')) content.push({ name: 'forecasts.csv', content: forecastsCsv(document.records, units) });
  return content;
}

/** `loaded` are the plan's series as read (their values, digests and as-of checks), in the order of `document.records`. */
export async function assembleMemo(plan: RunPlan, loaded: readonly PlannedSeries[], document: RecordDocument, options: AssembleOptions): Promise<AssembledMemo> {
  const { formats } = options;
  const { records, memo, run_date: date } = document;
  const content = contentFiles(document, formats, unitsOf(plan));
  const digest = contentDigest(options.inputs, new Map(content.map((file) => [file.name, file.content])));
  const configName = basename(plan.configFile);
  const input: MemoInput = {
    memo,
    paper: plan.output.paper,
    series: loaded.map(({ plan: seriesPlan, series, asOfGap }, i) => ({
      record: records[i],
      history: seriesHistory(series),
      units: seriesPlan.units,
      notes: seriesPlan.notes,
      source: seriesPlan.source,
      vintage: seriesPlan.vintage,
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
    revisions: plan.memo.asOf === undefined ? undefined : compareRecords(document, options.earlier),
    track_record: document.track_record,
    digest,
    sign_offs: judgeSignOffs(options.signOffs.entries, plan.memo.reviewers, digest),
    supersedes: options.supersedes ?? undefined,
  };
  const files: OutputFile[] = [];
  if (formats.includes('html') || formats.includes('pdf')) {
    // The renderer (Handlebars, Vega) loads only for a run that renders.
    const { renderMemoHtml } = await import('../memo/renderMemoHtml.js');
    const html = await renderMemoHtml(input, { templatesDir: plan.output.templates?.folder });
    if (formats.includes('html')) files.push({ name: 'memo.html', content: html });
    if (formats.includes('pdf')) {
      if (options.printer === undefined) throw new Error('assembleMemo: pdf output needs a printer');
      const printer = await options.printer();
      const pdf = await printer.print(html, { paper: plan.output.paper, footer: plan.memo.reference ?? plan.memo.title });
      files.push({ name: 'memo.pdf', content: stampPdfDates(pdf, date) });
    }
  }
  files.push(...content);
  // The workbook repeats forecasts.csv's numbers for the client; outside the content digest, like the rendering.
  if (formats.includes('xlsx')) files.push({ name: WORKBOOK_FILE, content: await forecastsWorkbook(document, unitsOf(plan)) });
  if (options.signOffs.text !== '') files.push({ name: SIGN_OFF_LOG, content: options.signOffs.text });
  if (options.supersedes !== null) files.push({ name: SUPERSEDES_FILE, content: supersedesText(options.supersedes) });
  const manifest = buildManifest({ tool: toolVersion(), run_date: date, command: options.command, inputs: [...options.inputs] }, files);
  files.push({ name: 'manifest.json', content: manifestText(manifest) }, ...options.copies);
  return { files, digest };
}
