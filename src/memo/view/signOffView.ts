// The sign-off block: one row per listed reviewer with their latest decision, or blank lines
// to sign on paper; sign-offs from people not listed as reviewers are shown after them.
import { noLinks } from '../format/noLinks.js';
import type { MemoDetails, SignOff } from '../memoInput.js';
import { DECISION_NAME, LABELS } from '../wording.js';
import { latestSignOffs } from './memoStatus.js';

export interface SignOffRow {
  name: string;
  role: string;
  signed: boolean;
  decision: string;
  date: string;
  comment: string;
  rejected: boolean;
}

function signedRow(name: string, role: string, entry: SignOff): SignOffRow {
  return {
    name: noLinks(name),
    role: noLinks(role),
    signed: true,
    decision: DECISION_NAME[entry.decision],
    date: noLinks(entry.date),
    comment: noLinks(entry.comment ?? ''),
    rejected: entry.decision === 'rejected',
  };
}

export function signOffView(memo: Pick<MemoDetails, 'reviewers' | 'sign_off'>): SignOffRow[] {
  const latest = latestSignOffs(memo.sign_off);
  const listed = new Set(memo.reviewers.map((r) => r.name));
  const reviewers = memo.reviewers.map((r) => {
    const entry = latest.get(r.name);
    return entry === undefined
      ? { name: noLinks(r.name), role: noLinks(r.role), signed: false, decision: LABELS.notSigned, date: '', comment: '', rejected: false }
      : signedRow(r.name, r.role, entry);
  });
  const others = [...latest.values()].filter((e) => !listed.has(e.reviewer)).map((e) => signedRow(e.reviewer, '', e));
  return [...reviewers, ...others];
}
