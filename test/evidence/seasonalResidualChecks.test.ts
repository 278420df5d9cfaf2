// Residual checks over two seasonal cycles of lags against statsmodels 0.13.5 (Debian
// python3-statsmodels), computed outside the tests by test/fixtures/seasonal/ljungBoxReference.py
// into ljung-box-reference.json on fixed series built from the shared seasonal datasets
// (seasonal and first differences; no model fitted): acorr_ljungbox(x, lags=[L], model_df=K)
// and acf(x, nlags=L, fft=False). Each entry records its exact call.
import { describe, expect, it } from 'vitest';
import { defaultAcfLags } from '../../src/evidence/defaultAcfLags.js';
import { ljungBox } from '../../src/evidence/ljungBox.js';
import { residualAcf } from '../../src/evidence/residualAcf.js';
import { residualChecks } from '../../src/evidence/residualChecks.js';
import { expectRelative } from './expectRelative.js';
import { readSeasonalFixture } from './seasonalFixtures.js';

interface LjungBoxCase {
  series: string;
  n: number;
  values: number[];
  ljung_box: { call: string; lags: number; model_df: number; stat: number; p_value: number }[];
  acf: { call: string; acf: number[] };
}

const { cases } = readSeasonalFixture<{ cases: LjungBoxCase[] }>('ljung-box-reference.json');
const FIVE_PERCENT = 0.05; // the settings' built-in significance (common practice)

/** model_df split as an airline-type model would spend it: q first, then Q, then p. */
function orders(modelDf: number): { p: number; q: number; P: number; Q: number } {
  return { q: Math.min(1, modelDf), Q: Math.min(1, Math.max(0, modelDf - 1)), p: Math.max(0, modelDf - 2), P: 0 };
}

/** p-values below 1e-8 are compared absolutely: 1 − CDF cannot resolve them relatively. */
function expectPValue(actual: number, expected: number): void {
  if (expected < 1e-8) expect(Math.abs(actual - expected)).toBeLessThan(1e-12);
  else expectRelative(actual, expected, 1e-8);
}

describe.each(cases.map((c) => [c.series, c] as const))('seasonal lags on %s', (_, fixture) => {
  it.each(fixture.ljung_box.map((entry) => [entry.call, entry] as const))('Ljung-Box %s', (__, reference) => {
    const result = ljungBox(fixture.values, { lags: reference.lags, ...orders(reference.model_df) });
    expect(result.lags).toBe(reference.lags);
    expect(result.df).toBe(reference.lags - reference.model_df);
    expectRelative(result.stat, reference.stat, 1e-9);
    expectPValue(result.p_value, reference.p_value);
  });

  it(`autocorrelations: ${fixture.acf.call}`, () => {
    const result = residualAcf(fixture.values, { lags: fixture.acf.acf.length });
    result.acf.forEach((value, i) => expectRelative(value, fixture.acf.acf[i], 1e-9));
  });
});

describe('the lag rule (defaultAcfLags.ts; common practice)', () => {
  it.each([
    [228, 1, 10],
    [30, 1, 6],
    [228, 12, 24],
    [59, 12, 24],
    [30, 12, 15],
    [103, 4, 10],
    [30, 4, 8],
  ])('n = %s, period %s: %s lags', (n, period, lags) => {
    expect(defaultAcfLags(n, period)).toBe(lags);
  });

  it('period 1 is the default and keeps min(10, floor(n/5))', () => {
    for (const n of [12, 49, 50, 51, 300]) expect(defaultAcfLags(n)).toBe(Math.min(10, Math.floor(n / 5)));
  });
});

describe('residual checks of a seasonal fit', () => {
  const monthly = cases.find((c) => c.series.startsWith('us-accidental-deaths'));
  if (monthly === undefined) throw new Error('the fixture lacks the US accidental deaths case');
  const reference = monthly.ljung_box.find((entry) => entry.lags === 24 && entry.model_df === 2);
  if (reference === undefined) throw new Error('the fixture lacks lags = 24, model_df = 2');

  it('test two years of lags with df = lags − (p + q + P + Q)', () => {
    const checks = residualChecks(monthly.values, 0, 1, FIVE_PERCENT, { period: 12, P: 0, Q: 1 });
    expect(checks.period).toBe(12);
    expect(checks.ljung_box?.lags).toBe(24);
    expect(checks.ljung_box?.df).toBe(22);
    expectRelative(checks.ljung_box?.stat ?? Number.NaN, reference.stat, 1e-9);
    expectRelative(checks.ljung_box?.p_value ?? Number.NaN, reference.p_value, 1e-8);
    expect(checks.acf.lag).toHaveLength(24);
    expect(checks.findings.find((f) => f.check === 'ljung_box')?.flagged).toBe(reference.p_value < FIVE_PERCENT);
    expect(checks.findings.find((f) => f.check === 'ljung_box')?.text).toContain('over 24 lags');
  });

  it('period 1 is today’s check exactly: ten lags, no period key', () => {
    const today = residualChecks(monthly.values, 0, 1, FIVE_PERCENT);
    expect(residualChecks(monthly.values, 0, 1, FIVE_PERCENT, { period: 1 })).toEqual(today);
    expect(today).not.toHaveProperty('period');
    expect(today.ljung_box?.lags).toBe(10);
    expect(today.ljung_box?.df).toBe(9);
  });

  it('ljungBox needs more lags than p + q + P + Q', () => {
    expect(() => ljungBox(monthly.values, { lags: 4, p: 1, q: 1, P: 1, Q: 1 })).toThrow('ljungBox needs more lags than p + q + P + Q');
    expect(() => ljungBox(monthly.values, { lags: 4, P: -1 })).toThrow('ljungBox needs whole, non-negative seasonal ARMA orders P and Q');
  });
});
