// One error type for everything the user got wrong (config, CSV, options), and the
// single place where user-facing problem text lives. Each problem renders as one line:
//   file:line:column: field: what is wrong; what to do
// Internal failures are ordinary Errors and map to exit code 1.

/** Where in the user's input a problem sits; every part is optional. */
export interface InputLocation {
  file?: string;
  line?: number;
  column?: number;
  field?: string;
}

/** One problem with the user's input. */
export interface InputProblem extends InputLocation {
  /** Stable machine-readable code, e.g. `csv.gap`. */
  code: string;
  /** What is wrong. */
  message: string;
  /** What to do about it. */
  hint: string;
}

/** Thrown when input is bad; carries every problem found in one pass. */
export class InputError extends Error {
  readonly problems: readonly InputProblem[];

  constructor(problems: InputProblem | readonly InputProblem[]) {
    const list = Array.isArray(problems) ? [...problems] : [problems as InputProblem];
    super(list.map(formatProblem).join('\n'));
    this.name = 'InputError';
    this.problems = list;
  }
}

/** Renders a problem as `file:line:column: field: message; hint`, omitting absent parts. */
export function formatProblem(problem: InputProblem): string {
  const place: string[] = [];
  if (problem.file !== undefined) {
    place.push(problem.file);
    if (problem.line !== undefined) {
      place.push(String(problem.line));
      if (problem.column !== undefined) place.push(String(problem.column));
    }
  }
  const parts: string[] = [];
  if (place.length > 0) parts.push(place.join(':'));
  if (problem.field !== undefined) parts.push(problem.field);
  parts.push(`${problem.message}; ${problem.hint}`);
  return parts.join(': ');
}

/** Builds a problem; the one constructor callers use so wording stays in this module's style. */
export function problem(code: string, message: string, hint: string, at: InputLocation = {}): InputProblem {
  return { code, message, hint, ...at };
}

// ---------------------------------------------------------------------------
// Data stage: messages about series CSV files (src/data/). Each function returns
// a complete problem so the code, the wording and the hint stay together.
// ---------------------------------------------------------------------------

/** Joins items with commas; a long list keeps its first few items and its last: `a, b, c, d, e, ..., z (26 in all)`. */
export function abbreviateList(items: readonly string[], keep = 6): string {
  if (items.length <= keep) return items.join(', ');
  return `${items.slice(0, keep - 1).join(', ')}, ..., ${items[items.length - 1]} (${items.length} in all)`;
}

const PERIOD_FORMS = 'write periods as 2003 (annual), 2003-Q1 (quarterly) or 2003-01 (monthly)';
const MISSING_HINT = 'fill in the observed value: the models need an unbroken series';

function quoted(text: string): string {
  return `'${text}'`;
}

const MEBIBYTE = 1024 * 1024;

function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}

const CSV_SYNTAX_DETAILS: Readonly<Record<string, string>> = {
  CSV_QUOTE_NOT_CLOSED: 'a quoted cell is never closed',
  CSV_INVALID_CLOSING_QUOTE: 'text follows the closing quote of a cell',
  INVALID_OPENING_QUOTE: 'a quote appears in the middle of an unquoted cell',
  CSV_NON_TRIMABLE_CHAR_AFTER_CLOSING_QUOTE: 'text follows the closing quote of a cell',
  CSV_MAX_RECORD_SIZE: 'a line is too long to be a row of this file',
};

export const dataMessages = {
  fileMissing(file: string): InputProblem {
    return problem('csv.file-missing', 'file not found', 'check the path and its spelling', { file });
  },
  notAFile(file: string, kind: 'directory' | 'special file'): InputProblem {
    return problem('csv.not-a-file', `is a ${kind}, not a regular file`, 'give the path of a .csv file', { file });
  },
  unreadable(file: string, reason: string): InputProblem {
    return problem('csv.unreadable', `cannot be read (${reason})`, 'check that the file exists and that you may read it', {
      file,
    });
  },
  tooLarge(file: string, bytes: number, limitBytes: number): InputProblem {
    return problem(
      'csv.too-large',
      // Rounded up, so a file just past the limit never reads as equal to it.
      `is ${(Math.ceil((bytes / MEBIBYTE) * 10) / 10).toFixed(1)} MB, above the ${limitBytes / MEBIBYTE} MB limit for a series file`,
      'keep only the period column and the value columns you need',
      { file },
    );
  },
  notUtf8(file: string): InputProblem {
    return problem('csv.not-utf8', 'is not UTF-8 text', 'save the file with UTF-8 encoding', { file });
  },
  csvSyntax(file: string, line: number | undefined, csvCode: string): InputProblem {
    const detail = CSV_SYNTAX_DETAILS[csvCode] ?? `the CSV structure is broken (${csvCode})`;
    return problem('csv.syntax', `not valid CSV: ${detail}`, 'quote a cell only as a whole, and write a quote inside a quoted cell as ""', {
      file,
      line,
    });
  },
  emptyFile(file: string): InputProblem {
    return problem('csv.empty', 'has no header and no data', 'start with a header line such as period,value, then one line per period', {
      file,
    });
  },
  noData(at: InputLocation): InputProblem {
    return problem('csv.no-data', 'has a header but no data lines', 'add one line per period below the header', at);
  },
  headerLooksLikeData(at: InputLocation, cell: string): InputProblem {
    return problem(
      'csv.no-header',
      `the first line holds ${quoted(cell)}, which is data, not a column name`,
      'add a header line naming the columns, such as period,value',
      at,
    );
  },
  oneColumn(at: InputLocation, name: string): InputProblem {
    const hint = /[;\t]/.test(name)
      ? 'separate cells with commas (this file seems to use semicolons or tabs)'
      : 'add a value column: each line needs a period and a value';
    return problem('csv.one-column', `has a single column ${quoted(name)}`, hint, at);
  },
  unknownColumn(at: InputLocation, name: string, columns: readonly string[], suggestion: string | undefined): InputProblem {
    const hint = suggestion === undefined ? 'use one of the column names above' : `did you mean ${quoted(suggestion)}?`;
    return problem('csv.unknown-column', `no column with this name; the columns are ${columns.map(quoted).join(', ')}`, hint, {
      ...at,
      field: name,
    });
  },
  unnamedColumn(at: InputLocation, position: number): InputProblem {
    return problem('csv.unnamed-column', `column ${position} has no name in the header`, 'give every column a name in the header line', {
      ...at,
      column: position,
    });
  },
  duplicateColumn(at: InputLocation, name: string, count: number): InputProblem {
    return problem('csv.duplicate-column', `${count} columns share this name`, 'rename the columns so each name appears once', {
      ...at,
      field: name,
    });
  },
  sameColumn(at: InputLocation, name: string): InputProblem {
    return problem('csv.same-column', 'chosen as both the period column and the value column', 'pick two different columns', {
      ...at,
      field: name,
    });
  },
  rowWidth(at: InputLocation, cells: number, expected: number): InputProblem {
    const hint = cells > expected ? 'quote cells that contain commas, or remove the extra cells' : 'fill in the missing cells';
    return problem('csv.row-width', `has ${plural(cells, 'cell')} but the header has ${expected}`, hint, at);
  },
  emptyPeriod(at: InputLocation): InputProblem {
    return problem('csv.empty-period', 'the period cell is empty', `${PERIOD_FORMS}, or delete the line`, at);
  },
  badPeriod(at: InputLocation, label: string): InputProblem {
    const date = /^(\d{4})-(\d{2})-\d{2}$/.exec(label);
    const hint = date === null ? PERIOD_FORMS : `write a month without its day, e.g. ${date[1]}-${date[2]}`;
    return problem('csv.bad-period', `${quoted(label)} is not a period`, hint, at);
  },
  emptyValue(at: InputLocation): InputProblem {
    return problem('csv.missing-value', 'the value cell is empty', MISSING_HINT, at);
  },
  missingMarker(at: InputLocation, text: string): InputProblem {
    return problem('csv.missing-value', `${quoted(text)} marks a missing value`, MISSING_HINT, at);
  },
  nonFinite(at: InputLocation, text: string): InputProblem {
    return problem('csv.non-finite', `${quoted(text)} is not a finite number`, 'replace it with the observed value', at);
  },
  badValue(at: InputLocation, text: string): InputProblem {
    const hint = text.includes(',')
      ? 'write decimals with a point and no thousands separators, e.g. 1234.5'
      : 'write a plain number such as 1234.5, without units or symbols';
    return problem('csv.bad-value', `${quoted(text)} is not a number`, hint, at);
  },
  frequencyMismatch(at: InputLocation, label: string, found: string, expected: string, lines: readonly number[]): InputProblem {
    return problem(
      'csv.frequency-mismatch',
      `period ${quoted(label)} is ${found}, but the frequency is set to ${expected}${disagreeing(lines)}`,
      `set the frequency to ${found}, or write every period in the ${expected} form`,
      at,
    );
  },
  mixedFrequency(
    at: InputLocation,
    label: string,
    found: string,
    first: { label: string; line: number; frequency: string },
    lines: readonly number[],
  ): InputProblem {
    return problem(
      'csv.mixed-frequency',
      `period ${quoted(label)} is ${found}, but the first period ${quoted(first.label)} (line ${first.line}) is ${first.frequency}${disagreeing(lines)}`,
      'write every period with the same frequency: one file holds one series',
      at,
    );
  },
  duplicatePeriod(at: InputLocation, label: string, firstLine: number): InputProblem {
    return problem('csv.duplicate-period', `period ${label} already appears on line ${firstLine}`, 'keep one line per period', at);
  },
  unsorted(at: InputLocation, label: string, previous: { label: string; line: number }): InputProblem {
    return problem(
      'csv.unsorted',
      `period ${label} comes after ${previous.label} (line ${previous.line})`,
      'sort the lines by period, oldest first',
      at,
    );
  },
  descending(at: InputLocation, first: string, last: string): InputProblem {
    return problem('csv.descending', `periods run backwards, from ${first} down to ${last}`, 'sort the lines by period, oldest first', at);
  },
  gap(at: InputLocation, missing: readonly string[], next: string): InputProblem {
    return problem('csv.gap', `missing ${abbreviateList(missing)} before ${next}`, 'add a line for each missing period: the models need an unbroken series', at);
  },
  tooFew(at: InputLocation, count: number, minimum: number): InputProblem {
    return problem(
      'series.too-few',
      `has ${plural(count, 'observation')}; at least ${minimum} are needed`,
      'supply a longer series, or choose settings that need fewer observations',
      at,
    );
  },
  constant(at: InputLocation, count: number, value: number): InputProblem {
    return problem(
      'series.constant',
      `all ${count} values equal ${value}`,
      'a constant series has no trend to model; check that the right column is chosen',
      at,
    );
  },
  nonPositive(at: InputLocation, value: number, transform: string): InputProblem {
    return problem(
      'series.non-positive',
      `value ${value} is not positive, which the ${transform} transform needs`,
      'choose no transform, or a series whose values are all above zero',
      at,
    );
  },
  moreOfTheSame(like: InputProblem, lines: readonly number[]): InputProblem {
    return problem(like.code, `and ${plural(lines.length, 'more line')} with this kind of problem: ${abbreviateList(lines.map(String))}`, like.hint, {
      file: like.file,
      line: lines[0],
      field: like.field,
    });
  },
};

function disagreeing(lines: readonly number[]): string {
  return lines.length > 1 ? `; ${lines.length} lines disagree: ${abbreviateList(lines.map(String))}` : '';
}

// ---------------------------------------------------------------------------
// Command line: messages about arguments and options (src/cli/).
// ---------------------------------------------------------------------------

function helpCommand(command: string): string {
  return command === '' ? 'trendbrief --help' : `trendbrief ${command} --help`;
}

export const cliMessages = {
  unknownCommand(name: string, suggestion: string | undefined): InputProblem {
    const hint = suggestion !== undefined ? `did you mean '${suggestion}'? See trendbrief --help` : 'see trendbrief --help for the commands';
    return problem('cli.unknown-command', `unknown command '${name}'`, hint);
  },
  noCommand(): InputProblem {
    return problem('cli.no-command', 'no command given', 'run trendbrief --help to see the commands');
  },
  /** `command` names the command whose options were given; '' for the options before any command. */
  unknownOption(written: string, suggestion: string | undefined, command: string): InputProblem {
    const hint = suggestion !== undefined ? `did you mean ${suggestion}? See ${helpCommand(command)}` : `see ${helpCommand(command)} for the options`;
    return problem('cli.unknown-option', 'unknown option', hint, { field: written });
  },
  missingValue(option: string, command: string): InputProblem {
    return problem('cli.missing-value', 'needs a value', `write the value after the option, e.g. ${option} VALUE, or see ${helpCommand(command)}`, {
      field: option,
    });
  },
  flagWithValue(option: string, command: string): InputProblem {
    return problem('cli.flag-with-value', 'is a switch and takes no value', `write ${option} alone, or see ${helpCommand(command)}`, {
      field: option,
    });
  },
  missingFile(command: string): InputProblem {
    return problem('cli.missing-file', `${command} needs a CSV file`, `give one, e.g. trendbrief ${command} series.csv`);
  },
  extraArguments(extra: readonly string[]): InputProblem {
    return problem('cli.extra-arguments', `unexpected argument${extra.length > 1 ? 's' : ''} ${extra.join(' ')}`, 'give one CSV file');
  },
  notAnInteger(option: string, value: string, min: number, max: number): InputProblem {
    return problem('cli.bad-value', `'${value}' is not a whole number from ${min} to ${max}`, `give --${option} a whole number from ${min} to ${max}`, {
      field: `--${option}`,
    });
  },
  badChoice(option: string, value: string, choices: readonly string[]): InputProblem {
    return problem('cli.bad-value', `'${value}' is not one of ${choices.join(', ')}`, `give --${option} one of ${choices.join(', ')}`, {
      field: `--${option}`,
    });
  },
  badTransform(value: string): InputProblem {
    return problem('cli.bad-value', `'${value}' is not a transform`, 'use none, log, or box-cox:LAMBDA with LAMBDA a number such as 0.5', {
      field: '--transform',
    });
  },
  badLevels(value: string): InputProblem {
    return problem('cli.bad-value', `'${value}' is not a list of interval levels`, 'give percentages between 50 and 99.9 separated by commas, e.g. 80,95', {
      field: '--levels',
    });
  },
};

// ---------------------------------------------------------------------------
// Backtest: messages about backtest settings and the series it is run on (src/backtest/).
// ---------------------------------------------------------------------------

function backtestField(name: string): InputLocation {
  return { field: `backtest.${name}` };
}

export const backtestMessages = {
  notWhole(name: string, value: number, min: number): InputProblem {
    return problem('backtest.bad-value', `${value} is not a whole number of at least ${min}`, `give ${name} a whole number from ${min} up`, backtestField(name));
  },
  badChoice(name: string, value: string, choices: readonly string[]): InputProblem {
    return problem('backtest.bad-value', `'${value}' is not one of ${choices.join(', ')}`, `give ${name} one of ${choices.join(', ')}`, backtestField(name));
  },
  badLevel(value: number): InputProblem {
    return problem('backtest.bad-value', `${value} is not an interval level`, 'give levels in percent, above 0 and below 100, e.g. 80 and 95', backtestField('levels'));
  },
  badSignificance(value: number): InputProblem {
    return problem('backtest.bad-value', `${value} is not a significance level`, 'give a probability above 0 and below 1, e.g. 0.05', backtestField('significance'));
  },
  badLambda(): InputProblem {
    return problem('backtest.bad-value', 'the Box-Cox transform has no finite lambda', 'give lambda as a number such as 0.5', backtestField('transform'));
  },
  ordersWithReselect(): InputProblem {
    return problem(
      'backtest.orders-unused',
      'orders are given, but the reselect policy chooses the orders at every origin',
      'drop the orders, or choose the reestimate or fixed policy',
      backtestField('orders'),
    );
  },
  trainingTooShort(value: number, needed: number): InputProblem {
    return problem(
      'backtest.training-too-short',
      `a minimum training length of ${value} leaves too few observations for the largest model`,
      `give at least ${needed}, or lower the largest AR and MA orders`,
      backtestField('minTrainingLength'),
    );
  },
  badObservation(position: number, value: number): InputProblem {
    return problem('backtest.bad-observation', `observation ${position} is ${value}, not a finite number`, 'supply a complete series of finite values', backtestField('values'));
  },
  notTransformable(position: number, value: number, transform: string): InputProblem {
    return problem(
      'backtest.bad-observation',
      `observation ${position} is ${value}, which the ${transform} transform cannot take`,
      'choose no transform, or a series whose values are all above zero',
      backtestField('values'),
    );
  },
  periodsMismatch(periods: number, values: number): InputProblem {
    return problem('backtest.periods-mismatch', `${periods} period labels for ${values} observations`, 'give one period label per observation', backtestField('periods'));
  },
  seriesTooShort(n: number, horizon: number, minimumTraining: number): InputProblem {
    return problem(
      'backtest.too-short',
      `has ${plural(n, 'observation')}; a backtest at horizon ${horizon} needs at least ${minimumTraining + horizon} (${minimumTraining} to train on, ${horizon} to score)`,
      'supply a longer series, shorten the backtest horizon, or lower the largest AR and MA orders',
      backtestField('values'),
    );
  },
};
