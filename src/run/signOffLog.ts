// The sign-off log of a memo folder, sign-offs.jsonl: one JSON object per line, one line per
// recorded act, numbered from 1 in the order recorded. It is only ever appended to (`review`
// writes the old bytes followed by one new line); nothing rewrites an entry. A memo is issued
// once a reviewer's decision is recorded on it, that is once its log has a line.
import { MAX_RUN_DOCUMENT_BYTES, regularFileBytes } from '../base/readRegularFile.js';
import { join } from 'node:path';
import type { RecordedSignOff, ReviewDecision } from '../memo/reviewPart.js';

export const SIGN_OFF_LOG = 'sign-offs.jsonl';

export const REVIEW_DECISIONS: readonly ReviewDecision[] = ['approve', 'approve-with-changes', 'return'];

/**
 * One recorded act as the log holds it: what the memo shows of it (RecordedSignOff without the
 * verdict, which is judged afresh against each memo's content), the content digest the reviewer
 * decided on, and the base64 Ed25519 signature of `signedText(entry)`, null when unsigned.
 */
export interface SignOffEntry extends Omit<RecordedSignOff, 'signed' | 'void_reason'> {
  digest: string;
  signature: string | null;
}

/** A line of the log that is not a sign-off entry (edited by hand, cut short). */
export interface UnreadableLine {
  line: number;
}

export interface SignOffLog {
  entries: SignOffEntry[];
  unreadable: UnreadableLine[];
  /** The log's bytes as read, '' when there is none; `review` appends to exactly these. */
  text: string;
}

/**
 * The text an Ed25519 signature covers: the entry's number, digest, reviewer, decision, date,
 * comment and resolved numbers as one JSON array, in that order.
 */
export function signedText(entry: Omit<SignOffEntry, 'signature' | 'role'>): string {
  return JSON.stringify(['trendbrief sign-off 1', entry.number, entry.digest, entry.reviewer, entry.decision, entry.date, entry.comment, entry.resolves]);
}

/** One line of the log, keys in a fixed order, ending in a line feed. */
export function signOffLine(entry: SignOffEntry): string {
  const { number, reviewer, role, decision, date, comment, resolves, digest, signature } = entry;
  return `${JSON.stringify({ number, reviewer, role, decision, date, comment, resolves, digest, signature })}\n`;
}

function isEntry(value: unknown, number: number): value is SignOffEntry {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return false;
  const v = value as Record<string, unknown>;
  const text = (key: string) => typeof v[key] === 'string';
  return (
    v.number === number &&
    text('reviewer') &&
    text('role') &&
    REVIEW_DECISIONS.some((decision) => decision === v.decision) &&
    typeof v.date === 'string' &&
    /^\d{4}-\d\d-\d\d$/.test(v.date) &&
    text('comment') &&
    Array.isArray(v.resolves) &&
    v.resolves.every((n) => Number.isInteger(n)) &&
    typeof v.digest === 'string' &&
    /^[0-9a-f]{64}$/.test(v.digest) &&
    (v.signature === null || text('signature'))
  );
}

export function parseSignOffLog(text: string): SignOffLog {
  const entries: SignOffEntry[] = [];
  const unreadable: UnreadableLine[] = [];
  const lines = text === '' ? [] : text.replace(/\n$/, '').split('\n');
  lines.forEach((line, index) => {
    let value: unknown;
    try {
      value = JSON.parse(line);
    } catch {
      value = undefined;
    }
    if (isEntry(value, index + 1)) entries.push(value);
    else unreadable.push({ line: index + 1 });
  });
  return { entries, unreadable, text };
}

/** The log of a memo folder; an empty log when it has none. */
export function readSignOffLog(folder: string): SignOffLog {
  // Only a regular file is read, so a FIFO in the log's place cannot make review wait.
  const bytes = regularFileBytes(join(folder, SIGN_OFF_LOG), MAX_RUN_DOCUMENT_BYTES);
  if (bytes === null) return { entries: [], unreadable: [], text: '' };
  return parseSignOffLog(bytes.toString('utf8'));
}

/** The number the next entry gets: one past the log's lines, readable or not. */
export function nextNumber(log: SignOffLog): number {
  return log.entries.length + log.unreadable.length + 1;
}
