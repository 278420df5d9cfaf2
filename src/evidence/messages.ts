// All wording this stage shows to readers of a memo, kept in one place so it can be reviewed
// and reworded without touching the statistics. Written for a client reviewer: no test jargon
// beyond naming the p-values.
import { formatPValue, type StatedPValue } from '../base/pValueText.js';
import type { SupWaldPBound, TrendVerdictKind } from './types.js';

/** A short plain-language explanation of a trend verdict, with both p-values and the level used. */
export function trendVerdictSummary(
  verdict: TrendVerdictKind,
  kpss: StatedPValue,
  adf: StatedPValue,
  significance: number,
): string {
  const kpssP = formatPValue(kpss);
  const adfP = formatPValue(adf);
  const level = `${Number((significance * 100).toPrecision(6))}% level`;
  switch (verdict) {
    case 'deterministic':
      return (
        'The series behaves like a steady trend line with passing swings around it. ' +
        `One check, which assumes such a line, found nothing against it (${kpssP}); the other, ` +
        `which assumes shocks never fade, was able to rule that out (${adfP}). Both judged at the ${level}.`
      );
    case 'stochastic':
      return (
        'The series behaves like a trend that keeps every shock, so each surprise moves its future ' +
        `path for good. One check ruled out a steady trend line (${kpssP}); the other, which assumes ` +
        `shocks never fade, found nothing against that (${adfP}). Both judged at the ${level}.`
      );
    case 'conflicting':
      return (
        `The two checks disagree. One ruled out a steady trend line (${kpssP}) and the other ruled out ` +
        `shocks that never fade (${adfP}), both at the ${level}, so these checks alone do not settle ` +
        'which kind of trend fits.'
      );
    case 'inconclusive':
      return (
        `Neither check could rule anything out: a steady trend line (${kpssP}) and shocks that never ` +
        `fade (${adfP}) both remain possible at the ${level}, so these checks alone cannot tell the ` +
        'two kinds of trend apart for this series.'
      );
  }
}

const BOUND_WORDS: Record<SupWaldPBound, string> = {
  'p < 0.01': 'p below 0.01',
  '0.01 < p < 0.05': 'p between 0.01 and 0.05',
  '0.05 < p < 0.10': 'p between 0.05 and 0.10',
  'p > 0.10': 'p above 0.10',
};

/**
 * One sentence on whether the trend line (deterministic) or the drift (stochastic) looks
 * stable, judged at 5%, with weak signs at 10% mentioned. `when` names the first observation
 * after the most likely break date (a period label, or "observation 73").
 */
export function breakTestSummary(kind: 'deterministic' | 'stochastic', bound: SupWaldPBound, when: string): string {
  const p = BOUND_WORDS[bound];
  const weak = bound === '0.05 < p < 0.10';
  const stable = bound === 'p > 0.10';
  if (kind === 'deterministic') {
    if (stable) return `The trend line looks stable: no shift in its level or slope stands out at any date away from the ends of the history (${p}).`;
    if (weak) return `The trend line looks broadly stable, with weak signs of a shift in its level or slope from ${when} (${p}).`;
    return `The trend line does not look stable: its level or slope appears to shift from ${when} (${p}), so one straight line through the whole history may mislead.`;
  }
  if (stable) return `The drift looks stable: the average change per period shows no clear shift at any date away from the ends of the history (${p}).`;
  if (weak) return `The drift looks broadly stable, with weak signs of a shift in the average change per period from ${when} (${p}).`;
  return `The drift does not look stable: the average change per period appears to shift from ${when} (${p}), so the recent pace may differ from the long-run average.`;
}

/** Notes on how the evidence was gathered. */
export const evidenceNotes = {
  missingInUnitRootTests(count: number): string {
    return `${count} missing value${count === 1 ? ' was' : 's were'} left out of the unit-root tests, which then treat the remaining values as consecutive; read them as approximate.`;
  },
  stabilityNeedsComplete: 'the trend-stability checks need a series without missing values',
};
