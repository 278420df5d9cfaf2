// `trendbrief fit` arguments → the settings as a config would write them, every problem
// collected. Ranges and choices come from the config's settings spec, so an option accepts
// exactly what the config key does; resolveSettings then fills in the rest, as for a config.
import { PERIOD_PATTERN, PERIOD_YEAR_RANGE } from '../base/textPatterns.js';
import type { Frequency } from '../base/period.js';
import { InputError, type InputLocation, type InputProblem } from '../base/problem.js';
import type { WrittenSettings } from '../config/resolveSettings.js';
import { numberFault, type ChoiceSpec, type NumericSpec, type Spec, type ValueOf } from '../config/keySpec.js';
import { DECIMAL_MARK, DELIMITER, FREQUENCY } from '../config/configSpec.js';
import { BACKTEST_FIELDS as BACKTEST, BOX_COX_LAMBDA, LEVEL, SETTINGS_FIELDS } from '../config/settingsSpec.js';
import { cliMessages } from './messages.js';
import { splitOptions, type OptionSpec } from './splitOptions.js';

export interface FitRequest {
  file: string;
  column?: string;
  periodColumn?: string;
  frequency?: Frequency;
  /** How the file is read (--sheet, --delimiter, --decimal-mark), as the series keys sheet, delimiter and decimal_mark. */
  sheet?: string;
  delimiter?: ValueOf<typeof DELIMITER>;
  decimalMark?: ValueOf<typeof DECIMAL_MARK>;
  /** The settings the options give, in the config's shape; what they leave out is absent. */
  settings: WrittenSettings;
  /** Run the backtest and the recommendation rule (--backtest, or one of its options). */
  backtest: boolean;
  json: boolean;
}

/** The option that sets each setting, for messages about the settings fit resolves. */
export const FIT_OPTION_OF: Readonly<Record<string, string>> = {
  horizon: '--horizon',
  through: '--through',
  transform: '--transform',
  levels: '--levels',
  coefficient_uncertainty: '--no-coef-uncertainty',
  point: '--point',
  year_figure: '--year-figure',
  estimation: '--estimation',
  seasonal: '--seasonal',
  max_p: '--max-p',
  max_q: '--max-q',
  missing: '--allow-missing',
  'backtest.origins': '--origins',
  'backtest.horizon': '--backtest-horizon',
  'backtest.refit': '--refit',
  'recommendation.scored_level': '--scored-level',
};

/** Where a fit setting came from: its option, or the setting's own name when no option sets it. */
export function fitOptionPlace(key: string): InputLocation {
  return { field: FIT_OPTION_OF[key] ?? key };
}

const FIT_OPTIONS: Readonly<Record<string, OptionSpec>> = {
  column: { type: 'string' },
  'period-column': { type: 'string' },
  frequency: { type: 'string' },
  sheet: { type: 'string' },
  delimiter: { type: 'string' },
  'decimal-mark': { type: 'string' },
  transform: { type: 'string' },
  horizon: { type: 'string' },
  through: { type: 'string' },
  'max-p': { type: 'string' },
  'max-q': { type: 'string' },
  levels: { type: 'string' },
  'no-coef-uncertainty': { type: 'boolean' },
  point: { type: 'string' },
  'year-figure': { type: 'string' },
  estimation: { type: 'string' },
  seasonal: { type: 'string' },
  json: { type: 'boolean' },
  'allow-missing': { type: 'boolean' },
  backtest: { type: 'boolean' },
  origins: { type: 'string' },
  'backtest-horizon': { type: 'string' },
  refit: { type: 'string' },
  'scored-level': { type: 'string' },
  // Read by runFit before the options are parsed; known here so `--help=x` is refused as a switch with a value.
  help: { type: 'boolean', short: 'h' },
};

export function parseFitOptions(args: readonly string[]): FitRequest {
  const { values: given, positionals, problems } = splitOptions(args, FIT_OPTIONS, 'fit');
  const text = (name: string): string | undefined => {
    const value = given.get(name);
    return typeof value === 'string' ? value : undefined;
  };
  if (positionals.length === 0) problems.push(cliMessages.missingFile('fit'));
  if (positionals.length > 1) problems.push(cliMessages.extraArguments(positionals.slice(1)));
  const integer = (option: string, spec: NumericSpec): number | undefined => {
    const value = text(option);
    if (value === undefined) return undefined;
    const number = /^\d+$/.test(value.trim()) ? Number(value) : Number.NaN;
    if (numberFault(spec, number) === undefined) return number;
    problems.push(cliMessages.notAnInteger(option, value, spec.min, spec.max));
    return undefined;
  };
  const choice = <S extends Spec<ChoiceSpec, string>>(option: string, spec: S): ValueOf<S> | undefined => {
    const value = text(option);
    if (value === undefined) return undefined;
    if (spec.values.includes(value)) return value as ValueOf<S>;
    problems.push(cliMessages.badChoice(option, value, spec.values));
    return undefined;
  };
  const origins = integer('origins', BACKTEST.origins);
  const backtestHorizon = integer('backtest-horizon', BACKTEST.horizon);
  const refit = choice('refit', BACKTEST.refit);
  const scoredLevel = parseLevel(text('scored-level'), problems);
  const settings: WrittenSettings = {
    transform: parseTransform(text('transform'), problems),
    horizon: integer('horizon', SETTINGS_FIELDS.horizon),
    through: parseThrough(text('through'), text('horizon'), problems),
    max_p: integer('max-p', SETTINGS_FIELDS.max_p),
    max_q: integer('max-q', SETTINGS_FIELDS.max_q),
    levels: parseLevels(text('levels'), problems),
    coefficient_uncertainty: given.get('no-coef-uncertainty') === true ? false : undefined,
    point: choice('point', SETTINGS_FIELDS.point),
    year_figure: choice('year-figure', SETTINGS_FIELDS.year_figure),
    estimation: choice('estimation', SETTINGS_FIELDS.estimation),
    seasonal: choice('seasonal', SETTINGS_FIELDS.seasonal.scalar),
    missing: given.get('allow-missing') === true ? 'allow' : undefined,
    backtest: { origins, horizon: backtestHorizon, refit },
    recommendation: { scored_level: scoredLevel },
  };
  const request: FitRequest = {
    file: positionals[0] ?? '',
    column: text('column'),
    periodColumn: text('period-column'),
    frequency: choice('frequency', FREQUENCY),
    sheet: text('sheet'),
    delimiter: choice('delimiter', DELIMITER),
    decimalMark: choice('decimal-mark', DECIMAL_MARK),
    settings,
    backtest: given.get('backtest') === true || origins !== undefined || backtestHorizon !== undefined || refit !== undefined || scoredLevel !== undefined,
    json: given.get('json') === true,
  };
  if (problems.length > 0) throw new InputError(problems);
  return request;
}

/** An end period as the config writes one (2030, 2030-Q4, 2030-12), and not beside --horizon. */
function parseThrough(value: string | undefined, horizon: string | undefined, problems: InputProblem[]): string | undefined {
  if (value === undefined) return undefined;
  if (horizon !== undefined) {
    problems.push(cliMessages.horizonAndThrough());
    return undefined;
  }
  const match = new RegExp(PERIOD_PATTERN, 'u').exec(value.trim());
  const year = Number(value.trim().slice(0, 4));
  if (match !== null && year >= PERIOD_YEAR_RANGE.min && year <= PERIOD_YEAR_RANGE.max) return value.trim();
  problems.push(cliMessages.badThrough(value));
  return undefined;
}

/** `none`, `log` or `box-cox:LAMBDA`, LAMBDA within the spec's range. */
function parseTransform(value: string | undefined, problems: InputProblem[]): WrittenSettings['transform'] {
  if (value === undefined) return undefined;
  if (value === 'none' || value === 'log') return value;
  const match = /^box-cox:(-?\d+(\.\d+)?)$/.exec(value);
  if (match !== null) {
    const lambda = Number(match[1]);
    if (numberFault(BOX_COX_LAMBDA, lambda) === undefined) return { box_cox: lambda };
  }
  problems.push(cliMessages.badTransform(value));
  return undefined;
}

/** One interval level in percent, as the spec's level items allow. */
function parseLevel(value: string | undefined, problems: InputProblem[]): number | undefined {
  if (value === undefined) return undefined;
  const level = /^\s*\d+(\.\d+)?\s*$/.test(value) ? Number(value) : Number.NaN;
  if (numberFault(LEVEL, level) === undefined) return level;
  problems.push(cliMessages.badLevel('scored-level', value));
  return undefined;
}

/** Levels separated by commas: as many, as distinct and in the range the spec allows. */
function parseLevels(value: string | undefined, problems: InputProblem[]): number[] | undefined {
  if (value === undefined) return undefined;
  const spec = SETTINGS_FIELDS.levels;
  const levels = value.split(',').map((part) => (/^\s*\d+(\.\d+)?\s*$/.test(part) ? Number(part) : Number.NaN));
  const distinct = [...new Set(levels)];
  const fits = levels.every((level) => numberFault(LEVEL, level) === undefined);
  if (!fits || distinct.length !== levels.length || levels.length < spec.minItems || levels.length > spec.maxItems) {
    problems.push(cliMessages.badLevels(value, spec.maxItems));
    return undefined;
  }
  return levels;
}
