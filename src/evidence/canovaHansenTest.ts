// Canova & Hansen (1995, J. Business & Economic Statistics 13, 237–252) test of a stable
// seasonal pattern. The regression y_t = μ + f_t'γ + e_t with the s − 1 seasonal harmonics
// f_t = (cos(2πjt/s), sin(2πjt/s))_{j < s/2} and cos(πt) when s is even (their eq. 2 and §2.2)
// is fitted by OLS; under the null γ is constant (a deterministic, stationary pattern), under
// the alternative it wanders as a random walk, which puts unit roots at the seasonal
// frequencies. For the harmonics of one frequency j (A selecting its cosine and sine, or the
// cosine alone at j = s/2) the Lagrange multiplier statistic (their eq. 8) is
//   L_j = n⁻² Σ_t F̂_t' (A'Ω̂A)⁻¹ F̂_t,   F̂_t = Σ_{i≤t} A'f_i ê_i,
//   Ω̂ = Σ_{|k|≤m} (1 − |k|/(m + 1)) n⁻¹ Σ_i f_{i+k} ê_{i+k} ê_i f_i'   (Newey & West 1987),
// asymptotically VM(rank A) (their Theorem 1; equation, section and theorem numbers from memory).
//
// The joint statistic over all seasonal frequencies is L = Σ_j L_j: Ω̂ taken block-diagonal by
// frequency. Under the null with covariance-stationary errors the long-run covariance between
// the scores of two different frequencies is zero (Σ_h γ(h) · lim n⁻¹ Σ_t f_j(t) f_k(t − h) = 0
// for j ≠ k, the harmonics being orthogonal), so the blocks' Brownian bridges are independent
// in the limit and L → VM(s − 1), the limit of the full-matrix statistic with A = I. We do not
// estimate those zero covariances: with the full (s − 1) × (s − 1) Ω̂ the monthly statistic
// never rejected at 5% in our simulations (test/fixtures/seasonal/canovaHansenSize.ts, 500
// series per cell, the window below), not even against a pattern whose months wander as random
// walks with steps as large as the noise (the sum: 38% at n = 72, 100% at n = 240); once the
// window reaches lag s the estimated cross-frequency terms swamp the statistic. Quarterly, the
// two agree at n = 108 and the sum has more power at n = 48. The price is the case the limit
// does not cover, errors whose variance changes with the season: with white noise three times
// as variable in a quarter of the year the sum rejected 4–8% of the series at 5%.
//
// Why this test: its null is the stable pattern, so the model keeps its simpler deterministic
// seasonal unless the data speak against it, as KPSS does for the trend; it needs no choice
// of augmentation lags, and its limit distribution is known exactly (vonMisesDistribution.ts),
// so the p-value is exact in the limit rather than read off a simulated table. It requires no
// unit root at frequency zero (their §2), and our stochastic model differences the series
// anyway, so it is run on the first differences: the question it answers is whether those
// differences need the seasonal difference on top. A deterministic pattern in the levels is
// still a deterministic pattern of the same period in the differences.
//
// Window: m = ceil(s (n/100)^{1/4}), capped at n − 1. Seasonal dependence in the errors decays
// over multiples of s lags, so the window spans at least a year and grows slowly with n, as
// Schwert's (1989) rule does for the KPSS test (for s = 12 it is that rule). No lagged
// dependent variable is added to the regression (Canova & Hansen allow one): a lag with a
// coefficient near −1 takes up the root at frequency π, which is one of the roots tested.
// Known weakness (of a kernel window that does not reach many years back): stationary seasonal
// autocorrelation, a seasonal AR(1) with Φ = 0.5, was taken for a wandering pattern in 25–75%
// of the simulated series; under the other fixed-pattern processes the test rejected 0–8%.
import { ols } from '../linalg/ols.js';
import { invertSymmetric } from '../linalg/invertSymmetric.js';
import { finiteSeries } from './finiteSeries.js';
import { vonMisesCritical, MAX_TABULATED_RESTRICTIONS } from './vonMisesCritical.js';
import { vonMisesUpperTail } from './vonMisesDistribution.js';
import type { SeasonalCritical, SeasonalFrequencyTest } from './types.js';

export const CANOVA_HANSEN_LAG_RULE = 'ceil(s (n/100)^(1/4))';

export interface CanovaHansenOptions {
  /** Bartlett-window truncation; default ceil(s (n/100)^{1/4}). */
  lags?: number;
}

export interface CanovaHansenStatistic {
  stat: number;
  restrictions: number;
  p_value: number;
  critical: SeasonalCritical;
  lags: number;
  n: number;
  by_frequency: SeasonalFrequencyTest[];
}

/** The Bartlett truncation ceil(s (n/100)^{1/4}) for n observations of period s, at most n − 1. */
export function canovaHansenLags(n: number, period: number): number {
  if (!Number.isInteger(n) || n < 2) throw new Error('canovaHansenLags needs a whole n of at least 2');
  return Math.min(Math.ceil(period * Math.pow(n / 100, 1 / 4)), n - 1);
}

/**
 * The seasonal harmonics at t = 1..n, columns ordered by frequency j = 1..floor(s/2): cosine
 * then sine, the sine left out at j = s/2 where it is zero.
 */
export function seasonalHarmonics(n: number, period: number): { columns: Float64Array[]; frequency: number[] } {
  const columns: Float64Array[] = [];
  const frequency: number[] = [];
  for (let j = 1; j <= Math.floor(period / 2); j++) {
    const omega = (2 * Math.PI * j) / period;
    columns.push(Float64Array.from({ length: n }, (_, i) => Math.cos(omega * (i + 1))));
    frequency.push(j);
    if (2 * j < period) {
      columns.push(Float64Array.from({ length: n }, (_, i) => Math.sin(omega * (i + 1))));
      frequency.push(j);
    }
  }
  return { columns, frequency };
}

/** Canova-Hansen statistics of y (already free of a zero-frequency unit root) for period s, with p-values. */
export function canovaHansenTest(y: ArrayLike<number>, period: number, options: CanovaHansenOptions = {}): CanovaHansenStatistic {
  const { stat, lags, n, by_frequency } = canovaHansenStatistics(y, period, options);
  const restrictions = period - 1;
  return {
    stat,
    restrictions,
    p_value: vonMisesUpperTail(stat, restrictions),
    critical: vonMisesCritical(restrictions),
    lags,
    n,
    by_frequency: by_frequency.map((f) => ({
      ...f,
      p_value: vonMisesUpperTail(f.stat, f.restrictions),
      critical: vonMisesCritical(f.restrictions),
    })),
  };
}

/** The joint and per-frequency statistics alone; `canovaHansenTest` adds their p-values. */
export function canovaHansenStatistics(
  y: ArrayLike<number>,
  period: number,
  options: CanovaHansenOptions = {},
): { stat: number; lags: number; n: number; by_frequency: Pick<SeasonalFrequencyTest, 'cycles_per_year' | 'stat' | 'restrictions'>[] } {
  if (!Number.isInteger(period) || period < 2 || period - 1 > MAX_TABULATED_RESTRICTIONS) {
    throw new Error(`canovaHansenTest needs a whole period from 2 to ${MAX_TABULATED_RESTRICTIONS + 1}`);
  }
  const series = finiteSeries(y, 'canovaHansenTest');
  const n = series.length;
  if (n < 2 * period + 1) throw new Error('canovaHansenTest needs more than two full cycles of observations');
  const lags = options.lags ?? canovaHansenLags(n, period);
  if (!Number.isInteger(lags) || lags < 0 || lags >= n) {
    throw new Error('canovaHansenTest needs whole, non-negative lags below the number of observations');
  }
  const { columns, frequency } = seasonalHarmonics(n, period);
  const fit = ols(series, [new Float64Array(n).fill(1), ...columns]);
  const centred = series.map((v) => v - series.reduce((a, b) => a + b, 0) / n);
  // A series the harmonics fit to rounding leaves scores of rounding size and a meaningless L.
  if (!(fit.ssr > 1e-20 * centred.reduce((a, v) => a + v * v, 0))) {
    throw new Error('canovaHansenTest needs a series that varies around its seasonal pattern');
  }
  const residuals = fit.residuals;
  const by_frequency = [...new Set(frequency)].map((j) => {
    const block = columns.filter((_, a) => frequency[a] === j);
    return { cycles_per_year: j, stat: blockStatistic(block, residuals, lags), restrictions: block.length };
  });
  const stat = by_frequency.reduce((sum, f) => sum + f.stat, 0);
  return { stat, lags, n, by_frequency };
}

/** L_j for the harmonics `block` of one frequency, from the OLS residuals. */
function blockStatistic(block: readonly Float64Array[], residuals: Float64Array, lags: number): number {
  const n = residuals.length;
  const k = block.length;
  const scores = block.map((column) => column.map((value, t) => value * residuals[t]));
  const omega = new Float64Array(k * k);
  for (let lag = 0; lag <= lags; lag++) {
    const weight = 1 - lag / (lags + 1);
    for (let a = 0; a < k; a++) {
      for (let b = 0; b < k; b++) {
        let sum = 0;
        for (let t = lag; t < n; t++) sum += scores[a][t] * scores[b][t - lag];
        const term = (weight * sum) / n;
        omega[a * k + b] += term;
        if (lag > 0) omega[b * k + a] += term;
      }
    }
  }
  // Σ_t F̂_t F̂_t' from the running sums of the scores.
  const outer = new Float64Array(k * k);
  const running = new Float64Array(k);
  for (let t = 0; t < n; t++) {
    for (let a = 0; a < k; a++) running[a] += scores[a][t];
    for (let a = 0; a < k; a++) for (let b = 0; b < k; b++) outer[a * k + b] += running[a] * running[b];
  }
  const inverse = invertSymmetric(omega, k);
  if (inverse === undefined) throw new Error('canovaHansenTest needs a series that varies around its seasonal pattern');
  let trace = 0;
  for (let a = 0; a < k; a++) for (let b = 0; b < k; b++) trace += inverse[a * k + b] * outer[b * k + a];
  if (!(trace >= 0) || !Number.isFinite(trace)) throw new Error('canovaHansenTest needs a series that varies around its seasonal pattern');
  return trace / (n * n);
}
