// The data stage's product: one checked, regularly spaced series read from a CSV file.

import type { Frequency } from './period.js';

/** The transform the models will apply; the data stage only checks that the values allow it. */
export interface TransformSpec {
  kind: 'none' | 'log' | 'box-cox';
  lambda?: number;
}

/** What the caller wants from the file and what the later use of the series requires. */
export interface SeriesOptions {
  /** Value column; default: the first column that is not the period column. */
  column?: string;
  /** Period column; default: the first column. */
  periodColumn?: string;
  /** Expected frequency; default: inferred from the first period label. */
  frequency?: Frequency;
  /** Fewest observations the caller's use of the series needs. */
  minObservations?: number;
  transform?: TransformSpec;
  /**
   * 'allow': empty cells, missing-value markers and missing periods become NaN observations
   * (the first and last must still be present); 'error' (default): each is a problem.
   */
  missing?: 'error' | 'allow';
}

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
