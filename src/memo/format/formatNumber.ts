// Numbers as the memo prints them: a true minus sign, thousands grouped with commas, a fixed
// number of decimals chosen from the scale of what is being compared, and "n/a" where the
// record holds no number. Plain code rather than Intl so the output never depends on the
// machine's locale data.
import type { JsonNumber } from '../../analysis/record.js';
import { groupThousands } from '../../base/groupThousands.js';

export const MISSING = 'n/a';
const MINUS = '\u2212';
const MAX_DECIMALS = 6;

/** Fixed decimals with grouping, e.g. formatNumber(-12345.678, 1) = "−12,345.7". */
export function formatNumber(value: JsonNumber | undefined, decimals: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  const fixed = Math.abs(value).toFixed(decimals);
  const body = groupThousands(fixed);
  // A value that rounds to zero is printed without a sign.
  const negative = value < 0 && /[1-9]/.test(fixed);
  return negative ? `${MINUS}${body}` : body;
}

/**
 * Decimals that show about three significant digits of `scale` (a typical difference between
 * the numbers in one table, such as an interval width): 2.6 → 2, 0.04 → 4, 950 → 0.
 */
export function decimalsForScale(scale: number): number {
  if (!Number.isFinite(scale) || scale <= 0) return 2;
  const magnitude = Math.floor(Math.log10(Math.abs(scale)));
  return Math.min(MAX_DECIMALS, Math.max(0, 2 - magnitude));
}

/** A value followed by its unit when there is one: "579.12 ft". */
export function withUnits(text: string, units: string | undefined): string {
  return units === undefined || units === '' || text === MISSING ? text : `${text} ${units}`;
}

/** A fraction as a percentage: formatPercent(0.8123) = "81%". */
export function formatPercent(fraction: JsonNumber | undefined, decimals = 0): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return MISSING;
  return `${formatNumber(fraction * 100, decimals)}%`;
}

/** A number already in percent (such as MAPE): formatPercentPoints(3.214) = "3.2%". */
export function formatPercentPoints(value: JsonNumber | undefined, decimals = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  return `${formatNumber(value, decimals)}%`;
}

const SUPERSCRIPT: Record<string, string> = {
  '-': '\u207b', '0': '\u2070', '1': '\u00b9', '2': '\u00b2', '3': '\u00b3', '4': '\u2074',
  '5': '\u2075', '6': '\u2076', '7': '\u2077', '8': '\u2078', '9': '\u2079',
};

/**
 * `digits` significant digits, for estimates whose scale varies (coefficients, test
 * statistics): 0.021109 → "0.02111", 580.08 → "580.1", 0.463 → "0.463" (no trailing zeros);
 * outside 0.001 to 10^6 as "2.11 × 10⁻⁴".
 */
export function formatSignificant(value: JsonNumber | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  if (value === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  if (magnitude >= -3 && magnitude < 6) {
    return withoutTrailingZeros(formatNumber(value, Math.max(0, digits - 1 - magnitude)));
  }
  const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
  const power = Array.from(String(Number(exponent)), (c) => SUPERSCRIPT[c]).join('');
  return `${withoutTrailingZeros(formatNumber(Number(mantissa), digits - 1))} \u00d7 10${power}`;
}

/** "0.4630" → "0.463", "2.00" → "2": significant digits say how precise a figure is, so zeros after the last digit that counts are dropped. */
export function withoutTrailingZeros(text: string): string {
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

/** "p = 0.042", "p < 0.001", or "n/a" when no p-value exists. */
export function formatP(value: JsonNumber | undefined): string {
  const cell = formatPCell(value);
  return cell === MISSING ? cell : cell.startsWith('<') ? `p ${cell}` : `p = ${cell}`;
}

/**
 * A p-value for a table column headed "p-value": "0.042", "< 0.001"; `bound` marks a value
 * at the edge of a lookup table ("< 0.01" below it, "> 0.10" above it).
 */
export function formatPCell(value: JsonNumber | undefined, bound?: 'below' | 'above'): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  if (bound === 'below') return `< ${value.toFixed(2)}`;
  if (bound === 'above') return `> ${value.toFixed(2)}`;
  if (value < 0.001) return '< 0.001';
  return value.toFixed(3);
}
