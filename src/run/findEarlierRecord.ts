// The earlier as-of memos beside this one: among the sibling folders of <output folder>/<memo id>/
// whose names are period labels before this memo's as-of period, those whose record.json is a
// record document of the same memo; the most recent of them is the one the revisions compare
// with. "Earlier" is by period order, never by file time, so a rerun of an old month compares
// with the same memos as before.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { parsePeriod, periodsPerYear } from '../base/period.js';
import { isMemoLink } from './memoVersions.js';
import { readComparableDocument, type ComparableDocument } from './comparableDocument.js';

export interface EarlierRecord {
  asOf: string;
  /** Absolute path of its record.json. */
  file: string;
  sha256: string;
  document: ComparableDocument;
}

/**
 * The months a period label spans, as [first, last] month indices (year × 12 + month − 1);
 * null for a text that is no period label. A year and its last quarter end in the same month.
 */
export function monthSpan(label: string): [number, number] | null {
  const period = parsePeriod(label);
  if (period === null) return null;
  const months = 12 / periodsPerYear(period.frequency);
  const first = period.year * 12 + (period.sub - 1) * months;
  return [first, first + months - 1];
}

/**
 * Orders as-of labels from the most recent: by the last month covered, then the later first
 * month (2024-12 before 2024-Q4 before 2024), then the label, so the order never depends on
 * the file system.
 */
export function byRecency(a: string, b: string): number {
  const [firstA, lastA] = monthSpan(a) ?? [0, 0];
  const [firstB, lastB] = monthSpan(b) ?? [0, 0];
  return lastB - lastA || firstB - firstA || (a < b ? 1 : a > b ? -1 : 0);
}

/** True when `label` ends before `asOf` does. */
export function isEarlierAsOf(label: string, asOf: string): boolean {
  const span = monthSpan(label);
  const own = monthSpan(asOf);
  return span !== null && own !== null && span[1] < own[1];
}

/**
 * Every earlier as-of memo beside this one whose record.json is a record document of the same
 * memo and as-of period, the most recent first: the revisions read the first, the track record
 * all of them.
 */
export function findEarlierRecords(memoIdFolder: string, memoId: string, asOf: string): EarlierRecord[] {
  let entries: string[];
  try {
    entries = readdirSync(memoIdFolder);
  } catch {
    return [];
  }
  return entries
    .filter((entry) => isEarlierAsOf(entry, asOf))
    .sort(byRecency)
    .flatMap((label) => {
      const file = join(memoIdFolder, label, 'record.json');
      const read = readComparableDocument(file);
      return read !== null && read.document.memo.id === memoId && read.document.memo.as_of === label ? [{ asOf: label, file, ...read }] : [];
    });
}

export function findEarlierRecord(memoIdFolder: string, memoId: string, asOf: string): EarlierRecord | null {
  return findEarlierRecords(memoIdFolder, memoId, asOf)[0] ?? null;
}

/**
 * Sub-folders of `memoIdFolder` named as as-of periods: the monthly memos that a run without an
 * as-of period, which replaces `memoIdFolder` as a whole, would delete.
 */
export function asOfFolders(memoIdFolder: string): string[] {
  try {
    return readdirSync(memoIdFolder, { withFileTypes: true })
      .filter((entry) => (entry.isDirectory() || isMemoLink(join(memoIdFolder, entry.name))) && monthSpan(entry.name) !== null)
      .map((entry) => entry.name)
      .sort(byRecency);
  } catch {
    return [];
  }
}
