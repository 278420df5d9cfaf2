// A checked, regularly spaced series: what the data stage reads from a CSV file and every
// analysis stage takes.
import type { Frequency } from './period.js';

export interface Series {
  /** The path as the caller gave it, used in messages and records. */
  file: string;
  column: string;
  periodColumn: string;
  frequency: Frequency;
  /** Canonical period labels, oldest first, one per observation, with no gaps. */
  periods: string[];
  /** NaN where an observation is missing (only with `missing: 'allow'`). */
  values: Float64Array;
  first: string;
  last: string;
  /** Periods from first to last, missing ones included. */
  n: number;
  /** Periods without a value. */
  missing: number;
  /** SHA-256 of the file's bytes, lowercase hex. */
  sha256: string;
}
