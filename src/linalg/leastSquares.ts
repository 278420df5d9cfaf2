// Ordinary least squares over ml-matrix, as a pure function: nothing passed in is modified.
import { Matrix, QrDecomposition } from 'ml-matrix';

export interface LeastSquaresFit {
  coefficients: Float64Array;
  residuals: Float64Array;
  /** Residual sum of squares. */
  ssr: number;
}

/**
 * Solves min ‖y − Xb‖² by Householder QR. `rows[i]` is the i-th row of X. Returns undefined
 * when X is rank-deficient.
 */
export function leastSquares(rows: readonly ArrayLike<number>[], y: ArrayLike<number>): LeastSquaresFit | undefined {
  const n = rows.length;
  if (n === 0) return undefined;
  const design = new Matrix(rows.map((row) => Array.from(row)));
  const qr = new QrDecomposition(design);
  if (!qr.isFullRank()) return undefined;
  const solution = qr.solve(Matrix.columnVector(Array.from(y)));
  const coefficients = Float64Array.from(solution.getColumn(0));
  const residuals = new Float64Array(n);
  let ssr = 0;
  for (let i = 0; i < n; i++) {
    let fitted = 0;
    for (let j = 0; j < coefficients.length; j++) fitted += rows[i][j] * coefficients[j];
    residuals[i] = y[i] - fitted;
    ssr += residuals[i] * residuals[i];
  }
  return { coefficients, residuals, ssr };
}
