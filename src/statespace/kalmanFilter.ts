// Kalman filter for y = Xβ + η, η ~ ARMA(p,q), run on y and on every column of X.
// The gains do not depend on the data, so the covariance recursion runs once and its gains
// serve every column (the augmented filter of de Jong 1991; Harvey 1989 §3.4). Weighted
// cross-products of the innovations give β by GLS and σ² in closed form, so the likelihood
// is a function of the ARMA parameters only. Once P has converged the steady-state gain is
// used and the covariance update skipped (Harvey 1989, §3.3.4). Missing observations (NaN
// in y) skip the update step (Durbin & Koopman 2012, §4.10).
//
// Everything lives in a workspace allocated once per (r, columns, n), so a likelihood
// evaluation allocates nothing; the column pass keeps a state of up to four in locals.

import { lyapunovScratchSize, stationaryCovariance } from './armaStateSpace.js';
import { choleskyInto, choleskySolveInPlace } from '../linalg/smallSpd.js';

const LOG_2PI = Math.log(2 * Math.PI);
/** Largest change in P (σ² = 1 scale) below which the filter is taken as converged. */
const STEADY_TOLERANCE = 1e-13;
/** State dimension up to which the column pass runs on scalars. */
const SCALAR_STATE = 4;

export interface FilterWorkspace {
  readonly r: number;
  /** Stride of per-time gain rows and length of the padded coefficient vectors. */
  readonly stride: number;
  /** Number of filtered columns: y first, then the k regressors. */
  readonly ncol: number;
  readonly n: number;
  readonly phi: Float64Array;
  readonly rvec: Float64Array;
  /** Predicted state covariance P_{t|t−1} / σ²; after a run, P_{n+1|n} / σ². */
  readonly pmat: Float64Array;
  readonly mmat: Float64Array;
  /** Gains K_t per time (stride entries each) up to the steady point, then the steady gain. */
  readonly gains: Float64Array;
  /** Innovation variances F_t / σ² (NaN where y is missing). */
  readonly variances: Float64Array;
  /** 1 / F_t, or 0 where y is missing. */
  readonly weights: Float64Array;
  /** Innovations of every column, column c at [c·n, (c+1)·n). */
  readonly innovations: Float64Array;
  /** Predicted state means a_{n+1|n}, column c at [c·r, (c+1)·r). */
  readonly state: Float64Array;
  /** Σ v_c v_d / F, ncol×ncol row-major (upper triangle filled). */
  readonly cross: Float64Array;
  readonly lyapunovScratch: Float64Array;
  readonly gram: Float64Array;
  readonly gramFactor: Float64Array;
  /** β after `profileLoglik`. */
  readonly gramRhs: Float64Array;
  sumLogF: number;
  /** Observations that entered the likelihood (non-missing y). */
  nobs: number;
}

export function createWorkspace(r: number, ncol: number, n: number): FilterWorkspace {
  const k = ncol - 1;
  const stride = Math.max(r, SCALAR_STATE);
  return {
    r,
    stride,
    ncol,
    n,
    phi: new Float64Array(stride),
    rvec: new Float64Array(stride),
    pmat: new Float64Array(r * r),
    mmat: new Float64Array(r * r),
    gains: new Float64Array((n + 1) * stride),
    variances: new Float64Array(n),
    weights: new Float64Array(n),
    innovations: new Float64Array(ncol * n),
    state: new Float64Array(r * ncol),
    cross: new Float64Array(ncol * ncol),
    lyapunovScratch: new Float64Array(lyapunovScratchSize(r)),
    gram: new Float64Array(Math.max(1, k * k)),
    gramFactor: new Float64Array(Math.max(1, k * k)),
    gramRhs: new Float64Array(Math.max(1, k)),
    sumLogF: 0,
    nobs: 0,
  };
}

/**
 * Installs ARMA coefficients and the stationary initial covariance. Returns false when
 * the AR part has a unit root (no stationary covariance exists).
 */
export function setArma(ws: FilterWorkspace, ar: ArrayLike<number>, p: number, ma: ArrayLike<number>, q: number): boolean {
  const { r, phi, rvec } = ws;
  phi.fill(0);
  rvec.fill(0);
  for (let i = 0; i < p; i++) phi[i] = ar[i];
  rvec[0] = 1;
  for (let j = 0; j < q; j++) rvec[j + 1] = ma[j];
  return stationaryCovariance(phi, rvec, r, ws.pmat, ws.lyapunovScratch);
}

/**
 * Runs the filter over `columns` (y first, then regressors; each of length n) from the
 * covariance installed by `setArma`. Returns false if an innovation variance is not positive.
 */
export function runFilter(ws: FilterWorkspace, columns: readonly Float64Array[]): boolean {
  const steadyFrom = runCovariance(ws, columns[0]);
  if (steadyFrom < 0) return false;
  for (let c = 0; c < ws.ncol; c++) {
    if (ws.r <= SCALAR_STATE) filterColumnScalar(ws, columns[c], c, steadyFrom);
    else filterColumnGeneric(ws, columns[c], c, steadyFrom);
  }
  accumulateCross(ws);
  return true;
}

/**
 * The data-free part: F_t, K_t and Σ log F_t, until P converges. Returns the time from
 * which the steady gain (stored at row `steadyFrom`) applies, n if never, −1 on failure.
 */
function runCovariance(ws: FilterWorkspace, y: Float64Array): number {
  const { r, stride, n, phi, rvec, pmat, mmat, gains, variances, weights } = ws;
  let lastMissing = -1;
  let nobs = 0;
  for (let t = 0; t < n; t++) {
    if (Number.isNaN(y[t])) lastMissing = t;
    else nobs++;
  }
  let sumLogF = 0;
  let t = 0;
  let steady = false;
  for (; t < n && !steady; t++) {
    const f = pmat[0];
    const missing = t <= lastMissing && Number.isNaN(y[t]);
    const row = t * stride;
    let invF = 0;
    if (missing) {
      variances[t] = Number.NaN;
      weights[t] = 0;
    } else {
      if (!(f > 0)) return -1;
      invF = 1 / f;
      variances[t] = f;
      weights[t] = invF;
      sumLogF += Math.log(f);
    }
    // M = T P; K = M[:,0] / F.
    for (let i = 0; i < r; i++) {
      for (let j = 0; j < r; j++) mmat[i * r + j] = phi[i] * pmat[j] + (i + 1 < r ? pmat[(i + 1) * r + j] : 0);
      gains[row + i] = mmat[i * r] * invF;
    }
    for (let i = r; i < stride; i++) gains[row + i] = 0;
    // P_{t+1} = T P T' + R R' − K F K' (the last term absent when y_t is missing).
    let change = 0;
    for (let i = 0; i < r; i++) {
      const mi0 = mmat[i * r];
      for (let j = i; j < r; j++) {
        const value = mi0 * phi[j] + (j + 1 < r ? mmat[i * r + j + 1] : 0) + rvec[i] * rvec[j] - mi0 * mmat[j * r] * invF;
        const delta = Math.abs(value - pmat[i * r + j]);
        if (delta > change) change = delta;
        pmat[i * r + j] = value;
        pmat[j * r + i] = value;
      }
    }
    steady = change < STEADY_TOLERANCE && t > lastMissing;
  }
  if (t < n) {
    // Steady state: P (and so F and K) no longer change.
    const f = pmat[0];
    const invF = 1 / f;
    const row = t * stride;
    for (let i = 0; i < stride; i++) gains[row + i] = i < r ? (phi[i] * pmat[0] + (i + 1 < r ? pmat[(i + 1) * r] : 0)) * invF : 0;
    for (let s = t; s < n; s++) {
      variances[s] = f;
      weights[s] = invF;
    }
    sumLogF += (n - t) * Math.log(f);
  }
  ws.sumLogF = sumLogF;
  ws.nobs = nobs;
  return t;
}

/** a_{t+1} = T a_t + K_t v_t for one column, with the state in four locals. */
function filterColumnScalar(ws: FilterWorkspace, y: Float64Array, c: number, steadyFrom: number): void {
  const { n, stride, phi, gains, r } = ws;
  const out = ws.innovations;
  const offset = c * n;
  const f0 = phi[0], f1 = phi[1], f2 = phi[2], f3 = phi[3];
  let a0 = 0, a1 = 0, a2 = 0, a3 = 0;
  for (let t = 0; t < steadyFrom; t++) {
    const yt = y[t];
    const v = Number.isNaN(yt) ? 0 : yt - a0;
    out[offset + t] = Number.isNaN(yt) ? Number.NaN : v;
    const row = t * stride;
    const n0 = f0 * a0 + a1 + gains[row] * v;
    const n1 = f1 * a0 + a2 + gains[row + 1] * v;
    const n2 = f2 * a0 + a3 + gains[row + 2] * v;
    a3 = f3 * a0 + gains[row + 3] * v;
    a0 = n0;
    a1 = n1;
    a2 = n2;
  }
  if (steadyFrom < n) {
    const row = steadyFrom * stride;
    const k0 = gains[row], k1 = gains[row + 1], k2 = gains[row + 2], k3 = gains[row + 3];
    for (let t = steadyFrom; t < n; t++) {
      const v = y[t] - a0;
      out[offset + t] = v;
      const n0 = f0 * a0 + a1 + k0 * v;
      const n1 = f1 * a0 + a2 + k1 * v;
      const n2 = f2 * a0 + a3 + k2 * v;
      a3 = f3 * a0 + k3 * v;
      a0 = n0;
      a1 = n1;
      a2 = n2;
    }
  }
  const state = ws.state;
  const base = c * r;
  state[base] = a0;
  if (r > 1) state[base + 1] = a1;
  if (r > 2) state[base + 2] = a2;
  if (r > 3) state[base + 3] = a3;
}

/** The same recursion for state dimensions above four. */
function filterColumnGeneric(ws: FilterWorkspace, y: Float64Array, c: number, steadyFrom: number): void {
  const { n, stride, phi, gains, r, state } = ws;
  const out = ws.innovations;
  const offset = c * n;
  const base = c * r;
  for (let i = 0; i < r; i++) state[base + i] = 0;
  for (let t = 0; t < n; t++) {
    const yt = y[t];
    const missing = Number.isNaN(yt);
    const v = missing ? 0 : yt - state[base];
    out[offset + t] = missing ? Number.NaN : v;
    const row = Math.min(t, steadyFrom) * stride;
    const a0 = state[base];
    for (let i = 0; i < r; i++) state[base + i] = phi[i] * a0 + (i + 1 < r ? state[base + i + 1] : 0) + gains[row + i] * v;
  }
}

/** Σ_t v_c v_d / F_t over observed t, for every pair of columns. */
function accumulateCross(ws: FilterWorkspace): void {
  const { n, ncol, innovations, weights, cross } = ws;
  for (let c = 0; c < ncol; c++) {
    const oc = c * n;
    for (let d = c; d < ncol; d++) {
      const od = d * n;
      let sum = 0;
      for (let t = 0; t < n; t++) {
        const w = weights[t];
        if (w !== 0) sum += w * innovations[oc + t] * innovations[od + t];
      }
      cross[c * ncol + d] = sum;
    }
  }
}

/**
 * The profile log-likelihood after `runFilter`: β by GLS and σ² = SSR/m concentrated out
 * (Harvey 1989, §3.4.2). Returns NaN when the GLS system is singular or SSR is not positive.
 * Leaves β in `ws.gramRhs` and the Cholesky factor of X'Ω⁻¹X in `ws.gramFactor`.
 */
export function profileLoglik(ws: FilterWorkspace): number {
  const ssr = residualSumOfSquares(ws);
  if (!(ssr > 0)) return Number.NaN;
  const m = ws.nobs;
  const sigma2 = ssr / m;
  return -0.5 * m * (LOG_2PI + 1 + Math.log(sigma2)) - 0.5 * ws.sumLogF;
}

/** GLS residual sum of squares Σ (v_y − V_x β)² / F, solving for β along the way. */
export function residualSumOfSquares(ws: FilterWorkspace): number {
  const { ncol, cross, gram, gramFactor, gramRhs } = ws;
  const k = ncol - 1;
  const syy = cross[0];
  if (k === 0) return syy;
  // X'Ω⁻¹X is the lower-right block of the cross-product matrix (upper triangle stored).
  for (let i = 0; i < k; i++) {
    for (let j = 0; j < k; j++) gram[i * k + j] = cross[(Math.min(i, j) + 1) * ncol + Math.max(i, j) + 1];
    gramRhs[i] = cross[i + 1];
  }
  if (!choleskyInto(gram, k, gramFactor)) return Number.NaN;
  choleskySolveInPlace(gramFactor, k, gramRhs);
  let explained = 0;
  for (let i = 0; i < k; i++) explained += gramRhs[i] * cross[i + 1];
  return syy - explained;
}
