// What changed between a memo kept as a revision and the memo that supersedes it: the inputs
// whose digests differ (matched by role and path as written), how many numbers of record.json
// differ as verify compares them (compareJson), the largest changes of the point forecasts and
// the observations revised (compareRecords).
import type { InputChange, PointChange, Supersedes } from '../memo/reviewPart.js';
import { isComparableDocument, type ComparableDocument } from './comparableDocument.js';
import { compareJson, numbersAgree } from './compareJson.js';
import { compareRecords } from './compareRecords.js';
import type { ManifestInput } from './manifest.js';
import type { RecordDocument } from './recordDocument.js';
import type { StoredMemo } from './storedMemo.js';
import type { OutputFile } from './writeOutputFolder.js';

/** What a run is about to publish, weighed against the memo folder it would replace. */
export interface NewContent {
  inputs: readonly ManifestInput[];
  document: RecordDocument;
  /** record.json and forecasts.csv as the formats ask for them. */
  content: readonly OutputFile[];
  digest: string;
}

/** Forecast changes named in the reasons. */
export const LARGEST_SHOWN = 3;

function inputChanges(before: readonly ManifestInput[], after: readonly ManifestInput[]): InputChange[] {
  const key = (input: ManifestInput) => `${input.role}\u0000${input.path}`;
  const earlier = new Map(before.map((input) => [key(input), input.sha256]));
  const now = new Map(after.map((input) => [key(input), input.sha256]));
  const changes: InputChange[] = [];
  for (const input of after) {
    const was = earlier.get(key(input)) ?? null;
    if (was !== input.sha256 && !changes.some((c) => c.role === input.role && c.path === input.path)) changes.push({ role: input.role, path: input.path, before: was, after: input.sha256 });
  }
  for (const input of before) if (!now.has(key(input))) changes.push({ role: input.role, path: input.path, before: input.sha256, after: null });
  return changes;
}

function storedDocument(earlier: StoredMemo): ComparableDocument | null {
  const bytes = earlier.stored.get('record.json');
  if (bytes === undefined) return null;
  try {
    const value: unknown = JSON.parse(bytes.toString('utf8'));
    return isComparableDocument(value) ? value : null;
  } catch {
    return null;
  }
}

function largestChanges(now: ComparableDocument, before: ComparableDocument): { largest: PointChange[]; revised: number } {
  const revisions = compareRecords(now, before);
  const changes: PointChange[] = revisions.series.flatMap((series) =>
    series.forecasts
      .filter((f) => f.point === null || f.point_earlier === null || !numbersAgree(f.point, f.point_earlier))
      .map((f) => ({ series: series.title, model: f.model, period: f.period, before: f.point_earlier, after: f.point, percent_change: f.percent_change })),
  );
  const size = (c: PointChange) => (c.percent_change === null ? Infinity : Math.abs(c.percent_change));
  changes.sort((a, b) => size(b) - size(a));
  const revised = revisions.series.reduce((sum, series) => sum + (series.data?.length ?? 0), 0);
  return { largest: changes.slice(0, LARGEST_SHOWN), revised };
}

export function supersedesOf(revision: number, earlier: StoredMemo, next: NewContent): Supersedes {
  const before = storedDocument(earlier);
  const recordText = next.content.find((file) => file.name === 'record.json')?.content;
  const comparison = before === null || recordText === undefined ? null : compareJson(before, JSON.parse(Buffer.from(recordText).toString('utf8')));
  const numbers = comparison === null ? null : { compared: comparison.numbers, differing: comparison.differences.length };
  const { largest, revised } = before === null ? { largest: [], revised: 0 } : largestChanges(next.document, before);
  return { revision, digest: earlier.digest, inputs: inputChanges(earlier.manifest.inputs, next.inputs), numbers, largest, observations_revised: revised };
}
