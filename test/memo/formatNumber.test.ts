// Number formatting rules for the memo. Expected strings are our spec (src/memo/format/).
import { describe, expect, it } from 'vitest';
import { decimalsForScale, formatNumber, formatP, formatPCell, formatPercent, formatSignificant, MISSING, withUnits } from '../../src/memo/format/formatNumber.js';
import { seriesDecimals } from '../../src/memo/format/seriesDecimals.js';
import { bareRecord } from './sampleInput.js';

describe('formatNumber', () => {
  it('groups thousands, uses a true minus sign and fixed decimals', () => {
    expect(formatNumber(-12345.678, 1)).toBe('\u221212,345.7');
    expect(formatNumber(1234567, 0)).toBe('1,234,567');
    expect(formatNumber(999.995, 2)).toBe('1,000.00'); // toFixed rounds 999.995 up in binary: 999.99500000000000455
    expect(formatNumber(0.5, 3)).toBe('0.500');
  });
  it('prints no sign on a negative value that rounds to zero', () => {
    expect(formatNumber(-0.0004, 3)).toBe('0.000');
  });
  it('prints n/a for null, undefined and non-finite values', () => {
    expect(formatNumber(null, 2)).toBe(MISSING);
    expect(formatNumber(undefined, 2)).toBe(MISSING);
    expect(formatNumber(Number.NaN, 2)).toBe(MISSING);
  });
});

describe('decimalsForScale', () => {
  it('shows about three significant digits of the scale, within 0 to 6 decimals', () => {
    expect(decimalsForScale(2.6)).toBe(2);
    expect(decimalsForScale(0.04)).toBe(4);
    expect(decimalsForScale(950)).toBe(0);
    expect(decimalsForScale(1e-12)).toBe(6);
    expect(decimalsForScale(0)).toBe(2);
  });
  it('gives Lake Huron two decimals and US real GDP none (95% one-step widths about 2.6 ft and 200 bn)', () => {
    expect(seriesDecimals(bareRecord('lakeHuron'))).toBe(2);
    expect(seriesDecimals(bareRecord('gdp'))).toBe(0);
  });
});

describe('other formats', () => {
  it('adds units only to a number', () => {
    expect(withUnits('579.12', 'ft')).toBe('579.12 ft');
    expect(withUnits(MISSING, 'ft')).toBe(MISSING);
    expect(withUnits('3', undefined)).toBe('3');
  });
  it('writes fractions as percentages', () => {
    expect(formatPercent(0.8123)).toBe('81%');
    expect(formatPercent(0.05, 1)).toBe('5.0%');
    expect(formatPercent(null)).toBe(MISSING);
  });
  it('writes estimates to significant digits, very small or large ones with a power of ten', () => {
    expect(formatSignificant(0.021109458)).toBe('0.02111');
    expect(formatSignificant(580.0823)).toBe('580.1');
    expect(formatSignificant(-0.6526)).toBe('\u22120.6526');
    expect(formatSignificant(0.000211, 3)).toBe('2.11 \u00d7 10\u207b\u2074');
    // No zeros after the last digit that counts (our rule): 0.4630 is printed 0.463, 2.270 × 10⁻⁴ as 2.27 × 10⁻⁴.
    expect(formatSignificant(0.463, 4)).toBe('0.463');
    expect(formatSignificant(0.000227, 4)).toBe('2.27 \u00d7 10\u207b\u2074');
    expect(formatSignificant(-0.204, 4)).toBe('\u22120.204');
    expect(formatSignificant(2, 3)).toBe('2');
    expect(formatSignificant(1500, 3)).toBe('1,500');
    expect(formatSignificant(12345678, 3)).toBe('1.23 \u00d7 10\u2077');
    expect(formatSignificant(0)).toBe('0');
  });
  it('writes p-values to three decimals with a floor, bare in table cells', () => {
    expect(formatP(0.04213)).toBe('p = 0.042');
    expect(formatP(0.0004)).toBe('p < 0.001');
    expect(formatP(null)).toBe(MISSING);
    expect(formatPCell(0.04213)).toBe('0.042');
    expect(formatPCell(0.0004)).toBe('< 0.001');
    expect(formatPCell(0.01, 'below')).toBe('< 0.01');
    expect(formatPCell(0.1, 'above')).toBe('> 0.10');
  });
});
