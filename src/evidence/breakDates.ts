// The range of candidate break dates for a sup test: Andrews (1993) takes the break fraction π
// over [π0, 1 − π0], since the statistic diverges as π approaches 0 or 1 (his Theorem 3 needs
// the range bounded away from the ends).

/** Percent of the sample trimmed from each end. */
export const TRIMMING_PERCENT = 15;

export interface BreakDates {
  /** Fewest and most observations before the break. */
  first: number;
  last: number;
}

/**
 * Candidate sizes of the first regime for m observations: from ⌈π0·m⌉ to ⌊(1 − π0)·m⌋, and
 * leaving each regime at least `minimumRegime` observations so the regression with a break
 * has full rank.
 */
export function breakDates(m: number, minimumRegime: number): BreakDates {
  // Integer arithmetic: 0.15 · m in floating point can land just above a whole number.
  const first = Math.max(Math.ceil((m * TRIMMING_PERCENT) / 100), minimumRegime);
  const last = Math.min(Math.floor((m * (100 - TRIMMING_PERCENT)) / 100), m - minimumRegime);
  if (first > last) {
    throw new Error(`breakDates needs more than ${m} observations for ${TRIMMING_PERCENT}% trimming with ${minimumRegime} in each regime`);
  }
  return { first, last };
}
