// Reads one value cell. Only plain decimal numbers count: `Number()` alone would also accept
// hex, binary and the empty string, none of which belongs in a series file.

export type ParsedValue =
  | { kind: 'number'; value: number }
  | { kind: 'empty' }
  | { kind: 'missing-marker' }
  | { kind: 'non-finite' }
  | { kind: 'invalid' };

const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const NON_FINITE = /^[+-]?(nan|inf|infinity)$/i;
// Markers that spreadsheets and statistics packages commonly write for a missing value (common practice).
const MISSING_MARKERS = new Set(['na', 'n/a', '#n/a', 'null', 'none', '.', '-']);

/** Classifies a trimmed cell; a decimal that overflows a double counts as non-finite. */
export function parseValue(cell: string): ParsedValue {
  if (cell === '') return { kind: 'empty' };
  if (DECIMAL.test(cell)) {
    const value = Number(cell);
    return Number.isFinite(value) ? { kind: 'number', value } : { kind: 'non-finite' };
  }
  if (NON_FINITE.test(cell)) return { kind: 'non-finite' };
  if (MISSING_MARKERS.has(cell.toLowerCase())) return { kind: 'missing-marker' };
  return { kind: 'invalid' };
}
