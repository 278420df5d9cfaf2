// Accuracy of the forecasts at one horizon across the origins. Point and interval scores
// are on the data's scale; CRPS is on the model scale, where the predictive is Gaussian.
//   MAE, RMSE: common practice. MAPE = 100·mean|e/y|, only when every actual is positive.
//   MASE = mean |e| / s, s the in-sample one-step no-change MAE of each origin's training
//   window (Hyndman & Koehler 2006, eq. for q_t). Coverage: share of actuals inside the
//   interval, limits included. Interval score: Gneiting & Raftery (2007), eq. 43.
//   CRPS: Gneiting et al. (2005), eq. 5.
import { levelKey } from '../base/settings.js';
import type { IntervalsByLevel } from '../base/transform.js';
import { finiteOrNull, type HorizonScores, type LevelTable } from './backtestRecord.js';
import { gaussianCrps } from './gaussianCrps.js';
import { intervalScore } from './intervalScore.js';

/** One forecast with what its scores need. */
export interface ScoredForecast {
  actual: number;
  point: number;
  intervals: IntervalsByLevel;
  /** Gaussian predictive on the model scale, and the actual on that scale. */
  mean: number;
  se: number;
  modelActual: number;
  /** The MASE scale of the forecast's origin. */
  maseScale: number;
}

export function scoreHorizon(h: number, rows: readonly ScoredForecast[], levels: readonly number[]): HorizonScores {
  const n = rows.length;
  const average = (value: (row: ScoredForecast) => number): number => (n === 0 ? Number.NaN : rows.reduce((sum, row) => sum + value(row), 0) / n);
  const coverage: LevelTable = {};
  const width: LevelTable = {};
  const interval_score: LevelTable = {};
  for (const level of levels) {
    const key = levelKey(level);
    coverage[key] = finiteOrNull(average(({ actual, intervals }) => (actual >= intervals[key][0] && actual <= intervals[key][1] ? 1 : 0)));
    width[key] = finiteOrNull(average(({ intervals }) => intervals[key][1] - intervals[key][0]));
    interval_score[key] = finiteOrNull(average(({ actual, intervals }) => intervalScore(intervals[key][0], intervals[key][1], level, actual)));
  }
  const allPositive = rows.every((row) => row.actual > 0);
  const scaled = rows.every((row) => row.maseScale > 0);
  return {
    h,
    n,
    mae: finiteOrNull(average((row) => Math.abs(row.actual - row.point))),
    rmse: finiteOrNull(Math.sqrt(average((row) => (row.actual - row.point) ** 2))),
    mape: allPositive ? finiteOrNull(100 * average((row) => Math.abs((row.actual - row.point) / row.actual))) : null,
    mase: scaled ? finiteOrNull(average((row) => Math.abs(row.actual - row.point) / row.maseScale)) : null,
    coverage,
    width,
    interval_score,
    crps: finiteOrNull(average((row) => gaussianCrps(row.mean, row.se, row.modelActual))),
  };
}
