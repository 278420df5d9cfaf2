// An .xlsx workbook's sheet to a checked Series. The archive is unpacked once under a size cap
// (readZipEntries) before exceljs, loaded only here, parses it. The sheet's first non-empty row
// is the header; columns are chosen by their header text as in a CSV file. Cells keep their
// type: numbers are numbers, a date cell is a calendar day, a formula counts by its saved result.
import { createHash } from 'node:crypto';
import type { CellValue, Row, Worksheet } from 'exceljs';
import { closestName } from '../base/closestName.js';
import { InputError, MEBIBYTE, type InputLocation, type InputProblem } from '../base/problem.js';
import { cellField } from '../base/quotedCell.js';
import type { Series } from '../base/series.js';
import { assembleSeries, type SeriesRow } from './assembleSeries.js';
import { detectDecimalMark, type LocatedText } from './detectDialect.js';
import { dataMessages } from './messages.js';
import { formatIsoDate, utcCalendarDate } from './periodDates.js';
import { parseValue, type DecimalMark, type ParsedValue } from './parseValue.js';
import { selectColumns } from './selectColumns.js';
import type { SeriesOptions } from './seriesOptions.js';
import { readZipEntries } from './zipArchive.js';

/** Most bytes a workbook may unpack to: some 10 times what a 20 MB series file could need as CSV, far below a zip bomb's gigabytes. */
export const MAX_WORKBOOK_UNPACKED_BYTES = 200 * MEBIBYTE;

/** What a cell holds once a formula is replaced by its saved result. */
type Plain = Exclude<CellValue, { formula: string } | { sharedFormula: string }>;

function isObject(value: CellValue): value is Exclude<CellValue, null | undefined | number | string | boolean | Date> {
  return typeof value === 'object' && value !== null && !(value instanceof Date);
}

/** The saved result of a formula (the cell's value otherwise); `formula` set when a formula has none. */
function plainValue(value: CellValue): { value: Plain; formula?: string } {
  if (isObject(value) && ('formula' in value || 'sharedFormula' in value)) {
    const formula = 'sharedFormula' in value ? (value.formula ?? value.sharedFormula) : value.formula;
    // exceljs reads a formula cell without a cached value as `result: undefined`; a blank result
    // cannot be told from a formula never calculated, so both are refused.
    return value.result === undefined ? { value: null, formula } : { value: value.result };
  }
  return { value: value as Plain };
}

/** Text of a string-like cell (plain, rich or hyperlink text); undefined for other kinds. */
function textOf(value: Plain): string | undefined {
  if (typeof value === 'string') return value.trim();
  if (isObject(value)) {
    if ('richText' in value) return value.richText.map((part) => part.text).join('').trim();
    if ('hyperlink' in value) return String(value.text).trim();
  }
  return undefined;
}

function headerText(value: CellValue): string {
  const { value: plain } = plainValue(value);
  if (plain === null || plain === undefined) return '';
  if (plain instanceof Date) return formatIsoDate(utcCalendarDate(plain));
  if (typeof plain === 'number' || typeof plain === 'boolean') return String(plain);
  if (isObject(plain) && 'error' in plain) return plain.error;
  return textOf(plain) ?? '';
}

function periodCell(value: CellValue, at: InputLocation): SeriesRow['period'] {
  const { value: plain, formula } = plainValue(value);
  if (formula !== undefined) return { text: '', problem: dataMessages.formulaWithoutResult(at, formula) };
  if (plain === null || plain === undefined) return { text: '' };
  if (plain instanceof Date) {
    const date = utcCalendarDate(plain);
    return { text: formatIsoDate(date), date };
  }
  if (typeof plain === 'number' || typeof plain === 'boolean') return { text: String(plain) };
  if (isObject(plain) && 'error' in plain) return { text: plain.error, problem: dataMessages.errorCell(at, plain.error) };
  return { text: textOf(plain) ?? '' };
}

/** A value cell before the decimal mark is known: its number, or its text to be parsed. */
type RawValue = { text: string; parsed?: ParsedValue; problem?: InputProblem };

function rawValue(value: CellValue, at: InputLocation): RawValue {
  const { value: plain, formula } = plainValue(value);
  if (formula !== undefined) return { text: '', problem: dataMessages.formulaWithoutResult(at, formula) };
  if (plain === null || plain === undefined) return { text: '', parsed: { kind: 'empty' } };
  if (typeof plain === 'number') return { text: String(plain), parsed: Number.isFinite(plain) ? { kind: 'number', value: plain } : { kind: 'non-finite' } };
  if (plain instanceof Date) return { text: '', problem: dataMessages.dateValue(at, formatIsoDate(utcCalendarDate(plain))) };
  if (typeof plain === 'boolean') return { text: plain ? 'TRUE' : 'FALSE', parsed: { kind: 'invalid' } };
  if (isObject(plain) && 'error' in plain) {
    // #N/A is how a spreadsheet marks a value not available (common practice): a missing value.
    return plain.error === '#N/A' ? { text: plain.error, parsed: { kind: 'missing-marker' } } : { text: plain.error, problem: dataMessages.errorCell(at, plain.error) };
  }
  return { text: textOf(plain) ?? '' };
}

async function loadWorkbook(bytes: Buffer, file: string): Promise<Worksheet[]> {
  const zip = readZipEntries(bytes, MAX_WORKBOOK_UNPACKED_BYTES);
  if ('fault' in zip) {
    if (zip.fault === 'too-large') throw new InputError(dataMessages.workbookTooLarge(file, MAX_WORKBOOK_UNPACKED_BYTES));
    throw new InputError(dataMessages.notAWorkbook(file, zip.fault === 'encrypted' ? 'encrypted' : 'corrupt'));
  }
  const names = new Set(zip.entries.map((entry) => entry.name));
  if (names.has('xl/workbook.bin')) throw new InputError(dataMessages.notAWorkbook(file, 'xlsb'));
  if (!names.has('xl/workbook.xml')) throw new InputError(dataMessages.notAWorkbook(file, names.has('content.xml') && names.has('mimetype') ? 'ods' : 'zip'));
  const { default: ExcelJS } = await import('exceljs');
  const workbook = new ExcelJS.Workbook();
  try {
    // exceljs types its input as an ArrayBuffer (JSZip reads either).
    await workbook.xlsx.load(new Uint8Array(bytes).buffer);
  } catch {
    // Whatever exceljs cannot parse is a broken workbook, not a defect of ours.
    throw new InputError(dataMessages.notAWorkbook(file, 'corrupt'));
  }
  return workbook.worksheets;
}

function chooseSheet(sheets: readonly Worksheet[], file: string, wanted: string | undefined): Worksheet {
  if (sheets.length === 0) throw new InputError(dataMessages.noSheets(file));
  if (wanted === undefined) return sheets[0];
  const found = sheets.find((sheet) => sheet.name === wanted);
  if (found !== undefined) return found;
  const names = sheets.map((sheet) => sheet.name);
  throw new InputError(dataMessages.noSuchSheet(file, wanted, names, closestName(wanted, names)));
}

/** Reads, checks and returns the series on one sheet of a workbook's bytes; throws InputError listing every problem found. */
export async function readWorkbookSeries(bytes: Buffer, file: string, options: SeriesOptions): Promise<Series> {
  if (options.delimiter !== undefined && options.delimiter !== 'auto') throw new InputError(dataMessages.delimiterForWorkbook(file));
  const sheet = chooseSheet(await loadWorkbook(bytes, file), file, options.sheet);
  const rows: Row[] = [];
  sheet.eachRow({ includeEmpty: false }, (row) => {
    if (Array.isArray(row.values) && row.values.some((value) => headerText(value) !== '')) rows.push(row);
  });
  const [headerRow, ...dataRows] = rows;
  if (headerRow === undefined) throw new InputError(dataMessages.emptySheet(file, sheet.name));
  const cells = Array.from({ length: headerRow.cellCount }, (_, i) => headerText(headerRow.getCell(i + 1).value));
  const choice = selectColumns({ line: headerRow.number, cells }, file, options, sheet.name);
  if (dataRows.length === 0) throw new InputError(dataMessages.noData({ file, line: headerRow.number, sheet: sheet.name }));

  const periodColumnAt = { file, sheet: sheet.name, column: choice.periodPosition + 1, field: cellField(choice.periodColumn) };
  const valueColumnAt = { file, sheet: sheet.name, column: choice.valuePosition + 1, field: cellField(choice.column) };
  const raw = dataRows.map((row) => {
    const valueAt = { ...valueColumnAt, line: row.number };
    return { row, valueAt, value: rawValue(row.getCell(choice.valuePosition + 1).value, valueAt) };
  });
  const texts: LocatedText[] = raw.filter((entry) => entry.value.parsed === undefined && entry.value.problem === undefined).map((entry) => ({ text: entry.value.text, at: entry.valueAt }));
  const decimalMark: DecimalMark = detectDecimalMark(texts, undefined, options.decimalMark);
  const seriesRows = raw.map(({ row, valueAt, value }): SeriesRow => {
    const periodAt = { ...periodColumnAt, line: row.number };
    return {
      line: row.number,
      period: periodCell(row.getCell(choice.periodPosition + 1).value, periodAt),
      periodAt,
      value: { text: value.text, parsed: value.parsed ?? parseValue(value.text, decimalMark), problem: value.problem },
      valueAt,
    };
  });
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  return assembleSeries(seriesRows, { file, periodColumn: choice.periodColumn, column: choice.column, periodColumnAt, valueColumnAt, decimalMark, rowProblems: [], sha256 }, options);
}
