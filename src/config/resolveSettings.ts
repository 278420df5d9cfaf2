// Written settings → the one complete AnalysisSettings value (src/base/settings.ts). The config's
// merged `defaults` and series keys, and `fit`'s options, both arrive here in the config's own
// shape; this is the only place a setting takes its default, each default written once:
// built-in values in builtInSettings.ts, and the rules below for the four that depend on
// something else (the horizon on the end period and the last observation, the shortest backtest training window on the
// order limits, the backtest horizon on the forecast horizon and the series' length, the
// scored level on the levels).
//
// The series must be read before the horizon can be resolved (its frequency may come from the
// data), yet reading it needs the transform, the missing-value policy and the order limits:
// `readingSettings` resolves those four, and `resolveSettings` builds the rest on them.
import { harmonicColumnCount, periodsPerYear, type Frequency } from '../base/period.js';
import { DEFAULT_YEARS_AHEAD, defaultThrough, periodThrough, stepsBetween } from '../base/periodEnd.js';
import { InputError, type InputLocation } from '../base/problem.js';
import { MIN_BACKTEST_ORIGINS, type AnalysisSettings, type SeasonalSetting, type Transform } from '../base/settings.js';
import { BUILT_IN_SETTINGS as BUILT_IN, MIN_TRAIN_FLOOR, MIN_TRAIN_PER_PARAMETER } from './builtInSettings.js';
import { BACKTEST_FIELDS, SETTINGS_FIELDS } from './settingsSpec.js';
import type { SettingsEntry } from './configSpec.js';
import { configMessages } from './messages.js';

/** Settings as a config or `fit` writes them: every key optional, snake_case, `transform` as written. */
export type WrittenSettings = SettingsEntry;

/** Where a setting was written, for a message about it: a config position, or a command-line option. */
export type PlaceOf = (key: string) => InputLocation;

const nowhere: PlaceOf = (key) => ({ field: key });

/** The settings the data stage needs to read and check a series file. */
export type ReadingSettings = Pick<AnalysisSettings, 'transform' | 'missing' | 'max_p' | 'max_q'>;

export function readingSettings(written: WrittenSettings): ReadingSettings {
  return {
    transform: toTransform(written.transform ?? BUILT_IN.transform),
    missing: written.missing ?? BUILT_IN.missing,
    max_p: written.max_p ?? BUILT_IN.max_p,
    max_q: written.max_q ?? BUILT_IN.max_q,
  };
}

/** What the defaults need to know of the series: its frequency and its length (a Series will do). */
export interface SeriesFacts {
  frequency: Frequency;
  /** Periods from first to last. */
  n: number;
  /** The values (NaN where missing), when known: a fixed seasonal pattern is checked against the seasons observed. */
  values?: ArrayLike<number>;
  /** The last period's label, when known: `through` and the default horizon count from it. */
  last?: string;
}

/**
 * The complete settings of one series. Throws an InputError when the written values contradict
 * each other (a scored level that is not among the levels).
 */
export function resolveSettings(written: WrittenSettings, series: SeriesFacts, placeOf: PlaceOf = nowhere): AnalysisSettings {
  const reading = readingSettings(written);
  const horizon = written.horizon ?? horizonThrough(written.through, series, placeOf);
  // The deterministic trend at the order limits has p + q + 3 parameters (intercept, slope, σ²).
  const minTrain = written.backtest?.min_train ?? Math.max(MIN_TRAIN_FLOOR, MIN_TRAIN_PER_PARAMETER * (reading.max_p + reading.max_q + 3));
  const levels = [...(written.levels ?? BUILT_IN.levels)].sort((a, b) => a - b);
  const backtest = written.backtest ?? {};
  const recommendation = written.recommendation ?? {};
  const scoredLevel = recommendation.scored_level ?? levels[levels.length - 1];
  if (!levels.includes(scoredLevel)) {
    throw new InputError(configMessages.scoredLevelNotListed(placeOf('recommendation.scored_level'), scoredLevel, levels));
  }
  return deepFreeze({
    horizon,
    transform: reading.transform,
    levels,
    coefficient_uncertainty: written.coefficient_uncertainty ?? BUILT_IN.coefficient_uncertainty,
    point: written.point ?? BUILT_IN.point,
    year_figure: written.year_figure ?? BUILT_IN.year_figure,
    estimation: written.estimation ?? BUILT_IN.estimation,
    seasonal: toSeasonal(written.seasonal ?? BUILT_IN.seasonal, series, placeOf),
    max_p: reading.max_p,
    max_q: reading.max_q,
    significance: written.significance ?? BUILT_IN.significance,
    backtest: {
      origins: backtest.origins ?? BUILT_IN.backtest.origins,
      horizon: backtest.horizon ?? backtestHorizon(horizon, series.n, minTrain),
      refit: backtest.refit ?? BUILT_IN.backtest.refit,
      window: backtest.window ?? BUILT_IN.backtest.window,
      min_train: minTrain,
    },
    recommendation: {
      rule: recommendation.rule ?? BUILT_IN.recommendation.rule,
      significance: recommendation.significance ?? BUILT_IN.recommendation.significance,
      scored_level: scoredLevel,
      model: recommendation.model ?? null,
      justification: recommendation.justification ?? null,
    },
    missing: reading.missing,
  });
}

/**
 * Steps from the last observation through the end period written (`through`), or through the
 * default one: the end of the calendar year DEFAULT_YEARS_AHEAD years after the last
 * observation's. A caller that does not know the last period gets the steps from a year's end.
 */
function horizonThrough(through: string | undefined, series: SeriesFacts, placeOf: PlaceOf): number {
  const { frequency, last } = series;
  if (last === undefined) {
    if (through !== undefined) throw new Error('resolveSettings: `through` needs the series\' last period (SeriesFacts.last)');
    return DEFAULT_YEARS_AHEAD[frequency] * periodsPerYear(frequency);
  }
  if (through === undefined) return stepsBetween(last, defaultThrough(last, frequency));
  const end = periodThrough(through, frequency);
  if (end === undefined) throw new InputError(configMessages.throughInsidePeriod(placeOf('through'), through, frequency));
  const steps = stepsBetween(last, end);
  if (steps < 1) throw new InputError(configMessages.throughNotAhead(placeOf('through'), through, last));
  const max = SETTINGS_FIELDS.horizon.max;
  if (steps > max) throw new InputError(configMessages.horizonTooLong(placeOf('through'), steps, max, through));
  return steps;
}

/** Frozen all the way down: the settings are shared by every stage and none may change them. */
function deepFreeze<T extends object>(value: T): T {
  for (const inner of Object.values(value)) if (typeof inner === 'object' && inner !== null) deepFreeze(inner);
  return Object.freeze(value);
}

/**
 * The backtest checks forecasts as far ahead as the memo makes them, where the series is long
 * enough to leave MIN_BACKTEST_ORIGINS origins after the shortest training window; a shorter
 * series gets a shorter backtest horizon (the memo says so on its first page). The longest such
 * horizon solves `availableOrigins` (base/backtestOrigins.ts) ≥ MIN_BACKTEST_ORIGINS for origins
 * one observation apart.
 */
function backtestHorizon(horizon: number, n: number, minTrain: number): number {
  const longest = n - minTrain - (MIN_BACKTEST_ORIGINS - 1);
  return Math.max(1, Math.min(horizon, longest, BACKTEST_FIELDS.horizon.max));
}

/** The seasonal setting with its period; a fixed form must suit the frequency. */
function toSeasonal(written: NonNullable<WrittenSettings['seasonal']>, series: SeriesFacts, placeOf: PlaceOf): SeasonalSetting {
  const { frequency } = series;
  const period = periodsPerYear(frequency);
  if (typeof written === 'string') return { kind: period === 1 ? 'none' : written, period };
  if (period === 1) throw new InputError(configMessages.seasonalFormAnnual(placeOf('seasonal')));
  const most = Math.floor(period / 2);
  if (written.harmonics > most) throw new InputError(configMessages.tooManyHarmonics(placeOf('seasonal'), written.harmonics, most, frequency));
  // With the level, K pairs' columns need as many distinct seasons observed, and one more
  // (trigonometric interpolation on distinct points).
  const columns = harmonicColumnCount(period, written.harmonics);
  const values = series.values;
  if (values === undefined) return { kind: 'fixed', period, ...written };
  const seen = new Set<number>();
  for (let t = 0; t < values.length; t++) if (!Number.isNaN(values[t])) seen.add(t % period);
  if (seen.size < columns + 1) throw new InputError(configMessages.harmonicsUnseen(placeOf('seasonal'), written.harmonics, seen.size, period, columns + 1));
  return { kind: 'fixed', period, ...written };
}

function toTransform(written: NonNullable<WrittenSettings['transform']>): Transform {
  return typeof written === 'string' ? { kind: written } : { kind: 'box-cox', lambda: written.box_cox };
}
