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
// Seasonal differences w_t − w_{t−s} chain each season's levels apart: the change between two
// observed levels of one season is the sum of that season's seasonal differences in between.
// So there is one running sum per season, u^c, and position j adds Z α_j to the sum of its
// season j mod s only. A season whose first levels are all missing starts its chain at its
// first observed level, unobserved (a restart: ρ = 0 afterwards, nothing observed), so the
// likelihood is conditional on the first observed level of each season. With s = 1 this is
// the first-difference filter above. At the end, the seasons whose last levels are missing
// hand their sums, with their covariance with the state, to the forecasts (forecast.ts).
//
// General rather than fast: it runs only for series with gaps. The transition is applied
// through its structure (companion rows and one accumulator), O(r·(r + s)) per step, and the
// update is a rank-one change of the (r + s)² covariance.
import type { FilterWorkspace, GapScratch } from './filterWorkspace.js';

export function createGapScratch(r: number, ncol: number, n: number, period: number, restarts: readonly number[]): GapScratch {
  if (!(Number.isInteger(period) && period >= 1)) throw new RangeError(`createGapScratch: the period must be a whole number ≥ 1, got ${period}`);
  const d = r + period;
  const restart = new Uint8Array(n);
  for (const position of restarts) {
    if (!(Number.isInteger(position) && position >= 0 && position < n)) throw new RangeError(`createGapScratch: restart position ${position} outside 0..${n - 1}`);
    restart[position] = 1;
  }
  return {
    period,
    restart,
    cov: new Float64Array(d * d),
    means: new Float64Array(d * ncol),
    line: new Float64Array(d),
    open: new Uint8Array(period),
    pendingSums: new Float64Array(ncol * period),
    pendingCross: new Float64Array(r * period),
    pendingVariance: new Float64Array(period),
  };
}

/**
 * Filters `columns` (the changes first, then the regressors; NaN in the changes where the
 * level is missing) from the stationary covariance already in `ws.pmat` (full, r×r). Fills the
 * same outputs as `runFilter`; `ws.state` and `ws.pmat` end as the α part of the last
 * prediction, and the scratch's pending arrays as described in `GapScratch`.
 */
export function runGapFilter(ws: FilterWorkspace, scratch: GapScratch, columns: readonly Float64Array[]): boolean {
  const { r, ncol, n, rvec, pmat, cross, innovations, variances, weights } = ws;
  const { period, restart, cov, means, open } = scratch;
  const d = r + period;
  cov.fill(0);
  for (let i = 0; i < r; i++) for (let j = 0; j < r; j++) cov[i * d + j] = pmat[i * r + j];
  means.fill(0);
  cross.fill(0);
  open.fill(0);
  // x_0: α_0 from the stationary distribution, and the first position's sum u = Z α_0.
  accumulate(scratch, d, ncol, r, 0);
  let sumLogF = 0;
  let nobs = 0;
  const y = columns[0];
  for (let t = 0; t < n; t++) {
    const season = t % period;
    const u = r + season;
    if (!Number.isNaN(y[t])) {
      const f = cov[u * d + u];
      if (!(f > 0)) return false;
      const invF = 1 / f;
      variances[t] = f;
      weights[t] = invF;
      sumLogF += Math.log(f);
      nobs++;
      for (let c = 0; c < ncol; c++) innovations[c * n + t] = columns[c][t] - means[c * d + u];
      for (let c = 0; c < ncol; c++) {
        const vc = innovations[c * n + t] * invF;
        for (let e = c; e < ncol; e++) cross[c * ncol + e] += vc * innovations[e * n + t];
      }
      // Update: a ← a + P[:,u] v / F, P ← P − P[:,u] P[u,:] / F.
      for (let c = 0; c < ncol; c++) {
        const v = innovations[c * n + t] * invF;
        for (let i = 0; i < d; i++) means[c * d + i] += cov[i * d + u] * v;
      }
      scratch.line.set(cov.subarray(u * d, (u + 1) * d));
      for (let i = 0; i < d; i++) {
        const factor = scratch.line[i] * invF;
        if (factor === 0) continue;
        for (let j = 0; j < d; j++) cov[i * d + j] -= factor * scratch.line[j];
      }
      open[season] = 0;
    } else {
      variances[t] = Number.NaN;
      weights[t] = 0;
      for (let c = 0; c < ncol; c++) innovations[c * n + t] = 0;
      open[season] = restart[t] === 1 ? 0 : 1;
    }
    predictState(scratch, d, ncol, r, ws.phi, rvec);
    // The next position adds to its season's sum, which restarts unless that season's last level was missing.
    if (t + 1 < n) accumulate(scratch, d, ncol, r, (t + 1) % period);
  }
  for (let c = 0; c < ncol; c++) for (let i = 0; i < r; i++) ws.state[c * r + i] = means[c * d + i];
  for (let i = 0; i < r; i++) for (let j = 0; j < r; j++) pmat[i * r + j] = cov[i * d + j];
  writePending(scratch, d, ncol, r);
  ws.sumLogF = sumLogF;
  ws.nobs = nobs;
  return true;
}

/** u^season ← ρ u^season + Z α, ρ = 1 while the season is open, else 0: a linear map without noise. */
function accumulate(scratch: GapScratch, d: number, ncol: number, r: number, season: number): void {
  const { cov, means } = scratch;
  const u = r + season;
  const rho = scratch.open[season];
  for (let c = 0; c < ncol; c++) means[c * d + u] = rho * means[c * d + u] + means[c * d];
  // Rows, then columns: C ← A C A' for the map that changes row u only.
  for (let j = 0; j < d; j++) cov[u * d + j] = rho * cov[u * d + j] + cov[j];
  for (let i = 0; i < d; i++) cov[i * d + u] = rho * cov[i * d + u] + cov[i * d];
}

/** α ← T α + R ε with the sums unchanged: C ← A C A' + b b' for the companion rows of A. */
function predictState(scratch: GapScratch, d: number, ncol: number, r: number, phi: Float64Array, rvec: Float64Array): void {
  const { cov, means, line } = scratch;
  for (let c = 0; c < ncol; c++) {
    const base = c * d;
    const a0 = means[base];
    for (let i = 0; i < r; i++) means[base + i] = phi[i] * a0 + (i + 1 < r ? means[base + i + 1] : 0);
  }
  // Rows: (T C)_i = φ_i C_0 + C_{i+1}, from the old first row.
  line.set(cov.subarray(0, d));
  for (let i = 0; i < r; i++) {
    for (let j = 0; j < d; j++) cov[i * d + j] = phi[i] * line[j] + (i + 1 < r ? cov[(i + 1) * d + j] : 0);
  }
  // Columns likewise, from the old first column.
  for (let i = 0; i < d; i++) line[i] = cov[i * d];
  for (let i = 0; i < d; i++) {
    for (let j = 0; j < r; j++) cov[i * d + j] = line[i] * phi[j] + (j + 1 < r ? cov[i * d + j + 1] : 0);
  }
  for (let i = 0; i < r; i++) for (let j = 0; j < r; j++) cov[i * d + j] += rvec[i] * rvec[j];
}

/** The open seasons' sums for the forecasts, zero for the others (see `GapScratch`). */
function writePending(scratch: GapScratch, d: number, ncol: number, r: number): void {
  const { period, open, cov, means, pendingSums, pendingCross, pendingVariance } = scratch;
  pendingSums.fill(0);
  pendingCross.fill(0);
  pendingVariance.fill(0);
  for (let season = 0; season < period; season++) {
    if (open[season] === 0) continue;
    const u = r + season;
    for (let c = 0; c < ncol; c++) pendingSums[c * period + season] = means[c * d + u];
    for (let i = 0; i < r; i++) pendingCross[season * r + i] = cov[i * d + u];
    pendingVariance[season] = cov[u * d + u];
  }
}
