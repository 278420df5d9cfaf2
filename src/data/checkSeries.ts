// Checks on the values of a series that concern its later use rather than the file's format.

import { dataMessages, type InputProblem } from '../errors.js';
import type { TransformSpec } from './series.js';

export interface SeriesRules {
  minObservations?: number;
  transform?: TransformSpec;
}

export interface SeriesValues {
  file: string;
  column: string;
  values: ArrayLike<number>;
  /** File line of each value, when the values came from a file. */
  lines?: readonly number[];
}

function transformName(transform: TransformSpec): string {
  if (transform.kind === 'box-cox') {
    return transform.lambda === undefined ? 'Box-Cox' : `Box-Cox (lambda ${transform.lambda})`;
  }
  return transform.kind;
}

function isConstant(values: ArrayLike<number>): boolean {
  for (let i = 1; i < values.length; i++) if (values[i] !== values[0]) return false;
  return true;
}

/**
 * Too few observations, a constant series, and values outside the domain of the transform.
 * Log and Box-Cox both need every value above zero (Box & Cox 1964 define the transform for y > 0).
 */
export function checkSeries(series: SeriesValues, rules: SeriesRules = {}): InputProblem[] {
  const { file, column, values } = series;
  const problems: InputProblem[] = [];
  const n = values.length;
  if (rules.minObservations !== undefined && n < rules.minObservations) {
    problems.push(dataMessages.tooFew({ file, field: column }, n, rules.minObservations));
  }
  if (n >= 2 && isConstant(values)) {
    problems.push(dataMessages.constant({ file, field: column }, n, values[0]));
  }
  const transform = rules.transform;
  if (transform !== undefined && transform.kind !== 'none') {
    const name = transformName(transform);
    for (let i = 0; i < n; i++) {
      if (values[i] > 0) continue;
      problems.push(dataMessages.nonPositive({ file, line: series.lines?.[i], field: column }, values[i], name));
    }
  }
  return problems;
}
