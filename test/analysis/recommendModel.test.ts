// The recommendation rule on constructed cases (expected outcomes: our documented rule in
// src/analysis/recommendModel.ts).
import { describe, expect, it } from 'vitest';
import { recommendModel, type RecommendationEvidence } from '../../src/analysis/recommendModel.js';
import type { RecommendationChoices } from '../../src/base/settings.js';
import { settingsFor } from '../support/settings.js';

/** The rule's settings as resolved from a config that writes `written` under recommendation. */
const rule = (written: Partial<RecommendationChoices> = {}): RecommendationChoices => ({ ...settingsFor().recommendation, ...written });

function evidence(det: number[], sto: number[], pValue: number | null, better: string | null, verdict = 'deterministic'): RecommendationEvidence {
  const rows = (scores: number[]) => scores.map((score, i) => ({ h: i + 1, interval_score: { '80': score * 0.8, '95': score } }));
  return {
    verdict,
    backtest: {
      per_horizon: { deterministic: rows(det), stochastic: rows(sto) },
      comparison: det.map((_, i) => ({ h: i + 1, loss: 'interval_score_95', p_value: i === det.length - 1 ? pValue : 0.5, better, available: pValue !== null })),
    },
  };
}

describe('prefer-stochastic (default)', () => {
  it('recommends the deterministic trend only when it earns it on all three counts', () => {
    const result = recommendModel(evidence([3, 3, 3, 3, 3], [3, 3, 4, 4, 4], 0.01, 'deterministic'), rule());
    expect(result.model).toBe('deterministic');
    expect(result.rule).toBe('prefer-stochastic');
    expect(result.reasons.join(' ')).toContain('p = 0.010');
  });

  it('keeps the stochastic trend when the comparison is not significant', () => {
    expect(recommendModel(evidence([3, 3, 3, 3, 3], [3, 3, 4, 4, 4], 0.2, 'deterministic'), rule()).model).toBe('stochastic');
  });

  it('keeps the stochastic trend when one longer horizon scores worse', () => {
    expect(recommendModel(evidence([3, 3, 3, 5, 3], [3, 3, 4, 4, 4], 0.01, 'deterministic'), rule()).model).toBe('stochastic');
  });

  it('keeps the stochastic trend when the unit-root evidence points to it', () => {
    const result = recommendModel(evidence([3, 3, 3, 3, 3], [3, 3, 4, 4, 4], 0.01, 'deterministic', 'stochastic'), rule());
    expect(result.model).toBe('stochastic');
    expect(result.reasons.join(' ')).toContain('points to a stochastic trend');
  });

  it('falls back to the stochastic trend without a backtest, and says so', () => {
    const result = recommendModel({ verdict: 'deterministic' }, rule());
    expect(result.model).toBe('stochastic');
    expect(result.reasons[0]).toContain('No backtest');
  });

  it('treats an unavailable comparison as not significant', () => {
    expect(recommendModel(evidence([3, 3, 3, 3, 3], [3, 3, 4, 4, 4], null, null), rule()).model).toBe('stochastic');
  });
});

describe('lowest-interval-score and fixed models', () => {
  it('picks the lower average score over the upper-half horizons', () => {
    const result = recommendModel(evidence([9, 9, 3, 3, 3], [1, 1, 4, 4, 4], 0.5, null), rule({ rule: 'lowest-interval-score' }));
    expect(result.model).toBe('deterministic');
    expect(result.reasons[0]).toContain('h = 3, 4, 5');
  });

  it('honours a model fixed by the config with its justification', () => {
    const result = recommendModel(evidence([3], [1], 0.5, null), rule({ model: 'deterministic', justification: 'Contracted volumes grow linearly.' }));
    expect(result.model).toBe('deterministic');
    expect(result.fixed_by_config).toBe(true);
    expect(result.reasons[0]).toContain('Contracted volumes grow linearly.');
  });
});

describe('the scored level', () => {
  it('compares the interval scores at the level the settings name, and says which', () => {
    // At 95% the stochastic trend scores 2.5 against 3 at the longer horizons; at 80% it scores
    // 0.8 × 2.5 = 2 (constructed above) against the deterministic trend's 1 set here.
    const lopsided = evidence([3, 3, 3, 3, 3], [3, 3, 2.5, 2.5, 2.5], 0.5, null);
    lopsided.backtest?.per_horizon.deterministic.forEach((row) => (row.interval_score['80'] = 1));
    const at80 = recommendModel(lopsided, rule({ rule: 'lowest-interval-score', scored_level: 80 }));
    const at95 = recommendModel(lopsided, rule({ rule: 'lowest-interval-score', scored_level: 95 }));
    expect([at80.model, at95.model]).toEqual(['deterministic', 'stochastic']);
    expect(at80.scored_level).toBe(80);
    expect(at80.reasons[0]).toContain('Average 80% interval score');
    expect(at80.rule_text).toContain('80% interval score');
  });

  it('falls back to the stochastic trend when the backtest has no scores at that level', () => {
    const result = recommendModel(evidence([3, 3, 3], [4, 4, 4], 0.01, 'deterministic'), rule({ scored_level: 90 }));
    expect(result.model).toBe('stochastic');
    expect(result.reasons[0]).toBe('No backtest 90% interval scores are available, so the rule falls back to the stochastic trend.');
  });
});
