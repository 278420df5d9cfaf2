// Harmonic regressors (Fourier terms) for a fixed seasonal pattern of period s: the pairs
//   cos(2πk m/s), sin(2πk m/s),  k = 1..K ≤ s/2,
// where m is the observation's position in the year (0 for January or the first quarter).
// At k = s/2 the sine is zero at every m and is left out, so K = s/2 gives s − 1 columns,
// which span every pattern that sums to zero over a year, as s − 1 seasonal dummies would;
// fewer pairs give a smoother pattern with fewer parameters (Harvey 1989, §2.3.4; Hyndman &
// Athanasopoulos 2021, §7.4 and §10.5, from memory). Anchoring m to the calendar, not to the
// first observation, makes the coefficients, and the pattern they describe, mean the same
// whatever window a fit sees.

import { harmonicColumnCount } from '../base/period.js';

export { harmonicColumnCount };

/** Most harmonic pairs a period has: ⌊s/2⌋. */
export function maxHarmonics(period: number): number {
  return Math.floor(period / 2);
}

export function checkHarmonics(period: number, harmonics: number): void {
  if (!(Number.isInteger(period) && period >= 2)) throw new RangeError(`harmonic regressors need a period of at least 2, got ${period}`);
  if (!(Number.isInteger(harmonics) && harmonics >= 0 && harmonics <= maxHarmonics(period))) {
    throw new RangeError(`harmonic regressors for period ${period} take 0..${maxHarmonics(period)} pairs, got ${harmonics}`);
  }
}

/** Names of the harmonic coefficients, in column order: cos1, sin1, cos2, … */
export function harmonicNames(period: number, harmonics: number): string[] {
  const names: string[] = [];
  for (let k = 1; k <= harmonics; k++) {
    names.push(`cos${k}`);
    if (2 * k !== period) names.push(`sin${k}`);
  }
  return names;
}

/** The harmonic row at position m in the year (any integer; taken modulo s). */
export function harmonicRow(period: number, harmonics: number, position: number): number[] {
  const m = ((position % period) + period) % period;
  const row: number[] = [];
  for (let k = 1; k <= harmonics; k++) {
    const angle = (2 * Math.PI * k * m) / period;
    // cos(πm) is ±1 exactly; Math.cos(π·m) would leave rounding in the last bits.
    row.push(2 * k === period ? (m % 2 === 0 ? 1 : -1) : Math.cos(angle));
    if (2 * k !== period) row.push(Math.sin(angle));
  }
  return row;
}

/**
 * The harmonic columns for observations at positions firstSeason, firstSeason + 1, … (n of
 * them), one Float64Array per column.
 */
export function harmonicColumns(period: number, harmonics: number, firstSeason: number, n: number): Float64Array[] {
  const count = harmonicColumnCount(period, harmonics);
  const columns = Array.from({ length: count }, () => new Float64Array(n));
  for (let t = 0; t < n; t++) {
    const row = harmonicRow(period, harmonics, firstSeason + t);
    for (let c = 0; c < count; c++) columns[c][t] = row[c];
  }
  return columns;
}

/**
 * The seasonal pattern the coefficients describe, one value per position in the year
 * (0 = January or the first quarter); it sums to zero over the year.
 */
export function seasonalPattern(period: number, harmonics: number, coefficients: ArrayLike<number>): number[] {
  return Array.from({ length: period }, (_, m) => {
    const row = harmonicRow(period, harmonics, m);
    let value = 0;
    for (let c = 0; c < row.length; c++) value += row[c] * coefficients[c];
    return value;
  });
}
