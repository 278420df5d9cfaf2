// The stochastic-trend model with missing levels. Differences next to a missing level are
// unknown, but the change between two observed levels is known: it is the sum of the
// differences in between. So the filter runs on the differences with the state augmented
// by their running sum u since the last observed level,
//   x_j = (α_j, u_j),  α_{j+1} = T α_j + R ε_{j+1},  u_{j+1} = ρ_j u_j + Z T α_j + ε_{j+1},
// with ρ_j = 0 after an observed level (the sum restarts) and 1 after a missing one, and
// observes u_j = Δ_j − c·g_j whenever level j+1 is observed, where Δ_j is the change since
// the last observed level and g_j the number of periods it spans (the drift's regressor).
// On a complete series this is exactly the filter on the differences. The likelihood is
// conditional on the first level, as the differenced model's is (Harvey 1989, §3.7 on
// temporal aggregation; Durbin & Koopman 2012, §4.10 on missing observations).
//
// Dense and general rather than fast: it runs only for series with gaps.
import type { FilterWorkspace, GapScratch } from './filterWorkspace.js';

export function createGapScratch(r: number, ncol: number): GapScratch {
  const d = r + 1;
  return {
    cov: new Float64Array(d * d),
    tmp: new Float64Array(d * d),
    transition: new Float64Array(d * d),
    means: new Float64Array(d * ncol),
    shock: new Float64Array(d),
  };
}

/**
 * Filters `columns` (Δ first, then the regressors; NaN in Δ where the level is missing) from
 * the stationary covariance already in `ws.pmat` (full, r×r). Fills the same outputs as
 * `runFilter`; `ws.state` and `ws.pmat` end as the α part of the last prediction.
 */
export function runGapFilter(ws: FilterWorkspace, scratch: GapScratch, columns: readonly Float64Array[]): boolean {
  const { r, ncol, n, phi, rvec, pmat, cross, innovations, variances, weights } = ws;
  const d = r + 1;
  const { cov, tmp, transition, means, shock } = scratch;
  // x_1 = (α_1, Z α_1): Cov = [[P, P e₁], [e₁'P, P₁₁]].
  cov.fill(0);
  for (let i = 0; i < r; i++) {
    for (let j = 0; j < r; j++) cov[i * d + j] = pmat[i * r + j];
    cov[i * d + r] = pmat[i * r];
    cov[r * d + i] = pmat[i * r];
  }
  cov[r * d + r] = pmat[0];
  means.fill(0);
  cross.fill(0);
  shock.fill(0);
  for (let i = 0; i < r; i++) shock[i] = rvec[i];
  shock[r] = 1;
  transition.fill(0);
  for (let i = 0; i < r; i++) {
    transition[i * d] = phi[i];
    if (i + 1 < r) transition[i * d + i + 1] = 1;
  }
  // Row of u: Z T = first row of T.
  for (let j = 0; j < r; j++) transition[r * d + j] = transition[j];
  let sumLogF = 0;
  let nobs = 0;
  const y = columns[0];
  for (let t = 0; t < n; t++) {
    const observed = !Number.isNaN(y[t]);
    if (observed) {
      const f = cov[r * d + r];
      if (!(f > 0)) return false;
      const invF = 1 / f;
      variances[t] = f;
      weights[t] = invF;
      sumLogF += Math.log(f);
      nobs++;
      for (let c = 0; c < ncol; c++) innovations[c * n + t] = columns[c][t] - means[c * d + r];
      for (let c = 0; c < ncol; c++) {
        const vc = innovations[c * n + t] * invF;
        for (let e = c; e < ncol; e++) cross[c * ncol + e] += vc * innovations[e * n + t];
      }
      // Update: a ← a + P[:,u] v / F, P ← P − P[:,u] P[u,:] / F.
      for (let c = 0; c < ncol; c++) {
        const v = innovations[c * n + t];
        for (let i = 0; i < d; i++) means[c * d + i] += cov[i * d + r] * v * invF;
      }
      for (let i = 0; i < d; i++) for (let j = 0; j < d; j++) tmp[i * d + j] = cov[i * d + j] - cov[i * d + r] * cov[r * d + j] * invF;
      cov.set(tmp);
    } else {
      variances[t] = Number.NaN;
      weights[t] = 0;
      for (let c = 0; c < ncol; c++) innovations[c * n + t] = 0;
    }
    // Predict with ρ = 0 after an observed level, 1 after a missing one.
    transition[r * d + r] = observed ? 0 : 1;
    predict(means, cov, tmp, transition, shock, d, ncol);
  }
  for (let c = 0; c < ncol; c++) for (let i = 0; i < r; i++) ws.state[c * r + i] = means[c * d + i];
  for (let i = 0; i < r; i++) for (let j = 0; j < r; j++) pmat[i * r + j] = cov[i * d + j];
  ws.sumLogF = sumLogF;
  ws.nobs = nobs;
  return true;
}

/** a ← A a for every column; P ← A P A' + b b'. */
function predict(means: Float64Array, cov: Float64Array, tmp: Float64Array, a: Float64Array, b: Float64Array, d: number, ncol: number): void {
  for (let c = 0; c < ncol; c++) {
    const base = c * d;
    for (let i = 0; i < d; i++) {
      let sum = 0;
      for (let k = 0; k < d; k++) sum += a[i * d + k] * means[base + k];
      tmp[i] = sum;
    }
    for (let i = 0; i < d; i++) means[base + i] = tmp[i];
  }
  for (let i = 0; i < d; i++) {
    for (let j = 0; j < d; j++) {
      let sum = 0;
      for (let k = 0; k < d; k++) sum += a[i * d + k] * cov[k * d + j];
      tmp[i * d + j] = sum;
    }
  }
  for (let i = 0; i < d; i++) {
    for (let j = 0; j < d; j++) {
      let sum = b[i] * b[j];
      for (let k = 0; k < d; k++) sum += tmp[i * d + k] * a[j * d + k];
      cov[i * d + j] = sum;
    }
  }
}
