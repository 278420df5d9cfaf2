// Diebold & Mariano (1995) test of equal predictive accuracy for h-step forecasts, with the
// small-sample correction of Harvey, Leybourne & Newbold (1997):
//   d_t = L(e_{1,t}) − L(e_{2,t}),  V = γ₀ + 2 Σ_{k=1}^{h−1} γ_k  (autocovariances of d, divisor n),
//   DM = d̄ / √(V/n),  DM* = DM · √((n + 1 − 2h + h(h−1)/n)/n),
// referred to Student's t with n − 1 degrees of freedom, two-sided. h-step errors from
// consecutive origins overlap, hence the h − 1 lags (Diebold & Mariano 1995, §2).
import { autocovariances, demean } from '../linalg/autocovariances.js';
import { studentTCdf } from '../linalg/distributions.js';
import { comparisonReasons } from './messages.js';

export interface DieboldMarianoResult {
  n: number;
  meanDifference: number;
  /** DM* (corrected), or null when the test is not available. */
  statistic: number | null;
  pValue: number | null;
  /** Why the test is not available; null when it is. */
  reason: string | null;
}

/** The HLN correction factor √((n + 1 − 2h + h(h−1)/n)/n); NaN where the radicand is not positive. */
export function hlnFactor(n: number, h: number): number {
  const radicand = (n + 1 - 2 * h + (h * (h - 1)) / n) / n;
  return radicand > 0 ? Math.sqrt(radicand) : Number.NaN;
}

/** The test on loss differences d_t (first model minus second) of h-step forecasts. */
export function dieboldMariano(differences: ArrayLike<number>, h: number): DieboldMarianoResult {
  if (!Number.isInteger(h) || h < 1) throw new RangeError('dieboldMariano needs a whole horizon h ≥ 1');
  const d = Float64Array.from(differences);
  const n = d.length;
  let sum = 0;
  for (const value of d) sum += value;
  const meanDifference = n > 0 ? sum / n : Number.NaN;
  const unavailable = (reason: string): DieboldMarianoResult => ({ n, meanDifference, statistic: null, pValue: null, reason });
  if (n < 2) return unavailable(comparisonReasons.tooFewOrigins);
  if (!Number.isFinite(meanDifference)) return unavailable(comparisonReasons.notFinite);
  if (h - 1 >= n) return unavailable(comparisonReasons.tooFewForLags);
  const factor = hlnFactor(n, h);
  if (Number.isNaN(factor)) return unavailable(comparisonReasons.correctionNotPositive);
  const gamma = autocovariances(demean(d), h - 1);
  let longRun = gamma[0];
  for (let k = 1; k < h; k++) longRun += 2 * gamma[k];
  if (!(longRun > 0)) return unavailable(comparisonReasons.varianceNotPositive);
  const statistic = (meanDifference / Math.sqrt(longRun / n)) * factor;
  const pValue = 2 * studentTCdf(-Math.abs(statistic), n - 1);
  return { n, meanDifference, statistic, pValue, reason: null };
}
