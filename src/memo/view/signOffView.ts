// The sign-off block: one row per listed reviewer with their latest valid recorded decision,
// or blank lines to sign on paper; then every recorded sign-off in log order (valid or void,
// with what each resolves and who resolved its comment), the sign-offs declared in the config
// (shown, never counted) and the content digest the sign-offs are bound to.
import { noLinks } from '../format/noLinks.js';
import type { MemoDetails } from '../memoInput.js';
import type { RecordedSignOff } from '../reviewPart.js';
import { REVIEW_DECISION_NAME, SIGN_OFF_TEXT, VOID_REASON_TEXT } from '../signOffWording.js';
import { DECISION_NAME, LABELS } from '../wording.js';
import { commentResolutions, latestValidSignOffs } from './memoStatus.js';

export interface SignOffRow {
  name: string;
  role: string;
  signed: boolean;
  decision: string;
  date: string;
  comment: string;
  returned: boolean;
  /** '' or the note that the sign-off carries a verified signature. */
  key: string;
}

export interface RecordedRow {
  number: string;
  reviewer: string;
  decision: string;
  date: string;
  comment: string;
  /** What it resolves, who resolved its comment, whether it is still open, its signature: '' when nothing. */
  notes: string[];
  /** '' when valid; otherwise why it is void. */
  void: string;
}

export interface DeclaredRow {
  reviewer: string;
  decision: string;
  date: string;
  comment: string;
}

export interface SignOffView {
  rows: SignOffRow[];
  recorded: RecordedRow[];
  declared: DeclaredRow[];
}

function recordedRow(entry: RecordedSignOff, resolvedBy: ReadonlyMap<number, RecordedSignOff>, open: ReadonlySet<number>): RecordedRow {
  const notes: string[] = [];
  if (entry.resolves.length > 0) notes.push(SIGN_OFF_TEXT.resolves(entry.resolves));
  const resolver = resolvedBy.get(entry.number);
  if (resolver !== undefined) notes.push(SIGN_OFF_TEXT.resolvedBy(noLinks(resolver.reviewer), resolver.number, resolver.date));
  if (open.has(entry.number)) notes.push(SIGN_OFF_TEXT.open);
  if (entry.signed) notes.push(SIGN_OFF_TEXT.signedWithKey);
  return {
    number: SIGN_OFF_TEXT.number(entry.number),
    reviewer: noLinks(entry.role === '' ? entry.reviewer : `${entry.reviewer}, ${entry.role}`),
    decision: REVIEW_DECISION_NAME[entry.decision],
    date: noLinks(entry.date),
    comment: noLinks(entry.comment),
    notes,
    void: entry.void_reason === null ? '' : VOID_REASON_TEXT[entry.void_reason],
  };
}

export function signOffView(memo: Pick<MemoDetails, 'reviewers' | 'sign_off'>, signOffs: readonly RecordedSignOff[]): SignOffView {
  const latest = latestValidSignOffs(signOffs);
  const rows = memo.reviewers.map((r): SignOffRow => {
    const entry = latest.get(r.name);
    if (entry === undefined) return { name: noLinks(r.name), role: noLinks(r.role), signed: false, decision: LABELS.notSigned, date: '', comment: '', returned: false, key: '' };
    return {
      name: noLinks(r.name),
      role: noLinks(r.role),
      signed: true,
      decision: REVIEW_DECISION_NAME[entry.decision],
      date: noLinks(entry.date),
      comment: noLinks(entry.comment),
      returned: entry.decision === 'return',
      key: entry.signed ? SIGN_OFF_TEXT.signedWithKey : '',
    };
  });
  const { open, resolvedBy } = commentResolutions(signOffs);
  const openNumbers = new Set(open.map((entry) => entry.number));
  return {
    rows,
    recorded: signOffs.map((entry) => recordedRow(entry, resolvedBy, openNumbers)),
    declared: memo.sign_off.map((entry) => ({
      reviewer: noLinks(entry.reviewer),
      decision: DECISION_NAME[entry.decision],
      date: noLinks(entry.date),
      comment: noLinks(entry.comment ?? ''),
    })),
  };
}
