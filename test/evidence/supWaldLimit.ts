// Simulated limiting null distributions of the sup-Wald break statistic, for checking
// critical values by Monte Carlo.
//
// Both take the sup over the candidate dates the tests use (breakDates: 15% trimming).
//
// Stationary regressors (Andrews 1993, Theorem 3): sup over π in [π0, 1 − π0] of
// ‖B(π) − πB(1)‖² / (π(1 − π)), B a p-dimensional standard Brownian motion, approximated by
// scaled partial sums of N(0, 1) draws on a grid of `steps`.
//
// A break in the level and slope of a linear trend: the regressors (1, t) do not satisfy
// Andrews' condition that Σ_{t ≤ πT} x_t x_t' / T → π Q, so the limit differs (the point of
// Vogelsang 1997, Econometric Theory 13(6)). It is approximated by white noise of length
// `steps` regressed on [1, t] with and without separate lines after each candidate date,
// with σ² = 1 known: Wald = SSR_no_break − SSR_break.
//
// A sup over a grid of spacing h falls short of the continuous sup by a term of order √h (as
// for the maximum of a sampled Brownian motion, Asmussen, Glynn & Pitman 1995). Each draw is
// therefore also taken over every `coarsen`-th grid point of the same path, and the quantile
// extrapolated to h → 0: q₀ ≈ q_h + (q_h − q_{coarsen·h}) / (√coarsen − 1).
import { breakDates } from '../../src/evidence/breakDates.js';

export interface SupDraws {
  /** Sup over the full grid, one per replication. */
  fine: Float64Array;
  /** Sup over every `coarsen`-th grid point of the same paths. */
  coarse: Float64Array;
  coarsen: number;
}

export interface LimitSize {
  steps: number;
  replications: number;
  coarsen: number;
}

/** Sup-Wald limit draws for p = 1..dims stationary restrictions (the first p components of B). */
export function bridgeSupDraws(normal: () => number, dims: number, size: LimitSize): SupDraws[] {
  const { steps, replications, coarsen } = size;
  const draws = Array.from({ length: dims }, () => ({ fine: new Float64Array(replications), coarse: new Float64Array(replications), coarsen }));
  const paths = Array.from({ length: dims }, () => new Float64Array(steps + 1));
  const scale = 1 / Math.sqrt(steps);
  const { first, last } = breakDates(steps, 1);
  const fine = new Float64Array(dims);
  const coarse = new Float64Array(dims);
  for (let rep = 0; rep < replications; rep++) {
    for (const path of paths) for (let i = 1; i <= steps; i++) path[i] = path[i - 1] + scale * normal();
    fine.fill(0);
    coarse.fill(0);
    for (let i = first; i <= last; i++) {
      const pi = i / steps;
      let norm = 0;
      for (let d = 0; d < dims; d++) {
        const bridge = paths[d][i] - pi * paths[d][steps];
        norm += (bridge * bridge) / (pi * (1 - pi));
        if (norm > fine[d]) fine[d] = norm;
        if (i % coarsen === 0 && norm > coarse[d]) coarse[d] = norm;
      }
    }
    for (let d = 0; d < dims; d++) {
      draws[d].fine[rep] = fine[d];
      draws[d].coarse[rep] = coarse[d];
    }
  }
  return draws;
}

/** Sup-Wald limit draws for a break in the level and slope of a linear trend (2 restrictions). */
export function trendBreakSupDraws(normal: () => number, size: LimitSize): SupDraws {
  const { steps, replications, coarsen } = size;
  const sumE = new Float64Array(steps + 1);
  const sumTE = new Float64Array(steps + 1);
  const sumEE = new Float64Array(steps + 1);
  const { first, last } = breakDates(steps, 2);
  const fine = new Float64Array(replications);
  const coarse = new Float64Array(replications);
  for (let rep = 0; rep < replications; rep++) {
    for (let t = 1; t <= steps; t++) {
      const e = normal();
      sumE[t] = sumE[t - 1] + e;
      sumTE[t] = sumTE[t - 1] + t * e;
      sumEE[t] = sumEE[t - 1] + e * e;
    }
    const lineSsr = (from: number, to: number): number => segmentLineSsr(sumE, sumTE, sumEE, from, to);
    const noBreak = lineSsr(0, steps);
    let bestFine = 0;
    let bestCoarse = 0;
    for (let tau = first; tau <= last; tau++) {
      const wald = noBreak - lineSsr(0, tau) - lineSsr(tau, steps);
      if (wald > bestFine) bestFine = wald;
      if (tau % coarsen === 0 && wald > bestCoarse) bestCoarse = wald;
    }
    fine[rep] = bestFine;
    coarse[rep] = bestCoarse;
  }
  return { fine, coarse, coarsen };
}

/** SSR of e_t on [1, t] over from < t ≤ to, from prefix sums of e, t·e and e². */
function segmentLineSsr(sumE: Float64Array, sumTE: Float64Array, sumEE: Float64Array, from: number, to: number): number {
  const m = to - from;
  const sumT = (to * (to + 1) - from * (from + 1)) / 2;
  const sumTT = (to * (to + 1) * (2 * to + 1) - from * (from + 1) * (2 * from + 1)) / 6;
  const se = sumE[to] - sumE[from];
  const ste = sumTE[to] - sumTE[from];
  const slope = (m * ste - sumT * se) / (m * sumTT - sumT * sumT);
  const intercept = (se - slope * sumT) / m;
  return sumEE[to] - sumEE[from] - intercept * se - slope * ste;
}

/**
 * The (1 − size) quantile of the draws: on the grid, and extrapolated to a continuous sup. With
 * `rankShift`, the order statistics are taken that many binomial standard deviations
 * √(R·size·(1 − size)) above (positive) or below (negative) the rank R·(1 − size): a
 * distribution-free band for the quantile (common practice).
 */
export function upperQuantiles(draws: SupDraws, size: number, rankShift = 0): { grid: number; continuous: number } {
  const count = draws.fine.length;
  const rank = Math.floor(count * (1 - size) + rankShift * Math.sqrt(count * size * (1 - size)));
  const grid = orderStatistic(draws.fine, rank);
  const coarse = orderStatistic(draws.coarse, rank);
  return { grid, continuous: grid + (grid - coarse) / (Math.sqrt(draws.coarsen) - 1) };
}

function orderStatistic(values: Float64Array, rank: number): number {
  const sorted = Float64Array.from(values).sort();
  return sorted[Math.max(0, Math.min(sorted.length - 1, rank))];
}
