// A memo is a draft until every listed reviewer's latest sign-off approves it (with or
// without changes). A memo with no reviewers listed stays a draft: nobody has signed it.
import type { MemoDetails, SignOff } from '../memoInput.js';
import { STATUS } from '../wording.js';

export interface MemoStatus {
  state: 'draft' | 'signed-off';
  label: string;
  detail: string;
}

/** Each reviewer's latest sign-off by date; on the same date the later entry in the input. */
export function latestSignOffs(signOffs: readonly SignOff[]): Map<string, SignOff> {
  const latest = new Map<string, SignOff>();
  for (const entry of signOffs) {
    const previous = latest.get(entry.reviewer);
    if (previous === undefined || entry.date >= previous.date) latest.set(entry.reviewer, entry);
  }
  return latest;
}

export function memoStatus(memo: Pick<MemoDetails, 'reviewers' | 'sign_off'>): MemoStatus {
  if (memo.reviewers.length === 0) return { state: 'draft', label: STATUS.draft, detail: STATUS.noReviewers };
  const latest = latestSignOffs(memo.sign_off);
  const rejected = memo.reviewers.filter((r) => latest.get(r.name)?.decision === 'rejected').map((r) => r.name);
  const waiting = memo.reviewers.filter((r) => latest.get(r.name) === undefined).map((r) => r.name);
  if (rejected.length > 0) {
    const detail = waiting.length > 0 ? `${STATUS.rejectedBy(rejected)} ${STATUS.awaiting(waiting)}` : STATUS.rejectedBy(rejected);
    return { state: 'draft', label: STATUS.draft, detail };
  }
  if (waiting.length > 0) return { state: 'draft', label: STATUS.draft, detail: STATUS.awaiting(waiting) };
  return { state: 'signed-off', label: STATUS.signedOff, detail: STATUS.complete };
}
