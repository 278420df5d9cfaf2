// Ljung-Box, residual ACF and Jarque-Bera against statsmodels 0.13.5 (Debian
// python3-statsmodels 0.13.5+dfsg-7), computed outside the tests on fixed vectors (first
// differences of the Lake Huron and Nile series). Values and exact calls are in
// test/fixtures/evidence/statsmodels-checks.json:
//   acorr_ljungbox(x, lags=[m], model_df=p+q), acf(x, nlags=10, fft=False),
//   statsmodels.stats.stattools.jarque_bera(x).
import { describe, expect, it } from 'vitest';
import { jarqueBera } from '../../src/evidence/jarqueBera.js';
import { ljungBox } from '../../src/evidence/ljungBox.js';
import { residualAcf } from '../../src/evidence/residualAcf.js';
import { expectRelative } from './expectRelative.js';
import { readEvidenceFixture } from './referenceFixtures.js';

interface ResidualCase {
  vector: string;
  n: number;
  values: number[];
  ljung_box: { call: string; lags: number; model_df: number; stat: number; p_value: number }[];
  acf: { call: string; acf: number[] };
  jarque_bera: { call: string; stat: number; p_value: number; skewness: number; kurtosis: number };
}

const { cases } = readEvidenceFixture<{ cases: ResidualCase[] }>('statsmodels-checks.json');
const TOLERANCE = 1e-9;
// p-values come from 1 − CDF, which loses relative precision in the far tail; the smallest
// here is about 2e-4, where 1e-8 relative is still comfortably met.
const P_TOLERANCE = 1e-8;

describe.each(cases.map((c) => [c.vector, c] as const))('residual checks on %s', (_, fixture) => {
  it.each(fixture.ljung_box.map((entry) => [entry.call, entry] as const))('Ljung-Box %s', (__, reference) => {
    // model_df = p + q; splitting it between p and q does not change the test.
    const result = ljungBox(fixture.values, { lags: reference.lags, p: reference.model_df });
    expect(result.lags).toBe(reference.lags);
    expect(result.df).toBe(reference.lags - reference.model_df);
    expectRelative(result.stat, reference.stat, TOLERANCE);
    expectRelative(result.p_value, reference.p_value, P_TOLERANCE);
  });

  it('Ljung-Box uses min(10, floor(n/5)) lags by default (common practice)', () => {
    const byDefault = ljungBox(fixture.values);
    const reference = fixture.ljung_box.find((entry) => entry.lags === 10 && entry.model_df === 0);
    expect(byDefault.lags).toBe(Math.min(10, Math.floor(fixture.n / 5)));
    expectRelative(byDefault.stat, reference?.stat ?? Number.NaN, TOLERANCE);
  });

  it('ACF at lags 1..10 with the ±1.96/√n band', () => {
    const result = residualAcf(fixture.values, { lags: 10 });
    expect(result.lag).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    result.acf.forEach((value, i) => expectRelative(value, fixture.acf.acf[i], TOLERANCE));
    // Bartlett (1946) white-noise band, common practice.
    expectRelative(result.bound, 1.96 / Math.sqrt(fixture.n), TOLERANCE);
  });

  it('Jarque-Bera statistic, p-value, skewness and raw kurtosis', () => {
    const result = jarqueBera(fixture.values);
    const reference = fixture.jarque_bera;
    expectRelative(result.stat, reference.stat, TOLERANCE);
    expectRelative(result.p_value, reference.p_value, P_TOLERANCE);
    expectRelative(result.skewness, reference.skewness, TOLERANCE);
    expectRelative(result.kurtosis, reference.kurtosis, TOLERANCE);
  });
});

describe('residual checks refuse what they cannot compute', () => {
  const values = cases[0].values;
  it('ljungBox needs more lags than p + q', () => {
    expect(() => ljungBox(values, { lags: 4, p: 2, q: 2 })).toThrow('ljungBox needs more lags than p + q');
  });
  it('ljungBox needs more observations than lags', () => {
    expect(() => ljungBox([0.1, -0.2, 0.3], { lags: 3 })).toThrow('ljungBox needs more observations than lags');
  });
  it('residualAcf needs residuals that are not all equal', () => {
    expect(() => residualAcf([1, 1, 1, 1, 1, 1], { lags: 2 })).toThrow('residualAcf needs residuals that are not all equal');
  });
  it('jarqueBera needs finite values', () => {
    expect(() => jarqueBera([0.5, Number.NaN, 0.2, 0.1])).toThrow('jarqueBera needs finite values');
  });
  it('does not change the caller’s array', () => {
    const copy = [...values];
    ljungBox(copy);
    residualAcf(copy);
    jarqueBera(copy);
    expect(copy).toEqual(values);
  });
});
