// How many rolling origins a series allows, in one place for the backtest's plan
// (backtest/planOrigins.ts) and `check`'s pre-flight (run/preflight.ts).

/** Origins are one observation apart. */
export const ORIGIN_STEP = 1;

/**
 * Origins available for a series of n observations (0 when none can be scored): the first
 * trains on `minTrainingLength` observations, the last leaves `horizon` to score, and they are
 * `step` apart.
 */
export function availableOrigins(n: number, options: { horizon: number; minTrainingLength: number; step: number }): number {
  const spare = n - options.horizon - options.minTrainingLength;
  return spare < 0 ? 0 : Math.floor(spare / options.step) + 1;
}
