// Smallest modulus of the roots of 1 − a₁z − … − a_p z^p, from the eigenvalues λ of the
// companion matrix (the roots are 1/λ; common practice). A modulus near 1 marks a fit at the
// edge of stationarity (AR) or invertibility (MA), where standard errors mean little; an MA
// root near 1 in the differenced model is the classic sign of over-differencing.
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';

/** A complex number, for roots. */
export interface Complex {
  re: number;
  im: number;
}

/**
 * The inverse roots 1/z of 1 − a₁z − … − a_p z^p: the eigenvalues of the companion matrix.
 * A stationary (or invertible) polynomial has every inverse root inside the unit circle.
 */
export function inverseRoots(coefficients: ArrayLike<number>): Complex[] {
  const p = coefficients.length;
  if (p === 0) return [];
  const companion = Matrix.zeros(p, p);
  for (let j = 0; j < p; j++) companion.set(0, j, coefficients[j]);
  for (let i = 1; i < p; i++) companion.set(i, i - 1, 1);
  const eigen = new EigenvalueDecomposition(companion);
  return eigen.realEigenvalues.map((re, i) => ({ re, im: eigen.imaginaryEigenvalues[i] }));
}

/** Smallest root modulus of 1 − Σ a_i z^i, or null for an empty polynomial. */
export function smallestRootModulus(coefficients: ArrayLike<number>): number | null {
  if (coefficients.length === 0) return null;
  const largest = Math.max(...inverseRoots(coefficients).map(({ re, im }) => Math.hypot(re, im)));
  return largest === 0 ? Number.POSITIVE_INFINITY : 1 / largest;
}

/** Smallest root modulus of the MA polynomial 1 + θ₁z + … + θ_q z^q. */
export function smallestMaRootModulus(theta: ArrayLike<number>): number | null {
  return smallestRootModulus(Array.from(theta, (v) => -v));
}
