// Asymptotic critical values of the sup-Wald (sup-F times restrictions) statistic for a
// break at an unknown date with stationary regressors and 15% trimming, π0 = 0.15:
// Andrews (1993), "Tests for parameter instability and structural change with unknown change
// point", Econometrica 61(4), Table 1, in the corrected values of Andrews (2003), Econometrica
// 71(1). Typed in from memory; the tests check them against a simulation of the limit
// sup ‖B(π) − πB(1)‖² / (π(1 − π)). The trimming is breakDates' TRIMMING_PERCENT.
import type { SupWaldCritical } from './types.js';

export const ANDREWS_SOURCE = 'Andrews (1993), Econometrica 61(4), Table 1 (corrected values, Andrews 2003)';

const TABLE: readonly SupWaldCritical[] = [
  { '10': 7.12, '5': 8.68, '1': 12.16 },
  { '10': 10.0, '5': 11.72, '1': 15.56 },
];

/** 10%, 5% and 1% critical values for 1 or 2 restrictions at 15% trimming. */
export function andrewsCritical(restrictions: number): SupWaldCritical {
  const row = TABLE[restrictions - 1];
  if (!Number.isInteger(restrictions) || row === undefined) {
    throw new Error(`andrewsCritical has values for 1 to ${TABLE.length} restrictions, not ${restrictions}`);
  }
  return { ...row };
}
