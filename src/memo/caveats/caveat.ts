// A caveat is a warning the memo derives from the record's numbers by a small named rule.
import type { AnalysisRecord } from '../../analysis/record.js';
import type { DataEnd } from '../memoInput.js';

export type CaveatSeverity = 'high' | 'medium' | 'low';

export const SEVERITY_ORDER: readonly CaveatSeverity[] = ['high', 'medium', 'low'];

export interface Caveat {
  /** The rule that produced it. */
  id: string;
  severity: CaveatSeverity;
  /** Plain-language text with the numbers that triggered it. */
  text: string;
  /** The numbers the rule used, for review and tests. */
  numbers: Record<string, number | string>;
}

export interface CaveatContext {
  record: AnalysisRecord;
  units?: string;
  /** Set when the data end well before the memo's as-of period. */
  dataEnd?: DataEnd;
}

export interface CaveatRule {
  id: string;
  /** When the rule fires, in one line, for the rule table. */
  fires: string;
  evaluate(context: CaveatContext): Caveat | null;
}
