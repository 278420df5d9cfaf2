// The forecast for the next full calendar year of a monthly or quarterly series: the first
// January–December (or Q1–Q4) after the last observation, as the total or the average of its
// periods (`year_figure`), under both models. None for an annual series, whose forecasts are
// years already; when the horizon ends inside that year the record says so and gives no figure
// (a partial year would be a different quantity, and the horizon is the analyst's to set).
//
// The figure's uncertainty comes from the joint distribution of the forecast errors across
// the year (models/jointForecast.ts), never from the periods taken one at a time: errors at
// neighbouring horizons share every shock since the origin (for the stochastic trend the
// level's error at h + 1 contains the one at h), so the variance of a sum is far from the sum
// of the variances. The covariance is the one whose diagonal the forecast intervals use, with
// or without the coefficient part as `coefficient_uncertainty` says.
// - Without a transform the figure is a linear combination of jointly Gaussian forecasts:
//   N(a'μ, a'Σa) with a = 1 (total) or 1/s (average), exact.
// - With a transform it is a sum of back-transformed values, which has no closed form: seeded
//   draws from the joint Gaussian on the model scale (μ + L z, L the Cholesky factor of Σ),
//   each back-transformed and added up. The interval is the draws' quantiles; the point
//   follows the memo's convention for the period forecasts (`point`): the draws' median, or
//   the mean, which is the period means added up (linearity; exact for the log, the same
//   second-order adjustment as the periods' for Box-Cox). Both models use the same draws.
import { addPeriods, parsePeriod, periodsPerYear } from '../base/period.js';
import type { Series } from '../base/series.js';
import { levelKey, type AnalysisSettings, type TrendModelKind, type YearFigure } from '../base/settings.js';
import { inverseTransform, type IntervalsByLevel } from '../base/transform.js';
import { normalInv } from '../linalg/distributions.js';
import { sampleQuantile } from '../linalg/sampleQuantile.js';
import { seededNormals } from '../linalg/seededNormals.js';
import { choleskyInto } from '../linalg/smallSpd.js';
import { jointForecastCovariance } from '../models/jointForecast.js';
import type { TrendModelFit } from '../models/trendModels.js';

/**
 * Draws for a transformed series' year: the 2.5% and 97.5% quantiles then move by about 1% of
 * the interval's half-width from one seed to another (a quantile's standard error
 * √(p(1 − p)/N)/f, common practice), below the rounding of most memos.
 */
export const YEAR_DRAWS = 20_000;
/** The simulation's seed: fixed, so a rerun gives the same memo byte for byte. */
export const YEAR_SEED = 20_250_101;

/** One model's figure for the year. */
export interface YearForecast {
  point: number;
  /** One interval per level of `settings.levels`, keyed by levelKey(level). */
  intervals: IntervalsByLevel;
  /** The period forecasts of the year (their points) added up or averaged; equal to `point` unless the points are medians of a transformed series. */
  from_points: number;
  /** Standard deviation of the figure: exact without a transform, the draws' with one. */
  sd: number;
  /** The same were the periods' forecast errors independent (the same draws' method): how much the joint distribution matters. */
  sd_if_independent: number;
  /**
   * With a simulation, the largest 95% Monte Carlo margin of an interval end, half the distance
   * between the order statistics that bound its quantile, as a share of that interval's
   * half-width; null when the figure is exact.
   */
  simulation_error: number | null;
}

export interface NextYearRecord {
  /** The calendar year, as its label ("2025"). */
  year: string;
  figure: YearFigure;
  /** Periods in the year: 12 or 4. */
  periods: number;
  first_period: string;
  last_period: string;
  /** Horizons of the year's first and last period. */
  first_h: number;
  last_h: number;
  /** Whether the forecast horizon reaches the end of the year; when not, no figure is given. */
  available: boolean;
  /** The last period forecast. */
  horizon_end: string;
  /** 'normal': exact (no transform); 'simulation': seeded draws, back-transformed; null when not available. */
  method: 'normal' | 'simulation' | null;
  draws: number | null;
  seed: number | null;
  deterministic: YearForecast | null;
  stochastic: YearForecast | null;
}

/** What the year figure reads of a model's forecast rows: the model-scale mean and the point shown. */
export interface PeriodForecast {
  point: number;
  model_scale: { mean: number };
}

/** The next full calendar year's figure under both models; null for an annual series. */
export function nextYear(
  series: Pick<Series, 'frequency' | 'last'>,
  settings: AnalysisSettings,
  fitted: Record<TrendModelKind, TrendModelFit>,
  rows: Record<TrendModelKind, readonly PeriodForecast[]>,
): NextYearRecord | null {
  const periods = periodsPerYear(series.frequency);
  const last = parsePeriod(series.last);
  if (periods === 1 || last === null) return null;
  // The first period of the next year is h = s − (position of the last observation) + 1.
  const firstH = periods - last.sub + 1;
  const lastH = firstH + periods - 1;
  const available = settings.horizon >= lastH;
  const transformed = settings.transform.kind !== 'none';
  const base = {
    year: String(last.year + 1),
    figure: settings.year_figure,
    periods,
    first_period: addPeriods(series.last, firstH),
    last_period: addPeriods(series.last, lastH),
    first_h: firstH,
    last_h: lastH,
    available,
    horizon_end: addPeriods(series.last, settings.horizon),
  };
  if (!available) return { ...base, method: null, draws: null, seed: null, deterministic: null, stochastic: null };
  const figureOf = (kind: TrendModelKind): YearForecast => {
    const covariance = jointForecastCovariance(fitted[kind], { first: firstH, last: lastH });
    const window = rows[kind].slice(firstH - 1, lastH);
    return yearFigure(
      {
        means: window.map((row) => row.model_scale.mean),
        points: window.map((row) => row.point),
        covariance: settings.coefficient_uncertainty ? covariance.total : covariance.process,
      },
      settings,
    );
  };
  return {
    ...base,
    method: transformed ? 'simulation' : 'normal',
    draws: transformed ? YEAR_DRAWS : null,
    seed: transformed ? YEAR_SEED : null,
    deterministic: figureOf('deterministic'),
    stochastic: figureOf('stochastic'),
  };
}

export interface YearForecasts {
  /** Model-scale means of the year's periods. */
  means: number[];
  /** The points shown for them. */
  points: number[];
  /** Their forecast errors' covariance, s × s row-major. */
  covariance: Float64Array;
}

/** The settings a year's figure reads. */
export type FigureSettings = Pick<AnalysisSettings, 'transform' | 'point' | 'levels' | 'year_figure'>;

/** One model's figure from its forecasts of the year's periods: exact without a transform, simulated with one. */
export function yearFigure(year: YearForecasts, settings: FigureSettings): YearForecast {
  return settings.transform.kind === 'none' ? normalFigure(year, settings) : simulatedFigure(year, settings);
}

/** 1 for a total, 1/s for an average. */
function weight(settings: FigureSettings, periods: number): number {
  return settings.year_figure === 'total' ? 1 : 1 / periods;
}

/** No transform: the figure is N(a'μ, a'Σa), exact. */
function normalFigure(year: YearForecasts, settings: FigureSettings): YearForecast {
  const s = year.means.length;
  const a = weight(settings, s);
  const point = a * year.means.reduce((sum, mean) => sum + mean, 0);
  let variance = 0;
  let diagonal = 0;
  for (let i = 0; i < s; i++) {
    diagonal += year.covariance[i * s + i];
    for (let j = 0; j < s; j++) variance += year.covariance[i * s + j];
  }
  const sd = a * Math.sqrt(variance);
  const intervals: IntervalsByLevel = {};
  for (const level of settings.levels) {
    const z = normalInv(0.5 + level / 200);
    intervals[levelKey(level)] = [point - z * sd, point + z * sd];
  }
  return { point, intervals, from_points: a * year.points.reduce((sum, value) => sum + value, 0), sd, sd_if_independent: a * Math.sqrt(diagonal), simulation_error: null };
}

/** With a transform: seeded draws from the joint Gaussian on the model scale, back-transformed and combined. */
function simulatedFigure(year: YearForecasts, settings: FigureSettings): YearForecast {
  const s = year.means.length;
  const a = weight(settings, s);
  const factor = new Float64Array(s * s);
  if (!choleskyInto(year.covariance, s, factor)) throw new Error('nextYear: the forecast-error covariance of the year is not positive definite');
  const independent = new Float64Array(s * s);
  for (let i = 0; i < s; i++) independent[i * s + i] = Math.sqrt(year.covariance[i * s + i]);
  const joint = drawFigures(year.means, factor, a, settings);
  const apart = drawFigures(year.means, independent, a, settings);
  const sorted = joint.slice().sort((x, y) => x - y);
  const intervals: IntervalsByLevel = {};
  for (const level of settings.levels) intervals[levelKey(level)] = [sampleQuantile(sorted, 0.5 - level / 200), sampleQuantile(sorted, 0.5 + level / 200)];
  const fromPoints = a * year.points.reduce((sum, value) => sum + value, 0);
  return {
    point: settings.point === 'median' ? sampleQuantile(sorted, 0.5) : fromPoints,
    intervals,
    from_points: fromPoints,
    sd: standardDeviation(joint),
    sd_if_independent: standardDeviation(apart),
    simulation_error: simulationError(sorted, intervals, settings.levels),
  };
}

/**
 * How far another seed could move the interval's ends: for the p-quantile of N draws, the order
 * statistics N·p ± z·√(N p (1 − p)) bound the true quantile with probability about 95% whatever
 * the distribution (the binomial count of draws below it; common practice, e.g. Conover 1999,
 * §3.2, from memory). Half their distance, over the interval's half-width, the largest over
 * every end and level.
 */
function simulationError(sorted: Float64Array, intervals: IntervalsByLevel, levels: readonly number[]): number {
  const n = sorted.length;
  const z = normalInv(0.975);
  let largest = 0;
  for (const level of levels) {
    const [low, high] = intervals[levelKey(level)];
    const halfWidth = (high - low) / 2;
    for (const p of [0.5 - level / 200, 0.5 + level / 200]) {
      const spread = z * Math.sqrt(n * p * (1 - p));
      const below = sorted[Math.max(0, Math.floor(n * p - spread))];
      const above = sorted[Math.min(n - 1, Math.ceil(n * p + spread))];
      largest = Math.max(largest, (above - below) / 2 / halfWidth);
    }
  }
  return largest;
}

/** YEAR_DRAWS figures a·Σ T⁻¹(μ + L z), z from the fixed seed (the same z for every call). */
function drawFigures(means: number[], factor: Float64Array, a: number, settings: FigureSettings): Float64Array {
  const s = means.length;
  const draw = seededNormals(YEAR_SEED);
  const z = new Float64Array(s);
  const figures = new Float64Array(YEAR_DRAWS);
  for (let d = 0; d < YEAR_DRAWS; d++) {
    for (let i = 0; i < s; i++) z[i] = draw();
    let total = 0;
    for (let i = 0; i < s; i++) {
      let value = means[i];
      for (let j = 0; j <= i; j++) value += factor[i * s + j] * z[j];
      total += inverseTransform(settings.transform, value);
    }
    figures[d] = a * total;
  }
  return figures;
}

function standardDeviation(values: Float64Array): number {
  let mean = 0;
  for (const value of values) mean += value;
  mean /= values.length;
  let squares = 0;
  for (const value of values) squares += (value - mean) ** 2;
  return Math.sqrt(squares / (values.length - 1));
}
