// Backtest options → checked settings with their defaults, every problem collected into one
// InputError. The interval levels, transform and coefficient-uncertainty settings should be
// those of the main analysis, so the backtest scores the intervals the memo shows.
import { backtestMessages, InputError, type InputProblem } from '../errors.js';
import { BUILT_IN_SETTINGS } from '../config/builtInSettings.js';
import type { TransformSpec } from '../models/transform.js';
import { TREND_MODELS, type TrendModelKind } from '../models/trendModels.js';
import type { OriginPool } from './runOriginTasks.js';
import { REFIT_POLICIES, WINDOW_KINDS, type ArmaOrder, type RefitPolicy, type WindowKind } from './backtestRecord.js';

export interface BacktestOptions {
  /** Origins K (default: as many as fit, up to 20). */
  origins?: number;
  /** Horizons scored, 1..B (default 5). */
  horizon?: number;
  window?: WindowKind;
  /** Observations between consecutive origins (default 1). */
  step?: number;
  refit?: RefitPolicy;
  /** Default: max(20, 3 × the largest model's parameter count). */
  minTrainingLength?: number;
  maxP?: number;
  maxQ?: number;
  transform?: TransformSpec;
  /** Interval levels in percent (default 80 and 95). */
  levels?: number[];
  coefficientUncertainty?: boolean;
  point?: 'median' | 'mean';
  /** Full-sample orders for `reestimate` and `fixed` (default: searched on the full sample). */
  orders?: Record<TrendModelKind, ArmaOrder>;
  /** Significance level quoted with the comparison tests (default 0.05). */
  significance?: number;
  /** Worker threads (default: min(available cores, origins); 1 runs inline). */
  threads?: number;
  /** An open pool to run on instead of starting threads for this backtest alone. */
  pool?: OriginPool;
}

export interface BacktestSettingsInput {
  origins?: number;
  horizon: number;
  window: WindowKind;
  step: number;
  refit: RefitPolicy;
  minTrainingLength?: number;
  maxP: number;
  maxQ: number;
  transform: TransformSpec;
  levels: number[];
  coefficientUncertainty: boolean;
  point: 'median' | 'mean';
  orders?: Record<TrendModelKind, ArmaOrder>;
  significance: number;
  threads?: number;
}

export const DEFAULT_BACKTEST_HORIZON = 5;

export function resolveBacktestOptions(options: BacktestOptions): BacktestSettingsInput {
  const problems: InputProblem[] = [];
  const whole = (name: string, value: number | undefined, min: number): number | undefined => {
    if (value !== undefined && !(Number.isInteger(value) && value >= min)) problems.push(backtestMessages.notWhole(name, value, min));
    return value;
  };
  const choice = <T extends string>(name: string, value: T | undefined, choices: readonly T[], fallback: T): T => {
    if (value !== undefined && !choices.includes(value)) problems.push(backtestMessages.badChoice(name, String(value), choices));
    return value ?? fallback;
  };
  const refit = choice('refit', options.refit, REFIT_POLICIES, 'reselect');
  const levels = options.levels ?? [...BUILT_IN_SETTINGS.levels];
  for (const level of levels) if (!(level > 0 && level < 100)) problems.push(backtestMessages.badLevel(level));
  const significance = options.significance ?? 0.05;
  if (!(significance > 0 && significance < 1)) problems.push(backtestMessages.badSignificance(significance));
  const transform = options.transform ?? { kind: 'none' };
  if (transform.kind === 'box-cox' && !Number.isFinite(transform.lambda)) problems.push(backtestMessages.badLambda());
  if (options.orders !== undefined) {
    if (refit === 'reselect') problems.push(backtestMessages.ordersWithReselect());
    for (const kind of TREND_MODELS) {
      whole(`orders.${kind}.p`, options.orders[kind].p, 0);
      whole(`orders.${kind}.q`, options.orders[kind].q, 0);
    }
  }
  const settings: BacktestSettingsInput = {
    origins: whole('origins', options.origins, 1),
    horizon: whole('horizon', options.horizon, 1) ?? DEFAULT_BACKTEST_HORIZON,
    window: choice('window', options.window, WINDOW_KINDS, 'expanding'),
    step: whole('step', options.step, 1) ?? 1,
    refit,
    minTrainingLength: whole('minTrainingLength', options.minTrainingLength, 1),
    maxP: whole('maxP', options.maxP, 0) ?? BUILT_IN_SETTINGS.max_p,
    maxQ: whole('maxQ', options.maxQ, 0) ?? BUILT_IN_SETTINGS.max_q,
    transform,
    levels: [...new Set(levels)].sort((a, b) => a - b),
    coefficientUncertainty: options.coefficientUncertainty ?? true,
    point: choice('point', options.point, ['median', 'mean'] as const, 'median'),
    orders: options.orders,
    significance,
    threads: whole('threads', options.threads, 1),
  };
  if (problems.length > 0) throw new InputError(problems);
  return settings;
}
