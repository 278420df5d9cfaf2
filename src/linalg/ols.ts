// Ordinary least squares by Householder QR, the one implementation every stage uses: the
// auxiliary regressions of the unit-root tests, the trend regressions that start the ARMA
// fits and the Hannan-Rissanen regressions. QR rather than the normal equations because
// those regressions mix a lagged level in the thousands with a time index and small
// differences, and X'X would square that conditioning. The inputs are copied into a fresh
// matrix, so nothing the caller owns changes.
import { Matrix, QrDecomposition, inverse } from 'ml-matrix';

/** Result of an OLS fit; arrays are in the order of the regressor columns given. */
export interface OlsFit {
  coefficients: Float64Array;
  /** Conventional standard errors, sqrt(sigma2 · diag((X'X)⁻¹)). */
  standardErrors: Float64Array;
  residuals: Float64Array;
  /** Sum of squared residuals. */
  ssr: number;
  /** Unbiased residual variance ssr / (nobs − regressors). */
  sigma2: number;
  nobs: number;
}

/**
 * Fits y on the given regressor columns (include a column of ones for a constant).
 * Throws when there are not more rows than columns or the columns are collinear.
 */
export function ols(y: ArrayLike<number>, columns: readonly ArrayLike<number>[]): OlsFit {
  const fit = leastSquares(y, columns);
  if (fit === undefined) throw new Error('ols needs regressor columns of full rank');
  return fit;
}

/** As `ols`, but undefined when the columns are collinear, for callers that have a way round it. */
export function leastSquares(y: ArrayLike<number>, columns: readonly ArrayLike<number>[]): OlsFit | undefined {
  const nobs = y.length;
  const k = columns.length;
  if (k === 0) throw new Error('ols needs at least one regressor column');
  if (nobs <= k) throw new Error('ols needs more observations than regressors');
  const design = new Matrix(nobs, k);
  columns.forEach((column, j) => {
    if (column.length !== nobs) throw new Error('ols needs every regressor column as long as y');
    for (let i = 0; i < nobs; i++) design.set(i, j, column[i]);
  });
  const response = Matrix.columnVector(Array.from(y));
  const qr = new QrDecomposition(design);
  const upper = qr.upperTriangularMatrix;
  // A diagonal of R below max|R_ii|·max(n, k)·ε counts as zero, the tolerance numpy's
  // matrix_rank applies to singular values (common practice); exact collinearity leaves
  // rounding-sized diagonals rather than zeros.
  const diagonal = Array.from({ length: k }, (_, j) => Math.abs(upper.get(j, j)));
  const rankTolerance = Math.max(...diagonal) * Math.max(nobs, k) * Number.EPSILON;
  if (diagonal.some((value) => value <= rankTolerance)) return undefined;
  const beta = qr.solve(response);

  const coefficients = new Float64Array(k);
  for (let j = 0; j < k; j++) coefficients[j] = beta.get(j, 0);
  const residuals = new Float64Array(nobs);
  let ssr = 0;
  for (let i = 0; i < nobs; i++) {
    let fitted = 0;
    for (let j = 0; j < k; j++) fitted += design.get(i, j) * coefficients[j];
    residuals[i] = y[i] - fitted;
    ssr += residuals[i] * residuals[i];
  }
  const sigma2 = ssr / (nobs - k);

  // (X'X)⁻¹ = R⁻¹R⁻ᵀ, so its diagonal is the row sums of squares of R⁻¹.
  const rInverse = inverse(upper);
  const standardErrors = new Float64Array(k);
  for (let j = 0; j < k; j++) {
    let sum = 0;
    for (let l = 0; l < k; l++) sum += rInverse.get(j, l) ** 2;
    standardErrors[j] = Math.sqrt(sigma2 * sum);
  }
  return { coefficients, standardErrors, residuals, ssr, sigma2, nobs };
}
