// One precision for every level of a series (history, forecasts, interval ends, accuracy in
// units), so numbers in its tables line up and compare at a glance.
import type { AnalysisRecord } from '../../analysis/record.js';
import { atLevel, widestLevel } from '../intervalLevels.js';
import { decimalsForScale } from './formatNumber.js';

/**
 * Decimals from the narrower of the two models' one-step intervals at the widest level:
 * differences smaller than a hundredth of that width carry no information for the reader.
 */
export function seriesDecimals(record: Pick<AnalysisRecord, 'forecasts' | 'settings'>): number {
  const level = widestLevel(record.settings);
  const widths = [record.forecasts.deterministic[0], record.forecasts.stochastic[0]].flatMap((row) => {
    const interval = atLevel(row?.intervals, level);
    return interval === undefined ? [] : [interval[1] - interval[0]];
  });
  const positive = widths.filter((w) => Number.isFinite(w) && w > 0);
  return positive.length === 0 ? 2 : decimalsForScale(Math.min(...positive));
}
