// The filter's workspace: every array a likelihood evaluation touches, allocated once per
// (state dimension, columns, n) by `createWorkspace` (kalmanFilter.ts), so an evaluation
// allocates nothing. Types only: the recursions, the gap filter and the filter that combines
// them all read it.


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
  /** The generic column pass's ring of states, r rows of ncol (filterRecursions.ts). */
  readonly columnStates: Float64Array;
  /** The generic column pass's a_0 and v of every column, 2·ncol. */
  readonly columnScratch: Float64Array;
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
  /** After a run: the time from which the steady gain (its row) applies, n if never (−1 before any run, or after the gap filter). */
  steadyFrom: number;
  /** Observations that entered the likelihood (non-missing y). */
  nobs: number;
  /**
   * The Chandrasekhar recursions' states per time up to the steady point, as the generic run
   * leaves them (filterRecursions.ts; allocated by the first run that keeps them).
   */
  gainStates: GainStates | undefined;
}

/**
 * F_t, m_t, K_t and w_t of the Chandrasekhar recursions (filterRecursions.ts) for t up to the
 * steady point, which the gain recursion's adjoint (filterAdjoint.ts) runs back through.
 */
export interface GainStates {
  readonly f: Float64Array;
  readonly m: Float64Array;
  /** K_t at [t·r, (t+1)·r). */
  readonly k: Float64Array;
  /** w_t at [t·r, (t+1)·r). */
  readonly w: Float64Array;
  /** True when they are those of the workspace's last run. */
  current: boolean;
}

/** Scratch the gap filter needs beyond the workspace's own arrays, for state dimension r and `period` seasons. */
export interface GapScratch {
  /** Seasons whose changes accumulate apart: 1 for first differences, s for seasonal ones. */
  period: number;
  /** 1 at positions where a season's changes start afresh without an observation. */
  restart: Uint8Array;
  /** Augmented state covariance, (r + period)², row-major. */
  cov: Float64Array;
  /** Augmented state means, column c at [c·(r + period), (c+1)·(r + period)). */
  means: Float64Array;
  /** One row or column of the covariance while the transition is applied. */
  line: Float64Array;
  /** Per season: 1 while its changes accumulate over missing levels. */
  open: Uint8Array;
  /**
   * After a run, what the forecasts need of the seasons whose last levels are missing: per
   * column (y first) and season, the filtered sum of the changes since the season's last
   * observed level (column c at [c·period, (c+1)·period)), its covariance with the predicted
   * state α_{n+1} (season j at [j·r, (j+1)·r)) and its variance; zero for the others.
   */
  pendingSums: Float64Array;
  pendingCross: Float64Array;
  pendingVariance: Float64Array;
}

/** A copy of the gap filter's pending sums (see `GapScratch`), per column (y first), by the filter's seasons. */
export interface GapSums {
  period: number;
  sums: Float64Array[];
  cross: Float64Array;
  variance: Float64Array;
}

export interface WorkspaceOptions {
  /**
   * NaN in y marks a missing level of a differenced series: accumulate the differences over
   * the gap (gapFilter.ts) instead of skipping them.
   */
  accumulateGaps?: boolean;
  /** With `accumulateGaps`: the seasons of seasonal differences (s); 1 when absent. */
  gapPeriod?: number;
  /** With `accumulateGaps`: positions where a season's changes start afresh without an observation (its earlier levels all missing). */
  gapRestarts?: readonly number[];
}
