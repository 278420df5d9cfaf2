// The recommendation rule on constructed cases (expected outcomes: our documented rule in
// src/analysis/recommendModel.ts).
import { describe, expect, it } from 'vitest';
import { recommendModel, type RecommendationEvidence } from '../../src/analysis/recommendModel.js';

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
    const result = recommendModel(evidence([3, 3, 3, 3, 3], [3, 3, 4, 4, 4], 0.01, 'deterministic'));
    expect(result.model).toBe('deterministic');
    expect(result.rule).toBe('prefer-stochastic');
    expect(result.reasons.join(' ')).toContain('p = 0.010');
  });

  it('keeps the stochastic trend when the comparison is not significant', () => {
    expect(recommendModel(evidence([3, 3, 3, 3, 3], [3, 3, 4, 4, 4], 0.2, 'deterministic')).model).toBe('stochastic');
  });

  it('keeps the stochastic trend when one longer horizon scores worse', () => {
    expect(recommendModel(evidence([3, 3, 3, 5, 3], [3, 3, 4, 4, 4], 0.01, 'deterministic')).model).toBe('stochastic');
  });

  it('keeps the stochastic trend when the unit-root evidence points to it', () => {
    const result = recommendModel(evidence([3, 3, 3, 3, 3], [3, 3, 4, 4, 4], 0.01, 'deterministic', 'stochastic'));
    expect(result.model).toBe('stochastic');
    expect(result.reasons.join(' ')).toContain('points to a stochastic trend');
  });

  it('falls back to the stochastic trend without a backtest, and says so', () => {
    const result = recommendModel({ verdict: 'deterministic' });
    expect(result.model).toBe('stochastic');
    expect(result.reasons[0]).toContain('No backtest');
  });

  it('treats an unavailable comparison as not significant', () => {
    expect(recommendModel(evidence([3, 3, 3, 3, 3], [3, 3, 4, 4, 4], null, null)).model).toBe('stochastic');
  });
});

describe('lowest-interval-score and fixed models', () => {
  it('picks the lower average score over the upper-half horizons', () => {
    const result = recommendModel(evidence([9, 9, 3, 3, 3], [1, 1, 4, 4, 4], 0.5, null), { rule: 'lowest-interval-score' });
    expect(result.model).toBe('deterministic');
    expect(result.reasons[0]).toContain('h = 3, 4, 5');
  });

  it('honours a model fixed by the config with its justification', () => {
    const result = recommendModel(evidence([3], [1], 0.5, null), { model: 'deterministic', justification: 'Contracted volumes grow linearly.' });
    expect(result.model).toBe('deterministic');
    expect(result.fixed_by_config).toBe(true);
    expect(result.reasons[0]).toContain('Contracted volumes grow linearly.');
  });
});
