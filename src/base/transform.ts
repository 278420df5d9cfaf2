// Variance-stabilising transforms and their inverses: none, log, and Box-Cox (1964),
// w = (y^λ − 1)/λ for λ ≠ 0 and log y for λ = 0. A forecast that is Gaussian on the model
// scale, N(mean, se²), goes back to the data's scale here, for the memo's forecasts and the
// backtest's alike: interval limits are the back-transformed quantiles (a monotone map keeps
// quantiles); the point is the back-transformed median, or the bias-adjusted mean by a
// second-order Taylor expansion (common practice; Hyndman & Athanasopoulos, Forecasting:
// Principles and Practice, §5.6, from memory).
import { normalInv } from '../linalg/distributions.js';
import { levelKey, type PointForecast, type Transform } from './settings.js';

/** The Box-Cox λ a transform stands for: undefined for none, 0 for log. */
function lambdaOf(transform: Transform): number | undefined {
  if (transform.kind === 'none') return undefined;
  return transform.kind === 'log' ? 0 : transform.lambda;
}

/** Forward transform of one value. */
export function transformValue(transform: Transform, y: number): number {
  const lambda = lambdaOf(transform);
  if (lambda === undefined) return y;
  if (lambda === 0) return Math.log(y);
  return (Math.pow(y, lambda) - 1) / lambda;
}

/** Inverse transform of one value on the model scale. */
export function inverseTransform(transform: Transform, w: number): number {
  const lambda = lambdaOf(transform);
  if (lambda === undefined) return w;
  if (lambda === 0) return Math.exp(w);
  const base = lambda * w + 1;
  // Outside the image of the transform the inverse is undefined; its limit there is 0 for
  // λ > 0 and +∞ for λ < 0 (an interval end that runs off the transform's range).
  if (base > 0) return Math.pow(base, 1 / lambda);
  return lambda > 0 ? 0 : Number.POSITIVE_INFINITY;
}

/**
 * Mean of y when w = T(y) ~ N(mean, se²): the log-normal mean exp(μ + σ²/2) for the log
 * (exact), and (λμ + 1)^{1/λ}·(1 + σ²(1 − λ)/(2(λμ + 1)²)) for Box-Cox (second order).
 */
export function biasAdjustedMean(transform: Transform, mean: number, se: number): number {
  const lambda = lambdaOf(transform);
  if (lambda === undefined) return mean;
  const variance = se * se;
  if (lambda === 0) return Math.exp(mean + variance / 2);
  const base = lambda * mean + 1;
  return inverseTransform(transform, mean) * (1 + (variance * (1 - lambda)) / (2 * base * base));
}

/** The transform in the words of messages: "none", "log", "Box-Cox (lambda 0.5)". */
export function describeTransform(transform: Transform): string {
  return transform.kind === 'box-cox' ? `Box-Cox (lambda ${transform.lambda})` : transform.kind;
}

/** The central `level`% interval (level in percent) on the data's scale. */
export function centralInterval(transform: Transform, mean: number, se: number, level: number): [number, number] {
  const z = normalInv(0.5 + level / 200);
  return [inverseTransform(transform, mean - z * se), inverseTransform(transform, mean + z * se)];
}

/** Intervals keyed by level (`levelKey`), e.g. {"80": [lo, hi], "95": [lo, hi]}. */
export type IntervalsByLevel = Record<string, [number, number]>;

export interface DataScaleForecast {
  point: number;
  intervals: IntervalsByLevel;
}

/** A Gaussian forecast on the model scale, as the point and intervals on the data's scale. */
export function backTransformForecast(transform: Transform, point: PointForecast, levels: readonly number[], mean: number, se: number): DataScaleForecast {
  const intervals: IntervalsByLevel = {};
  for (const level of levels) intervals[levelKey(level)] = centralInterval(transform, mean, se, level);
  return { point: point === 'mean' ? biasAdjustedMean(transform, mean, se) : inverseTransform(transform, mean), intervals };
}
