// Ljung & Box (1978) portmanteau test: Q = n(n+2) Σ_{k=1}^{m} r_k² / (n − k), referred to a
// chi-square with m − p − q − P − Q degrees of freedom when the residuals come from an
// ARMA(p, q) fit with a seasonal ARMA(P, Q) factor: one degree of freedom per estimated ARMA
// coefficient (Box & Pierce 1970; Ljung & Box 1978, §2; common practice for the seasonal ones).
import { chiSquareCdf } from '../linalg/distributions.js';
import { defaultAcfLags } from './defaultAcfLags.js';
import { finiteSeries } from './finiteSeries.js';
import { autocorrelations } from './residualAcf.js';
import type { LjungBoxResult } from './types.js';

export interface LjungBoxOptions {
  /** Autocorrelations summed; default `defaultAcfLags(n, period)`. */
  lags?: number;
  /** Observations per year, for the default lags; default 1 (min(10, floor(n/5))). */
  period?: number;
  /** AR order of the model that produced the residuals. */
  p?: number;
  /** MA order of the model that produced the residuals. */
  q?: number;
  /** Seasonal AR order of the model that produced the residuals; default 0. */
  P?: number;
  /** Seasonal MA order of the model that produced the residuals; default 0. */
  Q?: number;
}

/** Ljung-Box Q on `residuals` with its chi-square p-value. */
export function ljungBox(residuals: ArrayLike<number>, options: LjungBoxOptions = {}): LjungBoxResult {
  const series = finiteSeries(residuals, 'ljungBox');
  const n = series.length;
  const lags = options.lags ?? defaultAcfLags(n, options.period);
  const p = options.p ?? 0;
  const q = options.q ?? 0;
  if (!Number.isInteger(p) || !Number.isInteger(q) || p < 0 || q < 0) {
    throw new Error('ljungBox needs whole, non-negative ARMA orders p and q');
  }
  const seasonalP = options.P ?? 0;
  const seasonalQ = options.Q ?? 0;
  if (!Number.isInteger(seasonalP) || !Number.isInteger(seasonalQ) || seasonalP < 0 || seasonalQ < 0) {
    throw new Error('ljungBox needs whole, non-negative seasonal ARMA orders P and Q');
  }
  const df = lags - p - q - seasonalP - seasonalQ;
  if (df < 1) {
    throw new Error(seasonalP + seasonalQ > 0 ? 'ljungBox needs more lags than p + q + P + Q' : 'ljungBox needs more lags than p + q');
  }
  const { acf } = autocorrelations(series, lags, 'ljungBox');
  let sum = 0;
  acf.forEach((r, i) => {
    sum += (r * r) / (n - (i + 1));
  });
  const stat = n * (n + 2) * sum;
  return { lags, df, stat, p_value: 1 - chiSquareCdf(stat, df) };
}
