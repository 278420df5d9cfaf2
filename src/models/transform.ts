// Variance-stabilising transforms and their inverses: none, log, and Box-Cox (1964),
// w = (y^λ − 1)/λ for λ ≠ 0 and log y for λ = 0. Forecast intervals are back-transformed
// by their quantiles (a monotone map keeps quantiles); the point forecast is the
// back-transformed median, or the bias-adjusted mean by a second-order Taylor expansion
// (common practice; Hyndman & Athanasopoulos, Forecasting: Principles and Practice, §5.6,
// from memory).
import type { TransformSpec } from '../data/series.js';

export type { TransformSpec };

/** The Box-Cox λ a spec stands for: 1 for none (identity up to a shift), 0 for log. */
function lambdaOf(spec: TransformSpec): number | undefined {
  if (spec.kind === 'none') return undefined;
  if (spec.kind === 'log') return 0;
  if (spec.lambda === undefined || !Number.isFinite(spec.lambda)) {
    throw new RangeError('transform: box-cox needs a finite lambda');
  }
  return spec.lambda;
}

/** Forward transform of one value. */
export function transformValue(spec: TransformSpec, y: number): number {
  const lambda = lambdaOf(spec);
  if (lambda === undefined) return y;
  if (lambda === 0) return Math.log(y);
  return (Math.pow(y, lambda) - 1) / lambda;
}

/** Inverse transform of one value on the model scale. */
export function inverseTransform(spec: TransformSpec, w: number): number {
  const lambda = lambdaOf(spec);
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
export function biasAdjustedMean(spec: TransformSpec, mean: number, se: number): number {
  const lambda = lambdaOf(spec);
  if (lambda === undefined) return mean;
  const variance = se * se;
  if (lambda === 0) return Math.exp(mean + variance / 2);
  const base = lambda * mean + 1;
  return inverseTransform(spec, mean) * (1 + (variance * (1 - lambda)) / (2 * base * base));
}

/** Human-readable name, e.g. "Box-Cox (λ = 0.5)". */
export function describeTransform(spec: TransformSpec): string {
  if (spec.kind === 'none') return 'none';
  if (spec.kind === 'log') return 'natural log';
  return `Box-Cox (lambda = ${spec.lambda})`;
}
