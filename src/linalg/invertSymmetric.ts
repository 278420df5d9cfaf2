// The inverse of a small symmetric matrix held row-major, as a pure function over ml-matrix.

import { Matrix, inverse } from 'ml-matrix';

/** A⁻¹ of the k×k matrix `a` (row-major), row-major; undefined when A has a non-finite entry or is singular. */
export function invertSymmetric(a: ArrayLike<number>, k: number): Float64Array | undefined {
  for (let i = 0; i < k * k; i++) if (!Number.isFinite(a[i])) return undefined;
  const matrix = new Matrix(k, k);
  for (let i = 0; i < k; i++) for (let j = 0; j < k; j++) matrix.set(i, j, a[i * k + j]);
  let result: Matrix;
  try {
    result = inverse(matrix);
  } catch {
    return undefined;
  }
  return Float64Array.from(result.to1DArray());
}
