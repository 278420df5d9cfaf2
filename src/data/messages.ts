// What the data stage says about series files: CSV structure, periods, values, and the series
// as a whole. Each function returns a complete problem, so code, wording and hint stay together.
import { abbreviateList, codePointName, MEBIBYTE, plural, problem, roughly, type InputLocation, type InputProblem } from '../base/problem.js';
import { cellField, quotedCell } from '../base/quotedCell.js';

const PERIOD_FORMS = 'write periods as 2003 (annual), 2003-Q1 (quarterly) or 2003-01 (monthly), or as dates such as 2003-01-31';
/** How a series' reading settings are named, in the config and for fit. */
const SETTING_NAMES = {
  delimiter: { key: 'delimiter', option: '--delimiter' },
  decimal_mark: { key: 'decimal_mark', option: '--decimal-mark' },
  sheet: { key: 'sheet', option: '--sheet' },
  frequency: { key: 'frequency', option: '--frequency' },
  period_column: { key: 'period_column', option: '--period-column' },
} as const;
/** `delimiter: semicolon in the config (--delimiter semicolon for fit)`, or without a value `delimiter in the config (--delimiter for fit)`. */
function setting(name: keyof typeof SETTING_NAMES, value?: string): string {
  const { key, option } = SETTING_NAMES[name];
  return value === undefined ? `${key} in the config (${option} for fit)` : `${key}: ${value} in the config (${option} ${value} for fit)`;
}
const DELIMITER_NAMES: Readonly<Record<string, string>> = { comma: 'commas', semicolon: 'semicolons', tab: 'tabs' };
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
    return problem('csv.no-data', `has a header but no data ${rows(at)}`, `add one ${row(at)} per period below the header`, at);
  },
  headerLooksLikeData(at: InputLocation, cell: string): InputProblem {
    return problem(
      'csv.no-header',
      `the first ${row(at)} holds ${quotedCell(cell)}, which is data, not a column name`,
      at.sheet === undefined ? 'add a header line naming the columns, such as period,value' : 'add a header row naming the columns, such as period and value',
      at,
    );
  },
  oneColumn(at: InputLocation, name: string): InputProblem {
    const other = name.includes(';') ? 'semicolon' : name.includes('\t') ? 'tab' : name.includes(',') ? 'comma' : undefined;
    const hint =
      other === undefined ? `add a value column: each ${row(at)} needs a period and a value` : `the header seems to separate cells with ${DELIMITER_NAMES[other]}: set ${setting('delimiter', other)}`;
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
    return problem('csv.unnamed-column', `column ${position} has no name in the header`, `give every column a name in the header ${row(at)}`, {
      ...at,
      column: position,
    });
  },
  columnNameCharacter(at: InputLocation, position: number, codePoint: number, characterPosition: number): InputProblem {
    return problem(
      'csv.bad-column-name',
      `the name of column ${position} holds the invisible control character ${codePointName(codePoint)} at character ${characterPosition}`,
      `remove it from the header ${row(at)}: column names are printed in the memo`,
      { ...at, column: position },
    );
  },
  columnNameTooLong(at: InputLocation, position: number, length: number, max: number): InputProblem {
    return problem('csv.bad-column-name', `the name of column ${position} is ${length} characters long; at most ${max} are allowed`, `shorten it in the header ${row(at)}`, {
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
  rowWidth(at: InputLocation, cells: number, expected: number, delimiter = 'comma'): InputProblem {
    const hint = cells > expected ? `quote cells that contain ${DELIMITER_NAMES[delimiter] ?? 'the delimiter'}, or remove the extra cells` : 'fill in the missing cells';
    return problem('csv.row-width', `has ${plural(cells, 'cell')} but the header has ${expected}`, hint, at);
  },
  sheetForText(file: string, sheet: string): InputProblem {
    return problem('csv.sheet-for-text', `sheet ${quotedCell(sheet)} is asked for, but the file is text (CSV), which has no sheets`, `remove ${setting('sheet')}, or name the workbook (.xlsx) that holds it`, { file });
  },
  notAWorkbook(file: string, kind: 'xls' | 'ods' | 'xlsb' | 'zip' | 'corrupt' | 'encrypted' | 'not-zip', detail?: string): InputProblem {
    const what = {
      xls: 'is an Excel 97-2003 workbook (.xls) or a password-protected one, which is not read',
      ods: 'is an OpenDocument spreadsheet (.ods), which is not read',
      xlsb: 'is a binary workbook (.xlsb), which is not read',
      zip: 'is a ZIP archive but not an .xlsx workbook',
      corrupt: `is not a valid .xlsx workbook${detail === undefined ? '' : ` (${detail})`}`,
      encrypted: 'is an encrypted archive, which is not read',
      'not-zip': 'has a workbook name but is not a workbook (an .xlsx file is a ZIP archive)',
    }[kind];
    return problem('workbook.unreadable', what, 'save the sheet as an .xlsx workbook (Excel 2007 or later) without a password, or as CSV', { file });
  },
  workbookTooLarge(file: string, limitBytes: number): InputProblem {
    return problem('workbook.too-large', `unpacks to more than ${limitBytes / MEBIBYTE} MB, above the limit for a series workbook`, 'copy the series to a workbook of its own, or save it as CSV', { file });
  },
  noSuchSheet(file: string, sheet: string, sheets: readonly string[], suggestion: string | undefined): InputProblem {
    const hint = suggestion === undefined ? `name one of the sheets with ${setting('sheet')}` : `did you mean ${quotedCell(suggestion)}?`;
    return problem('workbook.no-such-sheet', `has no sheet ${quotedCell(sheet)}; its sheets are ${abbreviateList(sheets.map(quotedCell))}`, hint, { file });
  },
  noSheets(file: string): InputProblem {
    return problem('workbook.no-sheets', 'has no sheets', 'save a workbook with the series on its first sheet', { file });
  },
  emptySheet(file: string, sheet: string): InputProblem {
    return problem('workbook.empty-sheet', 'the sheet is empty', 'put a header row (period, value) in row 1 and one row per period below it, or name another sheet', { file, sheet });
  },
  formulaWithoutResult(at: InputLocation, formula: string): InputProblem {
    return problem(
      'workbook.formula-without-result',
      `the cell holds the formula ${quotedCell(`=${formula}`)} with no saved result`,
      'open the workbook in a spreadsheet program and save it again, so every formula keeps its result; or paste the values',
      at,
    );
  },
  errorCell(at: InputLocation, error: string): InputProblem {
    return problem('workbook.error-cell', `the cell shows the error ${error}`, 'correct the formula or the cell it refers to', at);
  },
  dateValue(at: InputLocation, date: string): InputProblem {
    return problem('csv.bad-value', `the cell holds the date ${date}, not a number`, 'check that the value column is chosen (column in the config, --column for fit)', at);
  },
  workbookForText(file: string): InputProblem {
    return problem('workbook.not-text', 'is a workbook (a ZIP archive), not CSV text', 'read it with readSeriesFile, which reads .xlsx workbooks too', { file });
  },
  delimiterForWorkbook(file: string): InputProblem {
    return problem('workbook.delimiter', 'a delimiter is set, but the file is a workbook, whose cells need none', `remove ${setting('delimiter')}`, { file });
  },
  emptyPeriod(at: InputLocation): InputProblem {
    return problem('csv.empty-period', 'the period cell is empty', `${PERIOD_FORMS}, or delete the ${row(at)}`, at);
  },
  badPeriod(at: InputLocation, label: string): InputProblem {
    return problem('csv.bad-period', `${quotedCell(label)} is not a period`, PERIOD_FORMS, at);
  },
  /** The period column's labels are unreadable throughout: one problem at the first bad cell stands for them all. */
  unreadablePeriods(at: InputLocation, label: string, others: number, total: number): InputProblem {
    const rest = others === 0 ? '' : `, nor ${others === total - 1 ? (others === 1 ? 'is the other label' : `are the other ${others} labels`) : `are ${others} of the other ${total - 1} labels`} in this column`;
    return problem(
      'csv.unreadable-periods',
      `${quotedCell(label)} is not a period${rest}`,
      `${PERIOD_FORMS}; if the periods are in another column, name it with ${setting('period_column')}`,
      at,
    );
  },
  /** A label of the other form than the column's first: a date among period labels, or a label among dates. */
  mixedPeriodForm(at: InputLocation, label: string, first: { label: string; line: number }, isDate: boolean): InputProblem {
    const [these, those] = isDate ? ['a date', 'a period label'] : ['a period label', 'a date'];
    return problem(
      'csv.mixed-period-form',
      `${quotedCell(label)} is ${these}, but the first period ${quotedCell(first.label)} (${row(at)} ${first.line}) is ${those}`,
      'write every period of the column in one form: all as period labels (2003-01) or all as dates (2003-01-31)',
      at,
    );
  },
  noSuchDay(at: InputLocation, label: string): InputProblem {
    return problem('csv.bad-date', `${quotedCell(label)} is not a day of the calendar`, 'correct the date (YYYY-MM-DD, a day that exists in that month)', at);
  },
  /** Dates whose spacing is not a month, a quarter or a year, with no frequency set. */
  dateSpacing(at: InputLocation, months: number | undefined): InputProblem {
    const what =
      months === undefined ? 'a single date does not show the frequency of the series'
      : months === 0 ? 'most consecutive dates fall in the same month: daily or weekly data are not read'
      : `most consecutive dates are ${plural(months, 'month')} apart, which is not monthly (1), quarterly (3) or annual (12)`;
    const hint = months === 0 ? 'add the days up (or average them) to one value per month, quarter or year' : `set ${setting('frequency')}`;
    return problem('csv.date-spacing', what, hint, at);
  },
  /** Dates closer together than the frequency set: every later date of a period would be a duplicate. `spacing`: the dates' own frequency, if they have one. */
  datesFiner(at: InputLocation, first: string, second: string, spacing: string | undefined, given: string): InputProblem {
    const period = given === 'annual' ? 'year' : given === 'quarterly' ? 'quarter' : 'month';
    const apart = spacing === undefined ? `closer together than a ${period}` : spacing;
    const hint = `${spacing === undefined ? '' : `set ${setting('frequency', spacing)}, or `}add the values up (or average them) to one per ${period}`;
    return problem('csv.dates-finer', `dates ${first} and ${second} fall in one ${period}: the dates are ${apart}, but the frequency is set to ${given}`, hint, at);
  },
  dateInSamePeriod(at: InputLocation, label: string, period: string, first: { label: string; line: number }): InputProblem {
    return problem('csv.duplicate-period', `date ${label} falls in ${period}, as does ${first.label} on ${row(at)} ${first.line}`, `keep one ${row(at)} per period`, at);
  },
  delimiterAmbiguous(at: InputLocation, candidates: readonly string[]): InputProblem {
    const names = candidates.map((name) => DELIMITER_NAMES[name] ?? name);
    return problem(
      'csv.delimiter-ambiguous',
      `the header line holds ${names.join(' and ')}, and the file could be read with either as the delimiter`,
      `set ${setting('delimiter')} to ${candidates.join(' or ')}`,
      at,
    );
  },
  decimalMarkAmbiguous(at: InputLocation, text: string, reason: 'both' | 'comma-delimited' | 'grouped'): InputProblem {
    const why =
      reason === 'both' ? 'some values use a point and others a comma as the decimal mark'
      : reason === 'comma-delimited' ? 'in a file delimited by commas a comma in a number may be a decimal mark or a thousands separator'
      : `every marked value has three digits after its ${text.includes(',') ? 'comma' : 'point'}, which is how a thousands separator looks too`;
    const hint = `set ${setting('decimal_mark')} to point or comma; thousands separators are never read`;
    return problem('csv.decimal-mark-ambiguous', `${quotedCell(text)} could be read two ways: ${why}`, hint, at);
  },
  otherMark(at: InputLocation, text: string, mark: 'point' | 'comma'): InputProblem {
    const other = mark === 'point' ? 'comma' : 'point';
    return problem(
      'csv.bad-value',
      `${quotedCell(text)} is written with a ${other} as its decimal mark, but the decimal mark is a ${mark}`,
      `write it with a ${mark}, or set ${setting('decimal_mark', other)} if every value uses a ${other}`,
      at,
    );
  },
  groupedDigits(at: InputLocation, text: string): InputProblem {
    return problem('csv.bad-value', `${quotedCell(text)} groups its digits with a thousands separator, which is not read`, 'save the values without thousands separators, e.g. 1234.5 or 1234,5', at);
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
    return problem('csv.bad-value', `${quotedCell(text)} is not a number`, 'write a plain number such as 1234.5, without units, symbols or thousands separators', at);
  },
  frequencyMismatch(at: InputLocation, label: string, found: string, expected: string, lines: readonly number[]): InputProblem {
    return problem(
      'csv.frequency-mismatch',
      `period ${quotedCell(label)} is ${found}, but the frequency is set to ${expected}${disagreeing(at, lines)}`,
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
      `period ${quotedCell(label)} is ${found}, but the first period ${quotedCell(first.label)} (${row(at)} ${first.line}) is ${first.frequency}${disagreeing(at, lines)}`,
      'write every period with the same frequency: one file holds one series',
      at,
    );
  },
  duplicatePeriod(at: InputLocation, label: string, firstLine: number): InputProblem {
    return problem('csv.duplicate-period', `period ${label} already appears on ${row(at)} ${firstLine}`, `keep one ${row(at)} per period`, at);
  },
  unsorted(at: InputLocation, label: string, previous: { label: string; line: number }): InputProblem {
    return problem(
      'csv.unsorted',
      `period ${label} comes after ${previous.label} (${row(at)} ${previous.line})`,
      `sort the ${rows(at)} by period, oldest first`,
      at,
    );
  },
  descending(at: InputLocation, first: string, last: string): InputProblem {
    return problem('csv.descending', `periods run backwards, from ${first} down to ${last}`, `sort the ${rows(at)} by period, oldest first`, at);
  },
  gap(at: InputLocation, missing: readonly string[], next: string): InputProblem {
    return problem(
      'csv.gap',
      `missing ${abbreviateList(missing)} before ${next}`,
      `add a ${row(at)} for each missing period, or allow gaps (missing: allow in the config, --allow-missing for fit)`,
      at,
    );
  },
  missingEnd(at: InputLocation, which: 'first' | 'last', label: string): InputProblem {
    return problem('series.missing-end', `the ${which} period, ${label}, has no value`, `start and end the ${at.sheet === undefined ? 'file' : 'sheet'} with observed values (remove the ${which} ${row(at)})`, at);
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

function disagreeing(at: InputLocation, lines: readonly number[]): string {
  return lines.length > 1 ? `; ${lines.length} ${rows(at)} disagree: ${abbreviateList(lines.map(String))}` : '';
}

/** A place in a workbook is a row of its sheet; in a CSV file, a line. */
function row(at: InputLocation): 'row' | 'line' {
  return at.sheet === undefined ? 'line' : 'row';
}

function rows(at: InputLocation): 'rows' | 'lines' {
  return at.sheet === undefined ? 'lines' : 'rows';
}
