// OLS against statsmodels 0.13.5: sm.OLS(x, sm.add_constant(np.arange(1, n + 1))).fit() on
// test/fixtures/lake-huron.csv; values in test/fixtures/evidence/statsmodels-checks.json → ols.
import { inverse, Matrix, QrDecomposition } from 'ml-matrix';
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

describe('ols against ml-matrix, to the last bit', () => {
  // ml-matrix 6.15.1 (npm), the general-purpose library this routine replaced: its
  // QrDecomposition for β and its inverse of R for the standard errors. The same operations
  // in the same order give the same doubles, so a search's choices cannot move.
  function reference(y: ArrayLike<number>, columns: readonly ArrayLike<number>[]): { beta: number[]; se: number[] } {
    const design = new Matrix(y.length, columns.length);
    columns.forEach((column, j) => {
      for (let i = 0; i < y.length; i++) design.set(i, j, column[i]);
    });
    const qr = new QrDecomposition(design);
    const beta = qr.solve(Matrix.columnVector(Array.from(y))).getColumn(0);
    let ssr = 0;
    for (let i = 0; i < y.length; i++) {
      let fitted = 0;
      for (let j = 0; j < columns.length; j++) fitted += design.get(i, j) * beta[j];
      ssr += (y[i] - fitted) ** 2;
    }
    const rInverse = inverse(qr.upperTriangularMatrix);
    const se = beta.map((_, j) => Math.sqrt((ssr / (y.length - columns.length)) * rInverse.getRow(j).reduce((sum, v) => sum + v ** 2, 0)));
    return { beta, se };
  }

  it('gives the same coefficients and standard errors on a trend regression and a lag regression of Lake Huron', () => {
    const lagged = lake.slice(0, -1);
    const changes = lake.slice(1).map((value, t) => value - lake[t]);
    const cases: [ArrayLike<number>, ArrayLike<number>[]][] = [
      [lake, [ones, time]],
      [changes, [ones.subarray(1), time.subarray(1), lagged, changes.map((_, t) => (t === 0 ? 0 : changes[t - 1]))]],
    ];
    for (const [y, columns] of cases) {
      const fit = ols(y, columns);
      const expected = reference(y, columns);
      expect(Array.from(fit.coefficients)).toEqual(expected.beta);
      expect(Array.from(fit.standardErrors)).toEqual(expected.se);
    }
  });
});
