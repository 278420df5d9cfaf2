// The memo's status, from the sign-offs recorded in its folder that are valid on its content
// (each already judged; void ones never count, and sign-offs typed into the config are only
// declared): signed off when every listed reviewer's latest valid decision approves it (with
// or without changes), returned when a reviewer's latest valid decision returns it, a draft
// otherwise. A memo with no reviewers listed stays a draft: nobody can sign it off.
import type { Reviewer } from '../memoInput.js';
import type { RecordedSignOff } from '../reviewPart.js';
import { REVIEW_STATUS } from '../signOffWording.js';

export interface MemoStatus {
  state: 'draft' | 'returned' | 'signed-off';
  label: string;
  detail: string;
}

/** Each reviewer's latest valid sign-off: the one recorded last. */
export function latestValidSignOffs(signOffs: readonly RecordedSignOff[]): Map<string, RecordedSignOff> {
  const latest = new Map<string, RecordedSignOff>();
  for (const entry of signOffs) {
    const previous = latest.get(entry.reviewer);
    if (entry.void_reason === null && (previous === undefined || entry.number > previous.number)) latest.set(entry.reviewer, entry);
  }
  return latest;
}

export function memoStatus(reviewers: readonly Pick<Reviewer, 'name'>[], signOffs: readonly RecordedSignOff[]): MemoStatus {
  if (reviewers.length === 0) return { state: 'draft', label: REVIEW_STATUS.draft, detail: REVIEW_STATUS.noReviewers };
  const latest = latestValidSignOffs(signOffs);
  const returned = reviewers.filter((r) => latest.get(r.name)?.decision === 'return').map((r) => r.name);
  const waiting = reviewers.filter((r) => latest.get(r.name) === undefined).map((r) => r.name);
  if (returned.length > 0) {
    const detail = waiting.length > 0 ? `${REVIEW_STATUS.returnedBy(returned)} ${REVIEW_STATUS.awaiting(waiting)}` : REVIEW_STATUS.returnedBy(returned);
    return { state: 'returned', label: REVIEW_STATUS.returned, detail };
  }
  if (waiting.length > 0) return { state: 'draft', label: REVIEW_STATUS.draft, detail: REVIEW_STATUS.awaiting(waiting) };
  return { state: 'signed-off', label: REVIEW_STATUS.signedOff, detail: REVIEW_STATUS.complete };
}

/**
 * Comments of valid approvals with changes that no later valid sign-off lists as resolved,
 * with the sign-off that resolved each of the others.
 */
export function commentResolutions(signOffs: readonly RecordedSignOff[]): { open: RecordedSignOff[]; resolvedBy: Map<number, RecordedSignOff> } {
  const resolvedBy = new Map<number, RecordedSignOff>();
  const valid = signOffs.filter((entry) => entry.void_reason === null);
  for (const entry of valid) {
    for (const number of entry.resolves) if (number < entry.number && !resolvedBy.has(number)) resolvedBy.set(number, entry);
  }
  const open = valid.filter((entry) => entry.decision === 'approve-with-changes' && entry.comment !== '' && !resolvedBy.has(entry.number));
  return { open, resolvedBy };
}
