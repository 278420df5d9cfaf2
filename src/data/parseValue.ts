// Reads one value cell. Only plain decimal numbers count: `Number()` alone would also accept
// hex, binary and the empty string, none of which belongs in a series file. The decimal mark is
// a point or a comma, one of the two per file; thousands separators are never read, so a cell
// that holds both marks (1.234,5 or 1,234.5) is refused rather than guessed at.

export type DecimalMark = 'point' | 'comma';

export type ParsedValue =
  | { kind: 'number'; value: number }
  | { kind: 'empty' }
  | { kind: 'missing-marker' }
  | { kind: 'non-finite' }
  /** A number written with the other decimal mark (1,5 where the mark is a point). */
  | { kind: 'other-mark' }
  /** Digits grouped with both a point and a comma: a thousands separator. */
  | { kind: 'grouped' }
  | { kind: 'invalid' };

const DECIMAL = { point: /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/, comma: /^[+-]?(\d+,?\d*|,\d+)([eE][+-]?\d+)?$/ } as const;
const GROUPED = /^[+-]?\d[\d.,]*$/;
const NON_FINITE = /^[+-]?(nan|inf|infinity)$/i;
// Markers that spreadsheets and statistics packages commonly write for a missing value (common practice).
const MISSING_MARKERS = new Set(['na', 'n/a', '#n/a', 'null', 'none', '.', '-']);

/** Whether the trimmed cell is a plain number written with this decimal mark. */
export function isDecimal(cell: string, mark: DecimalMark): boolean {
  return DECIMAL[mark].test(cell);
}

/** Classifies a trimmed cell; a decimal that overflows a double counts as non-finite. */
export function parseValue(cell: string, mark: DecimalMark = 'point'): ParsedValue {
  if (cell === '') return { kind: 'empty' };
  if (DECIMAL[mark].test(cell)) {
    const value = Number(mark === 'comma' ? cell.replace(',', '.') : cell);
    return Number.isFinite(value) ? { kind: 'number', value } : { kind: 'non-finite' };
  }
  if (NON_FINITE.test(cell)) return { kind: 'non-finite' };
  if (MISSING_MARKERS.has(cell.toLowerCase())) return { kind: 'missing-marker' };
  if (DECIMAL[mark === 'point' ? 'comma' : 'point'].test(cell)) return { kind: 'other-mark' };
  if (GROUPED.test(cell) && cell.includes('.') && cell.includes(',')) return { kind: 'grouped' };
  return { kind: 'invalid' };
}
