// The methods a backtest's tables and chart show: the two models and the benchmark the backtest
// scored them against (no change, or the seasonal naive for a seasonal series).
import type { BacktestMethod, BacktestRecord, HorizonScores } from '../analysis/record.js';

/** The two models and the backtest's benchmark; records made before the seasonal yardstick name none: theirs is no change. */
export function backtestMethods(backtest: BacktestRecord): readonly BacktestMethod[] {
  return ['deterministic', 'stochastic', backtest.settings.benchmark ?? 'naive'];
}

/** The scores of a method by horizon (the seasonal naive's only where the backtest scored it). */
export function scoresOf(backtest: BacktestRecord, method: BacktestMethod): HorizonScores[] {
  return method === 'seasonal_naive' ? (backtest.per_horizon.seasonal_naive ?? []) : backtest.per_horizon[method];
}
