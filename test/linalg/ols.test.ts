// OLS against statsmodels 0.13.5: sm.OLS(x, sm.add_constant(np.arange(1, n + 1))).fit() on
// test/fixtures/lake-huron.csv; values in test/fixtures/evidence/statsmodels-checks.json → ols.
import { describe, expect, it } from 'vitest';
import { ols } from '../../src/linalg/ols.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { readEvidenceFixture, readSeriesValues } from '../evidence/referenceFixtures.js';

const reference = readEvidenceFixture<{ ols: { params: number[]; bse: number[]; ssr: number } }>(
  'statsmodels-checks.json',
).ols;
const lake = readSeriesValues('lake-huron');
const ones = new Float64Array(lake.length).fill(1);
const time = Float64Array.from({ length: lake.length }, (_, t) => t + 1);

describe('ols', () => {
  it('matches statsmodels on Lake Huron regressed on [1, t]', () => {
    const fit = ols(lake, [ones, time]);
    expectRelative(fit.coefficients[0], reference.params[0], 1e-10);
    expectRelative(fit.coefficients[1], reference.params[1], 1e-10);
    expectRelative(fit.standardErrors[0], reference.bse[0], 1e-10);
    expectRelative(fit.standardErrors[1], reference.bse[1], 1e-10);
    expectRelative(fit.ssr, reference.ssr, 1e-10);
    expect(fit.nobs).toBe(98);
  });

  it('leaves its inputs unchanged', () => {
    const y = Float64Array.from(lake);
    const t = Float64Array.from(time);
    ols(y, [ones, t]);
    expect(Array.from(y)).toEqual(lake);
    expect(Array.from(t)).toEqual(Array.from(time));
  });

  it('refuses collinear columns and too few rows', () => {
    expect(() => ols(lake, [ones, ones])).toThrow('ols needs regressor columns of full rank');
    expect(() => ols([1, 2], [[1, 1], [1, 2]])).toThrow('ols needs more observations than regressors');
  });
});
