// KPSS and ADF against statsmodels 0.13.5 on three open datasets. Expected values come from
// test/fixtures/<dataset>.json → unit_root_tests (statsmodels `kpss(x, regression, nlags)` and
// `adfuller(x, regression, autolag='AIC')` / `adfuller(x, maxlag=k, regression, autolag=None)`),
// and KPSS p-values from test/fixtures/evidence/statsmodels-checks.json (same library and calls).
import { describe, expect, it } from 'vitest';
import { adfTest } from '../../src/evidence/adfTest.js';
import { kpssTest } from '../../src/evidence/kpssTest.js';
import { expectRelative } from './expectRelative.js';
import { readEvidenceFixture, readSeriesValues, readUnitRootReferences, type ReferenceDataset } from './referenceFixtures.js';

const DATASETS: ReferenceDataset[] = ['lake-huron', 'nile', 'us-real-gdp'];
// The reference files' unit_root_tests agree to the brief's 1e-6 tolerance.
const TOLERANCE = 1e-6;

interface KpssPValueCheck {
  dataset: ReferenceDataset;
  call: string;
  stat: number;
  p_value: number;
}
const kpssPValues = readEvidenceFixture<{ kpss_p_values: KpssPValueCheck[] }>('statsmodels-checks.json').kpss_p_values;

function analysedSeries(dataset: ReferenceDataset): number[] {
  const { transform } = readUnitRootReferences(dataset);
  const values = readSeriesValues(dataset);
  // us-real-gdp is analysed on the natural-log scale (`transform: log` in its reference file).
  return transform === 'log' ? values.map(Math.log) : values;
}

describe.each(DATASETS)('unit-root tests on %s match statsmodels 0.13.5', (dataset) => {
  const y = analysedSeries(dataset);
  const { tests } = readUnitRootReferences(dataset);

  it.each([
    ['kpss_c_legacy', 'level', 'fixed', "regression='c', nlags='legacy'"],
    ['kpss_c_auto', 'level', 'auto', "regression='c', nlags='auto'"],
    ['kpss_ct_legacy', 'trend', 'fixed', "regression='ct', nlags='legacy'"],
    ['kpss_ct_auto', 'trend', 'auto', "regression='ct', nlags='auto'"],
  ] as const)('%s', (key, regression, lagRule, call) => {
    const reference = tests[key];
    const result = kpssTest(y, { regression, lagRule });
    expectRelative(result.stat, reference.stat, TOLERANCE);
    expect(result.lags).toBe(reference.lags);
    expect(result.lag_rule).toBe(lagRule);
    expect(result.critical).toEqual({
      '10': reference.crit['10%'],
      '5': reference.crit['5%'],
      '2.5': reference.crit['2.5%'],
      '1': reference.crit['1%'],
    });
    const check = kpssPValues.find((entry) => entry.dataset === dataset && entry.call === `kpss(x, ${call})`);
    expect(check?.stat).toBeDefined();
    expectRelative(result.p_value, check?.p_value ?? Number.NaN, TOLERANCE);
  });

  it.each([
    ['adf_c_aic', 'constant', undefined],
    ['adf_c_lag0', 'constant', 0],
    ['adf_c_lag1', 'constant', 1],
    ['adf_c_lag2', 'constant', 2],
    ['adf_ct_aic', 'trend', undefined],
    ['adf_ct_lag0', 'trend', 0],
    ['adf_ct_lag1', 'trend', 1],
    ['adf_ct_lag2', 'trend', 2],
  ] as const)('%s', (key, regression, lags) => {
    const reference = tests[key];
    const result = adfTest(y, lags === undefined ? { regression } : { regression, lags });
    expectRelative(result.stat, reference.stat, TOLERANCE);
    expect(result.lags).toBe(reference.lags);
    expect(result.nobs).toBe(reference.nobs);
    expect(result.lag_rule).toBe(lags === undefined ? 'aic' : 'fixed');
    expectRelative(result.p_value, reference.pvalue ?? Number.NaN, TOLERANCE);
    expectRelative(result.critical['1'], reference.crit['1%'], TOLERANCE);
    expectRelative(result.critical['5'], reference.crit['5%'], TOLERANCE);
    expectRelative(result.critical['10'], reference.crit['10%'], TOLERANCE);
  });
});

describe('scale of the us-real-gdp reference values', () => {
  it('the unit_root_tests were computed on log GDP, not on the levels', () => {
    const { tests } = readUnitRootReferences('us-real-gdp');
    const levels = readSeriesValues('us-real-gdp');
    // statsmodels 0.13.5 adfuller(x, maxlag=0, regression='c', autolag=None): 2.2795964857568785 on levels.
    expectRelative(adfTest(levels, { regression: 'constant', lags: 0 }).stat, 2.2795964857568785, TOLERANCE);
    expect(tests.adf_c_lag0.stat).toBeLessThan(0);
    expectRelative(adfTest(levels.map(Math.log), { regression: 'constant', lags: 0 }).stat, tests.adf_c_lag0.stat, TOLERANCE);
  });
});
