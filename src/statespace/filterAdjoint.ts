// The sensitivities of the profile (or restricted) log-likelihood to what the column pass
// reads: the AR coefficients φ (the transition T), the gains g_t = K_t / F_t and the
// innovation variances F_t, by one backward (adjoint) pass over the columns, reverse-mode
// differentiation of the filter (Griewank & Walther 2008, ch. 3, for the method; the
// recursions below are ours); then a second backward pass through the gain recursion
// (`gainRecursionAdjoint`) carries the gains' and variances' sensitivities back to φ and to the
// stationary covariance's first column. The gradient in any parameter then costs only that
// parameter's change in those two (a stationary-moment solve), not an evaluation
// (profileLikelihood.ts).
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
import { ensureGainStates, runChandrasekharGeneric, SCALAR_STATE } from './filterRecursions.js';

/** The sensitivities, per time where they vary with it. */
export interface FilterSensitivities {
  /** ∂ℓ/∂φ_i, i < r (stride entries, 0 beyond r). */
  phi: Float64Array;
  /**
   * ∂ℓ/∂g_t[i] at [t·stride + i], the layout of the workspace's gains (i ≥ r unused), for t
   * before the steady point; later times count only in `settledGains`.
   */
  gains: Float64Array;
  /** ∂ℓ/∂F_t, for t before the steady point; later times count only in `settledVariance`. */
  variances: Float64Array;
  /**
   * Σ_{t ≥ steady point} of `gains` (stride entries) and of `variances`: the sensitivity to the
   * settled gain and variance, which every time from the filter's steady point on uses.
   */
  settledGains: Float64Array;
  settledVariance: number;
}

/** Sensitivities for a workspace with the given stride (its gain rows' length) and n. */
export function createSensitivities(stride: number, n: number): FilterSensitivities {
  return { phi: new Float64Array(stride), gains: new Float64Array(n * stride), variances: new Float64Array(n), settledGains: new Float64Array(stride), settledVariance: 0 };
}

/** Scratch for `filterSensitivities`: the adjoint ring, per-column terms and G⁻¹. */
export interface AdjointScratch {
  ring: Float64Array;
  direct: Float64Array;
  column: Float64Array;
  shifted: Float64Array;
  innovation: Float64Array;
  predicted: Float64Array;
  /** G⁻¹, k×k, for REML. */
  gramInverse: Float64Array;
  solve: Float64Array;
}

export function createAdjointScratch(r: number, ncol: number, n: number): AdjointScratch {
  const k = Math.max(1, ncol - 1);
  return {
    ring: new Float64Array(r * ncol),
    direct: new Float64Array(ncol * n),
    column: new Float64Array(ncol),
    shifted: new Float64Array(ncol),
    innovation: new Float64Array(ncol),
    predicted: new Float64Array(ncol),
    gramInverse: new Float64Array(k * k),
    solve: new Float64Array(k),
  };
}

/**
 * Fills `out` for the workspace's last run (complete series, covariance not kept), whose
 * log-likelihood was computed by `estimation`'s function (so ws.gramRhs holds β̂ and
 * ws.gramFactor the Cholesky factor of G). `arLength`: the AR coefficients that can be
 * nonzero (the process's p); ∂ℓ/∂φ_i stays 0 beyond them. State dimensions up to four with
 * at most three columns take a backward pass on scalars, the mirror of the forward one
 * (filterRecursions.ts); it gives the same sensitivities as the ring to rounding.
 */
export function filterSensitivities(ws: FilterWorkspace, columns: readonly Float64Array[], estimation: Estimation, arLength: number, scratch: AdjointScratch, out: FilterSensitivities): void {
  if (estimation === 'reml' && ws.ncol > 1) gramInverse(ws, scratch);
  if (ws.stride === SCALAR_STATE && ws.ncol <= 3) {
    backwardScalar(ws, columns, estimation, arLength, scratch.gramInverse, out);
    return;
  }
  directSensitivities(ws, estimation, scratch, out);
  backwardGeneric(ws, columns, arLength, scratch, out);
  const { n, stride, steadyFrom } = ws;
  out.settledGains.fill(0);
  out.settledVariance = 0;
  for (let t = steadyFrom; t < n; t++) {
    for (let i = 0; i < stride; i++) out.settledGains[i] += out.gains[t * stride + i];
    out.settledVariance += out.variances[t];
  }
}

/** G⁻¹ (k×k) into scratch.gramInverse from the Cholesky factor the restricted likelihood left. */
function gramInverse(ws: FilterWorkspace, scratch: AdjointScratch): void {
  const k = ws.ncol - 1;
  const { gramInverse: inverse, solve } = scratch;
  for (let c = 0; c < k; c++) {
    solve.fill(0, 0, k);
    solve[c] = 1;
    choleskySolveInPlace(ws.gramFactor, k, solve);
    for (let d = 0; d < k; d++) inverse[d * k + c] = solve[d];
  }
}

/** The residual sum S = Σ e_t²/F_t at β̂, from the cross-products the likelihood solved with. */
function residualSum(ws: FilterWorkspace): number {
  const { ncol, cross, gramRhs: beta } = ws;
  let explained = 0;
  for (let c = 1; c < ncol; c++) explained += beta[c - 1] * cross[c];
  return cross[0] - explained;
}

/** ∂ℓ/∂v_{c,t} with β̂ held (into scratch.direct, laid out like the innovations) and ∂ℓ/∂F_t (into out.variances). */
function directSensitivities(ws: FilterWorkspace, estimation: Estimation, scratch: AdjointScratch, out: FilterSensitivities): void {
  const { n, ncol, variances, innovations: v, gramRhs: beta } = ws;
  const k = ncol - 1;
  const m = ws.nobs;
  const { direct, gramInverse: inverse } = scratch;
  const reml = estimation === 'reml' && k > 0;
  for (let t = 0; t < n; t++) {
    let e = v[t];
    for (let c = 0; c < k; c++) e -= beta[c] * v[(c + 1) * n + t];
    direct[t] = e;
  }
  const ssr = residualSum(ws);
  const dof = estimation === 'reml' ? m - k : m;
  const dS = -dof / (2 * ssr);
  for (let t = 0; t < n; t++) {
    const f = variances[t];
    const e = direct[t];
    const we = e / f;
    let dF = -dS * (e * e) / (f * f) - 0.5 / f;
    for (let c = 0; c < k; c++) direct[(c + 1) * n + t] = -2 * dS * we * beta[c];
    if (reml) {
      // −½ log det G: ∂/∂x̃_t = −(G⁻¹x̃_t)/F_t, ∂/∂F_t = +½ x̃_t'G⁻¹x̃_t / F_t².
      let quadratic = 0;
      for (let c = 0; c < k; c++) {
        let product = 0;
        for (let d = 0; d < k; d++) product += inverse[c * k + d] * v[(d + 1) * n + t];
        quadratic += v[(c + 1) * n + t] * product;
        direct[(c + 1) * n + t] -= product / f;
      }
      dF += (0.5 * quadratic) / (f * f);
    }
    direct[t] = 2 * dS * we;
    out.variances[t] = dF;
  }
}

/** The backward pass over the ring of λ, every column at once. */
function backwardGeneric(ws: FilterWorkspace, columns: readonly Float64Array[], arLength: number, scratch: AdjointScratch, out: FilterSensitivities): void {
  const { n, ncol, r, stride, phi, gains, innovations: v, steadyFrom } = ws;
  const { ring, direct, column, shifted, innovation, predicted } = scratch;
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
    const sensitivity = t * stride;
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
        }
        out.phi[i] += dphi;
      } else {
        for (let c = 0; c < ncol; c++) {
          const lambda = ring[base + c];
          dg += lambda * innovation[c];
          column[c] += g * lambda;
        }
      }
      // φ_i = 0 (most of a seasonal model's expanded coefficients) adds nothing to λ: ±0 · λ leaves the sums as they are.
      if (f !== 0) for (let c = 0; c < ncol; c++) shifted[c] += f * ring[base + c];
      out.gains[sensitivity + i] = dg;
    }
    // λ_t: rows shift down one (the head moves back), and the new row 0 takes the row that held logical r − 1.
    head = head === 0 ? r - 1 : head - 1;
    const base = head * ncol;
    for (let c = 0; c < ncol; c++) ring[base + c] = shifted[c] - column[c];
  }
}

/**
 * The same for state dimensions up to four and at most three columns, in one backward sweep
 * on scalars: the direct terms, λ of each column in four locals (y, x1, x2; an absent column's
 * innovations and λ stay 0) as the forward pass keeps its states, and the sums from the steady
 * point on. Rows at or beyond r only ever meet φ_i = g_i = 0. `inverse`: G⁻¹ for REML.
 */
function backwardScalar(ws: FilterWorkspace, columns: readonly Float64Array[], estimation: Estimation, arLength: number, inverse: Float64Array, out: FilterSensitivities): void {
  const { n, ncol, phi, gains, weights, innovations: v, gramRhs: beta, steadyFrom } = ws;
  const k = ncol - 1;
  const y = columns[0];
  const x1 = ncol > 1 ? columns[1] : ws.zeros;
  const x2 = ncol > 2 ? columns[2] : ws.zeros;
  const o1 = n;
  const o2 = 2 * n;
  const reml = estimation === 'reml' && k > 0;
  const dS = -(reml ? ws.nobs - k : ws.nobs) / (2 * residualSum(ws));
  const beta1 = k > 0 ? beta[0] : 0;
  const beta2 = k > 1 ? beta[1] : 0;
  // G⁻¹ for REML's −½ log det G: ∂/∂x̃_t = −(G⁻¹x̃_t)/F_t, ∂/∂F_t = +½ x̃_t'G⁻¹x̃_t / F_t².
  const i11 = reml ? inverse[0] : 0;
  const i12 = reml && k > 1 ? inverse[1] : 0;
  const i22 = reml && k > 1 ? inverse[3] : 0;
  const f0 = phi[0], f1 = phi[1], f2 = phi[2], f3 = phi[3];
  // λ_{t+1}: a* for y, b* for x1, c* for x2; d*: ∂ℓ/∂φ; s*, sv: the sums from the steady point on.
  let a0 = 0, a1 = 0, a2 = 0, a3 = 0;
  let b0 = 0, b1 = 0, b2 = 0, b3 = 0;
  let c0 = 0, c1 = 0, c2 = 0, c3 = 0;
  let d0 = 0, d1 = 0, d2 = 0, d3 = 0;
  let s0 = 0, s1 = 0, s2 = 0, s3 = 0, sv = 0;
  const { gains: dgains, variances: dvariances } = out;
  for (let t = n - 1; t >= 0; t--) {
    const row = (t < steadyFrom ? t : steadyFrom) * SCALAR_STATE;
    const g0 = gains[row], g1 = gains[row + 1], g2 = gains[row + 2], g3 = gains[row + 3];
    const invF = weights[t];
    const u = v[t];
    const w = v[o1 + t];
    const z = v[o2 + t];
    // Direct terms: ∂S/∂v = 2e/F for y and −2βe/F for the regressors; ∂ℓ/∂F_t.
    const we = (u - beta1 * w - beta2 * z) * invF;
    const two = 2 * dS * we;
    let dw = -two * beta1;
    let dz = -two * beta2;
    let dF = -dS * we * we - 0.5 * invF;
    if (reml) {
      const pw = i11 * w + i12 * z;
      const pz = i12 * w + i22 * z;
      dw -= pw * invF;
      dz -= pz * invF;
      dF += 0.5 * (w * pw + z * pz) * invF * invF;
    }
    const e0 = a0 * u + b0 * w + c0 * z;
    const e1 = a1 * u + b1 * w + c1 * z;
    const e2 = a2 * u + b2 * w + c2 * z;
    const e3 = a3 * u + b3 * w + c3 * z;
    if (t >= steadyFrom) {
      s0 += e0;
      s1 += e1;
      s2 += e2;
      s3 += e3;
      sv += dF;
    } else {
      const at = t * SCALAR_STATE;
      dgains[at] = e0;
      dgains[at + 1] = e1;
      dgains[at + 2] = e2;
      dgains[at + 3] = e3;
      dvariances[t] = dF;
    }
    const pu = y[t] - u;
    const pw = x1[t] - w;
    const pz = x2[t] - z;
    d0 += a0 * pu + b0 * pw + c0 * pz;
    d1 += a1 * pu + b1 * pw + c1 * pz;
    d2 += a2 * pu + b2 * pw + c2 * pz;
    d3 += a3 * pu + b3 * pw + c3 * pz;
    // λ_t[0] = Σ_i (φ_i − g_i) λ_{t+1}[i] − ∂ℓ/∂v_t; the other rows shift down.
    const h0 = f0 - g0, h1 = f1 - g1, h2 = f2 - g2, h3 = f3 - g3;
    const na = h0 * a0 + h1 * a1 + h2 * a2 + h3 * a3 - two;
    const nb = h0 * b0 + h1 * b1 + h2 * b2 + h3 * b3 - dw;
    const nc = h0 * c0 + h1 * c1 + h2 * c2 + h3 * c3 - dz;
    a3 = a2;
    a2 = a1;
    a1 = a0;
    a0 = na;
    b3 = b2;
    b2 = b1;
    b1 = b0;
    b0 = nb;
    c3 = c2;
    c2 = c1;
    c1 = c0;
    c0 = nc;
  }
  const settled = out.settledGains;
  settled[0] = s0;
  settled[1] = s1;
  settled[2] = s2;
  settled[3] = s3;
  out.settledVariance = sv;
  // Every entry written on every call (φ has four at least), so the stores always carry type feedback.
  const dphi = out.phi;
  const p = Math.min(arLength, ws.r);
  dphi[0] = p > 0 ? d0 : 0;
  dphi[1] = p > 1 ? d1 : 0;
  dphi[2] = p > 2 ? d2 : 0;
  dphi[3] = p > 3 ? d3 : 0;
}

/** Scratch for `gainRecursionAdjoint`: the adjoints of K and w. */
export interface GainScratch {
  kBar: Float64Array;
  wBar: Float64Array;
}

export function createGainScratch(r: number): GainScratch {
  return { kBar: new Float64Array(r), wBar: new Float64Array(r) };
}

/**
 * Reverse mode through the Chandrasekhar recursions (filterRecursions.ts) of the workspace's last
 * run: from `sens`, the sensitivities of ℓ to F_t and the gains g_t = K_t / F_t (and their sums
 * from the steady point on, which apply to the settled state), adds ∂ℓ/∂φ_i through the gains to
 * `phiBar` and writes ∂ℓ/∂P_1[i,0] (the stationary covariance's first column, which is all of
 * the start the recursions read) into `columnBar`. With them the gradient in any parameter needs
 * only that parameter's change in φ and in the first column, not a rerun of the recursions.
 * The recursion, per step, from (F, K, w, m):
 *   F' = F + m (w₀)²,  Tw_i = φ_i w₀ + w_{i+1},  K'_i = K_i + m w₀ Tw_i,
 *   w'_i = Tw_i − K'_i w₀ / F',  m' = m + m² (w₀)² / F,
 * from F = P[0,0], K_i = φ_i P[0,0] + P[i+1,0], w = K, m = −1/F; its adjoint below is the
 * chain rule applied to these lines in reverse (Griewank & Walther 2008, ch. 3), on the states
 * the run kept (the generic run keeps them; after the scalar run, they are recorded here by the
 * generic one, whose outputs are the same to rounding). False, with nothing added, where that
 * recording settles at another step than the run did.
 */
export function gainRecursionAdjoint(ws: FilterWorkspace, sens: FilterSensitivities, scratch: GainScratch, phiBar: Float64Array, columnBar: Float64Array): boolean {
  const { r, stride, phi, pmat, steadyFrom, n } = ws;
  const states = ensureGainStates(ws);
  // After the scalar run the generic one records the states. Its sums round differently, so on
  // the threshold it could settle one step apart from the run; then the caller differences.
  if (!states.current && runChandrasekharGeneric(ws, states) !== steadyFrom) {
    states.current = false;
    return false;
  }
  const { f: fs, m: ms, k: ks, w: wsr } = states;
  const { kBar, wBar } = scratch;
  const last = r - 1;
  // The adjoint of the state at the steady point: its outputs serve every t from there on.
  let fBar = 0;
  let mBar = 0;
  kBar.fill(0);
  wBar.fill(0);
  if (steadyFrom < n) {
    const at = steadyFrom * r;
    const invF = 1 / fs[steadyFrom];
    let fromGains = 0;
    for (let i = 0; i < r; i++) {
      const weight = sens.settledGains[i];
      kBar[i] = weight * invF;
      fromGains += weight * ks[at + i];
    }
    fBar = sens.settledVariance - fromGains * invF * invF;
  }
  const { gains, variances } = sens;
  for (let t = steadyFrom - 1; t >= 0; t--) {
    const at = t * r;
    const next = at + r;
    const fPrev = fs[t];
    const mPrev = ms[t];
    const zw = wsr[at];
    const nextF = fs[t + 1];
    const c = zw / nextF;
    const mz = mPrev * zw;
    const invF = 1 / fPrev;
    const row = t * stride;
    // One pass over i, from the top so that w̄_{i+1} is read before it is overwritten, through
    // the lines of the step in reverse: the outputs g_t = K_t / F_t; w'_i = Tw_i − K'_i c with
    // c = w₀ / F'; K'_i = K_i + m w₀ Tw_i; Tw_i = φ_i w₀ + w_{i+1}. The scalar adjoints
    // (through c, F', m' and w₀) are summed on the way and finished after it.
    let cBar = 0;
    let kTw = 0;
    let twPhi = 0;
    let fromGains = 0;
    for (let i = last; i >= 0; i--) {
      const wb = wBar[i];
      cBar -= ks[next + i] * wb;
      const kb = kBar[i] - c * wb;
      const tw = phi[i] * zw + (i < last ? wsr[at + i + 1] : 0);
      kTw += kb * tw;
      const twb = wb + kb * mz;
      phiBar[i] += twb * zw;
      twPhi += twb * phi[i];
      if (i < last) wBar[i + 1] = twb;
      const weight = gains[row + i];
      kBar[i] = kb + weight * invF;
      fromGains += weight * ks[at + i];
    }
    // F' = F + m w₀² and m' = m + m² w₀² / F.
    const nextFBar = fBar - (cBar * zw) / (nextF * nextF);
    const mNextBar = mBar;
    mBar = mNextBar * (1 + (2 * mz * zw) * invF) + zw * kTw + nextFBar * zw * zw;
    wBar[0] = mNextBar * 2 * mPrev * mz * invF + cBar / nextF + mPrev * kTw + twPhi + nextFBar * 2 * mz;
    fBar = nextFBar - mNextBar * mz * mz * invF * invF + variances[t] - fromGains * invF * invF;
  }
  // The start: w = K, m = −1/F, F = P[0,0], K_i = φ_i P[0,0] + P[i+1,0].
  for (let i = 0; i < r; i++) kBar[i] += wBar[i];
  fBar += mBar / (fs[0] * fs[0]);
  columnBar.fill(0);
  let p00Bar = fBar;
  for (let i = 0; i < r; i++) {
    phiBar[i] += kBar[i] * pmat[0];
    p00Bar += kBar[i] * phi[i];
    if (i + 1 < r) columnBar[i + 1] += kBar[i];
  }
  columnBar[0] += p00Bar;
  return true;
}
