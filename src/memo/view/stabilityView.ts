// The trend-stability section in words: how the windows were set up and what each break test
// found, with the period the break would start from.
import { addPeriods } from '../../base/period.js';
import { evidenceWording } from '../evidenceWording.js';
import { formatPercent, formatSignificant } from '../format/formatNumber.js';
import { noLinks } from '../format/noLinks.js';
import type { ModelRecord, StabilityRecord } from '../../analysis/record.js';
import type { TrendModelKind } from '../../base/settings.js';

export interface StabilityView {
  settings: string;
  breaks: { text: string; rejects: boolean }[];
  method: string[];
  /** One sentence for the series' main page; the chart and the tests are in the technical appendix. */
  summary: string;
}

const MODELS: readonly TrendModelKind[] = ['deterministic', 'stochastic'];

/** `seasonal`: each model's seasonal part (null without one), which the checks kept in every window and in the break test. */
export function stabilityView(stability: StabilityRecord, first: string, seasonal: Record<TrendModelKind, ModelRecord['seasonal']>): StabilityView {
  const { windows, break_test } = stability;
  // A part the search chose as none (no pattern, no seasonal terms, no seasonal differences) is not worth a mention.
  const parts = MODELS.flatMap((model) => seasonal[model] ?? []).filter((part) => part.harmonics > 0 || part.P + part.Q > 0 || part.seasonal_differences);
  const hasSeasonal = parts.length > 0;
  const seasonalNote = evidenceWording.breakSeasonal({ pattern: parts.some((part) => part.harmonics > 0), seasonalTerms: parts.some((part) => part.P + part.Q > 0) });
  const yearSteps = seasonal.stochastic?.seasonal_differences === true ? seasonal.stochastic.period : undefined;
  return {
    settings: evidenceWording.stabilitySettings({ minWindow: windows.min_window, step: windows.step, windows: windows.deterministic.length, seasonal: hasSeasonal }),
    breaks: MODELS.map((model) => {
      const test = break_test[model];
      return {
        rejects: test.reject['5'],
        text: evidenceWording.breakTest({
          model,
          rejects5: test.reject['5'],
          rejects10: test.reject['10'],
          period: addPeriods(first, test.break_index),
          stat: formatSignificant(test.stat, 3),
          critical5: formatSignificant(test.critical['5'], 3),
          pBound: test.p_bound,
          ...(model === 'stochastic' && yearSteps !== undefined ? { yearSteps } : {}),
        }),
      };
    }),
    summary: evidenceWording.stabilitySummary(MODELS.filter((model) => break_test[model].reject['5']), MODELS.filter((model) => break_test[model].reject['10'] && !break_test[model].reject['5'])),
    method: [
      ...MODELS.map((model) => {
        const test = break_test[model];
        return noLinks(evidenceWording.breakMethod(test.method, test.source, formatPercent(test.trimming)));
      }),
      ...(seasonalNote === '' ? [] : [seasonalNote]),
    ],
  };
}
