// STL, the seasonal-trend decomposition by loess of Cleveland, Cleveland, McRae & Terpenning
// (1990, J. Official Statistics 6, 3–73), y = trend + seasonal + remainder, as set out in its §2:
//
//   inner loop, n_i passes:  detrend (y − T) ─▶ smooth each cycle-subseries by loess (span n_s),
//     extended one period at each end ─▶ low-pass filter of that seasonal (moving averages of
//     n_p, n_p and 3, then loess with span n_l) ─▶ seasonal = subseries smooth − low-pass ─▶
//     deseasonalise (y − S) ─▶ trend = loess of that (span n_t)
//   outer loop, n_o passes:  robustness weights from the remainder, bisquare of |R|/(6·median|R|),
//     used by the subseries and trend smoothers of the next inner loop.
//
// Parameters follow the paper's §3 choices: n_l the least odd integer ≥ n_p; n_t the least odd
// integer ≥ 1.5 n_p / (1 − 1.5/n_s); jumps ceil(span/10); n_i = 2 and n_o = 0 without robustness,
// n_i = 1 and n_o = 15 with it (the paper asks for enough outer passes to converge; 15 is what
// R 4.2.2's `stl()` uses, and our reference values come from it). Degrees: the trend and low-pass
// loess are locally linear, the cycle-subseries loess locally constant (the degree R's `stl()`
// takes by default). A `periodic` seasonal (a fixed pattern) is the subseries smooth with an
// unbounded span, each subseries then replaced by its mean. The remainder is y − S − T.
import { loessSmooth, loessAt, type LoessSettings } from './loessSmooth.js';

export interface StlOptions {
  /** Observations per cycle n_p: 4 quarterly, 12 monthly (at least 2). */
  period: number;
  /** Cycle-subseries span n_s (odd, at least 7 recommended), or 'periodic' for a fixed pattern; default 7. */
  seasonalSpan?: number | 'periodic';
  /** Local degree of the cycle-subseries loess; default 0. */
  seasonalDegree?: 0 | 1;
  /** Trend span n_t; default the least odd integer ≥ 1.5 n_p / (1 − 1.5/n_s). */
  trendSpan?: number;
  /** Local degree of the trend loess; default 1. */
  trendDegree?: 0 | 1;
  /** Low-pass span n_l; default the least odd integer ≥ n_p. */
  lowPassSpan?: number;
  /** Local degree of the low-pass loess; default the trend's. */
  lowPassDegree?: 0 | 1;
  /** Robustness iterations (outer loop); default false. */
  robust?: boolean;
}

/** The settings an STL decomposition ran with, after defaults (all spans odd). */
export interface StlSettings {
  period: number;
  periodic: boolean;
  seasonal: LoessSettings;
  trend: LoessSettings;
  low_pass: LoessSettings;
  inner: number;
  outer: number;
}

export interface StlResult {
  seasonal: Float64Array;
  trend: Float64Array;
  remainder: Float64Array;
  /** Robustness weights of the last outer pass (all 1 without robustness). */
  weights: Float64Array;
  settings: StlSettings;
}

/** Least odd integer at or above x. */
function nextOdd(x: number): number {
  const whole = Math.ceil(x);
  return whole % 2 === 0 ? whole + 1 : whole;
}

/** The odd span the smoothers use: at least 3, an even count raised by one. */
function oddSpan(span: number): number {
  const atLeast = Math.max(3, span);
  return atLeast % 2 === 0 ? atLeast + 1 : atLeast;
}

/** Applies the defaults of the header to `options` for a series of n observations. */
export function stlSettings(n: number, options: StlOptions): StlSettings {
  const { period } = options;
  if (!Number.isInteger(period) || period < 2) throw new Error('stlDecomposition needs a whole period of at least 2');
  const periodic = options.seasonalSpan === 'periodic';
  const seasonalSpan = periodic ? 10 * n + 1 : (options.seasonalSpan ?? 7);
  if (typeof seasonalSpan !== 'number' || !Number.isInteger(seasonalSpan) || seasonalSpan < 3) {
    throw new Error("stlDecomposition needs a whole seasonal span of at least 3, or 'periodic'");
  }
  const seasonalDegree = periodic ? 0 : (options.seasonalDegree ?? 0);
  const trendSpan = options.trendSpan ?? nextOdd((1.5 * period) / (1 - 1.5 / seasonalSpan));
  const trendDegree = options.trendDegree ?? 1;
  const lowPassSpan = options.lowPassSpan ?? nextOdd(period);
  const lowPassDegree = options.lowPassDegree ?? trendDegree;
  for (const [name, span] of [['trend', trendSpan], ['low-pass', lowPassSpan]] as const) {
    if (!Number.isInteger(span) || span < 3) throw new Error(`stlDecomposition needs a whole ${name} span of at least 3`);
  }
  const robust = options.robust ?? false;
  const smoother = (span: number, degree: 0 | 1): LoessSettings => ({ span: oddSpan(span), degree, jump: Math.ceil(span / 10) });
  return {
    period,
    periodic,
    seasonal: smoother(seasonalSpan, seasonalDegree),
    trend: smoother(trendSpan, trendDegree),
    low_pass: smoother(lowPassSpan, lowPassDegree),
    inner: robust ? 1 : 2,
    outer: robust ? 15 : 0,
  };
}

/** STL decomposition of a complete series y with at least two full cycles. */
export function stlDecomposition(y: ArrayLike<number>, options: StlOptions): StlResult {
  const n = y.length;
  const settings = stlSettings(n, options);
  const { period } = settings;
  if (n <= 2 * period) throw new Error('stlDecomposition needs more than two full cycles of observations');
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(y[i])) throw new Error(`stlDecomposition needs finite values; position ${i} is ${y[i]}`);
  }
  const trend = new Float64Array(n);
  const seasonal = new Float64Array(n);
  const weights = new Float64Array(n).fill(1);
  let robustness: Float64Array | null = null;
  for (let pass = 0; ; pass++) {
    for (let i = 0; i < settings.inner; i++) innerPass(y, settings, robustness, seasonal, trend);
    if (pass >= settings.outer) break;
    robustness = robustnessWeights(y, seasonal, trend);
    weights.set(robustness);
  }
  if (settings.periodic) replaceByCycleMeans(seasonal, period);
  const remainder = Float64Array.from({ length: n }, (_, i) => y[i] - seasonal[i] - trend[i]);
  return { seasonal, trend, remainder, weights, settings };
}

/** One pass of the inner loop; updates `seasonal` and `trend` in place. */
function innerPass(
  y: ArrayLike<number>,
  settings: StlSettings,
  robustness: Float64Array | null,
  seasonal: Float64Array,
  trend: Float64Array,
): void {
  const n = y.length;
  const { period } = settings;
  const detrended = Float64Array.from({ length: n }, (_, i) => y[i] - trend[i]);
  const extended = cycleSubseriesSmooth(detrended, period, settings.seasonal, robustness);
  const lowPass = loessSmooth(lowPassFilter(extended, period), n, settings.low_pass, null);
  for (let i = 0; i < n; i++) seasonal[i] = extended[period + i] - lowPass[i];
  const deseasonalised = Float64Array.from({ length: n }, (_, i) => y[i] - seasonal[i]);
  trend.set(loessSmooth(deseasonalised, n, settings.trend, robustness));
}

/**
 * Loess of each cycle-subseries (the values one period apart), evaluated at its points and one
 * step beyond each end, so the result covers n + 2·period positions starting one period early.
 */
function cycleSubseriesSmooth(
  x: Float64Array,
  period: number,
  settings: LoessSettings,
  robustness: Float64Array | null,
): Float64Array {
  const n = x.length;
  const extended = new Float64Array(n + 2 * period);
  for (let j = 1; j <= period; j++) {
    const k = Math.floor((n - j) / period) + 1;
    const values = Float64Array.from({ length: k }, (_, i) => x[i * period + j - 1]);
    const weights = robustness === null ? null : Float64Array.from({ length: k }, (_, i) => robustness[i * period + j - 1]);
    const smooth = loessSmooth(values, k, settings, weights);
    const scratch = new Float64Array(k);
    const before = loessAt(values, k, settings, 0, 1, Math.min(settings.span, k), weights, scratch) ?? smooth[0];
    const after = loessAt(values, k, settings, k + 1, Math.max(1, k - settings.span + 1), k, weights, scratch) ?? smooth[k - 1];
    extended[j - 1] = before;
    for (let i = 0; i < k; i++) extended[(i + 1) * period + j - 1] = smooth[i];
    extended[(k + 1) * period + j - 1] = after;
  }
  return extended;
}

/** Moving averages of length period, period and 3: n + 2·period values in, n out. */
function lowPassFilter(extended: Float64Array, period: number): Float64Array {
  return movingAverage(movingAverage(movingAverage(extended, period), period), 3);
}

/** Means of every `length` consecutive values, by a running sum. */
function movingAverage(x: Float64Array, length: number): Float64Array {
  const count = x.length - length + 1;
  const averages = new Float64Array(count);
  let sum = 0;
  for (let i = 0; i < length; i++) sum += x[i];
  averages[0] = sum / length;
  for (let j = 1; j < count; j++) {
    sum = sum - x[j - 1] + x[j + length - 1];
    averages[j] = sum / length;
  }
  return averages;
}

/**
 * Bisquare weights B(|R|/h) with h = 6 · median |R| (the paper's §2.4; the median of an even
 * count is the mean of the two middle values).
 */
function robustnessWeights(y: ArrayLike<number>, seasonal: Float64Array, trend: Float64Array): Float64Array {
  const n = y.length;
  const residual = Float64Array.from({ length: n }, (_, i) => Math.abs(y[i] - seasonal[i] - trend[i]));
  const sorted = Float64Array.from(residual).sort();
  const upper = Math.floor(n / 2) + 1;
  const lower = n - upper + 1;
  const h = 3 * (sorted[upper - 1] + sorted[lower - 1]);
  return residual.map((r) => {
    if (r <= 0.001 * h) return 1;
    if (r <= 0.999 * h) return (1 - (r / h) ** 2) ** 2;
    return 0;
  });
}

/** A fixed pattern: each position in the cycle takes the mean of its seasonal values. */
function replaceByCycleMeans(seasonal: Float64Array, period: number): void {
  for (let j = 0; j < period; j++) {
    let sum = 0;
    let count = 0;
    for (let i = j; i < seasonal.length; i += period) {
      sum += seasonal[i];
      count++;
    }
    for (let i = j; i < seasonal.length; i += period) seasonal[i] = sum / count;
  }
}
