// Test helper: the command line run in-process, its output captured.
import { cli } from '../../src/cli.js';
import type { AnalysisRecord } from '../../src/analysis/record.js';

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
  /** stderr split into its lines, without the final newline. */
  errorLines: string[];
}

export async function runCli(argv: readonly string[]): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const code = await cli(argv, {
    stdout: (text) => {
      stdout += text;
    },
    stderr: (text) => {
      stderr += text;
    },
  });
  const errorLines = stderr === '' ? [] : stderr.replace(/\n$/, '').split('\n');
  return { code, stdout, stderr, errorLines };
}

/** `trendbrief fit FILE --json ...`, failing the test unless it succeeds cleanly. */
export async function fitRecord(file: string, options: readonly string[] = []): Promise<AnalysisRecord> {
  const run = await runCli(['fit', file, '--json', ...options]);
  if (run.code !== 0 || run.stderr !== '') throw new Error(`fit ${file} exited ${run.code}: ${run.stderr}`);
  return JSON.parse(run.stdout) as AnalysisRecord;
}

/** `fit` options for a quick backtest: orders up to (1, 1), four origins, three steps ahead. */
export const QUICK_BACKTEST = ['--backtest', '--max-p', '1', '--max-q', '1', '--origins', '4', '--backtest-horizon', '3'] as const;
