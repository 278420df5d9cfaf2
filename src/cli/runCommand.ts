// `trendbrief run CONFIG... [--out DIR] [--formats html,pdf,json,csv] [--quiet]`: one memo per
// config. A config that fails is reported and the others still run; the exit code says the
// worst that happened (1 for an internal failure, 4 for no browser, 2 for bad input).
import { availableParallelism } from 'node:os';
import { join, resolve } from 'node:path';
import { OUTPUT_FORMATS } from '../config/configSpec.js';
import { loadConfig } from '../config/loadConfig.js';
import type { OutputFormat } from '../config/runPlan.js';
import { formatProblem, InputError, plural, type InputProblem } from '../base/problem.js';
import { cliMessages, configCommandMessages } from './messages.js';
import { runMessages } from '../run/messages.js';
import type { PdfPrinter } from '../memo/print/pdfPrinter.js';
import { browserProblem } from '../memo/print/browserPath.js';
import { runMemo, type MemoRunResult } from '../run/runMemo.js';
import { openSeriesPool } from '../run/seriesPool.js';
import { batchOrder, type BatchEntry } from './batchOrder.js';
import { progressReporter } from './progressReporter.js';
import { splitOptions } from './splitOptions.js';
import { shownPath } from '../base/shownPath.js';
import { EnvironmentError } from '../base/environmentError.js';
import { EXIT, worseExit } from './exitCodes.js';

export const RUN_HELP = `Usage: trendbrief run CONFIG.yaml... [options]

Analyses every series of each config (both trend models, evidence, backtest, recommendation)
and writes the memo into <output folder>/<memo id>/<as-of>/ (<output folder>/<memo id>/ without
memo.as_of): memo.html, memo.pdf, record.json, forecasts.csv and manifest.json (and the
forecasts as a workbook, forecasts.xlsx, with --formats ...,xlsx). A memo with an
as-of period compares itself with the latest earlier as-of memo beside it and shows how the
forecasts of all the earlier ones fared. A folder appears only when all its files are complete,
and carries copies of its config and data under inputs/.

A memo is issued once a reviewer's decision is recorded on it (trendbrief review). A rerun
with the same content keeps its sign-offs; one that would change its content is refused
unless --new-revision is given.

Options:
  --out DIR                 write into DIR instead of the config's output folder
  --formats LIST            comma-separated subset of ${OUTPUT_FORMATS.join(', ')} (default: the config's)
  --threads N               worker threads for the series (default: the machine's cores)
  --new-revision            over an issued memo whose content would change, keep it as a
                            numbered revision (revisions/N/) and write a new draft
  --quiet                   print nothing but problems
  -h, --help                this text

With several configs (e.g. configs/*.yaml) every memo is attempted; one that fails does not
stop the others, and the summary at the end says which failed and why. As-of memos of one
memo id run in period order, so each sees the earlier ones of the same run.

Exit codes: 0 done; 2 bad input; 4 no Chromium for the PDF (install Debian's chromium, set
TRENDBRIEF_CHROMIUM, or leave pdf out of --formats); 1 a defect in trendbrief. A batch exits
with the worst of its memos.
`;

interface Io {
  stdout(text: string): void;
  stderr(text: string): void;
  /** True when stderr is a terminal (progress is then drawn in place). */
  isTTY?: boolean;
}

/** Memos whose analysis may run ahead while an earlier one is rendered. */
const MEMOS_IN_FLIGHT = 3;

interface MemoOutcome {
  config: string;
  memo: string;
  series: number | null;
  result: string;
  folder: string;
}

export async function runRun(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals, problems } = splitOptions(
    args,
    {
      out: { type: 'string' },
      formats: { type: 'string' },
      threads: { type: 'string' },
      'new-revision': { type: 'boolean' },
      quiet: { type: 'boolean' },
      help: { type: 'boolean', short: 'h' },
    },
    'run',
  );
  if (values.get('help') === true) {
    io.stdout(RUN_HELP);
    return EXIT.ok;
  }
  if (positionals.length === 0) problems.push(configCommandMessages.noConfigsToRun());
  const formats = parseFormats(values.get('formats'), problems);
  const out = values.get('out');
  // `--out=` would otherwise resolve to the working folder.
  if (out === '') problems.push(cliMessages.missingValue('--out', 'run'));
  const threads = parseThreads(values.get('threads'), problems);
  if (problems.length > 0) throw new InputError(problems);
  const quiet = values.get('quiet') === true;
  const previews = positionals.map((config) => previewConfig(config, typeof out === 'string' ? resolve(out) : undefined));
  const totalSeries = previews.reduce((sum, preview) => sum + preview.series, 0);
  const claimed = new Map<string, number>();
  // On a terminal the bar is drawn on stderr; elsewhere (a log) progress is plain lines before the summary on stdout.
  const progress = progressReporter(
    totalSeries,
    positionals.length,
    quiet ? undefined : { write: (text) => (io.isTTY === true ? io.stderr(text) : io.stdout(text)), isTTY: io.isTTY === true },
  );
  progress.start();
  let printer: Promise<PdfPrinter> | undefined;
  let noBrowser: InputProblem | null | undefined;
  // The browser driver loads, and Chromium starts, only when the first PDF is printed.
  const sharedPrinter = (): Promise<PdfPrinter> => (printer ??= import('../memo/print/pdfPrinter.js').then(({ openPdfPrinter }) => openPdfPrinter()));
  const pool = threads > 1 && totalSeries > 1 ? openSeriesPool(Math.min(threads, totalSeries)) : undefined;
  const outcomes: MemoOutcome[] = [];
  let exitCode: number = EXIT.ok;
  let environmentReported = false;
  const { order, after } = batchOrder(previews);
  const runOne = async (index: number): Promise<MemoRunResult> => {
    const config = positionals[index];
    // The earlier periods of this memo are written first (they never reject: see `launch`).
    await Promise.all(after[index].map((earlier) => settled[earlier]));
    // Two configs of one batch writing the same memo folder would silently replace each other.
    const folder = previews[index].folder;
    const first = folder === undefined ? undefined : claimed.get(folder);
    if (first !== undefined && first !== index) throw new InputError(runMessages.sameMemoFolder({ file: config, field: 'memo.id' }, positionals[first]));
    // A memo that needs a PDF and has no browser stops before its analysis.
    if ((formats ?? previews[index].formats)?.includes('pdf') === true) {
      const missing = (noBrowser ??= browserProblem() ?? null);
      if (missing !== null) throw new EnvironmentError(missing);
    }
    return runMemo(config, {
      outputFolder: typeof out === 'string' ? resolve(out) : undefined,
      formats,
      printer: sharedPrinter,
      pool,
      threads: threads > 1 ? undefined : 1,
      onSeriesDone: (memoId, seriesId) => progress.seriesDone(memoId, seriesId),
      newRevision: values.get('new-revision') === true,
    });
  };
  previews.forEach((preview, index) => {
    if (preview.folder !== undefined && !claimed.has(preview.folder)) claimed.set(preview.folder, index);
  });
  // With a pool, the next memos' series are analysed while this one is rendered and written;
  // reports still come in config order.
  const window = pool === undefined ? 1 : MEMOS_IN_FLIGHT;
  const settled: Promise<{ result?: MemoRunResult; error?: unknown }>[] = [];
  const launch = (index: number): void => {
    settled[index] = runOne(index).then(
      (result) => ({ result }),
      (error: unknown) => ({ error }),
    );
  };
  try {
    for (let step = 0; step < Math.min(window, order.length); step++) launch(order[step]);
    for (const [step, index] of order.entries()) {
      const config = positionals[index];
      const { result, error } = await settled[index];
      if (step + window < order.length) launch(order[step + window]);
      if (result !== undefined) {
        for (const warning of result.warnings) io.stderr(`${formatProblem(warning)}\n`);
        progress.memoDone(result.memoId, result.outcome);
        outcomes.push({ config, memo: result.memoId, series: result.series, result: outcomeText(result), folder: shownPath(result.folder) });
        continue;
      }
      progress.finish();
      if (!(error instanceof InputError)) {
        io.stderr(`${config}: internal error: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
        exitCode = worseExit(exitCode, EXIT.internal);
        outcomes.push({ config, memo: '-', series: null, result: 'failed: internal error (see above)', folder: '-' });
        progress.memoDone(config, 'failed');
        continue;
      }
      if (error instanceof EnvironmentError) {
        // One browser serves the whole batch: its failure is reported once, and each memo that needed it says so.
        if (!environmentReported) for (const problem of error.problems) io.stderr(`${formatProblem(problem)}\n`);
        environmentReported = true;
        progress.memoDone(config, 'failed');
        exitCode = worseExit(exitCode, EXIT.environment);
        outcomes.push({ config, memo: '-', series: null, result: 'failed: no browser for the PDF (see above; nothing written)', folder: '-' });
        continue;
      }
      for (const problem of error.problems) io.stderr(`${formatProblem(problem)}\n`);
      progress.memoDone(config, 'failed');
      exitCode = worseExit(exitCode, EXIT.input);
      const count = error.problems.length;
      outcomes.push({ config, memo: '-', series: null, result: `failed: ${plural(count, 'input problem')} (see above)`, folder: '-' });
    }
  } finally {
    progress.finish();
    // A browser that failed to start was reported by each memo that needed it; report it once.
    if (printer !== undefined) await printer.then((opened) => opened.close(), () => undefined);
    if (pool !== undefined) await pool.close();
  }
  if (!quiet) io.stdout(summaryTable(outcomes));
  return exitCode;
}

/**
 * The series count (for progress), the memo folder (to catch two configs writing one folder) and
 * the memo id's folder with the as-of period (for the batch's order); nothing for a config that
 * does not load.
 */
function previewConfig(config: string, outputFolder: string | undefined): { series: number; folder?: string; formats?: readonly OutputFormat[] } & BatchEntry {
  try {
    const plan = loadConfig(config);
    const idFolder = join(outputFolder ?? plan.output.folder, plan.memo.id);
    const folder = join(idFolder, plan.memo.asOf ?? '');
    return { series: plan.series.length, folder, idFolder, asOf: plan.memo.asOf, formats: plan.output.formats };
  } catch {
    return { series: 0 };
  }
}

/** The run's line in the summary: what happened to the memo folder. */
function outcomeText(result: MemoRunResult): string {
  if (result.outcome === 'kept') return `kept (same content as the issued memo; ${plural(result.signOffs, 'sign-off')} carried, nothing changed)`;
  if (result.outcome === 'revised') return `revised (revision ${String(result.revision)} kept; ${result.files.join(', ')})`;
  return `written (${result.files.join(', ')})`;
}

function parseThreads(value: string | true | undefined, problems: InputProblem[]): number {
  if (value === undefined) return availableParallelism();
  const number = typeof value === 'string' && /^\d+$/.test(value) ? Number(value) : Number.NaN;
  if (!(number >= 1 && number <= 64)) {
    problems.push(cliMessages.notAnInteger('threads', typeof value === 'string' ? value : '', 1, 64));
    return 1;
  }
  return number;
}

function summaryTable(outcomes: readonly MemoOutcome[]): string {
  const rows = [['config', 'memo', 'series', 'result', 'folder'], ...outcomes.map((o) => [o.config, o.memo, o.series === null ? '-' : String(o.series), o.result, o.folder])];
  const widths = rows[0].map((_, i) => Math.max(...rows.map((row) => row[i].length)));
  return `${rows.map((row) => row.map((cell, i) => cell.padEnd(widths[i])).join('  ').trimEnd()).join('\n')}\n`;
}

function parseFormats(value: string | true | undefined, problems: InputProblem[]): OutputFormat[] | undefined {
  if (value === undefined) return undefined;
  if (value === true) {
    problems.push(cliMessages.badChoice('formats', '', OUTPUT_FORMATS));
    return undefined;
  }
  const formats: OutputFormat[] = [];
  for (const part of value.split(',').map((word) => word.trim())) {
    const found = OUTPUT_FORMATS.find((format) => format === part);
    if (found === undefined) problems.push(cliMessages.badChoice('formats', part, OUTPUT_FORMATS));
    else if (!formats.includes(found)) formats.push(found);
  }
  return formats;
}
