// Canova & Hansen (1995, J. Business & Economic Statistics 13, 237–252) test of a stable
// seasonal pattern. The regression y_t = μ + f_t'γ + e_t with the s − 1 seasonal harmonics
// f_t = (cos(2πjt/s), sin(2πjt/s))_{j < s/2} and cos(πt) when s is even (their eq. 2 and §2.2)
// is fitted by OLS; under the null γ is constant (a deterministic, stationary pattern), under
// the alternative it wanders as a random walk, which puts unit roots at the seasonal
// frequencies. The Lagrange multiplier statistic (their eq. 8 with A selecting harmonics) is
//   L = n⁻² Σ_t F̂_t' (A'Ω̂A)⁻¹ F̂_t,   F̂_t = Σ_{i≤t} A'f_i ê_i,
//   Ω̂ = Σ_{|k|≤m} (1 − |k|/(m + 1)) n⁻¹ Σ_i f_{i+k} ê_{i+k} ê_i f_i'   (Newey & West 1987),
// asymptotically VM(rank A). A = I gives the joint test at all seasonal frequencies; one
// frequency's cosine and sine give its own test (2 restrictions, 1 at π).
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

/** Canova-Hansen statistics of y (already free of a zero-frequency unit root) for period s. */
export function canovaHansenTest(y: ArrayLike<number>, period: number, options: CanovaHansenOptions = {}): CanovaHansenStatistic {
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
  const k = columns.length;
  const residuals = ols(series, [new Float64Array(n).fill(1), ...columns]).residuals;

  // Scores u_t = f_t ê_t, row-major n × k.
  const scores = new Float64Array(n * k);
  for (let t = 0; t < n; t++) for (let a = 0; a < k; a++) scores[t * k + a] = columns[a][t] * residuals[t];

  const omega = new Float64Array(k * k);
  for (let lag = 0; lag <= lags; lag++) {
    const weight = lag === 0 ? 1 : 1 - lag / (lags + 1);
    for (let a = 0; a < k; a++) {
      for (let b = 0; b < k; b++) {
        let sum = 0;
        for (let t = lag; t < n; t++) sum += scores[t * k + a] * scores[(t - lag) * k + b];
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
    for (let a = 0; a < k; a++) running[a] += scores[t * k + a];
    for (let a = 0; a < k; a++) for (let b = 0; b < k; b++) outer[a * k + b] += running[a] * running[b];
  }

  const statistic = (selected: readonly number[]): number => {
    const size = selected.length;
    const block = new Float64Array(size * size);
    selected.forEach((a, i) => selected.forEach((b, j) => (block[i * size + j] = omega[a * k + b])));
    const inverse = invertSymmetric(block, size);
    if (inverse === undefined) throw new Error('canovaHansenTest needs a series that varies around its seasonal pattern');
    let trace = 0;
    selected.forEach((a, i) => selected.forEach((b, j) => (trace += inverse[i * size + j] * outer[b * k + a])));
    if (!(trace >= 0)) throw new Error('canovaHansenTest needs a series that varies around its seasonal pattern');
    return trace / (n * n);
  };

  const all = Array.from({ length: k }, (_, a) => a);
  const stat = statistic(all);
  const cycles = [...new Set(frequency)];
  const by_frequency = cycles.map((j): SeasonalFrequencyTest => {
    const selected = all.filter((a) => frequency[a] === j);
    const value = statistic(selected);
    return {
      cycles_per_year: j,
      stat: value,
      restrictions: selected.length,
      p_value: vonMisesUpperTail(value, selected.length),
      critical: vonMisesCritical(selected.length),
    };
  });
  return { stat, restrictions: k, p_value: vonMisesUpperTail(stat, k), critical: vonMisesCritical(k), lags, n, by_frequency };
}
