// The sentence a memo prints, on page 1 and in the series section, when the two models give
// about the same interval at the end of the horizon: the memo's consistency check
// (memo/consistency) requires it there.
import type { AnalysisRecord } from '../../analysis/record.js';
import { endWidthRatio, modelsAgree } from '../consistency/memoContradictions.js';
import { evidenceWording } from '../evidenceWording.js';
import { formatNumber } from '../format/formatNumber.js';

/** The sentence for two models whose intervals end about the same, else nothing. */
export function agreement(record: Pick<AnalysisRecord, 'forecasts' | 'settings'>): string[] {
  return modelsAgree(record) ? [evidenceWording.modelsAgree(formatNumber(endWidthRatio(record), 2))] : [];
}
