// The delimiter and the decimal mark of a series file, as set for the series or read from the
// file itself. Detection never guesses between two readings that both fit: it refuses and names
// the setting that decides, since a misread decimal mark changes every value silently.
import { InputError, type InputLocation } from '../base/problem.js';
import { parsePeriod } from '../base/period.js';
import { dataMessages } from './messages.js';
import { parseIsoDate } from './periodDates.js';
import { isDecimal, type DecimalMark } from './parseValue.js';

export type DelimiterSetting = 'auto' | 'comma' | 'semicolon' | 'tab';
export type DecimalMarkSetting = 'auto' | DecimalMark;
export type Delimiter = Exclude<DelimiterSetting, 'auto'>;

export const DELIMITER_CHARACTER: Readonly<Record<Delimiter, string>> = { comma: ',', semicolon: ';', tab: '\t' };

/** Lines looked at to detect the delimiter: the header and the first data lines. */
const SAMPLE_LINES = 10;

/** Occurrences of `character` outside double-quoted parts of one line. */
function countOutsideQuotes(line: string, character: string): number {
  let count = 0;
  let quoted = false;
  for (const char of line) {
    if (char === '"') quoted = !quoted;
    else if (char === character && !quoted) count++;
  }
  return count;
}

function firstCell(line: string, character: string): string {
  return (line.split(character)[0] ?? '').trim().replace(/^"(.*)"$/, '$1');
}

/**
 * The delimiter: the one set, else the one of comma, semicolon and tab that the header line
 * holds; when it holds several, the one that splits each sampled line into as many cells as the
 * header (a tab before the others), and then the one whose first data cell reads as a period.
 * A header with none of them is one column, read with commas (the caller reports it).
 */
export function detectDelimiter(text: string, file: string, setting: DelimiterSetting = 'auto'): Delimiter {
  if (setting !== 'auto') return setting;
  const lines: { line: number; text: string }[] = [];
  const all = text.split('\n');
  for (let i = 0; i < all.length && lines.length < SAMPLE_LINES; i++) if (all[i].trim() !== '') lines.push({ line: i + 1, text: all[i] });
  const [header, ...data] = lines;
  if (header === undefined) return 'comma';
  const present = (Object.keys(DELIMITER_CHARACTER) as Delimiter[]).filter((name) => countOutsideQuotes(header.text, DELIMITER_CHARACTER[name]) > 0);
  if (present.length <= 1) return present[0] ?? 'comma';
  const consistent = present.filter((name) => {
    const character = DELIMITER_CHARACTER[name];
    const width = countOutsideQuotes(header.text, character);
    return data.every((row) => countOutsideQuotes(row.text, character) === width);
  });
  if (consistent.includes('tab')) return 'tab';
  if (consistent.length === 1) return consistent[0];
  const dated = consistent.filter((name) => {
    const cell = data[0] === undefined ? '' : firstCell(data[0].text, DELIMITER_CHARACTER[name]);
    return parsePeriod(cell) !== null || parseIsoDate(cell) !== null;
  });
  if (dated.length === 1) return dated[0];
  const candidates = consistent.length > 0 ? consistent : present;
  throw new InputError(dataMessages.delimiterAmbiguous({ file, line: header.line }, candidates));
}

export interface LocatedText {
  text: string;
  at: InputLocation;
}

/** Thousands grouped once with this mark and nothing else: 1.234 or 12,345 (a point or a comma, three digits after it). */
const ONE_GROUP = { point: /^[+-]?[1-9]\d{0,2}\.\d{3}$/, comma: /^[+-]?[1-9]\d{0,2},\d{3}$/ } as const;

/**
 * The decimal mark: the one set, else read from the value cells (text cells; a workbook's number
 * cells need none). Cells written with a point only mean a point, with a comma only a comma.
 * Refused as ambiguous, at the first cell that could be read either way: both kinds of cells in
 * one column; commas in a comma-delimited file (the usual reason to quote "1,234" there is a
 * thousands separator); and, when every marked cell is one group of three digits (1.234, 12,345),
 * a point in a file not delimited by commas or a comma anywhere, since those are how thousands
 * separators look in the other convention.
 */
export function detectDecimalMark(cells: readonly LocatedText[], delimiter: Delimiter | undefined, setting: DecimalMarkSetting = 'auto'): DecimalMark {
  if (setting !== 'auto') return setting;
  const marked = (mark: DecimalMark, character: string) => cells.filter((cell) => cell.text.includes(character) && isDecimal(cell.text, mark));
  const points = marked('point', '.');
  const commas = marked('comma', ',');
  const refuse = (cell: LocatedText, reason: 'both' | 'comma-delimited' | 'grouped'): never => {
    throw new InputError(dataMessages.decimalMarkAmbiguous(cell.at, cell.text, reason));
  };
  if (points.length > 0 && commas.length > 0) {
    const second = points[0].at.line !== undefined && commas[0].at.line !== undefined && points[0].at.line > commas[0].at.line ? points[0] : commas[0];
    return refuse(second, 'both');
  }
  if (commas.length > 0) {
    if (delimiter === 'comma') return refuse(commas[0], 'comma-delimited');
    if (commas.every((cell) => ONE_GROUP.comma.test(cell.text))) return refuse(commas[0], 'grouped');
    return 'comma';
  }
  if (points.length > 0 && delimiter !== 'comma' && points.every((cell) => ONE_GROUP.point.test(cell.text))) return refuse(points[0], 'grouped');
  return 'point';
}
