// All wording this stage shows to readers of a memo, kept in one place so it can be reviewed
// and reworded without touching the statistics. Written for a client reviewer: no test jargon
// beyond naming the p-values.
import type { TrendVerdictKind } from './types.js';

/** A test's p-value as the memo states it, honouring the edges of a lookup table. */
export interface StatedPValue {
  p_value: number;
  p_bound?: 'below' | 'above';
}

/** "p = 0.042", "p below 0.01", "p above 0.10". */
export function formatPValue({ p_value, p_bound }: StatedPValue): string {
  if (p_bound === 'below') return `p below ${p_value.toFixed(2)}`;
  if (p_bound === 'above') return `p above ${p_value.toFixed(2)}`;
  if (p_value < 0.001) return 'p below 0.001';
  return `p = ${p_value.toFixed(3)}`;
}

/** One sentence explaining a trend verdict, with both p-values and the level used. */
export function trendVerdictSummary(
  verdict: TrendVerdictKind,
  kpss: StatedPValue,
  adf: StatedPValue,
  significance: number,
): string {
  const stable = `the check that starts from a steady trend line (${formatPValue(kpss)})`;
  const lasting = `the check that starts from shocks that never fade (${formatPValue(adf)})`;
  const level = `judged at the ${Number((significance * 100).toPrecision(6))}% level`;
  switch (verdict) {
    case 'deterministic':
      return `The series moves like a steady trend line with passing swings around it: ${stable} found nothing against that picture, while ${lasting} was rejected, ${level}.`;
    case 'stochastic':
      return `The series moves like a trend that keeps every shock, so surprises shift its future path for good: ${stable} was rejected, while ${lasting} found nothing against that picture, ${level}.`;
    case 'conflicting':
      return `The two checks disagree: ${stable} was rejected and so was ${lasting}, ${level}; these checks alone do not settle which kind of trend fits.`;
    case 'inconclusive':
      return `Neither check found clear evidence: ${stable} and ${lasting} were both left standing, ${level}; these checks alone cannot tell the two kinds of trend apart for this series.`;
  }
}
