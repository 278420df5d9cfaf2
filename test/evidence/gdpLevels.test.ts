// US real GDP levels (test/fixtures/us-real-gdp.csv, n = 203, not logged): the values that
// statsmodels' own test-suite takes from Stata for ADF and from R's tseries for KPSS.
import { describe, expect, it } from 'vitest';
import { adfTest } from '../../src/evidence/adfTest.js';
import { kpssTest } from '../../src/evidence/kpssTest.js';
import { expectRelative } from './expectRelative.js';
import { readSeriesValues } from './referenceFixtures.js';

const gdp = readSeriesValues('us-real-gdp');

describe('ADF with 4 lags on US real GDP levels (Stata, via statsmodels test-suite)', () => {
  it('constant: stat 0.97505319, p 0.99399563', () => {
    const result = adfTest(gdp, { regression: 'constant', lags: 4 });
    expect(result.lags).toBe(4);
    expect(result.nobs).toBe(203 - 1 - 4);
    // statsmodels 0.13.5 itself differs from these Stata figures by about 2e-6 relative.
    expectRelative(result.stat, 0.97505319, 1e-5);
    expectRelative(result.p_value, 0.99399563, 1e-5);
  });

  it('constant + trend: stat −1.8566374, p 0.67682968', () => {
    const result = adfTest(gdp, { regression: 'trend', lags: 4 });
    expectRelative(result.stat, -1.8566374, 1e-5);
    expectRelative(result.p_value, 0.67682968, 1e-5);
  });
});

describe('KPSS with 3 lags on US real GDP levels (R tseries, via statsmodels test-suite)', () => {
  // Published to 5 significant digits: half a unit in the last place is under 5e-5 relative.
  it('level: 5.0169', () => {
    const result = kpssTest(gdp, { regression: 'level', lags: 3 });
    expect(result.lags).toBe(3);
    expect(result.lag_rule).toBe('fixed');
    expectRelative(result.stat, 5.0169, 5e-5);
    expect(result).toMatchObject({ p_value: 0.01, p_bound: 'below' });
  });

  it('trend: 1.1828', () => {
    expectRelative(kpssTest(gdp, { regression: 'trend', lags: 3 }).stat, 1.1828, 5e-5);
  });
});
