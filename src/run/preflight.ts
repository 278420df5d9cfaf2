// `check`'s pre-flight warnings: what a config will run with but the memo would be weaker for,
// read from the resolved settings and the series alone, without fitting (DEVELOPERS.md, "What
// check reports"). Each warning names the config line of the setting it is about, or the
// series entry when the setting took its default. None of them refuses the run: the memo
// states each limitation too.
import type { InputLocation, InputProblem } from '../base/problem.js';
import { availableOrigins, ORIGIN_STEP } from '../base/backtestOrigins.js';
import { MIN_BACKTEST_ORIGINS } from '../base/settings.js';
import { seasonalStrengthOf } from '../analysis/seasonalStrengthCheck.js';
import type { PlannedSeries } from './readPlannedSeries.js';
import { preflightMessages } from './messages.js';

/**
 * STL seasonal strength (0 to 1) from which data under `seasonal: none` are warned about: the
 * remainder holds at most 40% of the variance of the seasonal component and remainder
 * together. Our threshold; seasonally adjusted series keep little seasonal variance.
 */
export const SEASONAL_STRENGTH_WARNED = 0.6;

export function preflightWarnings({ plan, series, settings }: PlannedSeries, configFile: string): InputProblem[] {
  const placeOf = (key: string): InputLocation => ({ file: configFile, ...(plan.settingPlaces.get(key) ?? { ...plan.at, field: `${plan.at.field}.${key}` }) });
  const warnings: InputProblem[] = [];
  const n = series.n;
  const { horizon: scored, min_train: minTrain } = settings.backtest;
  const origins = availableOrigins(n, { horizon: scored, minTrainingLength: minTrain, step: ORIGIN_STEP });
  if (origins < 1) warnings.push(preflightMessages.noBacktest(placeOf('backtest.min_train'), plan.id, n, minTrain, scored, plan.settingPlaces.has('backtest.min_train')));
  else if (origins < MIN_BACKTEST_ORIGINS) warnings.push(preflightMessages.thinBacktest(placeOf('backtest.min_train'), plan.id, origins, MIN_BACKTEST_ORIGINS, n, minTrain));
  // The backtest horizon was shortened to keep its origins (resolveSettings), not asked for shorter.
  if (origins >= 1 && scored < settings.horizon && !plan.settingPlaces.has('backtest.horizon')) warnings.push(preflightMessages.horizonBeyondBacktest(placeOf('horizon'), plan.id, settings.horizon, scored));
  else if (settings.horizon > n / 2) warnings.push(preflightMessages.horizonLong(placeOf('horizon'), plan.id, settings.horizon, n));
  if (settings.seasonal.kind === 'none' && settings.seasonal.period > 1) {
    const strength = seasonalStrengthOf(series, settings.transform);
    if (strength !== null && strength >= SEASONAL_STRENGTH_WARNED) warnings.push(preflightMessages.seasonalIgnored(placeOf('seasonal'), plan.id, series.frequency, strength));
  }
  return warnings;
}
