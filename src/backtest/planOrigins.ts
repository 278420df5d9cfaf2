// Rolling forecast origins (Tashman 2000): the last K training lengths for which all B
// horizons can be scored, T = n − B − (K − 1)·step, …, n − B, none shorter than the minimum
// training length. An expanding window trains on observations 1..T; a sliding window keeps
// the first origin's length and drops the oldest observations as the origin moves.
//
// Seasons: with seasonal period s > 1 the plan has at least s origins (more than asked for
// when fewer were), and s origins one observation apart (the backtest's step) end in s
// different seasons, so every season is an origin, and at every horizon a target, at least
// once. The whole rule is
// K' = min(max(K, s), available); when the series allows fewer than s origins, some seasons
// are never an origin, which `originSeasons` counts and the record's notes say.
import { availableOrigins } from '../base/backtestOrigins.js';
import type { WindowKind } from '../base/settings.js';

export interface PlannedOrigin {
  /** Observations up to and including the origin. */
  end: number;
  /** Index of the first training observation (0 for an expanding window). */
  start: number;
}

export interface OriginPlan {
  origins: PlannedOrigin[];
  requested: number;
  /** Origins planned before any is left out: the requested count, raised to the seasonal period, within what the series allows. */
  planned: number;
  /** Origins the series allows at this horizon, step and minimum training length. */
  available: number;
}

export interface OriginPlanOptions {
  horizon: number;
  /** Origins asked for. */
  origins: number;
  step: number;
  window: WindowKind;
  minTrainingLength: number;
  /** Seasonal period s (1: not seasonal); at least s origins are planned. */
  period?: number;
}

export function planOrigins(n: number, options: OriginPlanOptions): OriginPlan {
  const requested = options.origins;
  const available = availableOrigins(n, options);
  const count = Math.min(Math.max(requested, options.period ?? 1), available);
  const last = n - options.horizon;
  const ends = Array.from({ length: count }, (_, i) => last - (count - 1 - i) * options.step);
  const windowLength = ends.length > 0 ? ends[0] : 0;
  const origins = ends.map((end) => ({ end, start: options.window === 'sliding' ? end - windowLength : 0 }));
  return { origins, requested, planned: count, available };
}

/** How many of the s seasons the origins end in (an origin's season: its length mod s). */
export function originSeasons(origins: readonly PlannedOrigin[], period: number): number {
  return new Set(origins.map(({ end }) => end % period)).size;
}
