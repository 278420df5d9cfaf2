// The response and regressors of the two trend models for a model-scale series w:
//   deterministic: w_t = b₀ + b₁t [+ harmonics_t'γ] + η_t on the levels, t = 1 at the first
//                  observation (trend-stationary);
//   stochastic:    w_t − w_{t−1} = c [+ Δharmonics_t'γ] + η_t on the first differences
//                  (difference-stationary, ARIMA(p,1,q) with drift c), or, for a seasonal
//                  pattern that drifts, w_t − w_{t−s} = s·c + η_t on the seasonal differences.
// A fixed seasonal pattern enters as harmonic regressors (harmonics.ts): on the levels in the
// deterministic model, differenced in the stochastic one, so γ describes the same pattern of
// the levels in both. Seasonal differencing keeps the drift: (1 − B^s)(c·t) = s·c, so the
// column of s's carries c per period, and since 1 − B^s = (1 − B)(1 + B + … + B^{s−1}) the
// model stays difference-stationary at frequency zero; adding a first difference on top would
// make the trend I(2) and leave no drift (our choice, so that both stochastic designs mean a
// trend that wanders with a drift, as the comparison with the deterministic trend needs).
// A fixed pattern is removed by seasonal differencing, so that design takes no harmonics.
import type { TrendModelKind } from '../base/settings.js';
import type { WorkspaceOptions } from '../statespace/filterWorkspace.js';
import { checkHarmonics, harmonicColumns, harmonicNames, harmonicRow } from './harmonics.js';

/** The seasonal side of a design. */
export interface DesignSeasonality {
  /** Observations per year s (12 monthly, 4 quarterly). */
  period: number;
  /** Position in the year of the first observation: month − 1, or quarter − 1. */
  firstSeason: number;
  /** Harmonic pairs in the regression (0: none). */
  harmonics: number;
  /** Stochastic model only: seasonal differences (1 − B^s) instead of first differences. */
  seasonalDifferencing: boolean;
}

export interface TrendDesign {
  response: Float64Array;
  regressors: Float64Array[];
  /** Names of the regression coefficients, in order (harmonics: cos1, sin1, …). */
  coefficientNames: string[];
  /** Regressor rows for h = 1..horizon. */
  futureRows(horizon: number): number[][];
  /** For the stochastic model on first differences: forecasts are integrated from this last level. */
  integrateFrom?: number;
  /** For the stochastic model on seasonal differences: each season's forecasts build on its last observed level. */
  seasonalIntegration?: SeasonalLevels;
  /** The response is the change since the last observed level, NaN at missing levels (gapFilter.ts). */
  accumulateGaps: boolean;
  /** Seasonal differences with missing levels: the filter's seasons, and the positions where a season's changes start afresh. */
  gapPeriod?: number;
  gapRestarts?: number[];
  /** The seasonality the design was built with; absent for a design without one. */
  seasonality?: DesignSeasonality;
}

/** What the forecasts of a seasonal-difference design build on, by forecast season (h − 1) mod s. */
export interface SeasonalLevels {
  period: number;
  /** The last observed level of each forecast season. */
  lastLevels: Float64Array;
  /** Changes of each forecast season since that level that no level has shown (its later levels are missing). */
  pendingCounts: number[];
  /** The filter's season (response position mod s) of the first forecast step. */
  filterSeasonOffset: number;
}

/** The filter options a design needs (gapFilter.ts). */
export function designWorkspace(design: TrendDesign): WorkspaceOptions {
  return {
    accumulateGaps: design.accumulateGaps,
    ...(design.gapPeriod === undefined ? {} : { gapPeriod: design.gapPeriod }),
    ...(design.gapRestarts === undefined ? {} : { gapRestarts: design.gapRestarts }),
  };
}

/** The response and regressors of a model for the model-scale series `w`. */
export function trendDesign(kind: TrendModelKind, w: Float64Array, seasonality?: DesignSeasonality): TrendDesign {
  if (seasonality !== undefined) checkSeasonality(kind, seasonality);
  const n = w.length;
  const harmonics = seasonality === undefined || seasonality.harmonics === 0 ? undefined : seasonality;
  const harmonicAt = (index: number): number[] => (harmonics === undefined ? [] : harmonicRow(harmonics.period, harmonics.harmonics, harmonics.firstSeason + index));
  const harmonicNamesOf = harmonics === undefined ? [] : harmonicNames(harmonics.period, harmonics.harmonics);
  const withSeasonality = seasonality === undefined ? {} : { seasonality };
  if (kind === 'deterministic') {
    const columns = harmonics === undefined ? [] : harmonicColumns(harmonics.period, harmonics.harmonics, harmonics.firstSeason, n);
    return {
      response: w,
      regressors: [new Float64Array(n).fill(1), Float64Array.from({ length: n }, (_, i) => i + 1), ...columns],
      coefficientNames: ['intercept', 'slope', ...harmonicNamesOf],
      futureRows: (horizon) => Array.from({ length: horizon }, (_, h) => [1, n + h + 1, ...harmonicAt(n + h)]),
      accumulateGaps: false,
      ...withSeasonality,
    };
  }
  if (Number.isNaN(w[0]) || Number.isNaN(w[n - 1])) {
    throw new RangeError('trendDesign: the first and last observations must be present');
  }
  if (seasonality?.seasonalDifferencing === true) return seasonalDifferenceDesign(w, seasonality);
  // Δ_j = w_{j+1} − (the last observed level before it), g_j = the periods it spans, and each
  // harmonic's change over the same span; with no missing levels these are the first
  // differences, a column of ones and the harmonics' first differences.
  const changes = new Float64Array(n - 1);
  const spans = new Float64Array(n - 1);
  const harmonicChanges = harmonicNamesOf.map(() => new Float64Array(n - 1));
  let last = 0;
  for (let t = 1; t < n; t++) {
    const from = Number.isNaN(w[t]) ? t - 1 : last;
    const now = harmonicAt(t);
    const before = harmonicAt(from);
    harmonicChanges.forEach((column, c) => (column[t - 1] = now[c] - before[c]));
    if (Number.isNaN(w[t])) {
      changes[t - 1] = Number.NaN;
      spans[t - 1] = 1;
      continue;
    }
    changes[t - 1] = w[t] - w[last];
    spans[t - 1] = t - last;
    last = t;
  }
  return {
    response: changes,
    regressors: [spans, ...harmonicChanges],
    coefficientNames: ['drift', ...harmonicNamesOf],
    futureRows: (horizon) =>
      Array.from({ length: horizon }, (_, h) => {
        const now = harmonicAt(n + h);
        const before = harmonicAt(n + h - 1);
        return [1, ...now.map((value, c) => value - before[c])];
      }),
    integrateFrom: w[n - 1],
    accumulateGaps: true,
    ...withSeasonality,
  };
}

/**
 * w_t − w_{t−s} = s·c + η_t for t = s + 1..n (1-based): the first s levels are conditioned on,
 * as the first level is in the first-difference design. With missing levels, position j holds
 * the change of level j + s since the last observed level of its season and the periods it
 * spans (s per seasonal step, the drift's regressor), NaN where level j + s is missing or its
 * season has no earlier observed level (a restart, gapFilter.ts).
 */
function seasonalDifferenceDesign(w: Float64Array, seasonality: DesignSeasonality): TrendDesign {
  const n = w.length;
  const s = seasonality.period;
  const response = new Float64Array(n - s);
  const spans = new Float64Array(n - s).fill(s);
  const restarts: number[] = [];
  const lastObserved = Array.from({ length: s }, (_, season) => (Number.isNaN(w[season]) ? -1 : season));
  for (let t = s; t < n; t++) {
    const season = t % s;
    const previous = lastObserved[season];
    if (Number.isNaN(w[t])) {
      response[t - s] = Number.NaN;
      continue;
    }
    if (previous < 0) {
      response[t - s] = Number.NaN;
      restarts.push(t - s);
    } else {
      response[t - s] = w[t] - w[previous];
      spans[t - s] = t - previous;
    }
    lastObserved[season] = t;
  }
  const missing = response.some(Number.isNaN);
  // Forecast season q holds levels n + q, n + q + s, …; its base is the last observed level of the same season.
  const lastLevels = new Float64Array(s);
  const pendingCounts: number[] = [];
  for (let q = 0; q < s; q++) {
    const last = lastObserved[(n + q) % s];
    if (last < 0) throw new RangeError('trendDesign: seasonal differences need an observed level in every season');
    lastLevels[q] = w[last];
    pendingCounts.push(Math.floor((n - 1 - last) / s));
  }
  return {
    response,
    regressors: [spans],
    coefficientNames: ['drift'],
    futureRows: (horizon) => Array.from({ length: horizon }, () => [s]),
    seasonalIntegration: { period: s, lastLevels, pendingCounts, filterSeasonOffset: n % s },
    accumulateGaps: missing,
    ...(missing ? { gapPeriod: s, gapRestarts: restarts } : {}),
    seasonality,
  };
}

function checkSeasonality(kind: TrendModelKind, seasonality: DesignSeasonality): void {
  const { period, firstSeason, harmonics, seasonalDifferencing } = seasonality;
  checkHarmonics(period, harmonics);
  if (!(Number.isInteger(firstSeason) && firstSeason >= 0 && firstSeason < period)) {
    throw new RangeError(`trendDesign: the first season must be a position 0..${period - 1} in the year, got ${firstSeason}`);
  }
  if (seasonalDifferencing && kind === 'deterministic') throw new RangeError('trendDesign: seasonal differences belong to the stochastic model');
  if (seasonalDifferencing && harmonics > 0) throw new RangeError('trendDesign: seasonal differences remove a fixed pattern, so they take no harmonics');
}
