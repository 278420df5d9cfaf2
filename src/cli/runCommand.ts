// `trendbrief run CONFIG... [--out DIR] [--formats html,pdf,json,csv] [--quiet]`: one memo per
// config. A config that fails is reported and the others still run; the exit code says the
// worst that happened (2 for bad input, 1 for an internal failure).
import { basename, isAbsolute, resolve } from 'node:path';
import { OUTPUT_FORMATS, type OutputFormat } from '../config/index.js';
import { cliMessages, formatProblem, InputError, runMessages, type InputProblem } from '../errors.js';
import { openPdfPrinter, type PdfPrinter } from '../memo/print/pdfPrinter.js';
import { runMemo } from '../run/runMemo.js';
import { shownPath } from '../run/readPlannedSeries.js';
import { splitOptions } from './splitOptions.js';

export const RUN_HELP = `Usage: trendbrief run CONFIG.yaml... [options]

Analyses every series of each config (both trend models, evidence, backtest, recommendation)
and writes the memo into <output folder>/<memo id>/: memo.html, memo.pdf, record.json,
forecasts.csv and manifest.json. A folder appears only when all its files are complete.

Options:
  --out DIR                 write into DIR instead of the config's output folder
  --formats LIST            comma-separated subset of ${OUTPUT_FORMATS.join(', ')} (default: the config's)
  --quiet                   print nothing but problems
  -h, --help                this text
`;

interface Io {
  stdout(text: string): void;
  stderr(text: string): void;
}

export async function runRun(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals, problems } = splitOptions(
    args,
    { out: { type: 'string' }, formats: { type: 'string' }, quiet: { type: 'boolean' }, help: { type: 'boolean', short: 'h' } },
    'run',
  );
  if (values.get('help') === true) {
    io.stdout(RUN_HELP);
    return 0;
  }
  if (positionals.length === 0) problems.push(runMessages.noConfigs());
  const formats = parseFormats(values.get('formats'), problems);
  const out = values.get('out');
  // `--out=` would otherwise resolve to the working folder.
  if (out === '') problems.push(cliMessages.missingValue('--out', 'run'));
  if (problems.length > 0) throw new InputError(problems);
  const quiet = values.get('quiet') === true;
  let printer: Promise<PdfPrinter> | undefined;
  const sharedPrinter = (): Promise<PdfPrinter> => (printer ??= openPdfPrinter());
  let exitCode = 0;
  try {
    for (const config of positionals) {
      const command = ['trendbrief run', pathForRecord(config), ...(typeof out === 'string' ? ['--out', out] : []), ...(formats ? ['--formats', formats.join(',')] : [])].join(' ');
      try {
        const result = await runMemo(config, {
          outputFolder: typeof out === 'string' ? resolve(out) : undefined,
          formats,
          printer: sharedPrinter,
          command,
        });
        if (!quiet) io.stdout(`${config}: memo ${result.memoId}, ${result.series} series → ${shownPath(result.folder)} (${result.files.join(', ')})\n`);
      } catch (error) {
        if (!(error instanceof InputError)) {
          io.stderr(`${config}: internal error: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
          exitCode = Math.max(exitCode, 1);
          continue;
        }
        for (const problem of error.problems) io.stderr(`${formatProblem(problem)}\n`);
        exitCode = 2;
      }
    }
  } finally {
    if (printer !== undefined) await (await printer).close();
  }
  return exitCode;
}

/** The config path as it may appear in an output: relative to the working folder, else its name alone. */
function pathForRecord(config: string): string {
  const shown = shownPath(resolve(config));
  return isAbsolute(shown) ? basename(shown) : shown;
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
