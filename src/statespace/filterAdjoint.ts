// The sensitivities of the profile (or restricted) log-likelihood to what the column pass
// reads: the AR coefficients φ (the transition T), the gains g_t = K_t / F_t and the
// innovation variances F_t, by one backward (adjoint) pass over the columns, reverse-mode
// differentiation of the filter (Griewank & Walther 2008, ch. 3, for the method; the
// recursions below are ours). With them the gradient in any parameter costs only a rerun of
// the data-free part (the stationary start and the gain recursion, a few percent of an
// evaluation) instead of a whole evaluation per parameter (profileLikelihood.ts).
//
// After `runFilter` on a complete series (the Chandrasekhar path), with β̂ in ws.gramRhs:
//   ML:   ℓ = −½ m (log 2π + 1 + log(S/m)) − ½ Σ log F_t,        S = Σ_t e_t² / F_t,
//   REML: ℓ = −½ (m−k)(log 2π + 1 + log(S/(m−k))) − ½ Σ log F_t − ½ log det G,  G = Σ_t x̃_t x̃_t' / F_t,
// with e_t = v_{y,t} − x̃_t'β̂ and x̃_t the regressors' innovations. β̂ minimises S, so
// ∂S/∂v_{y,t} = 2e_t/F_t, ∂S/∂x̃_t = −2β̂ e_t/F_t and ∂S/∂F_t = −e_t²/F_t² (envelope theorem).
// The column pass is a_{t+1} = T a_t + g_t v_t, v_t = y_t − a_t[0], for every column; its
// adjoint λ_t = ∂ℓ/∂a_t runs backwards:
//   ∂ℓ/∂g_t[i] = Σ_c λ_{t+1}[i,c] v_{c,t},   ∂ℓ/∂φ_i += Σ_c λ_{t+1}[i,c] a_t[0,c],
//   ∂̄ℓ/∂v_{c,t} = ∂ℓ/∂v_{c,t} + Σ_i g_t[i] λ_{t+1}[i,c],
//   λ_t[0,c] = Σ_i φ_i λ_{t+1}[i,c] − ∂̄ℓ/∂v_{c,t},   λ_t[j,c] = λ_{t+1}[j−1,c] (j ≥ 1).
import type { Estimation } from '../base/settings.js';
import { choleskySolveInPlace } from '../linalg/smallSpd.js';
import type { FilterWorkspace } from './filterWorkspace.js';

/** The sensitivities, per time where they vary with it. */
export interface FilterSensitivities {
  /** ∂ℓ/∂φ_i, i < r. */
  phi: Float64Array;
  /** ∂ℓ/∂g_t[i] at [t·r + i]. */
  gains: Float64Array;
  /** ∂ℓ/∂F_t. */
  variances: Float64Array;
}

export function createSensitivities(r: number, n: number): FilterSensitivities {
  return { phi: new Float64Array(r), gains: new Float64Array(n * r), variances: new Float64Array(n) };
}

/** Scratch for `filterSensitivities`: the adjoint ring, per-column terms and a GLS solve. */
export interface AdjointScratch {
  ring: Float64Array;
  direct: Float64Array;
  column: Float64Array;
  shifted: Float64Array;
  innovation: Float64Array;
  predicted: Float64Array;
  solve: Float64Array;
}

export function createAdjointScratch(r: number, ncol: number, n: number): AdjointScratch {
  return { ring: new Float64Array(r * ncol), direct: new Float64Array(ncol * n), column: new Float64Array(ncol), shifted: new Float64Array(ncol), innovation: new Float64Array(ncol), predicted: new Float64Array(ncol), solve: new Float64Array(Math.max(1, ncol - 1)) };
}

/**
 * Fills `out` for the workspace's last run (complete series, covariance not kept), whose
 * log-likelihood was computed by `estimation`'s function (so ws.gramRhs holds β̂ and
 * ws.gramFactor the Cholesky factor of G). `arLength`: the AR coefficients that can be
 * nonzero (the process's p); ∂ℓ/∂φ_i stays 0 beyond them.
 */
export function filterSensitivities(ws: FilterWorkspace, columns: readonly Float64Array[], estimation: Estimation, arLength: number, scratch: AdjointScratch, out: FilterSensitivities): void {
  const { n, ncol, r, stride, phi, gains, variances, innovations: v, gramRhs: beta, gramFactor, steadyFrom } = ws;
  const k = ncol - 1;
  const m = ws.nobs;
  const { ring, direct, column, shifted, innovation, predicted, solve } = scratch;
  // e_t and S.
  let ssr = 0;
  for (let t = 0; t < n; t++) {
    let e = v[t];
    for (let c = 0; c < k; c++) e -= beta[c] * v[(c + 1) * n + t];
    direct[t] = e;
    ssr += (e * e) / variances[t];
  }
  const dof = estimation === 'reml' ? m - k : m;
  const dS = -dof / (2 * ssr);
  // Direct sensitivities to the innovations (laid out like them) and to F_t.
  for (let t = 0; t < n; t++) {
    const f = variances[t];
    const e = direct[t];
    const we = e / f;
    let dF = -dS * (e * e) / (f * f) - 0.5 / f;
    for (let c = 0; c < k; c++) direct[(c + 1) * n + t] = -2 * dS * we * beta[c];
    if (estimation === 'reml' && k > 0) {
      // −½ log det G: ∂/∂x̃_t = −(G⁻¹x̃_t)/F_t, ∂/∂F_t = +½ x̃_t'G⁻¹x̃_t / F_t².
      for (let c = 0; c < k; c++) solve[c] = v[(c + 1) * n + t];
      choleskySolveInPlace(gramFactor, k, solve);
      let quadratic = 0;
      for (let c = 0; c < k; c++) {
        const x = v[(c + 1) * n + t];
        quadratic += x * solve[c];
        direct[(c + 1) * n + t] -= solve[c] / f;
      }
      dF += (0.5 * quadratic) / (f * f);
    }
    direct[t] = 2 * dS * we;
    out.variances[t] = dF;
  }
  // The backward pass: logical row i of λ at physical row (head + i) mod r.
  ring.fill(0, 0, r * ncol);
  out.phi.fill(0);
  let head = 0;
  for (let t = n - 1; t >= 0; t--) {
    const row = (t < steadyFrom ? t : steadyFrom) * stride;
    for (let c = 0; c < ncol; c++) {
      const vc = v[c * n + t];
      column[c] = direct[c * n + t];
      shifted[c] = 0;
      innovation[c] = vc;
      predicted[c] = columns[c][t] - vc;
    }
    const sensitivity = t * r;
    for (let i = 0; i < r; i++) {
      let physical = head + i;
      if (physical >= r) physical -= r;
      const base = physical * ncol;
      const g = gains[row + i];
      const f = phi[i];
      let dg = 0;
      if (i < arLength) {
        let dphi = 0;
        for (let c = 0; c < ncol; c++) {
          const lambda = ring[base + c];
          dg += lambda * innovation[c];
          dphi += lambda * predicted[c];
          column[c] += g * lambda;
          shifted[c] += f * lambda;
        }
        out.phi[i] += dphi;
      } else {
        for (let c = 0; c < ncol; c++) {
          const lambda = ring[base + c];
          dg += lambda * innovation[c];
          column[c] += g * lambda;
        }
      }
      out.gains[sensitivity + i] = dg;
    }
    // λ_t: rows shift down one (the head moves back), and the new row 0 takes the row that held logical r − 1.
    head = head === 0 ? r - 1 : head - 1;
    const base = head * ncol;
    for (let c = 0; c < ncol; c++) ring[base + c] = shifted[c] - column[c];
  }
}
