// The series a backtest runs on: a Series from the data stage (period labels kept for the
// record) or a bare array of values. Every observation must be finite or NaN (missing) and,
// after the transform, still finite; all problems are reported together.
import { InputError, type InputProblem } from '../base/problem.js';
import { backtestMessages } from './messages.js';
import type { Transform } from '../base/settings.js';
import { describeTransform, transformValue } from '../base/transform.js';

export interface BacktestSeries {
  values: ArrayLike<number>;
  /** One period label per observation. */
  periods?: readonly string[];
}

export type BacktestInput = BacktestSeries | ArrayLike<number>;

export interface BacktestData {
  /** The data's scale. */
  y: Float64Array;
  /** The model (transformed) scale. */
  w: Float64Array;
  periods: readonly string[] | null;
}

export function readBacktestInput(input: BacktestInput, transform: Transform): BacktestData {
  const series: BacktestSeries = isBareValues(input) ? { values: input } : input;
  const y = Float64Array.from(series.values);
  const w = y.map((value) => transformValue(transform, value));
  const problems: InputProblem[] = [];
  // NaN is a missing observation, which the models handle; anything else must be finite.
  y.forEach((value, i) => {
    if (Number.isNaN(value)) return;
    if (!Number.isFinite(value)) problems.push(backtestMessages.badObservation(i + 1, value));
    else if (!Number.isFinite(w[i])) problems.push(backtestMessages.notTransformable(i + 1, value, describeTransform(transform)));
  });
  const periods = series.periods ?? null;
  if (periods !== null && periods.length !== y.length) problems.push(backtestMessages.periodsMismatch(periods.length, y.length));
  if (problems.length > 0) throw new InputError(problems);
  return { y, w, periods };
}

/** A typed array or an array of numbers, as opposed to a series object. */
function isBareValues(input: BacktestInput): input is ArrayLike<number> {
  return ArrayBuffer.isView(input) || Array.isArray(input);
}
