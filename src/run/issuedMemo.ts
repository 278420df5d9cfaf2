// What a run does with the memo folder it is about to replace. A memo is issued once a
// reviewer's decision is recorded on it (its sign-off log has a line); an issued memo is never
// replaced silently:
//   - same content digest: the memo is kept: its sign-off log (and any supersession note and
//     earlier revisions) are carried into the rewritten folder, so its status stays;
//   - another digest, without --new-revision: refused (exit 2), nothing changes;
//   - another digest, with --new-revision: the whole earlier folder is kept as revisions/N/
//     (numbered after those it already keeps, which keep their numbers) and the new memo, a
//     draft with an empty log, says which revision it supersedes and what changed.
// A memo that is not issued is replaced as before; if it superseded a revision, the new one
// supersedes the same revision, its reasons weighed again.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { InputError } from '../base/problem.js';
import { shownPath } from '../base/shownPath.js';
import type { Supersedes } from '../memo/reviewPart.js';
import { folderFiles } from './folderFiles.js';
import { issuedMessages } from './messages.js';
import { readSignOffLog, SIGN_OFF_LOG, type SignOffLog } from './signOffLog.js';
import { readStoredMemo } from './storedMemo.js';
import { supersedesOf, type NewContent } from './supersedesOf.js';
import type { OutputFile } from './writeOutputFolder.js';

export const REVISIONS_FOLDER = 'revisions';

export interface Publication {
  outcome: 'written' | 'kept' | 'revised';
  /** The log the new folder starts with. */
  log: SignOffLog;
  supersedes: Supersedes | null;
  /** Earlier revisions (and, when revised, the memo being superseded) carried under revisions/. */
  carried: OutputFile[];
  /** The revision number the superseded memo was kept under, when revised. */
  revision?: number;
  /** Sign-offs carried, when kept. */
  signOffs: number;
}

const EMPTY_LOG: SignOffLog = { entries: [], unreadable: [], text: '' };

/** Numbers of the revisions a memo folder keeps, in order. */
export function revisionNumbers(folder: string): number[] {
  try {
    return readdirSync(join(folder, REVISIONS_FOLDER), { withFileTypes: true })
      .filter((entry) => entry.isDirectory() && /^[1-9]\d*$/.test(entry.name))
      .map((entry) => Number(entry.name))
      .sort((a, b) => a - b);
  } catch {
    return [];
  }
}

/** Every file of the memo folder except its revisions, named under revisions/N/. */
function keptAsRevision(folder: string, revision: number): OutputFile[] {
  return folderFiles(folder, '', [REVISIONS_FOLDER]).map((file) => ({ ...file, name: `${REVISIONS_FOLDER}/${revision}/${file.name}` }));
}

/**
 * The supersession of a draft that superseded a revision: the same revision, weighed against the
 * new content. A draft replaced as drafts always were: a folder the run cannot read as a memo
 * (or whose kept revision it cannot read) supersedes nothing new and is not refused for it.
 */
function supersedesAgain(folder: string, next: NewContent): Supersedes | null {
  try {
    const existing = readStoredMemo(folder);
    if (existing === null || existing.supersedes === null) return null;
    const revision = existing.supersedes.revision;
    const earlier = readStoredMemo(join(folder, REVISIONS_FOLDER, String(revision)));
    return earlier === null ? existing.supersedes : supersedesOf(revision, earlier, next);
  } catch (error) {
    if (error instanceof InputError) return null;
    throw error;
  }
}

export function publication(folder: string, next: NewContent, newRevision: boolean): Publication {
  const log = readSignOffLog(folder);
  const lines = log.entries.length + log.unreadable.length;
  const carried = folderFiles(folder, REVISIONS_FOLDER);
  if (lines === 0) return { outcome: 'written', log: EMPTY_LOG, supersedes: supersedesAgain(folder, next), carried, signOffs: 0 };
  // An issued memo must be readable as one: its manifest says what its content was.
  const existing = readStoredMemo(folder);
  if (existing === null) throw new InputError(issuedMessages.noManifest({ file: shownPath(join(folder, SIGN_OFF_LOG)) }, shownPath(folder), lines));
  if (existing.digest === next.digest) return { outcome: 'kept', log: existing.log, supersedes: existing.supersedes, carried, signOffs: lines };
  if (!newRevision) throw new InputError(issuedMessages.wouldReplace({ file: shownPath(join(folder, SIGN_OFF_LOG)) }, shownPath(folder), lines, existing.digest, next.digest));
  const revision = Math.max(0, ...revisionNumbers(folder)) + 1;
  return {
    outcome: 'revised',
    log: EMPTY_LOG,
    supersedes: supersedesOf(revision, existing, next),
    carried: [...carried, ...keptAsRevision(folder, revision)],
    revision,
    signOffs: 0,
  };
}
