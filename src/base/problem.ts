// The one error type for everything the user got wrong (config, CSV, options), its one-line
// form and the quoting that keeps the user's own text from acting on the terminal:
//   file:line:column: field: what is wrong; what to do
// Each stage words its own problems beside its code (data/messages.ts, config/messages.ts, ...)
// with `problem()`; internal failures are ordinary Errors and map to exit code 1.

/** Where in the user's input a problem sits; every part is optional. */
export interface InputLocation {
  file?: string;
  line?: number;
  column?: number;
  field?: string;
  /** The sheet of a workbook; with a line and a column the place also reads as a cell reference (`Sheet1!B7`). */
  sheet?: string;
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
  if (problem.sheet !== undefined) parts.push(sheetPlace(problem.sheet, problem.line, problem.column));
  if (problem.field !== undefined) parts.push(problem.field);
  parts.push(`${problem.message}; ${problem.hint}`);
  return visible(parts.join(': '));
}

/** `Sheet1!B7` as spreadsheets write a cell (a sheet name other than letters, digits and `_` in single quotes), or the sheet alone. */
export function sheetPlace(sheet: string, row?: number, column?: number): string {
  const name = /^[A-Za-z_][A-Za-z0-9_]*$/.test(sheet) ? sheet : `'${sheet.replace(/'/g, "''")}'`;
  return row === undefined || column === undefined ? `sheet ${name}` : `${name}!${columnLetters(column)}${row}`;
}

/** Column 1 → A, 27 → AA (the spreadsheet's bijective base-26 column names). */
export function columnLetters(column: number): string {
  let letters = '';
  for (let n = column; n > 0; n = Math.floor((n - 1) / 26)) letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  return letters;
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
export function codePointName(codePoint: number): string {
  return `U+${codePoint.toString(16).toUpperCase().padStart(4, '0')}`;
}

/** Builds a problem; the one constructor every stage's messages use. */
export function problem(code: string, message: string, hint: string, at: InputLocation = {}): InputProblem {
  return { code, message, hint, ...at };
}

/** Joins items with commas; a long list keeps its first few items and its last: `a, b, c, d, e, ..., z (26 in all)`. */
export function abbreviateList(items: readonly string[], keep = 6): string {
  if (items.length <= keep) return items.join(', ');
  return `${items.slice(0, keep - 1).join(', ')}, ..., ${items[items.length - 1]} (${items.length} in all)`;
}

/** Longest piece of the user's text quoted in a message, in code points; a 20 MB cell is not echoed whole. */
const QUOTE_LIMIT = 80;

export function quoted(text: string): string {
  const characters = [...text];
  if (characters.length <= QUOTE_LIMIT) return `'${text}'`;
  return `'${characters.slice(0, QUOTE_LIMIT - 3).join('')}...' (${characters.length} characters)`;
}

export const MEBIBYTE = 1024 * 1024;

/** Three significant digits, for sizes far out of range where the exact digits do not matter. */
export function roughly(value: number): string {
  return String(Number(value.toPrecision(3)));
}

export function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}
