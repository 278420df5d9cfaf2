// Asymptotic critical values of the sup-Wald statistic for a break in both the level and the
// slope of a linear trend with stationary errors, 15% trimming. Andrews' (1993) table does not
// apply here: with the regressors (1, t), Σ_{t ≤ πT} x_t x_t' / T does not tend to π Q, so the
// limit is a different functional of Brownian motion (Vogelsang 1997, Econometric Theory
// 13(6)). Its quantiles lie 7% to 12% above Andrews' values for 2 restrictions; with those, a
// 5% test rejected a true no-break null in 8.3% of 1000 white-noise series of length 400. GLS
// whitening scales (1, t) asymptotically by a constant, so the limit is the same after it.
//
// Derived by simulation, not typed from a table: 400000 replications of white noise of length
// 2000 regressed on one line and on separate lines before and after each candidate date, in
// test/fixtures/evidence/supWaldCritical.ts (its header has the output). These are quantiles
// of the sup over that grid of dates; the same grid reproduces Andrews' stationary-regressor
// values to within 0.7%, so the two tables follow one convention.
import type { SupWaldCritical } from './types.js';

export const TREND_BREAK_SOURCE =
  'statistic: Andrews (1993), Econometrica 61(4); critical values: simulated limit for a level and slope break in a linear trend (Vogelsang 1997, Econometric Theory 13(6))';

/** 10%, 5% and 1% critical values for a level and slope break at 15% trimming. */
export function trendBreakCritical(): SupWaldCritical {
  return { '10': 11.23, '5': 12.95, '1': 16.67 };
}
