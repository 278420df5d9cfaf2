// The Canova & Hansen (1995) statistic against an independent numpy implementation of the
// paper's formulas (test/fixtures/seasonal/canovaHansenReference.py, numpy 1.24.2; its
// docstring states every formula), on the first differences of the three seasonal datasets,
// joint and by frequency, with the default window and with fixed ones; then its behaviour on
// seeded series under the null (a fixed pattern) and the alternative (a pattern that wanders).
import { describe, expect, it } from 'vitest';
import { canovaHansenLags, canovaHansenTest } from '../../src/evidence/canovaHansenTest.js';
import { vonMisesCritical } from '../../src/evidence/vonMisesCritical.js';
import { vonMisesUpperTail } from '../../src/evidence/vonMisesDistribution.js';
import { expectRelative } from './expectRelative.js';
import { readSeasonalFixture, readSeasonalValues, type SeasonalDataset } from './seasonalFixtures.js';
import { seededNormals } from './seededNormals.js';

interface CanovaHansenCase {
  file: SeasonalDataset;
  log: boolean;
  period: number;
  n: number;
  lags: number;
  lags_given: boolean;
  call: string;
  stat: number;
  restrictions: number;
  by_frequency: { cycles_per_year: number; stat: number; restrictions: number }[];
}

const { cases } = readSeasonalFixture<{ cases: CanovaHansenCase[] }>('canova-hansen-reference.json');

function firstDifferences(values: readonly number[]): number[] {
  return values.slice(1).map((v, i) => v - values[i]);
}

describe.each(cases.map((c) => [`${c.file}: ${c.call}`, c] as const))('Canova-Hansen against numpy: %s', (_, reference) => {
  const y = firstDifferences(readSeasonalValues(reference.file, reference.log));
  const result = canovaHansenTest(y, reference.period, reference.lags_given ? { lags: reference.lags } : {});

  it('window, observations and restrictions', () => {
    expect(result.n).toBe(reference.n);
    expect(result.lags).toBe(reference.lags);
    expect(result.restrictions).toBe(reference.restrictions);
  });

  it('joint statistic and its VM(s − 1) p-value', () => {
    expectRelative(result.stat, reference.stat, 1e-10);
    expect(result.p_value).toBe(vonMisesUpperTail(result.stat, reference.restrictions));
    expect(result.critical).toEqual(vonMisesCritical(reference.restrictions));
  });

  it('statistic at each seasonal frequency', () => {
    expect(result.by_frequency.map((f) => [f.cycles_per_year, f.restrictions])).toEqual(
      reference.by_frequency.map((f) => [f.cycles_per_year, f.restrictions]),
    );
    result.by_frequency.forEach((f, i) => expectRelative(f.stat, reference.by_frequency[i].stat, 1e-10));
  });
});

describe('the window rule ceil(s (n/100)^{1/4}) (ours, documented in canovaHansenTest.ts)', () => {
  it.each([
    [239, 12, 15],
    [71, 12, 12],
    [107, 4, 5],
    [100, 12, 12],
    [10, 4, 3],
  ])('n = %s, s = %s: %s lags', (n, s, lags) => {
    expect(canovaHansenLags(n, s)).toBe(lags);
  });
  it('stays below n', () => {
    expect(canovaHansenLags(3, 12)).toBe(2);
  });
});

describe('seeded series: a fixed pattern against a wandering one (Canova & Hansen 1995, §2; common practice)', () => {
  const pattern = [-9, -10, -7, -3, 3, 9, 13, 12, 7, 0, -6, -9];

  it('a fixed monthly pattern with a random-walk level is not rejected at 5%', () => {
    const draw = seededNormals(11);
    let level = 50;
    const levels = Array.from({ length: 240 }, (_, t) => {
      level += 0.3 * draw();
      return level + pattern[t % 12] + draw();
    });
    const result = canovaHansenTest(firstDifferences(levels), 12);
    expect(result.p_value).toBeGreaterThan(0.05);
    expect(result.stat).toBeLessThan(result.critical['5']);
  });

  it('a pattern whose every month wanders as a random walk is rejected at 1%', () => {
    const draw = seededNormals(12);
    const effects = [...pattern];
    const levels = Array.from({ length: 240 }, (_, t) => {
      effects[t % 12] += 1.5 * draw();
      return 50 + effects[t % 12] + 0.5 * draw();
    });
    const result = canovaHansenTest(firstDifferences(levels), 12);
    expect(result.p_value).toBeLessThan(0.01);
    expect(result.stat).toBeGreaterThan(result.critical['1']);
  });

  it('an annual cycle whose amplitude wanders is found at one cycle per year, not at six', () => {
    const draw = seededNormals(13);
    let cosine = 5;
    let sine = 2;
    const levels = Array.from({ length: 240 }, (_, t) => {
      cosine += 0.6 * draw();
      sine += 0.6 * draw();
      const angle = (2 * Math.PI * (t + 1)) / 12;
      return 20 + cosine * Math.cos(angle) + sine * Math.sin(angle) + 2 * Math.cos(Math.PI * (t + 1)) + draw();
    });
    const { by_frequency } = canovaHansenTest(firstDifferences(levels), 12);
    expect(by_frequency[0].cycles_per_year).toBe(1);
    expect(by_frequency[0].p_value).toBeLessThan(0.01);
    expect(by_frequency[5].cycles_per_year).toBe(6);
    expect(by_frequency[5].restrictions).toBe(1);
    expect(by_frequency[5].p_value).toBeGreaterThan(0.05);
  });
});

describe('canovaHansenTest refuses what it cannot compute', () => {
  it('needs more than two full cycles', () => {
    expect(() => canovaHansenTest([1, 2, 3, 4, 5, 6, 7, 8], 4)).toThrow('canovaHansenTest needs more than two full cycles of observations');
  });
  it('needs finite values', () => {
    expect(() => canovaHansenTest([1, 2, Number.NaN, 4, 5, 6, 7, 8, 9, 10], 4)).toThrow('canovaHansenTest needs finite values');
  });
  it('needs a period it has critical values for', () => {
    expect(() => canovaHansenTest(new Array(60).fill(0).map((_, t) => t % 5), 13)).toThrow('canovaHansenTest needs a whole period from 2 to 12');
  });
  it('needs a series that varies around its seasonal pattern', () => {
    const exact = Array.from({ length: 40 }, (_, t) => [1, -2, 3, -2][t % 4]);
    expect(() => canovaHansenTest(exact, 4)).toThrow('canovaHansenTest needs a series that varies around its seasonal pattern');
  });
  it('needs lags below the number of observations', () => {
    expect(() => canovaHansenTest(firstDifferences(readSeasonalValues('uk-gas.csv', true)), 4, { lags: 107 })).toThrow(
      'canovaHansenTest needs whole, non-negative lags below the number of observations',
    );
  });
});
