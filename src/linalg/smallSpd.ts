// Allocation-free Cholesky solves for the tiny symmetric positive-definite systems of the
// likelihood loop (the GLS normal equations have one or two unknowns). ml-matrix serves
// everywhere else; here a call per likelihood evaluation must not allocate.

/**
 * Cholesky-factors the k×k SPD matrix held row-major in `a` into its lower factor `l`
 * (row-major, k×k). Returns false when the matrix is not positive definite.
 */
export function choleskyInto(a: Float64Array, k: number, l: Float64Array): boolean {
  for (let i = 0; i < k; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = a[i * k + j];
      for (let m = 0; m < j; m++) sum -= l[i * k + m] * l[j * k + m];
      if (i === j) {
        if (!(sum > 0)) return false;
        l[i * k + i] = Math.sqrt(sum);
      } else {
        l[i * k + j] = sum / l[j * k + j];
      }
    }
    for (let j = i + 1; j < k; j++) l[i * k + j] = 0;
  }
  return true;
}

/** Solves L L' x = b in place (`b` becomes x) with the factor from `choleskyInto`. */
export function choleskySolveInPlace(l: Float64Array, k: number, b: Float64Array): void {
  for (let i = 0; i < k; i++) {
    let sum = b[i];
    for (let m = 0; m < i; m++) sum -= l[i * k + m] * b[m];
    b[i] = sum / l[i * k + i];
  }
  for (let i = k - 1; i >= 0; i--) {
    let sum = b[i];
    for (let m = i + 1; m < k; m++) sum -= l[m * k + i] * b[m];
    b[i] = sum / l[i * k + i];
  }
}

/** Inverse of an SPD matrix from its Cholesky factor, as a new row-major array. */
export function choleskyInverse(l: Float64Array, k: number): Float64Array {
  const inverse = new Float64Array(k * k);
  const column = new Float64Array(k);
  for (let j = 0; j < k; j++) {
    column.fill(0);
    column[j] = 1;
    choleskySolveInPlace(l, k, column);
    for (let i = 0; i < k; i++) inverse[i * k + j] = column[i];
  }
  return inverse;
}
