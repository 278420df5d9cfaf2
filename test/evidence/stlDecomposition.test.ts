// STL against base R's stl() (R 4.2.2 Patched, stats package), computed outside the tests by
// test/fixtures/seasonal/stlReference.R into stl-reference.json; each case records R's exact
// call, the windows, degrees and jumps R used, and its seasonal, trend, remainder and
// robustness weights. Our decomposition must agree to 1e-9 of each component's largest size.
import { describe, expect, it } from 'vitest';
import { stlDecomposition, stlSettings, type StlOptions } from '../../src/evidence/stlDecomposition.js';
import { readSeasonalFixture, readSeasonalValues, type SeasonalDataset } from './seasonalFixtures.js';

interface StlCase {
  file: SeasonalDataset;
  log: boolean;
  call: string;
  windows: { s: number; t: number; l: number };
  degrees: { s: number; t: number; l: number };
  jumps: { s: number; t: number; l: number };
  inner: number;
  outer: number;
  seasonal: number[];
  trend: number[];
  remainder: number[];
  weights: number[];
}

const { cases } = readSeasonalFixture<{ cases: StlCase[] }>('stl-reference.json');

/** Our options for each R call in the fixture (same order). */
const OPTIONS: Record<string, StlOptions> = {
  'stl(y, s.window = 7)': { period: 12, seasonalSpan: 7 },
  'stl(y, s.window = "periodic")': { period: 12, seasonalSpan: 'periodic' },
  'stl(y, s.window = 7, robust = TRUE)': { period: 12, seasonalSpan: 7, robust: true },
  'stl(y, s.window = 11, s.degree = 1, t.window = 15, l.window = 13)': {
    period: 12,
    seasonalSpan: 11,
    seasonalDegree: 1,
    trendSpan: 15,
    lowPassSpan: 13,
  },
  'stl(log(y), s.window = 7)': { period: 4, seasonalSpan: 7 },
};

/** max_i |a_i − b_i| / max_i |b_i|. */
function largestRelativeGap(actual: ArrayLike<number>, expected: readonly number[]): number {
  const scale = Math.max(...expected.map(Math.abs));
  let gap = 0;
  expected.forEach((value, i) => (gap = Math.max(gap, Math.abs(actual[i] - value))));
  return gap / scale;
}

describe.each(cases.map((c) => [`${c.file}: ${c.call}`, c] as const))('STL against R: %s', (_, reference) => {
  const options = OPTIONS[reference.call];
  const y = readSeasonalValues(reference.file, reference.log);

  it('uses the windows, degrees, jumps and passes R used', () => {
    const settings = stlSettings(y.length, options);
    const { seasonal, trend, low_pass: lowPass } = settings;
    expect([seasonal.span, trend.span, lowPass.span]).toEqual([reference.windows.s, reference.windows.t, reference.windows.l]);
    expect([seasonal.degree, trend.degree, lowPass.degree]).toEqual([reference.degrees.s, reference.degrees.t, reference.degrees.l]);
    expect([seasonal.jump, trend.jump, lowPass.jump]).toEqual([reference.jumps.s, reference.jumps.t, reference.jumps.l]);
    expect([settings.inner, settings.outer]).toEqual([reference.inner, reference.outer]);
  });

  it('gives R’s seasonal, trend, remainder and robustness weights', () => {
    const result = stlDecomposition(y, options);
    expect(largestRelativeGap(result.seasonal, reference.seasonal)).toBeLessThan(1e-9);
    expect(largestRelativeGap(result.trend, reference.trend)).toBeLessThan(1e-9);
    expect(largestRelativeGap(result.remainder, reference.remainder)).toBeLessThan(1e-9);
    expect(largestRelativeGap(result.weights, reference.weights)).toBeLessThan(1e-9);
  });
});

describe('STL definitions (Cleveland et al. 1990, §2)', () => {
  const y = readSeasonalValues('nottingham-temperature.csv');

  it('the three components add up to the series exactly', () => {
    const result = stlDecomposition(y, { period: 12 });
    y.forEach((value, i) => {
      expect(Math.abs(result.seasonal[i] + result.trend[i] + result.remainder[i] - value)).toBeLessThan(1e-12 * Math.abs(value));
    });
  });

  it('a periodic seasonal repeats itself every cycle', () => {
    const { seasonal } = stlDecomposition(y, { period: 12, seasonalSpan: 'periodic' });
    for (let i = 12; i < seasonal.length; i++) expect(seasonal[i]).toBe(seasonal[i - 12]);
  });

  it('a level plus a fixed pattern is split into exactly those', () => {
    // Every smoother is a weighted mean that reproduces constants, and the low-pass filter
    // turns a fixed pattern into its mean, so the seasonal is the centred pattern and the
    // trend the level plus the pattern's mean (Cleveland et al. 1990, §2; worked by hand).
    const pattern = [3, -1, -2, 4];
    const series = Array.from({ length: 40 }, (_, t) => 10 + pattern[t % 4]);
    const result = stlDecomposition(series, { period: 4 });
    result.seasonal.forEach((value, t) => expect(Math.abs(value - (pattern[t % 4] - 1))).toBeLessThan(1e-12));
    result.trend.forEach((value) => expect(Math.abs(value - 11)).toBeLessThan(1e-12));
    result.remainder.forEach((value) => expect(Math.abs(value)).toBeLessThan(1e-12));
  });

  it('does not change the caller’s array', () => {
    const copy = [...y];
    stlDecomposition(copy, { period: 12, robust: true });
    expect(copy).toEqual(y);
  });
});

describe('STL refuses what it cannot decompose', () => {
  it('needs more than two full cycles', () => {
    expect(() => stlDecomposition(Array.from({ length: 24 }, (_, t) => t % 12), { period: 12 })).toThrow(
      'stlDecomposition needs more than two full cycles of observations',
    );
  });
  it('needs finite values', () => {
    const y = readSeasonalValues('us-accidental-deaths.csv');
    y[5] = Number.NaN;
    expect(() => stlDecomposition(y, { period: 12 })).toThrow('stlDecomposition needs finite values; position 5 is NaN');
  });
  it('needs a whole period of at least 2 and a seasonal span of at least 3', () => {
    expect(() => stlSettings(100, { period: 1 })).toThrow('stlDecomposition needs a whole period of at least 2');
    expect(() => stlSettings(100, { period: 12, seasonalSpan: 1 })).toThrow('stlDecomposition needs a whole seasonal span of at least 3');
  });
});
