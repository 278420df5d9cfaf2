// What the unit-root tests refuse, and that they leave their input alone.
import { describe, expect, it } from 'vitest';
import { adfTest } from '../../src/evidence/adfTest.js';
import { kpssTest } from '../../src/evidence/kpssTest.js';
import { readSeriesValues } from './referenceFixtures.js';

const nile = readSeriesValues('nile');

describe('kpssTest guards', () => {
  it('needs finite values', () => {
    expect(() => kpssTest([1, 2, Number.NaN, 4, 5])).toThrow('kpssTest needs finite values; position 2 is NaN');
  });
  it('needs more observations than lags', () => {
    expect(() => kpssTest([1, 3, 2, 5, 4], { lags: 5 })).toThrow('kpssTest needs more observations than lags');
  });
  it('needs a series that varies around its fitted trend', () => {
    expect(() => kpssTest([1, 2, 3, 4, 5, 6], { lags: 1 })).toThrow('kpssTest needs a series that varies');
  });
  it('uses ceil(12(n/100)^{1/4}) lags under the fixed rule (Schwert 1989): 12 for n = 100', () => {
    expect(kpssTest(nile, { lagRule: 'fixed' }).lags).toBe(12);
  });
});

describe('adfTest guards', () => {
  it('allows at most floor(n/2) − 3 lags with a trend (at most half the rows used up)', () => {
    // n = 100 with constant + trend: 50 − 2 − 1 = 47 (the limit statsmodels 0.13.5 adfuller applies).
    expect(adfTest(nile, { lags: 47 }).lags).toBe(47);
    expect(() => adfTest(nile, { lags: 48 })).toThrow('adfTest allows at most 47 lags');
  });
  it('needs whole, non-negative lags', () => {
    expect(() => adfTest(nile, { lags: 1.5 })).toThrow('adfTest needs whole, non-negative lags');
  });
  it('needs enough observations for the regression', () => {
    expect(() => adfTest([1, 2, 4, 3, 5])).toThrow('adfTest needs at least 6 observations');
  });
  it('searches lags only up to maxLags', () => {
    expect(adfTest(readSeriesValues('us-real-gdp').map(Math.log), { maxLags: 1 }).lags).toBeLessThanOrEqual(1);
  });
});

describe('inputs are left unchanged', () => {
  it('kpssTest and adfTest do not modify a Float64Array they are given', () => {
    const series = Float64Array.from(nile);
    kpssTest(series);
    adfTest(series, { regression: 'constant' });
    expect(Array.from(series)).toEqual(nile);
  });
});
