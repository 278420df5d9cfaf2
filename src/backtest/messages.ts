// Wording of the backtest: its problems with the input, its notes and the reasons a comparison
// test is not available, kept in one place so the record and the summary say the same thing.
import { plural, problem, type InputProblem } from '../base/problem.js';
import type { RefitPolicy } from '../base/settings.js';

export const comparisonReasons = {
  tooFewOrigins: 'fewer than two origins were scored at this horizon',
  notFinite: 'some losses at this horizon are not finite numbers',
  tooFewForLags: 'the long-run variance needs more origins than the h − 1 autocovariance lags',
  correctionNotPositive: 'the small-sample correction is not positive for this horizon and number of origins',
  varianceNotPositive: 'the long-run variance estimate of the loss differences is not positive, so no statistic can be formed',
};

export const backtestNotes = {
  originsCut(requested: number, scored: number, minimumTraining: number): string {
    return `${requested} origins were asked for but only ${scored} can be scored: each training window needs at least ${minimumTraining} observations (the minimum training length).`;
  },
  lookAhead(refit: RefitPolicy): string {
    return refit === 'fixed'
      ? 'Orders and parameters were fitted on the full sample, including the periods being forecast: the scores are optimistic (look-ahead).'
      : 'Orders were chosen on the full sample, including the periods being forecast: the scores leave out order-selection uncertainty and are somewhat optimistic (look-ahead).';
  },
  unconverged(count: number, fits: number): string {
    return `${count} of the ${fits} origin fits stopped before the optimiser converged; their forecasts are scored as they are.`;
  },
  mapeUnavailable: 'MAPE is not given where an actual value is zero or negative.',
  warmSearches(chainLength: number): string {
    return `To save time, the origins' seasonal searches are grouped in runs of up to ${chainLength} consecutive origins: the first of each run searches from the usual starting values, each later one starts every candidate from its estimate at the origin before (data up to that origin only, so no look-ahead).`;
  },
  originsRaised(requested: number, planned: number, period: number): string {
    const reach = planned >= period ? `one ending in each of the ${period} seasons` : `as many of the ${period} seasons as the series allows`;
    return `${requested} origin${requested === 1 ? ' was' : 's were'} asked for; ${planned} are used so that the origins cover the seasonal cycle (${reach}).`;
  },
  seasonsMissed(covered: number, period: number): string {
    const missed = period - covered;
    return (
      `The origins end in only ${covered} of the ${period} seasons, so ${missed === 1 ? 'one season is' : `${missed} seasons are`} never forecast from and the scores speak for the others only. ` +
      `Every season needs ${period} consecutive origins whose last value is observed: a longer series, a shorter backtest.horizon or a lower backtest.min_train gives them.`
    );
  },
  missingOrigins(count: number): string {
    return `${count} origin${count === 1 ? ' was' : 's were'} left out because the last value before ${count === 1 ? 'it is' : 'them is'} missing; missing actual values are not scored.`;
  },
};

// Problems with what a caller handed the backtest. Settings were checked when they were
// resolved; these name the settings as a config writes them (`backtest.min_train`) and the
// library's own arguments (`orders`, `threads`, `period`, `values`) as a caller writes those.
export const backtestMessages = {
  badOrder(name: string, value: number): InputProblem {
    return problem('backtest.bad-value', `${value} is not a whole number of at least 0`, 'give each order a whole number from 0 up', { field: `orders.${name}` });
  },
  badPeriod(value: number): InputProblem {
    return problem('backtest.bad-value', `${value} is not a whole number of at least 1`, 'give period a whole number from 1 up: 1 for a series without seasons, 4 for quarterly and 12 for monthly data', {
      field: 'period',
    });
  },
  badThreads(value: number): InputProblem {
    return problem('backtest.bad-value', `${value} is not a whole number of at least 1`, 'give threads a whole number from 1 up', { field: 'threads' });
  },
  ordersWithReselect(): InputProblem {
    return problem(
      'backtest.orders-unused',
      'orders are given, but the reselect policy chooses the orders at every origin',
      'drop the orders, or choose the reestimate or fixed policy',
      { field: 'orders' },
    );
  },
  trainingTooShort(value: number, needed: number): InputProblem {
    return problem(
      'backtest.training-too-short',
      `a shortest training window of ${value} observations leaves too few for the largest model`,
      `give at least ${needed}, or lower max_p and max_q`,
      { field: 'backtest.min_train' },
    );
  },
  seasonUnseen(windowEnd: string): InputProblem {
    return problem(
      'backtest.season-unseen',
      `the training window ending ${windowEnd} has a season with no observed value, so the fixed seasonal pattern cannot be estimated there`,
      'raise backtest.min_train so that every training window sees each season, or use fewer harmonics in the seasonal part',
      { field: 'backtest.min_train' },
    );
  },
  fixedWithSeasonalPart(): InputProblem {
    return problem(
      'backtest.fixed-seasonal',
      'refit: fixed keeps the full-series parameters at every origin, which is not available for models with a seasonal part',
      'use refit: reselect (the default) or reestimate, or seasonal: none',
      { field: 'backtest.refit' },
    );
  },
  trainingShorterThanCycle(value: number, period: number): InputProblem {
    return problem(
      'backtest.training-too-short',
      `a shortest training window of ${value} observations holds no seasonal change: the seasonal naive yardstick and the MASE scale at period ${period} need at least ${period + 1}`,
      `give at least ${period + 1}`,
      { field: 'backtest.min_train' },
    );
  },
  badObservation(position: number, value: number): InputProblem {
    return problem('backtest.bad-observation', `observation ${position} is ${value}, not a finite number`, 'supply a complete series of finite values', { field: 'values' });
  },
  notTransformable(position: number, value: number, transform: string): InputProblem {
    return problem(
      'backtest.bad-observation',
      `observation ${position} is ${value}, which the ${transform} transform cannot take`,
      'choose no transform, or a series whose values are all above zero',
      { field: 'values' },
    );
  },
  periodsMismatch(periods: number, values: number): InputProblem {
    return problem('backtest.periods-mismatch', `${periods} period labels for ${values} observations`, 'give one period label per observation', { field: 'periods' });
  },
  seriesTooShort(n: number, horizon: number, minimumTraining: number): InputProblem {
    return problem(
      'backtest.too-short',
      `the series has ${plural(n, 'observation')}; a backtest at horizon ${horizon} needs at least ${minimumTraining + horizon} (${minimumTraining} to train on, ${horizon} to score)`,
      'supply a longer series, shorten backtest.horizon, or lower backtest.min_train or max_p and max_q',
    );
  },
};

/**
 * Why a series has no backtest, for the memo's reader (the record's `backtest_unavailable`):
 * what stands in the way, without the settings to change, which `check` tells the analyst.
 */
export function backtestUnavailableReason(problems: readonly InputProblem[]): string {
  return problems.map((p) => p.message).join('; ');
}
