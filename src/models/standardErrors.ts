// Standard errors of the ARMA coefficients from the observed information: the inverse of
// minus the numerical Hessian of the profile log-likelihood at the optimum. The profile
// Hessian's inverse equals the ARMA block of the full inverse information, since β and σ²
// are maximised out exactly (Pawitan 2001, §9.6). β's standard errors come from GLS.
import { invertSymmetric } from '../linalg/invertSymmetric.js';
import type { ProfileLikelihood } from './profileLikelihood.js';

/**
 * Standard errors (AR first, then MA) by central differences of step 1e-4·max(|θ|, 0.1).
 * Entries are NaN where the Hessian is not negative definite or a step leaves the region.
 */
export function armaStandardErrors(likelihood: ProfileLikelihood, ar: Float64Array, ma: Float64Array): Float64Array {
  const k = ar.length + ma.length;
  const out = new Float64Array(k).fill(Number.NaN);
  if (k === 0) return out;
  const theta = new Float64Array(k);
  theta.set(ar, 0);
  theta.set(ma, ar.length);
  const at = (point: Float64Array): number => likelihood.atCoefficients(point.subarray(0, ar.length), point.subarray(ar.length));
  const steps = Array.from(theta, (v) => 1e-4 * Math.max(Math.abs(v), 0.1));
  const centre = at(theta);
  const shifted = (moves: readonly [number, number][]): number => {
    const point = theta.slice();
    for (const [index, sign] of moves) point[index] += sign * steps[index];
    return at(point);
  };
  // Minus the Hessian: the observed information, row-major.
  const information = new Float64Array(k * k);
  for (let i = 0; i < k; i++) {
    information[i * k + i] = -(shifted([[i, 1]]) - 2 * centre + shifted([[i, -1]])) / (steps[i] * steps[i]);
    for (let j = 0; j < i; j++) {
      const cross =
        (shifted([[i, 1], [j, 1]]) - shifted([[i, 1], [j, -1]]) - shifted([[i, -1], [j, 1]]) + shifted([[i, -1], [j, -1]])) /
        (4 * steps[i] * steps[j]);
      information[i * k + j] = -cross;
      information[j * k + i] = -cross;
    }
  }
  const covariance = invertSymmetric(information, k);
  if (covariance === undefined) return out;
  for (let i = 0; i < k; i++) {
    const variance = covariance[i * k + i];
    out[i] = variance > 0 ? Math.sqrt(variance) : Number.NaN;
  }
  return out;
}
