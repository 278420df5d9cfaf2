// The rule table. Order matters only to break ties: among caveats of equal severity the one
// listed first is the one the summary shows, so the specific data-driven findings come before
// the standing caution.
import { SEVERITY_ORDER, type Caveat, type CaveatContext, type CaveatRule } from './caveat.js';
import { backTransformed } from './backTransformed.js';
import { backtestThin } from './backtestThin.js';
import { dataEndsEarly } from './dataEndsEarly.js';
import { fixedLineExtrapolation } from './fixedLineExtrapolation.js';
import { horizonLong } from './horizonLong.js';
import { narrowLineIntervals } from './narrowLineIntervals.js';
import { residualPattern } from './residualPattern.js';
import { seasonalPattern } from './seasonalPattern.js';
import { trendBreak } from './trendBreak.js';
import { unitRootEvidence } from './unitRootEvidence.js';

export const CAVEAT_RULES: readonly CaveatRule[] = [
  dataEndsEarly,
  trendBreak,
  unitRootEvidence,
  narrowLineIntervals,
  horizonLong,
  backtestThin,
  seasonalPattern,
  residualPattern,
  fixedLineExtrapolation,
  backTransformed,
];

/** Every caveat that fires, most severe first, ties in rule-table order. */
export function collectCaveats(context: CaveatContext, rules: readonly CaveatRule[] = CAVEAT_RULES): Caveat[] {
  const fired = rules.flatMap((rule) => {
    const caveat = rule.evaluate(context);
    return caveat === null ? [] : [caveat];
  });
  const rank = (c: Caveat) => SEVERITY_ORDER.indexOf(c.severity);
  // Array sort is stable (ES2019), so equal severities keep rule-table order.
  return fired.sort((a, b) => rank(a) - rank(b));
}
