// The backtest stage: the whole method re-run at past origins and scored.
//   values ──runBacktest──▶ BacktestRecord ──formatBacktest──▶ summary lines
export { runBacktest } from './runBacktest.js';
export { openOriginPool, type OriginPool } from './runOriginTasks.js';
export { formatBacktest } from './formatBacktest.js';
export { DEFAULT_BACKTEST_HORIZON, type BacktestOptions } from './resolveBacktestOptions.js';
export type { BacktestInput, BacktestSeries } from './readBacktestInput.js';
export { dieboldMariano, hlnFactor } from './dieboldMariano.js';
export { gaussianCrps } from './gaussianCrps.js';
export { intervalScore } from './intervalScore.js';
export { DEFAULT_ORIGINS } from './planOrigins.js';
export { REFIT_POLICIES, WINDOW_KINDS } from './backtestRecord.js';
export type * from './backtestRecord.js';
