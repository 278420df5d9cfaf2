// The generalised von Mises distribution VM(p), the limit of the Canova-Hansen statistic,
// against three outside sources:
// - Anderson & Darling (1952, Ann. Math. Statist. 23, 193–212, the table of the asymptotic ω²
//   distribution; from memory): VM(1) is the Cramér-von Mises limit, 10%, 5% and 1% points
//   0.34730, 0.46136, 0.74346.
// - Canova & Hansen (1995, JBES 13, 237–252), Table 1 (the simulated critical values of
//   Hansen 1990, to 3 significant figures; from memory): our exact quantiles must lie within
//   2.5% of them, which allows for the simulation error visible at p = 1 (0.470 against
//   Anderson & Darling's exact 0.46136).
// - An independent computation in base R (test/fixtures/seasonal/vonMisesReference.R: Imhof's
//   1961 inversion over 2000 weights, R 4.2.2), tails and quantiles for p = 1..12.
// and Watson's (1961, Biometrika 48, 109–114) closed form for p = 2 (VM(2) is four times the
// limit of his U²; from memory): P(VM(2) > x) = 2 Σ_k (−1)^{k−1} exp(−k²π²x/2).
import { describe, expect, it } from 'vitest';
import { vonMisesCritical, MAX_TABULATED_RESTRICTIONS } from '../../src/evidence/vonMisesCritical.js';
import { vonMisesQuantile, vonMisesUpperTail } from '../../src/evidence/vonMisesDistribution.js';
import { expectRelative } from './expectRelative.js';
import { readSeasonalFixture } from './seasonalFixtures.js';

interface VonMisesReference {
  critical: { restrictions: number; sizes: number[]; values: number[] }[];
  tails: { x: number; restrictions: number; upper_tail: number }[];
}

const reference = readSeasonalFixture<VonMisesReference>('von-mises-reference.json');

/** Canova & Hansen (1995), Table 1, [10%, 5%, 1%] for p = 1..11 (from memory). */
const CANOVA_HANSEN_TABLE: readonly [number, number, number][] = [
  [0.353, 0.47, 0.748],
  [0.61, 0.749, 1.07],
  [0.846, 1.01, 1.35],
  [1.07, 1.24, 1.6],
  [1.28, 1.47, 1.88],
  [1.49, 1.68, 2.12],
  [1.69, 1.9, 2.35],
  [1.89, 2.11, 2.59],
  [2.1, 2.32, 2.82],
  [2.29, 2.54, 3.05],
  [2.49, 2.75, 3.27],
];

describe('VM(1) is the Cramér-von Mises limit (Anderson & Darling 1952)', () => {
  it.each([
    [0.1, 0.3473],
    [0.05, 0.46136],
    [0.01, 0.74346],
  ])('upper %s point %s', (size, point) => {
    // The table gives 5 decimals: agreement to half a unit in the last place.
    expect(Math.abs(vonMisesQuantile(size, 1) - point)).toBeLessThanOrEqual(5e-6);
  });
});

describe('tail probabilities against the independent R computation (Imhof 1961)', () => {
  it.each(reference.tails.map((t) => [t.restrictions, t.x, t.upper_tail] as const))('P(VM(%s) > %s)', (p, x, tail) => {
    expectRelative(vonMisesUpperTail(x, p), tail, 1e-7);
  });

  it.each(reference.critical.map((c) => [c.restrictions, c] as const))('R’s 10/5/2.5/1%% points for p = %s have those tails', (p, entry) => {
    entry.values.forEach((value, i) => expect(Math.abs(vonMisesUpperTail(value, p) - entry.sizes[i])).toBeLessThan(1e-8));
  });
});

describe('the critical values used by the test', () => {
  it.each(reference.critical.filter((c) => c.restrictions <= MAX_TABULATED_RESTRICTIONS).map((c) => [c.restrictions, c] as const))(
    'p = %s: R’s quantiles rounded to 5 decimals',
    (p, entry) => {
      const table = vonMisesCritical(p);
      const at = (size: number): number => entry.values[entry.sizes.indexOf(size)];
      expect(Math.abs(table['10'] - at(0.1))).toBeLessThanOrEqual(5e-6);
      expect(Math.abs(table['5'] - at(0.05))).toBeLessThanOrEqual(5e-6);
      expect(Math.abs(table['1'] - at(0.01))).toBeLessThanOrEqual(5e-6);
    },
  );

  it.each(CANOVA_HANSEN_TABLE.map((row, i) => [i + 1, row] as const))('p = %s: within 2.5%% of Canova & Hansen’s Table 1', (p, row) => {
    const table = vonMisesCritical(p);
    expectRelative(table['10'], row[0], 0.025);
    expectRelative(table['5'], row[1], 0.025);
    expectRelative(table['1'], row[2], 0.025);
  });
});

describe('p = 2 against Watson’s closed form (Watson 1961)', () => {
  const watson = (x: number): number => {
    let sum = 0;
    for (let k = 1; k <= 50; k++) sum += (k % 2 === 1 ? 2 : -2) * Math.exp((-k * k * Math.PI * Math.PI * x) / 2);
    return sum;
  };
  it.each([0.1, 0.3, 0.7475, 1.5, 3])('x = %s', (x) => {
    expect(Math.abs(vonMisesUpperTail(x, 2) - watson(x))).toBeLessThan(1e-10);
  });
});

describe('VM refuses what it cannot evaluate', () => {
  it('needs whole restrictions and a number', () => {
    expect(() => vonMisesUpperTail(1, 0)).toThrow('vonMisesUpperTail needs a whole number of restrictions, at least 1');
    expect(() => vonMisesUpperTail(Number.NaN, 2)).toThrow('vonMisesUpperTail needs a statistic that is a number');
    expect(() => vonMisesCritical(12)).toThrow('vonMisesCritical needs a whole number of restrictions from 1 to 11');
    expect(() => vonMisesQuantile(1, 2)).toThrow('vonMisesQuantile needs a size between 0 and 1');
  });
  it('gives the certain tails at the ends of the support', () => {
    expect(vonMisesUpperTail(0, 3)).toBe(1);
    expect(vonMisesUpperTail(Number.POSITIVE_INFINITY, 3)).toBe(0);
  });
});
