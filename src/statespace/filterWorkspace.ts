// The filter's workspace: every array a likelihood evaluation touches, allocated once per
// (state dimension, columns, n), so an evaluation allocates nothing.
import { firstColumnScratchSize, lyapunovScratchSize } from './armaStateSpace.js';
import { createGapScratch, type GapScratch } from './gapFilter.js';
import { SCALAR_STATE } from './filterRecursions.js';


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
  /** Innovations of every column, column c at [c·n, (c+1)·n); 0 where y is missing. At least three columns long. */
  readonly innovations: Float64Array;
  /** Predicted state means a_{n+1|n}, column c at [c·r, (c+1)·r). */
  readonly state: Float64Array;
  /** Σ v_c v_d / F, ncol×ncol row-major (upper triangle filled). */
  readonly cross: Float64Array;
  readonly lyapunovScratch: Float64Array;
  /** n zeros, standing in for an absent column in the scalar pass. */
  readonly zeros: Float64Array;
  readonly gram: Float64Array;
  readonly gramFactor: Float64Array;
  /** β after `profileLoglik`. */
  readonly gramRhs: Float64Array;
  /** True when y has no missing values (set by `createWorkspace`). */
  readonly complete: boolean;
  /** Present when missing values are gaps in a differenced series (see gapFilter.ts). */
  readonly gaps: GapScratch | undefined;
  sumLogF: number;
  /** Observations that entered the likelihood (non-missing y). */
  nobs: number;
}

export interface WorkspaceOptions {
  /**
   * NaN in y marks a missing level of a differenced series: accumulate the differences over
   * the gap (gapFilter.ts) instead of skipping them.
   */
  accumulateGaps?: boolean;
}

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
    mmat: new Float64Array(Math.max(r * r, 3 * r)),
    gains: new Float64Array((n + 1) * stride),
    variances: new Float64Array(n),
    weights: new Float64Array(n),
    innovations: new Float64Array(Math.max(ncol, 3) * n),
    state: new Float64Array(r * ncol),
    cross: new Float64Array(ncol * ncol),
    lyapunovScratch: new Float64Array(Math.max(lyapunovScratchSize(r), firstColumnScratchSize(r, r))),
    zeros: new Float64Array(n),
    gram: new Float64Array(Math.max(1, k * k)),
    gramFactor: new Float64Array(Math.max(1, k * k)),
    gramRhs: new Float64Array(Math.max(1, k)),
    complete: !hasMissing(columns[0]),
    gaps: options.accumulateGaps === true && hasMissing(columns[0]) ? createGapScratch(r, ncol) : undefined,
    sumLogF: 0,
    nobs: 0,
  };
}

function hasMissing(y: Float64Array): boolean {
  for (let t = 0; t < y.length; t++) if (Number.isNaN(y[t])) return true;
  return false;
}

