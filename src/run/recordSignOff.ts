// `review`: one reviewer's decision recorded on an issued memo folder, bound to its content.
//   folder ─readStoredMemo─▶ manifest, stored content and its digest, sign-off log
//   ─planFromCopies─▶ the reviewers (and their public keys) of the copied config
//   ─▶ the entry (numbered, signed with the reviewer's key when the config lists one), appended
//   to the log ─assembleMemo from the stored record.json─▶ memo.html (memo.pdf) with the new
//   status, manifest.json ─writeOutputFolder─▶ the folder (complete, or as it was)
// record.json and forecasts.csv are rendered from the stored document and must come out byte
// for byte as stored; when the run wrote no record.json the analysis is run again from the
// copied inputs (and must give the stored forecasts.csv).
import { existsSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { closestName } from '../base/closestName.js';
import { writeFailure } from './checkRunPaths.js';
import { InputError } from '../base/problem.js';
import { shownPath } from '../base/shownPath.js';
import type { PdfPrinter } from '../memo/print/pdfPrinter.js';
import type { ReviewDecision } from '../memo/reviewPart.js';
import { memoStatus, commentResolutions, type MemoStatus } from '../memo/view/memoStatus.js';
import { assembleMemo } from './assembleMemo.js';
import { isComparableDocument } from './comparableDocument.js';
import { folderFiles } from './folderFiles.js';
import { inputCopyFiles } from './inputCopies.js';
import { REVISIONS_FOLDER } from './issuedMemo.js';
import { judgeSignOffs } from './judgeSignOffs.js';
import { sha256 } from './manifest.js';
import { reviewMessages, verifyMessages } from './messages.js';
import { earlierFromCopies, earlierFromCopy, planFromCopies } from './planFromCopies.js';
import { attachTrackRecord } from './trackRecord.js';
import { prepareMemo } from './prepareMemo.js';
import { readAllSeries } from './readPlannedSeries.js';
import type { RecordDocument } from './recordDocument.js';
import { keyMatches, readPrivateKey, signEntry } from './reviewKeys.js';
import { nextNumber, signOffLine, type SignOffEntry } from './signOffLog.js';
import { readStoredMemo, storedFormats, type StoredMemo } from './storedMemo.js';
import { writeOutputFolder } from './writeOutputFolder.js';
import { withMemoLock } from './memoLock.js';

export interface SignOffRequest {
  folder: string;
  reviewer: string;
  decision: ReviewDecision;
  /** '' when none; the caller has checked that a decision needing one has one. */
  comment: string;
  /** YYYY-MM-DD, already checked. */
  date: string;
  resolves: readonly number[];
  /** The reviewer's private key file, for a reviewer with a public key in the config. */
  keyFile?: string;
  /** A browser, needed when the folder holds memo.pdf. */
  printer?: () => Promise<PdfPrinter>;
}

export interface RecordedSignOffResult {
  entry: SignOffEntry;
  status: MemoStatus;
  /** The memo's files whose bytes changed (names in the folder); the others were written again as they were. */
  files: string[];
}

/** The stored record document, or null when the run wrote none. */
function storedDocument(memo: StoredMemo): RecordDocument | null {
  const bytes = memo.stored.get('record.json');
  if (bytes === undefined) return null;
  const value: unknown = JSON.parse(bytes.toString('utf8'));
  // Its bytes have the hash the manifest records (checked before), so it is the document the run wrote.
  if (!isComparableDocument(value)) throw new Error('recordSignOff: the stored record.json is not a record document');
  return value as unknown as RecordDocument;
}

/** The memo as issued: every input copy and every output with the hash the manifest records. */
function checkIssued(memo: StoredMemo): void {
  const { manifest } = memo;
  if (manifest.inputs.some((input) => input.copy === undefined)) throw new InputError(reviewMessages.notSelfContained(memo.manifestFile));
  inputCopyFiles(memo.folder, manifest.inputs, 'copy');
  for (const output of manifest.outputs) {
    const bytes = memo.stored.get(output.file);
    const actual = bytes === undefined ? 'none (the file is missing)' : sha256(bytes);
    if (actual !== output.sha256) throw new InputError(reviewMessages.outputChanged(shownPath(resolve(memo.folder, output.file)), output.sha256, actual));
  }
}

/** Holds the memo folder's lock from reading the log to publishing the folder, so no sign-off is lost to another writer. */
export async function recordSignOff(request: SignOffRequest): Promise<RecordedSignOffResult> {
  const folder = resolve(request.folder);
  return withMemoLock(folder, () => record(folder, request)).catch((error: unknown) => {
    // Refusals by the file system (taking the lock, writing the folder) are the user's environment.
    throw writeFailure(error, { outputFolder: folder, idFolder: folder, memoFolder: folder, chosenAt: { file: shownPath(folder) } });
  });
}

async function record(folder: string, request: SignOffRequest): Promise<RecordedSignOffResult> {
  if (!existsSync(folder)) throw new InputError(verifyMessages.notFound(shownPath(folder)));
  const memo = readStoredMemo(folder);
  if (memo === null) throw new InputError(reviewMessages.notAMemo(shownPath(folder)));
  // A revision kept under revisions/N/ of a memo folder is superseded: its sign-offs stay as they were.
  const current = dirname(dirname(folder));
  if (basename(dirname(folder)) === REVISIONS_FOLDER && existsSync(join(current, 'manifest.json'))) {
    throw new InputError(reviewMessages.superseded(shownPath(folder), shownPath(current)));
  }
  checkIssued(memo);
  const { manifest, manifestFile } = memo;
  const plan = planFromCopies(folder, manifest, manifestFile);
  const names = plan.memo.reviewers.map((r) => r.name);
  const listed = plan.memo.reviewers.find((r) => r.name === request.reviewer);
  if (listed === undefined) throw new InputError(reviewMessages.unknownReviewer(request.reviewer, names, closestName(request.reviewer, names), plan.memo.id));
  const judged = judgeSignOffs(memo.log.entries, plan.memo.reviewers, memo.digest);
  const open = commentResolutions(judged).open.map((entry) => entry.number);
  for (const number of request.resolves) if (!open.includes(number)) throw new InputError(reviewMessages.notOpen(number, open));
  if (listed.public_key !== undefined && request.keyFile === undefined) throw new InputError(reviewMessages.keyNeeded(listed.name));
  if (listed.public_key === undefined && request.keyFile !== undefined) throw new InputError(reviewMessages.keyNotListed(listed.name));
  const templates = plan.output.templates;
  if (templates !== undefined && !existsSync(templates.folder)) throw new InputError(reviewMessages.templatesMissing(shownPath(templates.folder)));

  const unsigned = {
    number: nextNumber(memo.log),
    reviewer: listed.name,
    role: listed.role ?? '',
    decision: request.decision,
    date: request.date,
    comment: request.comment,
    resolves: [...request.resolves],
    digest: memo.digest,
  };
  let signature: string | null = null;
  if (request.keyFile !== undefined && listed.public_key !== undefined) {
    const key = readPrivateKey(request.keyFile);
    if (!keyMatches(key, listed.public_key)) throw new InputError(reviewMessages.keyMismatch(shownPath(request.keyFile), listed.name));
    signature = signEntry(unsigned, key);
  }
  const entry: SignOffEntry = { ...unsigned, signature };
  const log = { entries: [...memo.log.entries, entry], unreadable: memo.log.unreadable, text: memo.log.text + signOffLine(entry) };

  const stored = storedDocument(memo);
  // Without a stored record.json the document is analysed again from the copied inputs.
  const loaded = stored === null ? null : await readAllSeries(plan);
  const prepared = loaded === null || stored === null ? await prepareMemo(plan, { runDate: manifest.run_date }) : { loaded, document: stored };
  // A stored record.json carries its track record; one analysed again reads the earlier records' copies.
  if (stored === null) attachTrackRecord(prepared.document, earlierFromCopies(folder, manifest, manifestFile));
  const assembled = await assembleMemo(plan, prepared.loaded, prepared.document, {
    formats: storedFormats(manifest),
    printer: request.printer,
    command: manifest.command,
    earlier: earlierFromCopy(folder, manifest, manifestFile)?.document ?? null,
    inputs: manifest.inputs,
    copies: inputCopyFiles(folder, manifest.inputs, 'copy'),
    signOffs: log,
    supersedes: memo.supersedes,
  });
  if (assembled.digest !== memo.digest) throw new InputError(reviewMessages.contentNotRebuilt(shownPath(folder)));
  writeOutputFolder(folder, [...assembled.files, ...folderFiles(folder, REVISIONS_FOLDER)]);
  return {
    entry,
    status: memoStatus(plan.memo.reviewers, judgeSignOffs(log.entries, plan.memo.reviewers, memo.digest)),
    files: assembled.files
      .filter((file) => !file.name.includes('/') && !memo.stored.get(file.name)?.equals(Buffer.from(file.content)))
      .map((file) => file.name),
  };
}
