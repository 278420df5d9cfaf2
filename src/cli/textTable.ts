// Plain-text tables and numbers for the terminal summary of `fit`. Numbers use the memo's
// rules (src/memo/format/formatNumber.ts: fixed decimals, thousands grouped) with an ASCII
// minus, so a figure copied from a terminal pastes into a spreadsheet as a number. Columns of
// numbers are right-aligned, or aligned on the decimal point where one column mixes scales
// (coefficients). Headings can span columns (a model's group). No colour: the summary is
// the same on a terminal and in a file.
import { formatNumber, formatPCell, withoutTrailingZeros } from '../memo/format/formatNumber.js';

/** Widest line the summary aims for; tables wider than this are laid out another way. */
export const TARGET_WIDTH = 100;

const GAP = '  ';
export const NO_VALUE = '\u2014';

/** How a column's cells are placed: text to the left, numbers to the right, or on the decimal point. */
export type Align = 'left' | 'right' | 'point';

export interface Column {
  head: string;
  align: Align;
  /** The heading of the group of columns above this one; consecutive columns with the same group share it. */
  group?: string;
}

/** `decimals` fixed, grouped by thousands, ASCII minus; the dash for a number that does not exist. */
export function fixed(value: number | null | undefined, decimals: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NO_VALUE;
  return formatNumber(value, decimals).replace('\u2212', '-');
}

/**
 * `digits` significant digits without trailing zeros (a coefficient, a statistic): 0.021109 →
 * "0.02111", 580.08 → "580.1"; outside 1e-4 to 1e7 as "2.11e-5".
 */
export function significant(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NO_VALUE;
  if (value === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  if (magnitude < -4 || magnitude >= 7) {
    const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
    return `${withoutTrailingZeros(mantissa)}e${Number(exponent)}`;
  }
  return withoutTrailingZeros(fixed(value, Math.max(0, digits - 1 - magnitude)));
}

/** A fraction as a whole percentage: 0.8 → "80%". */
export function percent(fraction: number | null | undefined): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return NO_VALUE;
  return `${fixed(fraction * 100, 0)}%`;
}

/** A p-value cell: "0.042", "< 0.001", "< 0.01" or "> 0.10" at a lookup table's edge. */
export function pCell(value: number | null | undefined, bound?: 'below' | 'above'): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NO_VALUE;
  return formatPCell(value, bound);
}

/** A level as written in a heading: 80 → "80%", 97.5 → "97.5%". */
export function levelText(level: number): string {
  return `${level}%`;
}

/** Each column's width: its widest cell or head, at least `least[c]`; a group wider than its columns widens the last one. */
export function columnWidths(columns: readonly Column[], rows: readonly (readonly string[])[], least: readonly number[] = []): number[] {
  const widths = columns.map((column, c) => Math.max(least[c] ?? 0, column.head.length, ...rows.map((row) => cellWidth(column, rows, c, row[c] ?? ''))));
  for (const group of groupSpans(columns)) {
    const span = spanWidth(widths, group.from, group.to);
    if (group.name.length > span) widths[group.to] += group.name.length - span;
  }
  return widths;
}

/** The width of columns `from` to `to` with the gaps between them. */
export function spanWidth(widths: readonly number[], from: number, to: number): number {
  return widths.slice(from, to + 1).reduce((a, b) => a + b, 0) + GAP.length * (to - from);
}

/** The table's lines, `indent` before each; the group headings, if any, on a line above the heads. */
export function renderTable(columns: readonly Column[], rows: readonly (readonly string[])[], indent = '', least: readonly number[] = []): string[] {
  const widths = columnWidths(columns, rows, least);
  const groups = groupSpans(columns);
  const lines: string[] = [];
  if (groups.some((group) => group.name !== '')) {
    let line = '';
    let position = 0;
    for (const group of groups) {
      const start = widths.slice(0, group.from).reduce((a, b) => a + b + GAP.length, 0);
      if (group.name !== '') {
        line += ' '.repeat(Math.max(0, start - position)) + group.name;
        position = start + group.name.length;
      }
    }
    lines.push(line);
  }
  lines.push(columns.map((column, c) => (column.align === 'left' ? column.head.padEnd(widths[c]) : column.head.padStart(widths[c]))).join(GAP));
  for (const row of rows) lines.push(columns.map((column, c) => placeCell(column, rows, c, row[c] ?? '', widths[c])).join(GAP));
  return lines.map((line) => `${indent}${line}`.trimEnd());
}

interface GroupSpan {
  name: string;
  from: number;
  to: number;
}

function groupSpans(columns: readonly Column[]): GroupSpan[] {
  const spans: GroupSpan[] = [];
  columns.forEach((column, c) => {
    const name = column.group ?? '';
    const last = spans[spans.length - 1];
    if (last !== undefined && last.name === name && name !== '') last.to = c;
    else spans.push({ name, from: c, to: c });
  });
  return spans;
}

const NUMBER = /^-?[\d,]+(\.\d+)?$/;

/** The whole and fraction part of a number cell, the fraction with its point: "-1,234.5" → ["-1,234", ".5"]; undefined for text. */
function splitPoint(cell: string): [string, string] | undefined {
  if (!NUMBER.test(cell)) return undefined;
  const point = cell.indexOf('.');
  return point < 0 ? [cell, ''] : [cell.slice(0, point), cell.slice(point)];
}

/** The widest whole and fraction parts of a column's numbers. */
function pointWidths(rows: readonly (readonly string[])[], c: number): [number, number] {
  let whole = 0;
  let fraction = 0;
  for (const row of rows) {
    const parts = splitPoint(row[c] ?? '');
    if (parts === undefined) continue;
    whole = Math.max(whole, parts[0].length);
    fraction = Math.max(fraction, parts[1].length);
  }
  return [whole, fraction];
}

function cellWidth(column: Column, rows: readonly (readonly string[])[], c: number, cell: string): number {
  if (column.align !== 'point' || splitPoint(cell) === undefined) return cell.length;
  const [whole, fraction] = pointWidths(rows, c);
  return whole + fraction;
}

/** Text in a column aligned on the point (a dash, a word) is set to the right like the block of numbers. */
function placeCell(column: Column, rows: readonly (readonly string[])[], c: number, cell: string, width: number): string {
  if (column.align === 'left') return cell.padEnd(width);
  const parts = column.align === 'point' ? splitPoint(cell) : undefined;
  if (parts === undefined) {
    if (column.align === 'right' || cell !== NO_VALUE) return cell.padStart(width);
    // A dash stands where the numbers' last whole digit does.
    const [, fraction] = pointWidths(rows, c);
    return (cell + ' '.repeat(fraction)).padStart(width);
  }
  const [whole, fraction] = pointWidths(rows, c);
  return (parts[0].padStart(whole) + parts[1].padEnd(fraction)).padStart(width);
}

/** `text` broken into lines of at most `width` characters at spaces, each after `indent` (the first after `first`). */
export function wrap(text: string, indent = '  ', width = TARGET_WIDTH, first = indent): string[] {
  const lines: string[] = [];
  let line = first;
  let empty = true;
  for (const word of text.split(/\s+/).filter((w) => w !== '')) {
    if (!empty && line.length + 1 + word.length > width) {
      lines.push(line);
      line = indent;
      empty = true;
    }
    line += empty ? word : ` ${word}`;
    empty = false;
  }
  if (!empty) lines.push(line);
  return lines;
}
