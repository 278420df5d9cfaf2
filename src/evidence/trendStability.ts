// Trend stability for both models, on the model-scale series w:
//   w ──fit at the given orders──▶ full-sample fits ─┬─expandingEstimates─▶ windows
//                                                     └─trendBreakTest─────▶ break_test
import { fitRegressionArma, type RegressionArmaFit } from '../models/fitRegressionArma.js';
import { minimumObservations, trendDesign } from '../models/trendModels.js';
import { expandingEstimates, expandingWindowSchedule } from './expandingWindows.js';
import { finiteSeries } from './finiteSeries.js';
import { trendBreakTest } from './trendBreakTest.js';
import type { BreakTestResult, StabilityRecord } from './types.js';
import { type Estimation, type TrendModelKind } from '../base/settings.js';

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
 * estimated as the models were (exact ML unless an order says REML).
 */
export function trendStability(w: ArrayLike<number>, orders: StabilityOrders): StabilityRecord {
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
    const fit = fitRegressionArma(design.response, design.regressors, orders[kind].p, orders[kind].q, { estimation: orders[kind].estimation });
    return { fit, test: trendBreakTest(kind, design, fit) };
  };
  const deterministic = fitted('deterministic');
  const stochastic = fitted('stochastic');
  const slopes = expandingEstimates('deterministic', series, schedule.ends, deterministic.fit);
  const drifts = expandingEstimates('stochastic', series, schedule.ends, stochastic.fit);
  return {
    windows: {
      deterministic: slopes.map(({ end, estimate, se }) => ({ end, slope: estimate, se })),
      stochastic: drifts.map(({ end, estimate, se }) => ({ end, drift: estimate, se })),
      min_window: schedule.minWindow,
      step: schedule.step,
    },
    break_test: { deterministic: deterministic.test, stochastic: stochastic.test },
  };
}
