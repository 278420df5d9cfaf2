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
