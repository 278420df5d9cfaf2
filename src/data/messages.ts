// What the data stage says about series files: CSV structure, periods, values, and the series
// as a whole. Each function returns a complete problem, so code, wording and hint stay together.
import { abbreviateList, codePointName, MEBIBYTE, plural, problem, roughly, type InputLocation, type InputProblem } from '../base/problem.js';
import { cellField, quotedCell } from '../base/quotedCell.js';

const PERIOD_FORMS = 'write periods as 2003 (annual), 2003-Q1 (quarterly) or 2003-01 (monthly)';
const MISSING_HINT = 'fill in the observed value, or allow missing values (missing: allow in the config, --allow-missing for fit)';

const CSV_SYNTAX_DETAILS: Readonly<Record<string, string>> = {
  CSV_QUOTE_NOT_CLOSED: 'a quoted cell is never closed',
  CSV_INVALID_CLOSING_QUOTE: 'text follows the closing quote of a cell',
  INVALID_OPENING_QUOTE: 'a quote appears in the middle of an unquoted cell',
  CSV_NON_TRIMABLE_CHAR_AFTER_CLOSING_QUOTE: 'text follows the closing quote of a cell',
  CSV_MAX_RECORD_SIZE: 'a line is too long to be a row of this file',
};

export const dataMessages = {
  fileMissing(file: string): InputProblem {
    return problem('csv.file-missing', 'was not found', 'check the path and its spelling', { file });
  },
  badLink(file: string, kind: 'dangling' | 'loop'): InputProblem {
    const what = kind === 'dangling' ? 'is a symbolic link to a file that does not exist' : 'is a symbolic link that leads back to itself';
    return problem('csv.bad-link', what, 'point the link at the .csv file, or name the file itself', { file });
  },
  nameTooLong(file: string): InputProblem {
    return problem('csv.name-too-long', 'is a path too long for the file system', 'move the file to a shorter path', { file });
  },
  webAddress(file: string): InputProblem {
    return problem('csv.web-address', 'is a web address; only files on this computer are read', 'download the file and name the local copy', { file });
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
  notUtf8(file: string, at: { line: number; column: number }): InputProblem {
    return problem('csv.not-utf8', 'is not UTF-8 text from here on', 'save the file with UTF-8 encoding', { file, ...at });
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
      `the first line holds ${quotedCell(cell)}, which is data, not a column name`,
      'add a header line naming the columns, such as period,value',
      at,
    );
  },
  oneColumn(at: InputLocation, name: string): InputProblem {
    const hint = /[;\t]/.test(name)
      ? 'separate cells with commas (this file seems to use semicolons or tabs)'
      : 'add a value column: each line needs a period and a value';
    return problem('csv.one-column', `has a single column ${quotedCell(name)}`, hint, at);
  },
  unknownColumn(at: InputLocation, name: string, columns: readonly string[], suggestion: string | undefined): InputProblem {
    const hint = suggestion === undefined ? 'use one of the column names above' : `did you mean ${quotedCell(suggestion)}?`;
    return problem('csv.unknown-column', `no column with this name; the columns are ${abbreviateList(columns.map(quotedCell))}`, hint, {
      ...at,
      field: cellField(name),
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
      field: cellField(name),
    });
  },
  sameColumn(at: InputLocation, name: string): InputProblem {
    return problem('csv.same-column', 'chosen as both the period column and the value column', 'pick two different columns', {
      ...at,
      field: cellField(name),
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
    return problem('csv.bad-period', `${quotedCell(label)} is not a period`, hint, at);
  },
  emptyValue(at: InputLocation): InputProblem {
    return problem('csv.missing-value', 'the value cell is empty', MISSING_HINT, at);
  },
  missingMarker(at: InputLocation, text: string): InputProblem {
    return problem('csv.missing-value', `${quotedCell(text)} marks a missing value`, MISSING_HINT, at);
  },
  nonFinite(at: InputLocation, text: string): InputProblem {
    return problem('csv.non-finite', `${quotedCell(text)} is not a finite number`, 'replace it with the observed value', at);
  },
  badValue(at: InputLocation, text: string): InputProblem {
    const hint = text.includes(',')
      ? 'write decimals with a point and no thousands separators, e.g. 1234.5'
      : 'write a plain number such as 1234.5, without units or symbols';
    return problem('csv.bad-value', `${quotedCell(text)} is not a number`, hint, at);
  },
  frequencyMismatch(at: InputLocation, label: string, found: string, expected: string, lines: readonly number[]): InputProblem {
    return problem(
      'csv.frequency-mismatch',
      `period ${quotedCell(label)} is ${found}, but the frequency is set to ${expected}${disagreeing(lines)}`,
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
      `period ${quotedCell(label)} is ${found}, but the first period ${quotedCell(first.label)} (line ${first.line}) is ${first.frequency}${disagreeing(lines)}`,
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
  /** `scale`: the transform's name when the values were transformed first, else null. */
  exactLine(at: InputLocation, count: number, scale: string | null): InputProblem {
    return problem(
      'series.exact-line',
      `all ${count} values lie exactly on a straight line${scale === null ? '' : ` after the ${scale} transform`}`,
      'a series without random variation has no error for the models to measure, so no interval could mean anything; check that the column holds observed values, not a plan, a target path or an interpolation',
      at,
    );
  },
  exactPattern(at: InputLocation, count: number, period: number, scale: string | null): InputProblem {
    return problem(
      'series.exact-pattern',
      `all ${count} values are exactly a straight line plus a pattern that repeats every ${period} periods${scale === null ? '' : ` after the ${scale} transform`}`,
      'a series without random variation has no error for the models to measure, so no interval could mean anything; check that the column holds observed values, not a plan, a budget profile or an interpolation',
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
  /**
   * A series file that cannot be read at all (missing, not a regular file, too large), told at
   * the config's `file:` entry that names it, with the path as written there.
   */
  atFileEntry(about: InputProblem, written: string, entry: { file: string; line: number; column: number; field: string }): InputProblem {
    return { ...about, ...entry, message: `${quotedCell(written)} ${about.message}` };
  },
  /** A problem with a series file as a whole, told with the config entry that names the file. */
  namedBy(about: InputProblem, entry: { file: string; line: number; column: number; field: string }): InputProblem {
    return { ...about, hint: `${about.hint} (the file of ${entry.field}, ${entry.file}:${entry.line}:${entry.column})` };
  },
};

function disagreeing(lines: readonly number[]): string {
  return lines.length > 1 ? `; ${lines.length} lines disagree: ${abbreviateList(lines.map(String))}` : '';
}
