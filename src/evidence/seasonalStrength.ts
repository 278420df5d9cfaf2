// How strong the seasonal pattern and the trend are, and how the pattern moved, from an STL
// decomposition y = T + S + R (stlDecomposition.ts) of the model-scale levels.
//
// Strength (Wang, Smith & Hyndman 2006, Data Mining and Knowledge Discovery 13, 335–364; the
// form with max(0, ·) and the STL components as the strength measures are usually stated, from
// memory): F_S = max(0, 1 − Var(R)/Var(S + R)) and
// F_T = max(0, 1 − Var(R)/Var(T + R)); 0 when the component is lost in the noise, near 1 when
// it dominates it. The variances' divisor cancels in the ratio.
//
// Pattern: the mean seasonal effect of each month or quarter over the whole series, and its
// effect in the first and in the last complete calendar year (all s observations present),
// with the largest change between those two years as a share of the pattern's range.
import { stlDecomposition, type StlOptions } from './stlDecomposition.js';
import type { SeasonalPattern, SeasonalStrength } from './types.js';

/** Where the series starts in the calendar: month (1–12) or quarter (1–4), and the year if known. */
export interface SeasonStart {
  season: number;
  year?: number;
}

/** Strength of the seasonal and trend components and the seasonal pattern, by STL. */
export function seasonalStrength(
  w: ArrayLike<number>,
  period: number,
  start: SeasonStart = { season: 1 },
  stlOptions: Omit<StlOptions, 'period'> = {},
): { strength: Omit<SeasonalStrength, 'text'>; pattern: SeasonalPattern } {
  if (!Number.isInteger(start.season) || start.season < 1 || start.season > period) {
    throw new Error(`seasonalStrength needs a starting season from 1 to the period (${period})`);
  }
  const stl = stlDecomposition(w, { ...stlOptions, period });
  const { seasonal, trend, remainder, settings } = stl;
  const strength: Omit<SeasonalStrength, 'text'> = {
    method: 'stl',
    source: 'Cleveland, Cleveland, McRae & Terpenning (1990); strength as in Wang, Smith & Hyndman (2006)',
    seasonal: componentStrength(seasonal, remainder),
    trend: componentStrength(trend, remainder),
    stl: {
      seasonal_span: settings.periodic ? 'periodic' : settings.seasonal.span,
      seasonal_degree: settings.seasonal.degree,
      trend_span: settings.trend.span,
      trend_degree: settings.trend.degree,
      low_pass_span: settings.low_pass.span,
      low_pass_degree: settings.low_pass.degree,
      inner: settings.inner,
      outer: settings.outer,
      robust: settings.outer > 0,
    },
  };
  return { strength, pattern: seasonalPattern(seasonal, period, start) };
}

/** max(0, 1 − Var(R)/Var(C + R)); null when C + R does not vary. */
export function componentStrength(component: ArrayLike<number>, remainder: ArrayLike<number>): number | null {
  const combined = Float64Array.from({ length: component.length }, (_, i) => component[i] + remainder[i]);
  const denominator = variance(combined);
  if (!(denominator > 0)) return null;
  return Math.max(0, 1 - variance(remainder) / denominator);
}

function variance(x: ArrayLike<number>): number {
  let mean = 0;
  for (let i = 0; i < x.length; i++) mean += x[i];
  mean /= x.length;
  let sum = 0;
  for (let i = 0; i < x.length; i++) sum += (x[i] - mean) ** 2;
  return sum / x.length;
}

/** The mean effect by season and its change between the first and last complete calendar years. */
export function seasonalPattern(seasonal: ArrayLike<number>, period: number, start: SeasonStart): SeasonalPattern {
  const n = seasonal.length;
  const seasonAt = (i: number): number => ((start.season - 1 + i) % period) + 1;
  const sums = new Float64Array(period);
  const counts = new Float64Array(period);
  for (let i = 0; i < n; i++) {
    sums[seasonAt(i) - 1] += seasonal[i];
    counts[seasonAt(i) - 1] += 1;
  }
  const mean_effect = Array.from(sums, (sum, j) => sum / counts[j]);
  const amplitude = Math.max(...mean_effect) - Math.min(...mean_effect);
  // The first complete year starts at the first observation of season 1.
  const firstStart = (period - (start.season - 1)) % period;
  const completeYears = Math.floor((n - firstStart) / period);
  const yearOf = (index: number): number | null =>
    start.year === undefined ? null : start.year + Math.floor((start.season - 1 + index) / period);
  const season = Array.from({ length: period }, (_, j) => j + 1);
  if (completeYears < 2) {
    return {
      period,
      season,
      mean_effect,
      amplitude,
      complete_years: Math.max(0, completeYears),
      first_year: null,
      last_year: null,
      first_year_effect: null,
      last_year_effect: null,
      largest_change: null,
      largest_change_season: null,
      change_share: null,
    };
  }
  const lastStart = firstStart + (completeYears - 1) * period;
  const first_year_effect = season.map((_, j) => seasonal[firstStart + j]);
  const last_year_effect = season.map((_, j) => seasonal[lastStart + j]);
  let largest = 0;
  let largestSeason = 1;
  season.forEach((s, j) => {
    const change = Math.abs(last_year_effect[j] - first_year_effect[j]);
    if (change > largest) {
      largest = change;
      largestSeason = s;
    }
  });
  return {
    period,
    season,
    mean_effect,
    amplitude,
    complete_years: completeYears,
    first_year: yearOf(firstStart),
    last_year: yearOf(lastStart),
    first_year_effect,
    last_year_effect,
    largest_change: largest,
    largest_change_season: largestSeason,
    change_share: amplitude > 0 ? largest / amplitude : null,
  };
}
