// Wording of the backtest's notes and of the reasons a comparison test is not available,
// kept in one place so the record and the summary say the same thing.
import type { RefitPolicy } from './backtestRecord.js';

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
  missingOrigins(count: number): string {
    return `${count} origin${count === 1 ? ' was' : 's were'} left out because the last value before ${count === 1 ? 'it is' : 'them is'} missing; missing actual values are not scored.`;
  },
};

/** One line on how each origin refits the models, for the summary. */
export function describeRefit(refit: RefitPolicy): string {
  if (refit === 'reselect') return 'orders re-selected by AICc and parameters re-estimated at every origin';
  if (refit === 'reestimate') return 'orders fixed from the full sample, parameters re-estimated at every origin';
  return 'orders and parameters fixed from the full sample';
}
