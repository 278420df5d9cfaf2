// supersedes.json: what a revised memo supersedes, kept in its folder so that `review` and
// `verify` render the same note without the earlier revision at hand. Written by a run with
// --new-revision, read back with its shape checked; it is outside the content digest (the
// numbers do not depend on it) and listed in the manifest with its SHA-256.
import { MAX_RUN_DOCUMENT_BYTES, regularFileBytes } from '../base/readRegularFile.js';
import { join } from 'node:path';
import { InputError } from '../base/problem.js';
import { shownPath } from '../base/shownPath.js';
import type { Supersedes } from '../memo/reviewPart.js';
import { copyMessages } from './messages.js';

export const SUPERSEDES_FILE = 'supersedes.json';

export function supersedesText(supersedes: Supersedes): string {
  return `${JSON.stringify(supersedes, null, 2)}\n`;
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

const isText = (value: unknown) => typeof value === 'string';
const isNumberOrNull = (value: unknown) => value === null || typeof value === 'number';
const isTextOrNull = (value: unknown) => value === null || typeof value === 'string';

function isSupersedes(value: unknown): value is Supersedes {
  if (!isObject(value)) return false;
  const { revision, digest, inputs, numbers, largest, observations_revised: revised } = value;
  return (
    Number.isInteger(revision) &&
    isText(digest) &&
    Array.isArray(inputs) &&
    inputs.every((i) => isObject(i) && isText(i.role) && isText(i.path) && isTextOrNull(i.before) && isTextOrNull(i.after)) &&
    (numbers === null || (isObject(numbers) && Number.isInteger(numbers.compared) && Number.isInteger(numbers.differing))) &&
    Array.isArray(largest) &&
    largest.every(
      (c) =>
        isObject(c) &&
        isText(c.series) &&
        (c.model === 'deterministic' || c.model === 'stochastic') &&
        isText(c.period) &&
        isNumberOrNull(c.before) &&
        isNumberOrNull(c.after) &&
        isNumberOrNull(c.percent_change),
    ) &&
    Number.isInteger(revised)
  );
}

/** The folder's supersession note; null when the memo supersedes nothing. */
export function readSupersedes(folder: string): Supersedes | null {
  const file = join(folder, SUPERSEDES_FILE);
  // Only a regular file is read, so a FIFO in the note's place cannot make a run wait.
  const bytes = regularFileBytes(file, MAX_RUN_DOCUMENT_BYTES);
  if (bytes === null) return null;
  const text = bytes.toString('utf8');
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    value = undefined;
  }
  if (!isSupersedes(value)) throw new InputError(copyMessages.badSupersedes(shownPath(file)));
  return value;
}
