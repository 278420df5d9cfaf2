// The two halves of the filter, in one module so the loops read their constants as
// constants (an imported binding is a slower load in a hot loop):
// - data-free: innovation variances F_t and gains K_t with Σ log F_t, until P converges, by
//   the full covariance recursion (needed with missing values, or when P_{n+1} is kept) or
//   by the Chandrasekhar recursions, which carry only a rank-one change of P (Morf, Sidhu &
//   Kailath 1974);
// - data: a_{t+1} = T a_t + K_t v_t for y and every regressor column, with the weighted
//   cross-products of the innovations that GLS needs.
import type { FilterWorkspace, GainStates } from './filterWorkspace.js';

/** Largest change in P (σ² = 1 scale) below which the filter is taken as converged. */
export const STEADY_TOLERANCE = 1e-13;
/** State dimension up to which the column pass runs on scalars. */
export const SCALAR_STATE = 4;

/**
 * The data-free part: F_t, K_t and Σ log F_t, until P converges. Returns the time from
 * which the steady gain (stored at row `steadyFrom`) applies, n if never, −1 on failure.
 */
export function runCovariance(ws: FilterWorkspace, y: Float64Array): number {
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
    fillSteady(ws, t, f);
    sumLogF += (n - t) * Math.log(f);
  }
  ws.sumLogF = sumLogF;
  ws.nobs = nobs;
  return t;
}

/**
 * The Chandrasekhar recursions for a time-invariant model started from the stationary P:
 * P_{t+1} − P_t = m_t w_t w_t' stays of rank one, so each step costs O(r), not O(r²)
 * (Morf, Sidhu & Kailath 1974; Herbst 2015, J. Econ. Dyn. Control 55):
 *   F_{t+1} = F_t + m (Zw)²,  K_{t+1} = K_t + m (Zw) T w,
 *   w_{t+1} = T w − K_{t+1} (Zw) / F_{t+1},  m_{t+1} = m + m² (Zw)² / F_t,
 * with K_t = T P_t Z', w_1 = K_1, m_1 = −1/F_1. Same outputs as `runCovariance`, except
 * that `ws.pmat` is left at the initial covariance.
 */
export function runChandrasekhar(ws: FilterWorkspace): number {
  const { r, stride, n, phi, pmat, gains, variances, weights } = ws;
  if (stride !== SCALAR_STATE) return runChandrasekharGeneric(ws, ensureGainStates(ws));
  // State dimension ≤ 4: K, w and T w in locals, padded with zeros beyond r (φ_i = 0 for
  // i ≥ r keeps the padding at zero).
  const f0 = phi[0], f1 = phi[1], f2 = phi[2], f3 = phi[3];
  let f = pmat[0];
  let k0 = f0 * f + (r > 1 ? pmat[r] : 0);
  let k1 = f1 * f + (r > 2 ? pmat[2 * r] : 0);
  let k2 = f2 * f + (r > 3 ? pmat[3 * r] : 0);
  let k3 = f3 * f;
  let w0 = k0, w1 = k1, w2 = k2, w3 = k3;
  let m = -1 / f;
  let logF = 0;
  let product = 1;
  let t = 0;
  let steady = false;
  for (; t < n && !steady; t++) {
    if (!(f > 0)) return -1;
    const invF = 1 / f;
    variances[t] = f;
    weights[t] = invF;
    product *= f;
    if (product > 1e250) {
      logF += Math.log(product);
      product = 1;
    }
    const row = t * SCALAR_STATE;
    gains[row] = k0 * invF;
    gains[row + 1] = k1 * invF;
    gains[row + 2] = k2 * invF;
    gains[row + 3] = k3 * invF;
    const zw = w0;
    const nextF = f + m * zw * zw;
    const tw0 = f0 * w0 + w1;
    const tw1 = f1 * w0 + w2;
    const tw2 = f2 * w0 + w3;
    const tw3 = f3 * w0;
    const mz = m * zw;
    k0 += mz * tw0;
    k1 += mz * tw1;
    k2 += mz * tw2;
    k3 += mz * tw3;
    const change = Math.abs(m) * (w0 * w0 + w1 * w1 + w2 * w2 + w3 * w3);
    const c = zw / nextF;
    w0 = tw0 - k0 * c;
    w1 = tw1 - k1 * c;
    w2 = tw2 - k2 * c;
    w3 = tw3 - k3 * c;
    m += (mz * mz) / f;
    f = nextF;
    steady = change < STEADY_TOLERANCE;
  }
  if (t < n) {
    const invF = 1 / f;
    const row = t * SCALAR_STATE;
    gains[row] = k0 * invF;
    gains[row + 1] = k1 * invF;
    gains[row + 2] = k2 * invF;
    gains[row + 3] = k3 * invF;
    fillSteady(ws, t, f);
    logF += (n - t) * Math.log(f);
  }
  ws.sumLogF = logF + Math.log(product);
  ws.nobs = n;
  return t;
}

function createGainStates(r: number, n: number): GainStates {
  return { f: new Float64Array(n + 1), m: new Float64Array(n + 1), k: new Float64Array((n + 1) * r), w: new Float64Array((n + 1) * r), current: false };
}

/** The workspace's per-time gain states, allocated on first use. */
export function ensureGainStates(ws: FilterWorkspace): GainStates {
  ws.gainStates ??= createGainStates(ws.r, ws.n);
  return ws.gainStates;
}

/**
 * The same recursions with K and w in per-time rows of `states`, for state dimensions above
 * four, where the gain recursion's adjoint (filterAdjoint.ts) reads them back; for smaller ones
 * the adjoint runs this to have them. `states.current` says they belong to the last run.
 */
export function runChandrasekharGeneric(ws: FilterWorkspace, states: GainStates): number {
  const { r, stride, n, phi, pmat, gains, variances, weights } = ws;
  const { f: fs, m: ms, k: ks, w: wsr } = states;
  const last = r - 1;
  let f = pmat[0];
  for (let i = 0; i < r; i++) {
    const k = phi[i] * pmat[0] + (i < last ? pmat[(i + 1) * r] : 0);
    ks[i] = k;
    wsr[i] = k;
  }
  let m = -1 / f;
  fs[0] = f;
  ms[0] = m;
  let logF = 0;
  let t = 0;
  let steady = false;
  for (; t < n && !steady; t++) {
    if (!(f > 0)) return -1;
    const invF = 1 / f;
    variances[t] = f;
    weights[t] = invF;
    logF += Math.log(f);
    const row = t * stride;
    const at = t * r;
    const next = at + r;
    for (let i = 0; i < r; i++) gains[row + i] = ks[at + i] * invF;
    const zw = wsr[at];
    const nextF = f + m * zw * zw;
    let change = 0;
    for (let i = 0; i < r; i++) {
      const w = wsr[at + i];
      change += w * w;
      const tw = phi[i] * zw + (i < last ? wsr[at + i + 1] : 0);
      const k = ks[at + i] + m * zw * tw;
      ks[next + i] = k;
      wsr[next + i] = tw - (k * zw) / nextF;
    }
    m += (m * m * zw * zw) / f;
    f = nextF;
    fs[t + 1] = f;
    ms[t + 1] = m;
    steady = Math.abs(m) * change < STEADY_TOLERANCE;
  }
  if (t < n) {
    const invF = 1 / f;
    const row = t * stride;
    for (let i = 0; i < r; i++) gains[row + i] = ks[t * r + i] * invF;
    fillSteady(ws, t, f);
    logF += (n - t) * Math.log(f);
  }
  ws.sumLogF = logF;
  ws.nobs = n;
  states.current = true;
  return t;
}

/** Innovation variances and weights from time `from` on, once F has settled at `f`. */
function fillSteady(ws: FilterWorkspace, from: number, f: number): void {
  const invF = 1 / f;
  for (let s = from; s < ws.n; s++) {
    ws.variances[s] = f;
    ws.weights[s] = invF;
  }
}


/**
 * a_{t+1} = T a_t + K_t v_t for y and up to two regressor columns at once, each state in
 * four locals (three independent recursions in one loop run side by side on the CPU), with
 * the weighted cross-products of every pair accumulated on the way. A model with one
 * regressor passes a column of zeros as the third, whose results are not used.
 */
export function filterColumnsScalar(ws: FilterWorkspace, columns: readonly Float64Array[], steadyFrom: number): void {
  const { n, ncol, phi, gains, r, weights, cross, state } = ws;
  const out = ws.innovations;
  const y = columns[0];
  const x1 = ncol > 1 ? columns[1] : ws.zeros;
  const x2 = ncol > 2 ? columns[2] : ws.zeros;
  // Absent columns write into the spare rows of `innovations` (it holds at least three).
  const o1 = n;
  const o2 = 2 * n;
  const f0 = phi[0], f1 = phi[1], f2 = phi[2], f3 = phi[3];
  let a0 = 0, a1 = 0, a2 = 0, a3 = 0;
  let b0 = 0, b1 = 0, b2 = 0, b3 = 0;
  let c0 = 0, c1 = 0, c2 = 0, c3 = 0;
  let s00 = 0, s01 = 0, s02 = 0, s11 = 0, s12 = 0, s22 = 0;
  for (let t = 0; t < n; t++) {
    const w = weights[t];
    // A missing y has weight 0; its innovations are stored as 0 so they drop out of every sum.
    const observed = w !== 0;
    const u = observed ? y[t] - a0 : 0;
    const v = observed ? x1[t] - b0 : 0;
    const z = observed ? x2[t] - c0 : 0;
    out[t] = u;
    out[o1 + t] = v;
    out[o2 + t] = z;
    const wu = w * u;
    const wv = w * v;
    s00 += wu * u;
    s01 += wu * v;
    s02 += wu * z;
    s11 += wv * v;
    s12 += wv * z;
    s22 += w * z * z;
    const row = (t < steadyFrom ? t : steadyFrom) * SCALAR_STATE;
    const g0 = gains[row], g1 = gains[row + 1], g2 = gains[row + 2], g3 = gains[row + 3];
    const na0 = f0 * a0 + a1 + g0 * u;
    const na1 = f1 * a0 + a2 + g1 * u;
    const na2 = f2 * a0 + a3 + g2 * u;
    a3 = f3 * a0 + g3 * u;
    a0 = na0;
    a1 = na1;
    a2 = na2;
    const nb0 = f0 * b0 + b1 + g0 * v;
    const nb1 = f1 * b0 + b2 + g1 * v;
    const nb2 = f2 * b0 + b3 + g2 * v;
    b3 = f3 * b0 + g3 * v;
    b0 = nb0;
    b1 = nb1;
    b2 = nb2;
    const nc0 = f0 * c0 + c1 + g0 * z;
    const nc1 = f1 * c0 + c2 + g1 * z;
    const nc2 = f2 * c0 + c3 + g2 * z;
    c3 = f3 * c0 + g3 * z;
    c0 = nc0;
    c1 = nc1;
    c2 = nc2;
  }
  cross[0] = s00;
  if (ncol > 1) {
    cross[1] = s01;
    cross[ncol + 1] = s11;
  }
  if (ncol > 2) {
    cross[2] = s02;
    cross[ncol + 2] = s12;
    cross[2 * ncol + 2] = s22;
  }
  // Written out rather than through an array: this runs once per likelihood evaluation.
  writeState(state, 0, r, a0, a1, a2, a3);
  if (ncol > 1) writeState(state, r, r, b0, b1, b2, b3);
  if (ncol > 2) writeState(state, 2 * r, r, c0, c1, c2, c3);
}

/**
 * The same recursion for state dimensions above four, or more than three columns: every
 * column at once, time step by time step. The states sit interleaved (entry i of every column
 * in one row of `columnStates`) in a ring of r rows: the companion transition shifts the state
 * up by one, which the ring does by moving its head, so a step adds φ_i a_0 + K_i v to each row
 * in place and writes the new last row.
 */
export function filterColumnsGeneric(ws: FilterWorkspace, columns: readonly Float64Array[], steadyFrom: number): void {
  const { n, ncol, stride, phi, gains, r, state, weights, columnStates: ring, columnScratch: scratch } = ws;
  const out = ws.innovations;
  // scratch[c]: a_0 of column c before the step; scratch[ncol + c]: its innovation.
  ring.fill(0, 0, r * ncol);
  let head = 0;
  for (let t = 0; t < n; t++) {
    const observed = weights[t] !== 0;
    const at = head * ncol;
    for (let c = 0; c < ncol; c++) {
      const a0 = ring[at + c];
      scratch[c] = a0;
      const value = observed ? columns[c][t] - a0 : 0;
      scratch[ncol + c] = value;
      out[c * n + t] = value;
    }
    const row = (t < steadyFrom ? t : steadyFrom) * stride;
    // Logical row i + 1 becomes row i: physical row (head + 1 + i) mod r.
    for (let i = 0; i < r - 1; i++) {
      let physical = head + 1 + i;
      if (physical >= r) physical -= r;
      const base = physical * ncol;
      const g = gains[row + i];
      const f = phi[i];
      if (f !== 0) {
        // In the order of the one-column recursion, φ_i a_0 + a_{i+1} + g_i v, so the sums round alike.
        for (let c = 0; c < ncol; c++) ring[base + c] = f * scratch[c] + ring[base + c] + g * scratch[ncol + c];
      } else {
        // A zero coefficient (most of a seasonal model's expanded ones): the same sums, as ±0 + x = x.
        for (let c = 0; c < ncol; c++) ring[base + c] = ring[base + c] + g * scratch[ncol + c];
      }
    }
    // The old first row becomes the last: nothing shifts into it.
    const g = gains[row + r - 1];
    const f = phi[r - 1];
    for (let c = 0; c < ncol; c++) ring[at + c] = f * scratch[c] + g * scratch[ncol + c];
    head = head + 1 === r ? 0 : head + 1;
  }
  for (let c = 0; c < ncol; c++) {
    for (let i = 0; i < r; i++) {
      let physical = head + i;
      if (physical >= r) physical -= r;
      state[c * r + i] = ring[physical * ncol + c];
    }
  }
}

/** Σ_t v_c v_d / F_t over observed t, for every pair of columns. */
export function accumulateCross(ws: FilterWorkspace): void {
  const { n, ncol, innovations, weights, cross } = ws;
  for (let c = 0; c < ncol; c++) {
    const oc = c * n;
    for (let d = c; d < ncol; d++) {
      const od = d * n;
      let sum = 0;
      for (let t = 0; t < n; t++) sum += weights[t] * innovations[oc + t] * innovations[od + t];
      cross[c * ncol + d] = sum;
    }
  }
}

/** The first r of four state entries into `state` at `base`. */
function writeState(state: Float64Array, base: number, r: number, s0: number, s1: number, s2: number, s3: number): void {
  state[base] = s0;
  if (r > 1) state[base + 1] = s1;
  if (r > 2) state[base + 2] = s2;
  if (r > 3) state[base + 3] = s3;
}
