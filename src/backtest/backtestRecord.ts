// The backtest block of the AnalysisRecord: rolling-origin forecasts of both trend models and
// the no-change yardstick (and, for seasonal data, the seasonal naive one), their scores per
// horizon and the comparison tests. Plain JSON; numbers that do not exist are null. Keys are
// a contract: add freely, rename none.
import type { PointForecast, RefitPolicy, Transform, TrendModelKind, WindowKind } from '../base/settings.js';
import type { IntervalsByLevel } from '../base/transform.js';

export type BacktestNumber = number | null;

/** The two trend models and the no-change forecast: scored in every backtest. */
export type ForecastMethod = TrendModelKind | 'naive';
export const FORECAST_METHODS: readonly ForecastMethod[] = ['deterministic', 'stochastic', 'naive'];

/** The naive yardsticks: no change, and for a seasonal period s > 1 the seasonal naive forecast (the same season's last value). */
export type YardstickMethod = 'naive' | 'seasonal_naive';

/** Every method a backtest may score: the seasonal naive one only when the period is above 1. */
export type BacktestMethod = ForecastMethod | 'seasonal_naive';

/** The squared error of the point forecast, or the interval score at a level, e.g. `interval_score_95`. */
export type ComparisonLoss = 'squared_error' | `interval_score_${number}`;

/** The loss name of the interval score at `level` percent. */
export function intervalScoreLoss(level: number): ComparisonLoss {
  return `interval_score_${level}`;
}

/** Values keyed by interval level (levelKey), e.g. {"80": …, "95": …}. */
export type LevelTable = Record<string, BacktestNumber>;

export interface ArmaOrder {
  p: number;
  q: number;
}

export interface BacktestSettings {
  /** Origins scored. */
  origins: number;
  /** Origins asked for (the default is 20). */
  requested_origins: number;
  horizon: number;
  window: WindowKind;
  step: number;
  refit: RefitPolicy;
  min_training_length: number;
  levels: number[];
  transform: Transform;
  coefficient_uncertainty: boolean;
  point: PointForecast;
  max_p: number;
  max_q: number;
  /** Orders from the full sample under `reestimate` and `fixed`; null under `reselect`. */
  orders: Record<TrendModelKind, ArmaOrder> | null;
  significance: number;
  /** Seasonal period s the backtest ran at: 1 not seasonal, 4 quarterly, 12 monthly. */
  period: number;
  /** The yardstick the models are measured against: `seasonal_naive` when the period is above 1, else `naive`. */
  benchmark: YardstickMethod;
  /** Whose in-sample mean absolute error scales MASE: the one-step no-change forecast (`naive`) or, when the period is above 1, the seasonal naive forecast. */
  mase_scaling: YardstickMethod;
  /** How many of the `period` seasons the scored origins end in (all of them unless the notes say otherwise). */
  seasons_covered: number;
}

export interface OriginModel {
  p: number;
  q: number;
  /** Null under `fixed`, where nothing is estimated at the origin. */
  loglik: BacktestNumber;
  converged: boolean;
}

export interface OriginRecord {
  /** Observations up to and including the origin: the training length of an expanding window. */
  length: number;
  /** Period label of the last training observation; null for a bare array of values. */
  period: string | null;
  /** Observations in the training window (smaller than `origin` for a sliding window). */
  training_length: number;
  /** The MASE scale: the window's in-sample mean absolute error of the yardstick named by `settings.mase_scaling` (one-step no change, or lag-s seasonal naive). */
  mase_scale: BacktestNumber;
  models: Record<TrendModelKind, OriginModel>;
}

export interface HorizonScores {
  h: number;
  /** Origins scored at this horizon. */
  n: number;
  mae: BacktestNumber;
  rmse: BacktestNumber;
  /** Mean absolute percentage error, in percent; null unless every actual is positive. */
  mape: BacktestNumber;
  mase: BacktestNumber;
  coverage: LevelTable;
  width: LevelTable;
  interval_score: LevelTable;
  /** On the model (transformed) scale. */
  crps: BacktestNumber;
}

export interface ComparisonRow {
  h: number;
  loss: ComparisonLoss;
  n: number;
  /** Mean loss of the deterministic minus the stochastic trend. */
  mean_difference: BacktestNumber;
  statistic: BacktestNumber;
  p_value: BacktestNumber;
  /** The model with the lower mean loss (whatever the p-value); null on a tie. */
  better: TrendModelKind | null;
  available: boolean;
  reason: string | null;
}

export interface BacktestForecast {
  origin: number;
  origin_period: string | null;
  model: BacktestMethod;
  h: number;
  /** Period label of the forecast target; null for a bare array of values. */
  period: string | null;
  actual: number;
  point: number;
  intervals: IntervalsByLevel;
  /** The Gaussian predictive on the model scale the scores use. */
  model_scale: { mean: number; se: number };
}

export interface BacktestRecord {
  settings: BacktestSettings;
  notes: string[];
  origins: OriginRecord[];
  /** `seasonal_naive` is present when the period is above 1. */
  per_horizon: Record<ForecastMethod, HorizonScores[]> & { seasonal_naive?: HorizonScores[] };
  comparison: ComparisonRow[];
  forecasts: BacktestForecast[];
}

/** A number for JSON: non-finite values become null. */
export function finiteOrNull(value: number): BacktestNumber {
  return Number.isFinite(value) ? value : null;
}
