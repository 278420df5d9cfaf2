// Kalman filter for y = Xβ + η, η ~ ARMA(p,q), run on y and on every column of X.
// The gains do not depend on the data, so the covariance recursion runs once and its gains
// serve every column (the augmented filter of de Jong 1991; Harvey 1989 §3.4). Weighted
// cross-products of the innovations give β by GLS and σ² in closed form, so the likelihood
// is a function of the ARMA parameters only. Once P has converged the steady-state gain is
// used and the covariance update skipped (Harvey 1989, §3.3.4). Missing observations (NaN
// in y) skip the update step (Durbin & Koopman 2012, §4.10).
//
// The pieces: filterWorkspace.ts (the arrays, created here), filterRecursions.ts (F_t and K_t,
// then the states and cross-products), gapFilter.ts (gaps in a differenced series).

import { choleskyInto, choleskySolveInPlace } from '../linalg/smallSpd.js';
import { accumulateCross, filterColumnsGeneric, filterColumnsScalar, runChandrasekhar, runCovariance, SCALAR_STATE } from './filterRecursions.js';
import { firstColumnScratchSize, lyapunovScratchSize, momentsScratchSize, stationaryCovariance, stationaryCovarianceFromMoments, stationaryFirstColumn } from './armaStateSpace.js';
import type { FilterWorkspace, WorkspaceOptions } from './filterWorkspace.js';
import { createGapScratch, runGapFilter } from './gapFilter.js';

const LOG_2PI = Math.log(2 * Math.PI);

/** A workspace for filtering `columns` (y first) with state dimension r. */
export function createWorkspace(r: number, columns: readonly Float64Array[], options: WorkspaceOptions = {}): FilterWorkspace {
  const ncol = columns.length;
  const n = columns[0].length;
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
    innovations: new Float64Array(Math.max(ncol, 3) * n),
    state: new Float64Array(r * ncol),
    columnStates: new Float64Array(r * ncol),
    columnScratch: new Float64Array(2 * ncol),
    cross: new Float64Array(ncol * ncol),
    lyapunovScratch: new Float64Array(r > SCALAR_STATE ? momentsScratchSize(r, r) : Math.max(lyapunovScratchSize(r), firstColumnScratchSize(r, r))),
    zeros: new Float64Array(n),
    gram: new Float64Array(Math.max(1, k * k)),
    gramFactor: new Float64Array(Math.max(1, k * k)),
    gramRhs: new Float64Array(Math.max(1, k)),
    complete: !hasMissing(columns[0]),
    gaps: options.accumulateGaps === true && hasMissing(columns[0]) ? createGapScratch(r, ncol, n, options.gapPeriod ?? 1, options.gapRestarts ?? []) : undefined,
    sumLogF: 0,
    steadyFrom: -1,
    nobs: 0,
    gainStates: undefined,
  };
}


function hasMissing(y: Float64Array): boolean {
  for (let t = 0; t < y.length; t++) if (Number.isNaN(y[t])) return true;
  return false;
}

/**
 * Installs ARMA coefficients and the stationary initial covariance. Returns false when
 * the AR part has a unit root (no stationary covariance exists). With `firstColumnOnly`,
 * only P's first column is computed, which is all the Chandrasekhar path of `runFilter`
 * reads (a complete series, covariance not kept).
 */
export function setArma(
  ws: FilterWorkspace,
  ar: ArrayLike<number>,
  p: number,
  ma: ArrayLike<number>,
  q: number,
  firstColumnOnly = false,
): boolean {
  const { r, phi, rvec } = ws;
  phi.fill(0);
  rvec.fill(0);
  for (let i = 0; i < p; i++) phi[i] = ar[i];
  rvec[0] = 1;
  for (let j = 0; j < q; j++) rvec[j + 1] = ma[j];
  if (firstColumnOnly) return stationaryFirstColumn(phi, rvec, p, r, ws.pmat, ws.lyapunovScratch);
  // Above the scalar path the Lyapunov system grows as r⁴ and more; the moments give P directly.
  if (r > SCALAR_STATE) return stationaryCovarianceFromMoments(phi, rvec, p, r, ws.pmat, ws.lyapunovScratch);
  return stationaryCovariance(phi, rvec, r, ws.pmat, ws.lyapunovScratch);
}

/**
 * Runs the filter over `columns` (y first, then regressors; each of length n) from the
 * covariance installed by `setArma`. Returns false if an innovation variance is not positive.
 * With `keepCovariance`, P is carried along so that `ws.pmat` ends as P_{n+1|n} (for
 * forecasting); otherwise, on a complete series, the cheaper Chandrasekhar form is used.
 */
export function runFilter(ws: FilterWorkspace, columns: readonly Float64Array[], keepCovariance = false): boolean {
  ws.steadyFrom = -1;
  if (ws.gainStates !== undefined) ws.gainStates.current = false;
  if (ws.gaps !== undefined) return runGapFilter(ws, ws.gaps, columns);
  const fast = !keepCovariance && ws.complete;
  const steadyFrom = fast ? runChandrasekhar(ws) : runCovariance(ws, columns[0]);
  if (steadyFrom < 0) return false;
  ws.steadyFrom = steadyFrom;
  if (ws.r <= SCALAR_STATE && ws.ncol <= 3) {
    filterColumnsScalar(ws, columns, steadyFrom);
  } else {
    filterColumnsGeneric(ws, columns, steadyFrom);
    accumulateCross(ws);
  }
  return true;
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

/**
 * The restricted (marginal) log-likelihood after `runFilter`: the likelihood of the n − k
 * error contrasts free of β (Harvey 1989, §3.4; Tunnicliffe Wilson 1989, JRSS B 51, 15–27),
 * with σ² = SSR/(m − k) concentrated out:
 *   ℓ_R = −½[(m − k)(log 2π + 1 + log σ̂²) + Σ log F_t + log det X'Ω⁻¹X],
 * dropping the constant ½ log det X'X. Maximising it instead of `profileLoglik` removes most of
 * the small-sample bias of the ARMA coefficients when a trend is estimated (Cheang & Reinsel
 * 2000, JASA 95, 1173–1184; both citations from memory). NaN where `profileLoglik` is NaN.
 */
export function restrictedLoglik(ws: FilterWorkspace): number {
  const ssr = residualSumOfSquares(ws);
  if (!(ssr > 0)) return Number.NaN;
  const k = ws.ncol - 1;
  const dof = ws.nobs - k;
  if (!(dof > 0)) return Number.NaN;
  let logDetGram = 0;
  for (let i = 0; i < k; i++) logDetGram += 2 * Math.log(ws.gramFactor[i * k + i]);
  return -0.5 * dof * (LOG_2PI + 1 + Math.log(ssr / dof)) - 0.5 * ws.sumLogF - 0.5 * logDetGram;
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
