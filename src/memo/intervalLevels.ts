// Which interval level the memo reads where. Every level the analysis ran at gets its own band
// in the forecast chart and its own column in the tables. Where one number stands for the
// intervals (a width ratio, a caveat, a headline figure, the coverage panel) it is the widest
// level, the range a reader plans against; where the text is about the recommendation rule it
// is the level the rule scored. The sentences name the level either way.
import type { AnalysisRecord } from '../analysis/record.js';
import { levelKey } from '../base/settings.js';

/** The widest of the levels (they are ascending, at least one). */
export function widestLevel(settings: { readonly levels: readonly number[] }): number {
  return settings.levels[settings.levels.length - 1];
}

/** The level whose backtest interval scores the recommendation rule and the comparison tests read. */
export function scoredLevel(record: Pick<AnalysisRecord, 'settings'>): number {
  return record.settings.recommendation.scored_level;
}

/** What a table keyed by level holds at `level`; undefined when it holds nothing there. */
export function atLevel<T>(table: Readonly<Record<string, T>> | undefined, level: number): T | undefined {
  return table?.[levelKey(level)];
}
