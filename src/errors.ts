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
  return visible(parts.join(': '));
}

/**
 * Messages echo the user's text (a cell, a key, a file name). Control characters in it would
 * act on the terminal (escape sequences, a line break that forges another message) and
 * bidirectional controls would reorder the line, so each is shown as its code point instead.
 */
const INVISIBLE = /[\u0000-\u001F\u007F-\u009F\u2028\u2029\u202A-\u202E\u2066-\u2069]/gu;

function visible(line: string): string {
  return line.replace(INVISIBLE, (character) => `[${codePointName(character.codePointAt(0) ?? 0)}]`);
}

/** `U+202E`, as the Unicode standard writes a code point. */
function codePointName(codePoint: number): string {
  return `U+${codePoint.toString(16).toUpperCase().padStart(4, '0')}`;
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
const MISSING_HINT = 'fill in the observed value, or allow missing values (missing: allow in the config, --allow-missing for fit)';

/** Longest piece of the user's text quoted in a message, in code points; a 20 MB cell is not echoed whole. */
const QUOTE_LIMIT = 80;

function quoted(text: string): string {
  const characters = [...text];
  if (characters.length <= QUOTE_LIMIT) return `'${text}'`;
  return `'${characters.slice(0, QUOTE_LIMIT - 3).join('')}...' (${characters.length} characters)`;
}

const MEBIBYTE = 1024 * 1024;

/** Three significant digits, for sizes far out of range where the exact digits do not matter. */
function roughly(value: number): string {
  return String(Number(value.toPrecision(3)));
}

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
  columnNameCharacter(at: InputLocation, position: number, codePoint: number, characterPosition: number): InputProblem {
    return problem(
      'csv.bad-column-name',
      `the name of column ${position} holds the invisible control character ${codePointName(codePoint)} at character ${characterPosition}`,
      'remove it from the header line: column names are printed in the memo',
      { ...at, column: position },
    );
  },
  columnNameTooLong(at: InputLocation, position: number, length: number, max: number): InputProblem {
    return problem('csv.bad-column-name', `the name of column ${position} is ${length} characters long; at most ${max} are allowed`, 'shorten it in the header line', {
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
    return problem(
      'csv.gap',
      `missing ${abbreviateList(missing)} before ${next}`,
      'add a line for each missing period, or allow gaps (missing: allow in the config, --allow-missing for fit)',
      at,
    );
  },
  missingEnd(at: InputLocation, which: 'first' | 'last', label: string): InputProblem {
    return problem('series.missing-end', `the ${which} period, ${label}, has no value`, `start and end the file with observed values (remove the ${which} line)`, at);
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
  /** `scale` names the transform when the models see the values transformed. */
  /** `modelValue` is the value after the transform `scale` names, when there is one. */
  tooLargeForModels(at: InputLocation, value: number, modelValue: number, limit: number, scale: string | undefined): InputProblem {
    const reason = scale === undefined ? `, which compute with sizes up to ${limit}` : `: the ${scale} transform makes it ${roughly(modelValue)}, and they compute with sizes up to ${limit}`;
    const hint = scale === undefined ? 'express the series in larger units (thousands or millions, say), or choose the log transform' : 'express the series in other units, or choose a transform with a smaller lambda';
    return problem('series.out-of-scale', `value ${roughly(value)} is too large for the models${reason}`, hint, at);
  },
  tooLittleSpread(at: InputLocation, spread: number, limit: number, scale: string | undefined): InputProblem {
    const where = scale === undefined ? '' : ` after the ${scale} transform`;
    return problem(
      'series.out-of-scale',
      `the values differ by at most ${roughly(spread)}${where}, too little for the models to tell apart (at least ${limit} is needed)`,
      'express the series in smaller units (multiply it by a power of ten), or check that the right column is chosen',
      at,
    );
  },
  /** A problem with a series file as a whole, told with the config entry that names the file. */
  namedBy(about: InputProblem, entry: { file: string; line: number; column: number; field: string }): InputProblem {
    return { ...about, hint: `${about.hint} (the file of ${entry.field}, ${entry.file}:${entry.line}:${entry.column})` };
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
// Config: messages about config files (src/config/). Field names are dotted paths
// such as `series[2].horizon`; positions are the YAML node's line and column.
// ---------------------------------------------------------------------------

/** What a config key accepts, as the validator knows it; rendered by `describeExpected`. */
export type ExpectedValue =
  | { kind: 'text' }
  | { kind: 'whole'; min: number; max: number }
  | { kind: 'number'; min: number; max: number }
  | { kind: 'boolean' }
  | { kind: 'choice'; values: readonly string[] }
  | { kind: 'period' }
  | { kind: 'list'; example: string }
  | { kind: 'mapping'; example: string }
  | { kind: 'shapes'; description: string };

/** What the config holds where a value was expected. */
export type FoundValue =
  | { kind: 'text'; text: string }
  | { kind: 'number'; value: number }
  | { kind: 'boolean'; value: boolean }
  | { kind: 'empty' }
  | { kind: 'list' }
  | { kind: 'mapping' };

const PERIOD_EXAMPLES = 'a period such as 2026, 2026-Q3 or 2026-10';

export function describeExpected(expected: ExpectedValue): string {
  switch (expected.kind) {
    case 'text':
      return 'text';
    case 'whole':
      return `a whole number from ${expected.min} to ${expected.max}`;
    case 'number':
      return `a number from ${expected.min} to ${expected.max}`;
    case 'boolean':
      return 'true or false';
    case 'choice':
      return `one of ${expected.values.join(', ')}`;
    case 'period':
      return PERIOD_EXAMPLES;
    case 'list':
      return `a list such as ${expected.example}`;
    case 'mapping':
      return `a mapping of keys such as ${expected.example}`;
    case 'shapes':
      return expected.description;
  }
}

function describeFound(found: FoundValue): string {
  switch (found.kind) {
    case 'text':
      return `text ${quoted(found.text)}`;
    case 'number':
      return `the number ${found.value}`;
    case 'boolean':
      return String(found.value);
    case 'empty':
      return 'no value';
    case 'list':
      return 'a list';
    case 'mapping':
      return 'a mapping';
  }
}

function wrongTypeHint(expected: ExpectedValue, found: FoundValue): string {
  const numeric = expected.kind === 'whole' || expected.kind === 'number';
  if (numeric && found.kind === 'text' && Number.isFinite(Number(found.text)) && found.text.trim() !== '') {
    return 'write the number without quotes';
  }
  if ((expected.kind === 'text' || expected.kind === 'choice') && (found.kind === 'number' || found.kind === 'boolean')) {
    return `put the value in quotes if it is meant as text, or write ${describeExpected(expected)}`;
  }
  if (found.kind === 'empty') return `give it ${describeExpected(expected)}, or remove it`;
  return `write ${describeExpected(expected)}`;
}

/** The YAML parser's error codes in our words: what is wrong, what to do. */
const YAML_SYNTAX_DETAILS: Readonly<Record<string, readonly [string, string]>> = {
  BAD_INDENT: ['the indentation does not fit the lines around it', 'line the key up with the keys beside it, using spaces'],
  TAB_AS_INDENT: ['a tab is used for indentation', 'indent with spaces'],
  MISSING_CHAR: ['a quote or bracket is still open here', 'close the quote or bracket opened above this point'],
  // Ours, not the parser's: MISSING_CHAR moved to the quote that opens the value.
  UNCLOSED_QUOTE: ['a quote opened here is never closed', 'end the value with the same quote mark, or remove this one'],
  MULTIPLE_DOCS: ['the file holds more than one document', 'remove the second --- line: a config is one document'],
  BLOCK_AS_IMPLICIT_KEY: ['a key runs over more than one line', 'write each key on one line, followed by a colon'],
  MULTILINE_IMPLICIT_KEY: ['a key runs over more than one line', 'write each key on one line, followed by a colon'],
  TAG_RESOLVE_FAILED: ['a tag (a word starting with !) that this config does not use', 'remove the tag and write the plain value'],
  BAD_ALIAS: ['an alias (*name) refers to no anchor (&name) above it', 'define the anchor before the alias, or write the value out'],
  UNEXPECTED_TOKEN: ['text appears where YAML does not allow it', 'check the punctuation on this line'],
  KEY_OVER_1024_CHARS: ['a key is longer than 1024 characters', 'shorten the key'],
  RESOURCE_EXHAUSTION: ['the values nest too deeply', 'write a flatter config'],
};

const CONFIG_SIZE_HINT = 'a config describes a memo; keep data in the series CSV files it names';

export const configMessages = {
  fileMissing(file: string): InputProblem {
    return problem('config.file-missing', 'config file not found', 'check the path and its spelling', { file });
  },
  notAFile(file: string, kind: 'directory' | 'special file'): InputProblem {
    return problem('config.not-a-file', `is a ${kind}, not a regular file`, 'give the path of a .yaml config file', { file });
  },
  unreadable(file: string, reason: string): InputProblem {
    return problem('config.unreadable', `cannot be read (${reason})`, 'check that the file exists and that you may read it', { file });
  },
  tooLarge(file: string, bytes: number, limitBytes: number): InputProblem {
    return problem('config.too-large', `is ${bytes} bytes, above the ${limitBytes / MEBIBYTE} MB limit for a config file`, CONFIG_SIZE_HINT, { file });
  },
  notUtf8(file: string): InputProblem {
    return problem('config.not-utf8', 'is not UTF-8 text', 'save the file with UTF-8 encoding', { file });
  },
  empty(file: string): InputProblem {
    return problem('config.empty', 'holds no settings', 'write the memo and series sections; trendbrief init writes a starter config', {
      file,
    });
  },
  /** `yamlCode` and `yamlMessage` are the YAML parser's; known codes get our own wording. */
  syntax(at: InputLocation, yamlCode: string, yamlMessage: string): InputProblem {
    const known = YAML_SYNTAX_DETAILS[yamlCode];
    const detail = known?.[0] ?? yamlMessage.charAt(0).toLowerCase() + yamlMessage.slice(1).replace(/\.$/, '');
    return problem('config.syntax', `not valid YAML: ${detail}`, known?.[1] ?? 'fix the YAML at this position', at);
  },
  tooManyAliases(at: InputLocation, limit: number): InputProblem {
    return problem('config.too-many-aliases', `aliases expand to more than ${limit} copies`, 'write the repeated settings once under defaults instead of copying them with aliases', at);
  },
  keyNotText(at: InputLocation): InputProblem {
    return problem('config.key-type', 'a key here is not a plain name', 'write keys as plain names such as horizon', at);
  },
  duplicateKey(at: InputLocation, firstLine: number): InputProblem {
    return problem('config.duplicate-key', `key already given on line ${firstLine}`, 'keep one of the two', at);
  },
  unknownKey(at: InputLocation, key: string, suggestion: string | undefined, allowed: readonly string[]): InputProblem {
    const hint = suggestion !== undefined ? `did you mean ${quoted(suggestion)}?` : `the keys allowed here are ${allowed.join(', ')}`;
    return problem('config.unknown-key', `unknown key ${quoted(key)}`, hint, at);
  },
  /** `key` is the missing key's own name and `purpose` its description from the spec. */
  missing(at: InputLocation, key: string, purpose: string): InputProblem {
    return problem('config.missing', 'is required but missing', `add ${key}: (${purpose.replace(/\.$/, '')})`, at);
  },
  wrongType(at: InputLocation, expected: ExpectedValue, found: FoundValue): InputProblem {
    const what = found.kind === 'empty' ? 'has no value' : `expected ${describeExpected(expected)}, found ${describeFound(found)}`;
    return problem('config.wrong-type', what, wrongTypeHint(expected, found), at);
  },
  notFinite(at: InputLocation, value: number, expected: ExpectedValue): InputProblem {
    return problem('config.not-finite', `${value} is not a finite number`, `write ${describeExpected(expected)}`, at);
  },
  notWhole(at: InputLocation, value: number, expected: ExpectedValue): InputProblem {
    return problem('config.not-whole', `${value} is not a whole number`, `write ${describeExpected(expected)}`, at);
  },
  outOfRange(at: InputLocation, value: number, expected: ExpectedValue & { min: number; max: number }): InputProblem {
    const side = value < expected.min ? `below the smallest allowed, ${expected.min}` : `above the largest allowed, ${expected.max}`;
    return problem('config.out-of-range', `${value} is ${side}`, `write ${describeExpected(expected)}`, at);
  },
  badChoice(at: InputLocation, value: string, choices: readonly string[], suggestion: string | undefined): InputProblem {
    const hint = suggestion !== undefined ? `did you mean ${quoted(suggestion)}?` : `write one of ${choices.join(', ')}`;
    return problem('config.bad-choice', `${quoted(value)} is not one of ${choices.join(', ')}`, hint, at);
  },
  emptyText(at: InputLocation): InputProblem {
    return problem('config.empty-text', 'is empty text', 'write a value, or remove the key', at);
  },
  tooLong(at: InputLocation, length: number, max: number): InputProblem {
    return problem('config.too-long', `is ${length} characters long; at most ${max} are allowed`, 'shorten it', at);
  },
  controlCharacter(at: InputLocation, codePoint: number, position: number, lineBreaksAllowed: boolean): InputProblem {
    const code = codePointName(codePoint);
    const kind = codePoint === 0x0a ? 'a line break' : `the invisible control character ${code}`;
    const hint = lineBreaksAllowed ? 'remove it; only visible characters and line breaks are allowed' : 'remove it; write this value on one line with visible characters only';
    return problem('config.control-character', `holds ${kind} at character ${position}`, hint, at);
  },
  badSlug(at: InputLocation, value: string): InputProblem {
    return problem(
      'config.bad-slug',
      `${quoted(value)} is not an id of lowercase letters, digits and single hyphens`,
      'write an id such as water-demand-2026 (it becomes a folder name, so no spaces, capitals or other signs)',
      at,
    );
  },
  badDate(at: InputLocation, value: string): InputProblem {
    return problem('config.bad-date', `${quoted(value)} is not a date`, 'write the date as YYYY-MM-DD, e.g. 2026-10-05', at);
  },
  noSuchDay(at: InputLocation, value: string): InputProblem {
    return problem('config.bad-date', `${quoted(value)} is not a day of the calendar`, 'check the day and the month', at);
  },
  badPeriod(at: InputLocation, value: string): InputProblem {
    return problem('config.bad-period', `${quoted(value)} is not a period`, `write ${PERIOD_EXAMPLES}`, at);
  },
  tooFewItems(at: InputLocation, count: number, min: number): InputProblem {
    return problem('config.list-length', `has ${plural(count, 'item')}; at least ${min} ${min === 1 ? 'is' : 'are'} needed`, 'add items to the list', at);
  },
  tooManyItems(at: InputLocation, count: number, max: number): InputProblem {
    return problem('config.list-length', `has ${plural(count, 'item')}; at most ${max} are allowed`, 'shorten the list, or split the memo into several configs', at);
  },
  duplicateItem(at: InputLocation, value: string, firstField: string): InputProblem {
    return problem('config.duplicate-item', `${value} is already listed at ${firstField}`, 'list each value once', at);
  },
  duplicateSeriesId(at: InputLocation, id: string, firstField: string, firstLine: number): InputProblem {
    return problem('config.duplicate-id', `series id ${quoted(id)} is already used by ${firstField} (line ${firstLine})`, 'give every series its own id', at);
  },
  duplicateReviewer(at: InputLocation, name: string, firstLine: number): InputProblem {
    return problem('config.duplicate-reviewer', `reviewer ${quoted(name)} is already listed on line ${firstLine}`, 'list each reviewer once', at);
  },
  unknownReviewer(at: InputLocation, name: string, reviewers: readonly string[], suggestion: string | undefined): InputProblem {
    const listed = reviewers.length === 0 ? 'memo.reviewers lists nobody' : `the reviewers are ${reviewers.map(quoted).join(', ')}`;
    const hint = suggestion !== undefined ? `did you mean ${quoted(suggestion)}?` : 'add this person to memo.reviewers, or correct the name';
    return problem('config.unknown-reviewer', `${quoted(name)} signs off but is not a listed reviewer; ${listed}`, hint, at);
  },
  /** `key` holds `value`, which needs the `absent` keys beside it. */
  dependentMissing(at: InputLocation, key: string, value: string, absent: readonly string[]): InputProblem {
    return problem(
      'config.needs-key',
      `${key} is set to ${value}, which needs ${absent.join(' and ')} beside it`,
      `add ${absent.map((name) => `${name}:`).join(' and ')} beside ${key}:, or remove ${key}:`,
      at,
    );
  },
};

/** The check and init commands (src/cli/checkCommand.ts, src/cli/initCommand.ts). */
export const configCommandMessages = {
  noConfigs(): InputProblem {
    return problem('cli.missing-config', 'check needs at least one config file', 'give one or more, e.g. trendbrief check memo.yaml');
  },
  extraFolders(extra: readonly string[]): InputProblem {
    return problem('cli.extra-arguments', `unexpected argument${extra.length > 1 ? 's' : ''} ${extra.join(' ')}`, 'give one folder, e.g. trendbrief init forecasts');
  },
  fileExists(file: string): InputProblem {
    return problem('init.file-exists', 'already exists, and init never overwrites a file', 'choose another folder, or move this file away first', { file });
  },
  notAFolder(folder: string): InputProblem {
    return problem('init.not-a-folder', 'exists but is not a folder', 'give the path of a folder, or of one to create', { file: folder });
  },
  cannotWrite(file: string, reason: string): InputProblem {
    return problem('init.unwritable', `cannot be written (${reason})`, 'check that the folder exists and that you may write in it', { file });
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

// ---------------------------------------------------------------------------
// Run: messages about running memos (src/run/, src/cli/runCommand.ts).
// ---------------------------------------------------------------------------

const OUTPUT_FOLDER_HINT = 'choose a folder, or a path where one can be created';
const TEMPLATES_HINT = 'correct the path, or remove output.templates to use the built-in templates';

export const runMessages = {
  sameMemoFolder(at: InputLocation, earlierConfig: string): InputProblem {
    return problem('run.same-memo-folder', `writes the same memo folder as ${earlierConfig} earlier in this run`, 'give one of them another memo.id, as_of or output.folder', at);
  },
  noConfigs(): InputProblem {
    return problem('cli.missing-config', 'run needs at least one config file', 'give one or more, e.g. trendbrief run configs/demo.yaml');
  },
  badSourceDateEpoch(value: string): InputProblem {
    return problem('env.source-date-epoch', `SOURCE_DATE_EPOCH '${value}' is not a whole number of seconds`, 'set it to seconds since 1970-01-01 UTC, or unset it', {
      field: 'SOURCE_DATE_EPOCH',
    });
  },
  /** `at` is where the folder was chosen: the config's output.folder or the --out option; `kind` e.g. 'a regular file'. */
  outputNotAFolder(at: InputLocation, folder: string, kind: string): InputProblem {
    return problem('run.output-not-a-folder', `the output folder '${folder}' is ${kind}, not a folder`, OUTPUT_FOLDER_HINT, at);
  },
  outputUnderNonFolder(at: InputLocation, folder: string, blocker: string, kind: string): InputProblem {
    return problem('run.output-not-a-folder', `the output folder '${folder}' lies under '${blocker}', which is ${kind}, not a folder`, OUTPUT_FOLDER_HINT, at);
  },
  memoFolderTaken(at: InputLocation, folder: string, kind: string): InputProblem {
    return problem(
      'run.memo-folder-taken',
      `the memo's folder '${folder}' is ${kind}, and a run replaces only a folder`,
      'move it away, or choose another output folder or memo id',
      at,
    );
  },
  outputUnwritable(at: InputLocation, folder: string, reason: string): InputProblem {
    return problem('run.output-unwritable', `the memo cannot be written into '${folder}' (${reason})`, 'check that you may write there and that the disk has room; the earlier memo is kept', at);
  },
  templatesMissing(at: InputLocation, folder: string): InputProblem {
    return problem('run.templates-missing', `the templates folder '${folder}' does not exist`, TEMPLATES_HINT, at);
  },
  templatesNotAFolder(at: InputLocation, folder: string, kind: string): InputProblem {
    return problem('run.templates-missing', `the templates folder '${folder}' is ${kind}, not a folder`, TEMPLATES_HINT, at);
  },
};


// ---------------------------------------------------------------------------
// Monthly memos and verify: as-of folders (src/run/runMemo.ts) and `trendbrief verify`
// (src/run/verifyMemoFolder.ts, src/cli/verifyCommand.ts). Problems here exit with 2; the
// report wording (matches, differences) follows them.
// ---------------------------------------------------------------------------

const VERIFY_HELP = 'see trendbrief verify --help';

export const monthlyMessages = {
  asOfFoldersWouldBeReplaced(at: InputLocation, folder: string, labels: readonly string[]): InputProblem {
    return problem(
      'run.as-of-folders',
      `the memo's folder '${folder}' holds as-of memos (${abbreviateList(labels)}), which a run without an as-of period would replace`,
      'set memo.as_of to the period this memo speaks for, or write elsewhere with --out',
      at,
    );
  },
};

export const verifyMessages = {
  noFolderGiven(): InputProblem {
    return problem('verify.no-folder', 'verify needs the memo folder to check', 'give one, e.g. trendbrief verify out/lake-outlook/2026-01');
  },
  extraArguments(extra: readonly string[]): InputProblem {
    return problem('verify.extra-arguments', `unexpected argument${extra.length > 1 ? 's' : ''} ${extra.join(' ')}`, `give one memo folder; ${VERIFY_HELP}`);
  },
  noManifest(folder: string, asOfFolders: readonly string[]): InputProblem {
    const hint = asOfFolders.length > 0 ? `it holds as-of memos: give one of them, e.g. ${folder}/${asOfFolders[0]}` : 'give the folder a run wrote, the one with manifest.json in it';
    return problem('verify.no-manifest', `'${folder}' has no manifest.json`, hint, { file: folder });
  },
  badManifest(file: string, field: string, expected: string): InputProblem {
    return problem('verify.bad-manifest', `is not ${expected}`, 'the manifest is not as a run writes it; rerun the memo to write a new one', { file, field });
  },
  noInputLocation(file: string, field: string): InputProblem {
    return problem(
      'verify.no-input-location',
      'does not say where the input lies relative to the memo folder (from_output)',
      'the memo was written by an earlier version; rerun it with this version, then verify',
      { file, field },
    );
  },
  inputMissing(file: string, field: string, role: string, path: string, expected: string): InputProblem {
    return problem('verify.input-missing', `the ${role} ${path} is missing (expected SHA-256 ${expected})`, 'put the file back where the manifest says, or rerun the memo', { file, field });
  },
  inputChanged(file: string, field: string, role: string, path: string, expected: string, actual: string): InputProblem {
    return problem(
      'verify.input-changed',
      `the ${role} ${path} has changed: SHA-256 ${actual}, the manifest records ${expected}`,
      'restore the file as it was when the memo was run, or rerun the memo to issue a new one',
      { file, field },
    );
  },
  earlierRecordUnreadable(file: string, field: string, path: string): InputProblem {
    return problem('verify.earlier-record', `the earlier record ${path} is not a record document`, 'restore the previous as-of memo folder as it was issued', { file, field });
  },
};

/** The lines of the verify report on stdout; numbers appear as JSON writes them. */
export const verifyReport = {
  header: (folder: string, runDate: string, tool: string, command: string) => `verify ${folder}: run on ${runDate} with ${tool}: ${command}`,
  otherVersion: (recorded: string, current: string) =>
    `note: recorded with ${recorded}, verified with ${current}; wording or numbers of another version may differ`,
  inputs: (count: number) => `inputs: ${count} file${count === 1 ? '' : 's'} with the SHA-256 the manifest records`,
  outputs: (count: number, changed: number) => `outputs: ${count - changed} of ${count} with the SHA-256 the manifest records`,
  records: (series: number, numbers: number, tolerance: string) => `records: ${series} series recomputed; ${numbers} numbers compared within ${tolerance}`,
  noRecord: 'records: the run wrote no record.json (its formats left it out); the numbers are compared through forecasts.csv',
  bytes: (parts: readonly string[]) => `rerun bytes: ${parts.join(', ')}`,
  identical: (file: string) => `${file} identical`,
  differs: (file: string) => `${file} differs`,
  notRebuilt: (file: string) => `${file} not rebuilt (verify prints no PDF; its recorded hash is checked above)`,
  differencesHeading: (count: number) => `differences (${count}), stored vs recomputed:`,
  more: (count: number) => `  ... and ${count} more`,
  outputChanged: (file: string, expected: string, actual: string) => `${file}: SHA-256 ${actual}, the manifest records ${expected}`,
  outputMissing: (file: string) => `${file}: listed in the manifest but missing`,
  bytesDiffer: (file: string, line: number) => `${file}: the rerun differs from the stored file from line ${line}`,
  numberDiffers: (path: string, stored: string, rerun: string) => `${path}: ${stored} vs ${rerun}`,
  match: (folder: string) => `ok: ${folder} is what its inputs give`,
  mismatch: (folder: string, count: number) => `mismatch: ${folder} differs from what its inputs give in ${count} place${count === 1 ? '' : 's'}`,
};

// ---------------------------------------------------------------------------
// Memo templates: messages about a consultancy's own templates folder (src/memo/).
// ---------------------------------------------------------------------------

export const templateMessages = {
  badSyntax(file: string, line: number | undefined, detail: string): InputProblem {
    return problem('template.syntax', `not a valid template (${detail})`, 'fix the template, or remove it to use the built-in one', { file, line });
  },
};
