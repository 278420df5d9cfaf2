// Every sentence a reader sees about the memo's review: its status, recorded and declared
// sign-offs, void ones and why, open comments, the content digest and the revision a memo
// supersedes.
import { formatNumber, formatSignificant } from './format/formatNumber.js';
import type { InputChange, PointChange, ReviewDecision, Supersedes, VoidReason } from './reviewPart.js';
import { listInWords } from './wording.js';

export const REVIEW_DECISION_NAME: Record<ReviewDecision, string> = {
  approve: 'Approved',
  'approve-with-changes': 'Approved with changes',
  return: 'Returned for rework',
};

export const REVIEW_STATUS = {
  draft: 'Draft',
  returned: 'Returned',
  signedOff: 'Signed off',
  noReviewers: 'No reviewers are listed, so the memo cannot be signed off.',
  awaiting: (names: string[]) => `Awaiting a recorded sign-off from ${listInWords(names)}.`,
  returnedBy: (names: string[]) => `Returned for rework by ${listInWords(names)}.`,
  complete: 'Every listed reviewer has recorded a sign-off on this content.',
} as const;

export const VOID_REASON_TEXT: Record<VoidReason, string> = {
  'not-listed': 'void: the reviewer is not listed in the config',
  'other-content': 'void: given on other content (another digest)',
  unsigned: 'void: the reviewer has a public key and the sign-off is not signed',
  'bad-signature': 'void: its signature does not verify with the reviewer\u2019s public key',
};

export const SIGN_OFF_TEXT = {
  recordedHeading: 'Recorded sign-offs',
  declaredHeading: 'Declared in the config, not recorded',
  declaredNote: 'These entries were typed into the config. They are shown as declared and do not count towards the status; a reviewer records a decision with trendbrief review.',
  noneRecorded: 'No sign-off has been recorded on this memo.',
  digestLabel: 'Content digest (SHA-256)',
  digestNote:
    'The digest covers the inputs\u2019 digests, record.json and forecasts.csv, not this rendering. Each recorded sign-off names the digest it was given on; a change to any input or number gives another digest and voids it.',
  signedWithKey: 'signed with the reviewer\u2019s key',
  number: (n: number) => `No. ${n}`,
  resolves: (numbers: readonly number[]) => `resolves ${listInWords(numbers.map((n) => `No. ${n}`))}`,
  resolvedBy: (reviewer: string, number: number, date: string) => `resolved by ${reviewer} in No. ${number} on ${date}`,
  open: 'open',
  openCommentsHeading: 'Open review comments',
} as const;

/** The sign-off block's fixed text, as the templates place it. */
export const REVIEW_TEXT = {
  recordedHeading: SIGN_OFF_TEXT.recordedHeading,
  declaredHeading: SIGN_OFF_TEXT.declaredHeading,
  declaredNote: SIGN_OFF_TEXT.declaredNote,
  noneRecorded: SIGN_OFF_TEXT.noneRecorded,
  digestLabel: SIGN_OFF_TEXT.digestLabel,
  digestNote: SIGN_OFF_TEXT.digestNote,
} as const;

function shortDigest(digest: string | null): string {
  return digest === null ? 'none' : `${digest.slice(0, 12)}\u2026`;
}

const INPUT_ROLE: Readonly<Record<string, string>> = { config: 'config', data: 'data file', 'earlier-record': 'earlier memo\u2019s record' };

function inputReason(change: InputChange): string {
  const what = `The ${INPUT_ROLE[change.role] ?? change.role} ${change.path}`;
  if (change.before === null) return `${what} is new (SHA-256 ${shortDigest(change.after)}).`;
  if (change.after === null) return `${what} is no longer used.`;
  return `${what} changed (SHA-256 ${shortDigest(change.before)} before, ${shortDigest(change.after)} now).`;
}

const MODEL_WORDS = { deterministic: 'deterministic trend', stochastic: 'stochastic trend' } as const;

function pointReason(change: PointChange): string {
  const value = (x: number | null) => (x === null ? 'none' : formatSignificant(x, 6));
  const percent = change.percent_change === null ? '' : ` (${change.percent_change >= 0 ? '+' : ''}${formatNumber(change.percent_change, 2)}%)`;
  return `${change.series}, ${MODEL_WORDS[change.model]}, ${change.period}: ${value(change.before)} before, ${value(change.after)} now${percent}.`;
}

/** The reasons a revised memo lists, in plain words: inputs, then numbers, then the largest forecast changes. */
export function supersedesReasons(supersedes: Supersedes): string[] {
  const reasons = supersedes.inputs.map(inputReason);
  if (supersedes.observations_revised > 0) {
    reasons.push(`${supersedes.observations_revised} observation${supersedes.observations_revised === 1 ? ' was' : 's were'} revised in periods both versions hold.`);
  }
  if (supersedes.numbers !== null) {
    const { compared, differing } = supersedes.numbers;
    reasons.push(`The record differs in ${differing} place${differing === 1 ? '' : 's'} (${compared} numbers compared as trendbrief verify compares them).`);
  }
  if (supersedes.largest.length > 0) reasons.push(`The largest changes of the point forecasts: ${supersedes.largest.map(pointReason).join(' ')}`);
  return reasons;
}

/** One sentence for page 1. */
export function supersedesSentence(supersedes: Supersedes): string {
  const changed = supersedes.inputs.map((change) => change.path);
  const because = changed.length === 0 ? 'because its numbers changed' : `because ${listInWords(changed)} changed`;
  return `This memo supersedes revision ${supersedes.revision} (content digest ${shortDigest(supersedes.digest)}), ${because}; its sign-offs do not carry over, and revision ${supersedes.revision} is kept in the memo folder under revisions/${supersedes.revision}/.`;
}

export const SUPERSEDES_HEADING = (revision: number) => `Supersedes revision ${revision}`;
