// Standard errors of the ARMA coefficients, from the observed information where it can be
// had and from the outer product of the scores where it cannot.
// - Observed information: the inverse of minus the numerical Hessian of the profile
//   log-likelihood at the optimum. The profile Hessian's inverse equals the ARMA block of the
//   full inverse information, since β and σ² are maximised out exactly (Pawitan 2001, §9.6).
// - Outer product of the per-observation scores (Berndt, Hall, Hall & Hausman 1974), used
//   when the Hessian is not negative definite or a step of it leaves the admissible region:
//   the log-likelihood's contributions l_t = −½(log 2πσ²F_t + v_t²/(σ²F_t)) are differentiated
//   numerically in the ARMA parameters with β and σ² held at their estimates, the ARMA block
//   of the information being asymptotically separate from theirs (Brockwell & Davis 1991,
//   §8.8, from memory). It needs only first derivatives, on the side of each step that stays
//   in the region.
// β's standard errors come from GLS. With a seasonal part the parameters are the factors'
// (φ, θ, Φ, Θ; seasonalArma.ts), the ones the fit reports, not the expanded coefficients.
import { invertSymmetric } from '../linalg/invertSymmetric.js';
import type { ProfileLikelihood } from './profileLikelihood.js';

/** How the ARMA standard errors were obtained; null without ARMA terms or when neither method works. */
export type StandardErrorMethod = 'observed-information' | 'outer-product' | null;

export interface ArmaStandardErrors {
  /** In the layout of the parameters (AR, MA, seasonal AR, seasonal MA); NaN where no method gives one. */
  values: Float64Array;
  method: StandardErrorMethod;
}

/** Relative step of the numerical derivatives: 1e-4·max(|θ|, 0.1). */
function stepFor(value: number): number {
  return 1e-4 * Math.max(Math.abs(value), 0.1);
}

/** Standard errors of the ARMA parameters `theta`, packed as `ProfileLikelihood.atParameters` takes them. */
export function armaStandardErrors(likelihood: ProfileLikelihood, theta: Float64Array): ArmaStandardErrors {
  const k = theta.length;
  if (k === 0) return { values: new Float64Array(0), method: null };
  const fromHessian = observedInformationErrors(likelihood, theta);
  if (fromHessian.every(Number.isFinite)) return { values: fromHessian, method: 'observed-information' };
  const fromScores = outerProductErrors(likelihood, theta);
  if (fromScores.every(Number.isFinite)) return { values: fromScores, method: 'outer-product' };
  return { values: new Float64Array(k).fill(Number.NaN), method: null };
}

/** Square roots of the diagonal of the inverse of `information` (k×k); NaN where not positive. */
function errorsFromInformation(information: Float64Array, k: number): Float64Array {
  const out = new Float64Array(k).fill(Number.NaN);
  const covariance = invertSymmetric(information, k);
  if (covariance === undefined) return out;
  for (let i = 0; i < k; i++) {
    const variance = covariance[i * k + i];
    out[i] = variance > 0 ? Math.sqrt(variance) : Number.NaN;
  }
  return out;
}

/** By central differences of the profile log-likelihood. */
export function observedInformationErrors(likelihood: ProfileLikelihood, theta: Float64Array): Float64Array {
  const k = theta.length;
  const at = (point: Float64Array): number => likelihood.atParameters(point);
  const steps = Array.from(theta, stepFor);
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
  return errorsFromInformation(information, k);
}

/** By the outer product of the per-observation scores. */
export function outerProductErrors(likelihood: ProfileLikelihood, theta: Float64Array): Float64Array {
  const k = theta.length;
  const failed = new Float64Array(k).fill(Number.NaN);
  const base = contributions(likelihood, theta);
  if (base === undefined) return failed;
  const { beta, sigma2 } = base;
  const n = base.values.length;
  const scores: Float64Array[] = [];
  for (let i = 0; i < k; i++) {
    const step = stepFor(theta[i]);
    const moved = (sign: number): Float64Array | undefined => {
      const point = theta.slice();
      point[i] += sign * step;
      return contributions(likelihood, point, { beta, sigma2 })?.values;
    };
    const up = moved(1);
    const down = moved(-1);
    // Central where both sides stay admissible, one-sided where only one does.
    const score = up !== undefined && down !== undefined ? up.map((v, t) => (v - down[t]) / (2 * step)) : up !== undefined ? up.map((v, t) => (v - base.values[t]) / step) : down?.map((v, t) => (base.values[t] - v) / step);
    if (score === undefined) return failed;
    scores.push(score);
  }
  const information = new Float64Array(k * k);
  for (let i = 0; i < k; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = 0;
      for (let t = 0; t < n; t++) sum += scores[i][t] * scores[j][t];
      information[i * k + j] = sum;
      information[j * k + i] = sum;
    }
  }
  return errorsFromInformation(information, k);
}

/**
 * l_t at the ARMA parameters `theta`, 0 at a missing observation; with `fixed`, at that β and
 * σ², else at their estimates for `theta`. Undefined outside the region.
 */
function contributions(
  likelihood: ProfileLikelihood,
  theta: Float64Array,
  fixed?: { beta: Float64Array; sigma2: number },
): { values: Float64Array; beta: Float64Array; sigma2: number } | undefined {
  if (Number.isNaN(likelihood.atParameters(theta))) return undefined;
  const { innovations, variances, gramRhs, n, ncol, nobs } = likelihood.workspace;
  const k = ncol - 1;
  const beta = fixed?.beta ?? gramRhs.slice(0, k);
  const residual = (t: number): number => {
    let v = innovations[t];
    for (let c = 0; c < k; c++) v -= beta[c] * innovations[(c + 1) * n + t];
    return v;
  };
  let sigma2 = fixed?.sigma2;
  if (sigma2 === undefined) {
    let sum = 0;
    for (let t = 0; t < n; t++) if (!Number.isNaN(variances[t])) sum += residual(t) ** 2 / variances[t];
    sigma2 = sum / nobs;
  }
  const values = new Float64Array(n);
  for (let t = 0; t < n; t++) {
    const f = variances[t];
    if (Number.isNaN(f)) continue;
    values[t] = -0.5 * (Math.log(2 * Math.PI * sigma2 * f) + residual(t) ** 2 / (sigma2 * f));
  }
  return { values, beta, sigma2 };
}
