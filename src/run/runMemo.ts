// One config → one memo folder:
//   loadConfig ─▶ RunPlan ─checkRunPaths─▶ <output>/<memo id>/<as-of>/ (or <output>/<memo id>/)
//   ─findEarlierRecord (the previous as-of memo beside it)─▶ prepareMemo ─▶ files
//   ─writeOutputFolder─▶ the folder (complete, or the previous one left as it was)
import { loadConfig } from '../config/loadConfig.js';
import type { OutputFormat } from '../config/runPlan.js';
import { InputError, type InputProblem } from '../base/problem.js';
import { monthlyMessages } from './messages.js';
import type { PdfPrinter } from '../memo/print/pdfPrinter.js';
import { checkRunPaths, writeFailure } from './checkRunPaths.js';
import { asOfFolders, findEarlierRecord } from './findEarlierRecord.js';
import { prepareMemo } from './prepareMemo.js';
import { recordedCommand } from './recordedCommand.js';
import { runDate } from './runDate.js';
import type { SeriesPool } from './seriesPool.js';
import { recoverOutputFolder, writeOutputFolder } from './writeOutputFolder.js';
import { shownPath } from '../base/shownPath.js';

export interface RunMemoOptions {
  /** Replaces the config's output folder (already resolved by the caller). */
  outputFolder?: string;
  /** Replaces the config's formats. */
  formats?: readonly OutputFormat[];
  /** A browser to print with; needed when the formats include pdf. */
  printer?: () => Promise<PdfPrinter>;
  /** Worker threads for each series' backtest (without a pool). */
  threads?: number;
  /** Worker threads that analyse whole series; shared by every memo of a batch. */
  pool?: SeriesPool;
  /** Called as each series finishes, for progress reports. */
  onSeriesDone?: (memoId: string, seriesId: string) => void;
}

export interface MemoRunResult {
  configFile: string;
  memoId: string;
  folder: string;
  series: number;
  files: string[];
  /** The as-of period of the memo compared with, when there was one. */
  comparedWith?: string;
  /** Warnings that did not stop the run (series whose data end well before memo.as_of). */
  warnings: InputProblem[];
}

export async function runMemo(configFile: string, options: RunMemoOptions = {}): Promise<MemoRunResult> {
  const plan = loadConfig(configFile);
  const paths = checkRunPaths(plan, options.outputFolder);
  // Put back an earlier memo left under its backup name by a killed run, before anything else
  // (findEarlierRecord and a failing run must see it where it belongs).
  recoverOutputFolder(paths.memoFolder);
  const { asOf } = plan.memo;
  // Without an as-of period the memo replaces <memo id>/ as a whole, which would delete the monthly memos in it.
  const monthly = asOf === undefined ? asOfFolders(paths.idFolder) : [];
  if (monthly.length > 0) throw new InputError(monthlyMessages.asOfFoldersWouldBeReplaced({ file: plan.configFile, field: 'memo.as_of' }, shownPath(paths.idFolder), monthly));
  const date = runDate();
  const earlier = asOf === undefined ? null : findEarlierRecord(paths.idFolder, plan.memo.id, asOf);
  const { files, records, warnings } = await prepareMemo(plan, {
    folder: paths.memoFolder,
    formats: options.formats ?? plan.output.formats,
    printer: options.printer,
    command: recordedCommand(plan, options),
    runDate: date,
    threads: options.threads,
    pool: options.pool,
    onSeriesDone: options.onSeriesDone,
    earlier,
  });
  try {
    writeOutputFolder(paths.memoFolder, files);
  } catch (error) {
    throw writeFailure(error, paths);
  }
  return {
    configFile: plan.configFile,
    memoId: plan.memo.id,
    folder: paths.memoFolder,
    series: records.length,
    files: files.map((file) => file.name),
    comparedWith: earlier?.asOf,
    warnings,
  };
}
