// All wording this stage shows to readers of a memo, kept in one place so it can be reviewed
// and reworded without touching the statistics. Written for a client reviewer: no test jargon
// beyond naming the p-values.
import { groupThousands } from '../base/groupThousands.js';
import { formatPValue, type StatedPValue } from '../base/pValueText.js';
import type { SeasonalPattern, SeasonalStrength, SupWaldPBound, TrendVerdictKind } from './types.js';

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
  seasonalNeedsComplete: 'the seasonal checks need a series without missing values',
};

const MONTHS = [
  'January', 'February', 'March', 'April', 'May', 'June',
  'July', 'August', 'September', 'October', 'November', 'December',
];

/** "March", "the second quarter", or "season 3" for another period. */
export function seasonName(season: number, period: number): string {
  if (period === 12) return MONTHS[season - 1];
  if (period === 4) return `the ${['first', 'second', 'third', 'fourth'][season - 1]} quarter`;
  return `season ${season}`;
}

/** "month" or "quarter", for a sentence about the same season a year earlier. */
function seasonWord(period: number): string {
  if (period === 12) return 'month';
  if (period === 4) return 'quarter';
  return 'season';
}

/** Three significant figures, without a trailing exponent for ordinary sizes, thousands grouped as the memo prints numbers. */
function threeFigures(x: number): string {
  return groupThousands(String(Number(x.toPrecision(3))));
}

/**
 * One sentence on the seasonal unit-root check (Canova-Hansen): whether a stable pattern
 * survives, and what the stochastic model does about it.
 */
export function seasonalTestSummary(
  differencing: boolean,
  pValue: StatedPValue,
  significance: number,
  period: number,
): string {
  const p = formatPValue(pValue);
  const level = `${Number((significance * 100).toPrecision(6))}% level`;
  const word = seasonWord(period);
  return differencing
    ? `The seasonal pattern does not hold still: the check for a stable pattern rules one out at the ${level} (${p}), ` +
        `so the stochastic model compares each ${word} with the same ${word} a year earlier instead of with the one before (seasonal differencing).`
    : `The check for a stable seasonal pattern finds nothing against one at the ${level} (${p}), ` +
        'so the stochastic model takes no seasonal difference.';
}

/** Descriptive bands for a strength between 0 and 1 (our wording, not a test). */
function strengthWord(strength: number): string {
  if (strength >= 0.7) return 'strong';
  if (strength >= 0.4) return 'moderate';
  return 'weak';
}

/**
 * How strong the seasonal pattern is and whether it kept its shape: "stable" when no season's
 * effect moved by more than a fifth of the pattern's range between the first and last complete
 * years, "shifting" up to half of it, "changing" beyond (our wording bands, not a test).
 */
export function seasonalStrengthSummary(strength: Pick<SeasonalStrength, 'seasonal' | 'trend'>, pattern: SeasonalPattern): string {
  const trend = strength.trend === null ? '' : ` The trend's strength on the same scale is ${strength.trend.toFixed(2)}.`;
  if (strength.seasonal === null) return `The series does not vary, so no seasonal strength can be measured.${trend}`;
  const value = strength.seasonal.toFixed(2);
  const opening = `The seasonal pattern is ${strengthWord(strength.seasonal)} (seasonal strength ${value} on a scale from 0 to 1)`;
  if (pattern.change_share === null || pattern.largest_change === null || pattern.largest_change_season === null) {
    return `${opening}; the series is too short to compare two complete years of it.${trend}`;
  }
  const years =
    pattern.first_year !== null && pattern.last_year !== null
      ? `between ${pattern.first_year} and ${pattern.last_year}`
      : 'between the first and the last complete year';
  const share = `${Math.round(pattern.change_share * 100)}% of the pattern's range of ${threeFigures(pattern.amplitude)}`;
  const season = seasonName(pattern.largest_change_season, pattern.period);
  const change = threeFigures(pattern.largest_change);
  if (pattern.change_share <= 0.2) {
    return `${opening} and stable: ${years} no ${seasonWord(pattern.period)}'s effect moved by more than ${change}, ${share}.${trend}`;
  }
  const how = pattern.change_share <= 0.5 ? 'has shifted somewhat' : 'has changed considerably';
  // A weak pattern's effects at the series' ends (STL's seasonal component there) are mostly estimation error, so their change says little.
  const noise = strengthWord(strength.seasonal) === 'weak' ? ' With a pattern this weak, its effects at either end of the series are poorly determined, so the change says little.' : '';
  return `${opening}, and its shape ${how}: ${years} the effect of ${season} moved by ${change}, ${share}.${noise}${trend}`;
}
