// Ordinary least squares by Householder QR, the one implementation every stage uses: the
// auxiliary regressions of the unit-root tests, the trend regressions that start the ARMA
// fits and the Hannan-Rissanen regressions. QR rather than the normal equations because
// those regressions mix a lagged level in the thousands with a time index and small
// differences, and X'X would square that conditioning. The inputs are copied, so nothing the
// caller owns changes.
//
// The decomposition is the classic Householder one of LINPACK's and JAMA's QR (Golub & Van
// Loan 2013, §5.2.2), written on one column-major Float64Array: an order search runs it some
// hundred times per series, and a matrix object per call made it a large share of the fit's
// time and garbage. The operations run in the order ml-matrix's QrDecomposition and its
// inverse of R (an LU solve that, on a triangular matrix, reduces to back substitution) run
// them, so the results are the same to the last bit (test/linalg/ols.test.ts compares them).

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

/** √(a² + b²) without overflow, in the form the decomposition has always used. */
function hypotenuse(a: number, b: number): number {
  if (Math.abs(a) > Math.abs(b)) {
    const r = b / a;
    return Math.abs(a) * Math.sqrt(1 + r * r);
  }
  if (b !== 0) {
    const r = a / b;
    return Math.abs(b) * Math.sqrt(1 + r * r);
  }
  return 0;
}

/** As `ols`, but undefined when the columns are collinear, for callers that have a way round it. */
export function leastSquares(y: ArrayLike<number>, columns: readonly ArrayLike<number>[]): OlsFit | undefined {
  const nobs = y.length;
  const k = columns.length;
  if (k === 0) throw new Error('ols needs at least one regressor column');
  if (nobs <= k) throw new Error('ols needs more observations than regressors');
  // Column-major: element (i, j) at j·nobs + i. `design` keeps X for the residuals; `qr` is overwritten.
  const design = new Float64Array(nobs * k);
  columns.forEach((column, j) => {
    if (column.length !== nobs) throw new Error('ols needs every regressor column as long as y');
    for (let i = 0; i < nobs; i++) design[j * nobs + i] = column[i];
  });
  const qr = Float64Array.from(design);
  const rdiag = new Float64Array(k);
  for (let c = 0; c < k; c++) {
    const col = c * nobs;
    let nrm = 0;
    for (let i = c; i < nobs; i++) nrm = hypotenuse(nrm, qr[col + i]);
    if (nrm !== 0) {
      if (qr[col + c] < 0) nrm = -nrm;
      for (let i = c; i < nobs; i++) qr[col + i] = qr[col + i] / nrm;
      qr[col + c] = qr[col + c] + 1;
      for (let j = c + 1; j < k; j++) {
        const other = j * nobs;
        let s = 0;
        for (let i = c; i < nobs; i++) s += qr[col + i] * qr[other + i];
        s = -s / qr[col + c];
        for (let i = c; i < nobs; i++) qr[other + i] = qr[other + i] + s * qr[col + i];
      }
    }
    rdiag[c] = -nrm;
  }
  // A diagonal of R below max|R_ii|·max(n, k)·ε counts as zero, the tolerance numpy's
  // matrix_rank applies to singular values (common practice); exact collinearity leaves
  // rounding-sized diagonals rather than zeros.
  let largest = 0;
  for (let j = 0; j < k; j++) largest = Math.max(largest, Math.abs(rdiag[j]));
  const rankTolerance = largest * Math.max(nobs, k) * Number.EPSILON;
  for (let j = 0; j < k; j++) if (Math.abs(rdiag[j]) <= rankTolerance) return undefined;

  // β: Qᵀy by the stored reflections, then back substitution on R.
  const x = Float64Array.from(y);
  for (let c = 0; c < k; c++) {
    const col = c * nobs;
    let s = 0;
    for (let i = c; i < nobs; i++) s += qr[col + i] * x[i];
    s = -s / qr[col + c];
    for (let i = c; i < nobs; i++) x[i] = x[i] + s * qr[col + i];
  }
  for (let c = k - 1; c >= 0; c--) {
    x[c] = x[c] / rdiag[c];
    for (let i = 0; i < c; i++) x[i] = x[i] - x[c] * qr[c * nobs + i];
  }
  const coefficients = x.slice(0, k);
  const residuals = new Float64Array(nobs);
  let ssr = 0;
  for (let i = 0; i < nobs; i++) {
    let fitted = 0;
    for (let j = 0; j < k; j++) fitted += design[j * nobs + i] * coefficients[j];
    residuals[i] = y[i] - fitted;
    ssr += residuals[i] * residuals[i];
  }
  const sigma2 = ssr / (nobs - k);

  // (X'X)⁻¹ = R⁻¹R⁻ᵀ, so its diagonal is the row sums of squares of R⁻¹. R⁻¹ by back
  // substitution on the identity, row-major: R(i, j) is qr(i, j) above the diagonal, rdiag on it.
  const rInverse = new Float64Array(k * k);
  for (let j = 0; j < k; j++) rInverse[j * k + j] = 1;
  for (let c = k - 1; c >= 0; c--) {
    for (let j = 0; j < k; j++) rInverse[c * k + j] = rInverse[c * k + j] / rdiag[c];
    for (let i = 0; i < c; i++) {
      const r = qr[c * nobs + i];
      for (let j = 0; j < k; j++) rInverse[i * k + j] = rInverse[i * k + j] - rInverse[c * k + j] * r;
    }
  }
  const standardErrors = new Float64Array(k);
  for (let j = 0; j < k; j++) {
    let sum = 0;
    for (let l = 0; l < k; l++) sum += rInverse[j * k + l] ** 2;
    standardErrors[j] = Math.sqrt(sigma2 * sum);
  }
  return { coefficients, standardErrors, residuals, ssr, sigma2, nobs };
}
