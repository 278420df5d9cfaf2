// One config → one memo folder:
//   loadConfig ─▶ RunPlan ─checkRunPaths─▶ <output>/<memo id>/<as-of>/ (or <output>/<memo id>/)
//   ─findEarlierRecord (the previous as-of memo beside it)─▶ prepareMemo ─▶ record document
//   ─contentDigest─▶ publication (an issued memo kept, revised or left alone) ─assembleMemo─▶ files
//   ─writeOutputFolder─▶ the memo (its name linked to the complete new version, or to the previous one)
import { loadConfig } from '../config/loadConfig.js';
import type { OutputFormat } from '../config/runPlan.js';
import { InputError, type InputProblem } from '../base/problem.js';
import { monthlyMessages } from './messages.js';
import type { PdfPrinter } from '../memo/print/pdfPrinter.js';
import { checkRunPaths, writeFailure } from './checkRunPaths.js';
import { asOfFolders, findEarlierRecords } from './findEarlierRecord.js';
import { assembleMemo, contentFiles, unitsOf } from './assembleMemo.js';
import { contentDigest } from './contentDigest.js';
import { inputCopyFiles } from './inputCopies.js';
import { publication, type Publication } from './issuedMemo.js';
import { withMemoLock } from './memoLock.js';
import { prepareMemo } from './prepareMemo.js';
import { runInputs } from './runInputs.js';
import { attachTrackRecord } from './trackRecord.js';
import { recordedCommand } from './recordedCommand.js';
import { runDate } from './runDate.js';
import type { SeriesPool } from './seriesPool.js';
import { writeOutputFolder } from './writeOutputFolder.js';
import { recoverMemoLink } from './memoVersions.js';
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
  /** Over an issued memo whose content would change: keep it as a numbered revision and write a new draft (otherwise the run is refused). */
  newRevision?: boolean;
}

export interface MemoRunResult {
  configFile: string;
  memoId: string;
  folder: string;
  series: number;
  files: string[];
  /** The as-of period of the memo compared with, when there was one. */
  comparedWith?: string;
  /** Written afresh, kept (an issued memo with the same content digest) or revised (the issued memo kept as a revision). */
  outcome: Publication['outcome'];
  /** The number the superseded memo was kept under, when revised. */
  revision?: number;
  /** Sign-offs carried into the rewritten folder, when kept. */
  signOffs: number;
  /** Warnings that did not stop the run (series whose data end well before memo.as_of). */
  warnings: InputProblem[];
}

export async function runMemo(configFile: string, options: RunMemoOptions = {}): Promise<MemoRunResult> {
  const plan = loadConfig(configFile);
  const paths = checkRunPaths(plan, options.outputFolder);
  const { asOf } = plan.memo;
  // Without an as-of period the memo replaces <memo id>/ as a whole, which would delete the monthly memos in it.
  const monthly = asOf === undefined ? asOfFolders(paths.idFolder) : [];
  if (monthly.length > 0) throw new InputError(monthlyMessages.asOfFoldersWouldBeReplaced({ file: plan.configFile, field: 'memo.as_of' }, shownPath(paths.idFolder), monthly));
  const date = runDate();
  // The revisions compare with the most recent earlier memo; the track record reads them all.
  const earlierMemos = asOf === undefined ? [] : findEarlierRecords(paths.idFolder, plan.memo.id, asOf);
  const earlier = earlierMemos[0] ?? null;
  const { loaded, records, document, warnings } = await prepareMemo(plan, { runDate: date, threads: options.threads, pool: options.pool, onSeriesDone: options.onSeriesDone });
  const formats = options.formats ?? plan.output.formats;
  attachTrackRecord(document, earlierMemos);
  const inputs = runInputs(plan, loaded, paths.memoFolder, earlierMemos);
  const content = contentFiles(document, formats, unitsOf(plan));
  const digest = contentDigest(inputs, new Map(content.map((file) => [file.name, file.content])));
  // An issued memo is kept, revised or left alone (exit 2) before anything is rendered; no
  // review may record a sign-off between reading the folder and replacing it.
  const { publish, files } = await withMemoLock(paths.memoFolder, async () => {
    // A killed run's leftovers are cleared and the memo's name linked to its complete version first.
    recoverMemoLink(paths.memoFolder);
    const publish = publication(paths.memoFolder, { inputs, document, content, digest }, options.newRevision === true);
    const { files } = await assembleMemo(plan, loaded, document, {
      formats,
      printer: options.printer,
      command: recordedCommand(plan, options),
      earlier: earlier?.document ?? null,
      inputs,
      copies: inputCopyFiles(paths.memoFolder, inputs, 'original'),
      signOffs: publish.log,
      supersedes: publish.supersedes,
    });
    writeOutputFolder(paths.memoFolder, [...files, ...publish.carried], paths.outputFolder);
    return { publish, files };
  }).catch((error: unknown) => {
    // Refusals by the file system (taking the lock, writing the folder) are the user's environment.
    throw writeFailure(error, paths);
  });
  return {
    configFile: plan.configFile,
    memoId: plan.memo.id,
    folder: paths.memoFolder,
    series: records.length,
    files: files.filter((file) => !file.name.includes('/')).map((file) => file.name),
    comparedWith: earlier?.asOf,
    outcome: publish.outcome,
    revision: publish.revision,
    signOffs: publish.signOffs,
    warnings,
  };
}
