// Trend stability for both models, on the model-scale series w:
//   w ──fit at the given orders──▶ full-sample fits ─┬─expandingEstimates─▶ windows
//                                                     └─trendBreakTest─────▶ break_test
// A model with a seasonal part brings its own full-sample fit and design
// (`seasonalTrendStability`): the windows keep the whole seasonal part, and the break test
// whitens at the model's seasonal ARMA with the harmonic terms as regressors that do not break.
import { fitRegressionArma, type RegressionArmaFit } from '../models/fitRegressionArma.js';
import { minimumObservations, trendDesign, type TrendDesign } from '../models/trendModels.js';
import { expandingEstimates, expandingWindowSchedule, seasonalExpandingEstimates, type SeasonalTrendFit, type WindowEstimate } from './expandingWindows.js';
import { finiteSeries } from './finiteSeries.js';
import { trendBreakTest } from './trendBreakTest.js';
import type { BreakTestResult, StabilityRecord } from './types.js';
import { TREND_MODELS, type Estimation, type TrendModelKind } from '../base/settings.js';

export type { SeasonalTrendFit } from './expandingWindows.js';

export interface ArmaOrder {
  p: number;
  q: number;
  /** Exact ML when absent. */
  estimation?: Estimation;
}

/** The ARMA orders of the errors, chosen on the full sample, for each model. */
export interface StabilityOrders {
  deterministic: ArmaOrder;
  stochastic: ArmaOrder;
}

/**
 * Expanding-window slope and drift, and a break test for each model, at fixed ARMA orders,
 * estimated as the models were (exact ML unless an order says REML). `given`: a model's fit to
 * the whole of w at those orders (the order search's own), which then serves as the full-sample
 * window and the break test's whitening instead of a refit, so the checks describe the model the
 * memo reports and its windows start from that optimum.
 */
export function trendStability(w: ArrayLike<number>, orders: StabilityOrders, given: Partial<Record<TrendModelKind, RegressionArmaFit>> = {}): StabilityRecord {
  const series = finiteSeries(w, 'trendStability');
  const n = series.length;
  let fewest = 0;
  for (const kind of ['deterministic', 'stochastic'] as const) {
    const { p, q } = orders[kind];
    if (!Number.isInteger(p) || !Number.isInteger(q) || p < 0 || q < 0) {
      throw new Error(`trendStability needs whole, non-negative ARMA orders for the ${kind} model`);
    }
    const needed = minimumObservations(kind, p, q);
    if (n < needed) throw new Error(`trendStability needs at least ${needed} observations for the ${kind} model with ARMA(${p},${q})`);
    fewest = Math.max(fewest, needed);
  }
  const schedule = expandingWindowSchedule(n, fewest);
  const fitted = (kind: TrendModelKind): { fit: RegressionArmaFit; test: BreakTestResult } => {
    const design = trendDesign(kind, series);
    const { p, q, estimation = 'ml' } = orders[kind];
    const own = given[kind];
    const usable = own !== undefined && own.order.p === p && own.order.q === q && own.order.P + own.order.Q === 0 && own.estimation === estimation && own.residuals.length === design.response.length;
    const fit = usable ? own : fitRegressionArma(design.response, design.regressors, p, q, { estimation });
    return { fit, test: trendBreakTest(kind, design, fit) };
  };
  const deterministic = fitted('deterministic');
  const stochastic = fitted('stochastic');
  const slopes = expandingEstimates('deterministic', series, schedule.ends, deterministic.fit);
  const drifts = expandingEstimates('stochastic', series, schedule.ends, stochastic.fit);
  return stabilityRecord(schedule, slopes, drifts, { deterministic: deterministic.test, stochastic: stochastic.test });
}

/**
 * Trend stability of two models with a seasonal part, each given as fitted to the whole of w:
 * its design (with its seasonality) and its fit, whose orders (p, q)(P, Q)s and estimation the
 * windows keep. The full-sample window is the model's own fit.
 */
export function seasonalTrendStability(w: ArrayLike<number>, models: Record<TrendModelKind, SeasonalTrendFit>, ahead: Partial<Record<TrendModelKind, ModelWindows>> = {}): StabilityRecord {
  const series = finiteSeries(w, 'seasonalTrendStability');
  const n = series.length;
  let fewest = 0;
  for (const kind of TREND_MODELS) {
    const { design, fit } = models[kind];
    checkModel(kind, series, design, fit);
    fewest = Math.max(fewest, seasonalWindowNeeds(kind, models[kind]));
  }
  const schedule = expandingWindowSchedule(n, fewest);
  // Windows computed ahead on the model's own schedule serve when the joint one is the same (it
  // almost always is: the first window is at least 40% of the series).
  const estimates = (kind: TrendModelKind): WindowEstimate[] => {
    const done = ahead[kind];
    const same = done !== undefined && done.ends.length === schedule.ends.length && done.ends.every((end, i) => end === schedule.ends[i]);
    return same ? done.estimates : seasonalExpandingEstimates(kind, series, schedule.ends, models[kind]);
  };
  const slopes = estimates('deterministic');
  const drifts = estimates('stochastic');
  const test = (kind: TrendModelKind): BreakTestResult => trendBreakTest(kind, models[kind].design, models[kind].fit);
  return stabilityRecord(schedule, slopes, drifts, { deterministic: test('deterministic'), stochastic: test('stochastic') });
}

/** One model's expanding-window estimates on the schedule its own orders need, computed ahead. */
export interface ModelWindows {
  ends: number[];
  estimates: WindowEstimate[];
}

/** Fewest observations a window of this model needs (its orders and seasonal part). */
function seasonalWindowNeeds(kind: TrendModelKind, model: SeasonalTrendFit): number {
  const seasonality = model.design.seasonality;
  const { p, q, P, Q } = model.fit.order;
  return seasonality === undefined ? minimumObservations(kind, p, q) : minimumObservations(kind, p, q, { ...seasonality, P, Q });
}

/**
 * One model's windows on its own schedule, for `seasonalTrendStability` to take: computed right
 * after the model's search, in the thread that ran it, so the two models' windows are fitted side
 * by side. w must be the complete series the model was fitted to.
 */
export function seasonalModelWindows(kind: TrendModelKind, w: ArrayLike<number>, model: SeasonalTrendFit): ModelWindows {
  const series = finiteSeries(w, 'seasonalModelWindows');
  checkModel(kind, series, model.design, model.fit);
  const { ends } = expandingWindowSchedule(series.length, seasonalWindowNeeds(kind, model));
  return { ends, estimates: seasonalExpandingEstimates(kind, series, ends, model) };
}

/** A model given to the seasonal checks must be a fit of w's own design with its seasonality. */
function checkModel(kind: TrendModelKind, series: Float64Array, design: TrendDesign, fit: RegressionArmaFit): void {
  const seasonality = design.seasonality;
  if (seasonality === undefined) throw new Error(`seasonalTrendStability needs the ${kind} model's design with its seasonality`);
  const conditioned = kind === 'deterministic' ? 0 : seasonality.seasonalDifferencing ? seasonality.period : 1;
  if (design.response.length !== series.length - conditioned || fit.residuals.length !== design.response.length || fit.beta.length !== design.regressors.length) {
    throw new Error(`seasonalTrendStability needs the ${kind} model fitted to the whole series`);
  }
}

function stabilityRecord(
  schedule: { minWindow: number; step: number },
  slopes: WindowEstimate[],
  drifts: WindowEstimate[],
  breakTest: StabilityRecord['break_test'],
): StabilityRecord {
  return {
    windows: {
      deterministic: slopes.map(({ end, estimate, se }) => ({ end, slope: estimate, se })),
      stochastic: drifts.map(({ end, estimate, se }) => ({ end, drift: estimate, se })),
      min_window: schedule.minWindow,
      step: schedule.step,
    },
    break_test: breakTest,
  };
}
