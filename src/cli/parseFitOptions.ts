// `trendbrief fit` arguments → validated analysis settings, every problem collected.
import { cliMessages, InputError, type InputProblem } from '../errors.js';
import { splitOptions, type OptionSpec } from './splitOptions.js';
import { FREQUENCIES, type Frequency } from '../data/period.js';
import type { TransformSpec } from '../data/series.js';
import { REFIT_POLICIES, type RefitPolicy } from '../backtest/index.js';
import { BUILT_IN_SETTINGS } from '../config/builtInSettings.js';
import { MAX_HORIZON, MAX_ORDER } from '../config/settingsSpec.js';

export interface FitRequest {
  file: string;
  column?: string;
  periodColumn?: string;
  frequency?: Frequency;
  transform: TransformSpec;
  horizon?: number;
  maxP: number;
  maxQ: number;
  levels: number[];
  coefficientUncertainty: boolean;
  point: 'median' | 'mean';
  json: boolean;
  help: boolean;
  /** Missing values and periods become gaps the models handle, instead of errors. */
  allowMissing: boolean;
  /** Backtest settings; undefined without --backtest (or one of its options, which imply it). */
  backtest?: { origins?: number; horizon?: number; refit: RefitPolicy };
}

export { MAX_HORIZON, MAX_ORDER };
export const MAX_BACKTEST_ORIGINS = 200;
export const MAX_BACKTEST_HORIZON = 100;

const FIT_OPTIONS: Readonly<Record<string, OptionSpec>> = {
  column: { type: 'string' },
  'period-column': { type: 'string' },
  frequency: { type: 'string' },
  transform: { type: 'string' },
  horizon: { type: 'string' },
  'max-p': { type: 'string' },
  'max-q': { type: 'string' },
  levels: { type: 'string' },
  'no-coef-uncertainty': { type: 'boolean' },
  point: { type: 'string' },
  json: { type: 'boolean' },
  'allow-missing': { type: 'boolean' },
  backtest: { type: 'boolean' },
  origins: { type: 'string' },
  'backtest-horizon': { type: 'string' },
  refit: { type: 'string' },
  help: { type: 'boolean', short: 'h' },
};

export function parseFitOptions(args: readonly string[]): FitRequest {
  const { values: given, positionals, problems } = splitOptions(args, FIT_OPTIONS, 'fit');
  const text = (name: string): string | undefined => {
    const value = given.get(name);
    return typeof value === 'string' ? value : undefined;
  };
  const help = given.get('help') === true;
  if (!help && positionals.length === 0) problems.push(cliMessages.missingFile('fit'));
  if (positionals.length > 1) problems.push(cliMessages.extraArguments(positionals.slice(1)));
  const integer = (option: string, value: string | undefined, min: number, max: number): number | undefined => {
    if (value === undefined) return undefined;
    const number = /^\d+$/.test(value.trim()) ? Number(value) : Number.NaN;
    if (!Number.isInteger(number) || number < min || number > max) {
      problems.push(cliMessages.notAnInteger(option, value, min, max));
      return undefined;
    }
    return number;
  };
  const choice = <T extends string>(option: string, value: string | undefined, choices: readonly T[]): T | undefined => {
    if (value === undefined) return undefined;
    const found = choices.find((c) => c === value);
    if (found === undefined) problems.push(cliMessages.badChoice(option, value, choices));
    return found;
  };
  const request: FitRequest = {
    file: positionals[0] ?? '',
    column: text('column'),
    periodColumn: text('period-column'),
    frequency: choice('frequency', text('frequency'), FREQUENCIES),
    transform: parseTransform(text('transform'), problems),
    horizon: integer('horizon', text('horizon'), 1, MAX_HORIZON),
    maxP: integer('max-p', text('max-p'), 0, MAX_ORDER) ?? BUILT_IN_SETTINGS.max_p,
    maxQ: integer('max-q', text('max-q'), 0, MAX_ORDER) ?? BUILT_IN_SETTINGS.max_q,
    levels: parseLevels(text('levels'), problems),
    coefficientUncertainty: given.get('no-coef-uncertainty') !== true,
    point: choice('point', text('point'), ['median', 'mean'] as const) ?? 'median',
    json: given.get('json') === true,
    help,
    allowMissing: given.get('allow-missing') === true,
  };
  const origins = integer('origins', text('origins'), 1, MAX_BACKTEST_ORIGINS);
  const backtestHorizon = integer('backtest-horizon', text('backtest-horizon'), 1, MAX_BACKTEST_HORIZON);
  const refit = choice('refit', text('refit'), REFIT_POLICIES);
  if (given.get('backtest') === true || origins !== undefined || backtestHorizon !== undefined || refit !== undefined) {
    request.backtest = { origins, horizon: backtestHorizon, refit: refit ?? 'reselect' };
  }
  if (problems.length > 0 && !help) throw new InputError(problems);
  return request;
}

function parseTransform(value: string | undefined, problems: InputProblem[]): TransformSpec {
  if (value === undefined || value === 'none') return { kind: 'none' };
  if (value === 'log') return { kind: 'log' };
  const match = /^box-cox:(-?\d+(\.\d+)?)$/.exec(value);
  if (match !== null) {
    const lambda = Number(match[1]);
    if (Math.abs(lambda) <= 2) return { kind: 'box-cox', lambda };
  }
  problems.push(cliMessages.badTransform(value));
  return { kind: 'none' };
}

function parseLevels(value: string | undefined, problems: InputProblem[]): number[] {
  if (value === undefined) return [...BUILT_IN_SETTINGS.levels];
  const levels = value.split(',').map((part) => (/^\s*\d+(\.\d+)?\s*$/.test(part) ? Number(part) : Number.NaN));
  if (levels.length === 0 || levels.some((level) => !(level >= 50 && level <= 99.9))) {
    problems.push(cliMessages.badLevels(value));
    return [...BUILT_IN_SETTINGS.levels];
  }
  return [...new Set(levels)].sort((a, b) => a - b);
}
