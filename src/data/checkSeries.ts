// Checks on the values of a series that concern its later use rather than the file's format.

import { type InputLocation, type InputProblem } from '../base/problem.js';
import { dataMessages } from './messages.js';
import type { Transform } from '../base/settings.js';
import { describeTransform, transformValue } from '../base/transform.js';

export interface SeriesRules {
  minObservations?: number;
  transform?: Transform;
}

export interface SeriesValues {
  file: string;
  column: string;
  values: ArrayLike<number>;
  /** File line of each value, when the values came from a file. */
  lines?: readonly number[];
  /** The workbook sheet the values came from. */
  sheet?: string;
  /** Rows with a period or value cell that could not be read: the count of observations judged is the values' and theirs, since each would be one once its cell is corrected. */
  pendingRows?: number;
}

function isConstant(values: ArrayLike<number>): boolean {
  for (let i = 1; i < values.length; i++) if (values[i] !== values[0]) return false;
  return true;
}

/**
 * Bounds on the model scale (the values after the transform). The likelihood works with sums of
 * squares of the values and of their deviations, which overflow the double range (about 1.8e308)
 * or underflow to zero far out; fits were measured to fail at magnitudes of 1e200 and at spreads of
 * 1e-200 and to succeed at 1e150 and 1e-150, so these bounds keep a factor of 1e50 in hand.
 * Real series sit far inside them: beyond them the units are almost surely wrong.
 */
export const MODEL_SCALE = { maxMagnitude: 1e100, minSpread: 1e-100 } as const;

function scaleProblems(series: SeriesValues, transform: Transform | undefined): InputProblem[] {
  const { file, column, values, sheet } = series;
  const scale = transform === undefined || transform.kind === 'none' ? undefined : describeTransform(transform);
  const problems: InputProblem[] = [];
  let lowest = Infinity;
  let highest = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const y = transform === undefined ? values[i] : transformValue(transform, values[i]);
    if (Number.isNaN(y)) continue;
    if (!(Math.abs(y) <= MODEL_SCALE.maxMagnitude)) {
      problems.push(dataMessages.tooLargeForModels({ file, line: series.lines?.[i], field: column, sheet }, values[i], y, MODEL_SCALE.maxMagnitude, scale));
    }
    lowest = Math.min(lowest, y);
    highest = Math.max(highest, y);
  }
  if (problems.length === 0 && highest - lowest < MODEL_SCALE.minSpread) {
    problems.push(dataMessages.tooLittleSpread({ file, field: column, sheet }, highest - lowest, MODEL_SCALE.minSpread, scale));
  }
  return problems;
}

/**
 * Too few observations, a constant series, values outside the domain of the transform, and values
 * outside the range the models compute with (MODEL_SCALE).
 * Log and Box-Cox both need every value above zero (Box & Cox 1964 define the transform for y > 0).
 */
export function checkSeries(series: SeriesValues, rules: SeriesRules = {}): InputProblem[] {
  const { file, column, values, sheet } = series;
  const problems: InputProblem[] = [];
  const n = values.length;
  const rows = n + (series.pendingRows ?? 0);
  if (rules.minObservations !== undefined && rows < rules.minObservations) {
    problems.push(dataMessages.tooFew({ file, field: column, sheet }, rows, rules.minObservations));
  }
  const constant = n >= 2 && isConstant(values);
  if (constant) {
    problems.push(dataMessages.constant({ file, field: column, sheet }, n, values[0]));
  }
  const transform = rules.transform;
  let inDomain = true;
  if (transform !== undefined && transform.kind !== 'none') {
    const name = describeTransform(transform);
    for (let i = 0; i < n; i++) {
      if (values[i] > 0) continue;
      inDomain = false;
      problems.push(dataMessages.nonPositive({ file, line: series.lines?.[i], field: column, sheet }, values[i], name));
    }
  }
  if (n >= 2 && !constant && inDomain) problems.push(...scaleProblems(series, transform));
  return problems;
}

/** Relative to the series' range, a spread of differences below this is no variation at all (rounding of an exact formula). */
const EXACT_TOLERANCE = 1e-9;

/**
 * A series that a straight line, or a straight line plus a fixed seasonal pattern, fits without
 * error on the model scale: it has no random variation, so no model of it has an error variance
 * and no interval means anything (the likelihood grows without bound as σ² → 0). Found without
 * fitting: a line has equal changes per period between successive observations, and a line plus
 * a pattern repeating every `period` observations has equal changes over a year (every pair of
 * observations `period` apart). `values` are on the model scale, NaN where missing; `scale` names
 * the transform that took them there, if any.
 */
export function exactPatternProblem(values: ArrayLike<number>, period: number, at: InputLocation, scale: string | null = null): InputProblem | undefined {
  let lowest = Number.POSITIVE_INFINITY;
  let highest = Number.NEGATIVE_INFINITY;
  for (let t = 0; t < values.length; t++) {
    if (Number.isNaN(values[t])) continue;
    lowest = Math.min(lowest, values[t]);
    highest = Math.max(highest, values[t]);
  }
  const tolerance = EXACT_TOLERANCE * (highest - lowest);
  if (!(tolerance > 0)) return undefined;
  /** Whether every pair's change (per period between them when `perStep`) is the same, over at least `fewest` pairs. */
  const equalChanges = (pairs: [number, number][], fewest: number, perStep: boolean): boolean => {
    if (pairs.length < fewest) return false;
    const changes = pairs.map(([from, to]) => (values[to] - values[from]) / (perStep ? to - from : 1));
    const first = changes[0];
    return changes.every((change) => Math.abs(change - first) <= tolerance);
  };
  const observed: number[] = [];
  for (let t = 0; t < values.length; t++) if (!Number.isNaN(values[t])) observed.push(t);
  const successive = observed.slice(1).map((t, i): [number, number] => [observed[i], t]);
  if (equalChanges(successive, 2, true)) return dataMessages.exactLine(at, observed.length, scale);
  if (period === 1) return undefined;
  const yearApart = observed.filter((t) => t >= period && !Number.isNaN(values[t - period])).map((t): [number, number] => [t - period, t]);
  // A pattern needs every season seen twice, a year apart, before it can be called exact.
  return equalChanges(yearApart, period, false) ? dataMessages.exactPattern(at, observed.length, period, scale) : undefined;
}
