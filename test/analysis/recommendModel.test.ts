// The recommendation rule on constructed cases (expected outcomes: our documented rule in
// src/analysis/recommendModel.ts): the policy's conditions, what the reading says was the
// evidence and what the policy, and the scored level.
import { describe, expect, it } from 'vitest';
import { recommendModel, type RecommendationInput } from '../../src/analysis/recommendModel.js';
import type { RecommendationChoices, TrendModelKind } from '../../src/base/settings.js';
import { settingsFor } from '../support/settings.js';

/** The rule's settings as resolved from a config that writes `written` under recommendation, at a horizon of 5. */
function settings(written: Partial<RecommendationChoices> = {}, horizon = 5) {
  return { horizon, recommendation: { ...settingsFor().recommendation, ...written } };
}

interface Case {
  det: number[];
  sto: number[];
  pValue: number | null;
  better: TrendModelKind | null;
  verdict?: string;
  origins?: number;
  deterministicBreak?: boolean | null;
  stochasticSetAside?: RecommendationInput['stochasticSetAside'];
}

/** A backtest of B = det.length horizons whose 95% scores are as given (80% scores 0.8 times them). */
function input({ det, sto, pValue, better, verdict = 'deterministic', origins = 20, deterministicBreak = false, stochasticSetAside = null }: Case): RecommendationInput {
  const rows = (scores: number[]) => scores.map((score, i) => ({ h: i + 1, interval_score: { '80': score * 0.8, '95': score } }));
  return {
    verdict,
    deterministicBreak,
    stochasticSetAside,
    backtest: {
      origins,
      horizon: det.length,
      per_horizon: { deterministic: rows(det), stochastic: rows(sto) },
      comparison: det.map((_, i) => ({ h: i + 1, loss: 'interval_score_95', p_value: i === det.length - 1 ? pValue : 0.5, better, available: pValue !== null })),
    },
  };
}

const EARNS_IT: Case = { det: [3, 3, 3, 3, 3], sto: [3, 3, 4, 4, 4], pValue: 0.01, better: 'deterministic' };

describe('prefer-stochastic (default)', () => {
  it('recommends the deterministic trend only when it earns it on every count, and says the evidence decided', () => {
    const result = recommendModel(input(EARNS_IT), settings());
    expect(result.model).toBe('deterministic');
    expect(result.rule).toBe('prefer-stochastic');
    expect(result.decided_by).toBe('evidence');
    expect(result.rule_text.startsWith('Policy: ')).toBe(true);
    expect(result.reasons.join(' ')).toContain('p = 0.010 in favour of the deterministic trend: significant at 5%');
  });

  it('keeps the stochastic trend when the comparison is not significant, and says the policy decided', () => {
    const result = recommendModel(input({ ...EARNS_IT, pValue: 0.2 }), settings());
    expect(result.model).toBe('stochastic');
    expect(result.decided_by).toBe('policy');
    expect(result.reasons.at(-1)).toBe('The evidence does not settle the choice, so the policy\u2019s default applies: the stochastic trend is recommended.');
  });

  it('keeps the stochastic trend when one longer horizon scores worse', () => {
    expect(recommendModel(input({ ...EARNS_IT, det: [3, 3, 3, 5, 3] }), settings()).model).toBe('stochastic');
  });

  it('keeps the stochastic trend when the unit-root evidence points to it, and calls mixed evidence the policy\'s call', () => {
    const result = recommendModel(input({ ...EARNS_IT, verdict: 'stochastic' }), settings());
    expect(result.model).toBe('stochastic');
    // The backtest speaks for the fixed line, the unit-root checks against it: mixed.
    expect(result.decided_by).toBe('policy');
    expect(result.reasons).toContain("The fixed line does not meet the policy's conditions: it lacks unit-root checks free of evidence for a stochastic trend.");
    expect(result.evidence.find((e) => e.check === 'unit-root')).toEqual({ check: 'unit-root', finding: 'The unit-root checks point to a stochastic trend.', favours: 'stochastic' });
  });

  it('does not recommend the fixed line against a break found in it', () => {
    const result = recommendModel(input({ ...EARNS_IT, deterministicBreak: true }), settings());
    expect(result.model).toBe('stochastic');
    expect(result.evidence.find((e) => e.check === 'trend-break')?.favours).toBe('stochastic');
  });

  it('does not count a comparison over fewer than ten origins', () => {
    const result = recommendModel(input({ ...EARNS_IT, origins: 4 }), settings());
    expect(result.model).toBe('stochastic');
    const test = result.evidence.find((e) => e.check === 'comparison-test');
    expect(test?.favours).toBeNull();
    expect(test?.finding).toContain('significant at 5%, but over 4 origins it does not count as evidence');
    expect(result.evidence.some((e) => e.check === 'origins')).toBe(true);
  });

  it('does not recommend the fixed line beyond the horizons the backtest reached', () => {
    const result = recommendModel(input(EARNS_IT), settings({}, 15));
    expect(result.model).toBe('stochastic');
    expect(result.evidence.find((e) => e.check === 'backtest-reach')?.finding).toContain('up to 5 steps ahead; the memo forecasts 15');
  });

  it('calls a significant result for the stochastic side significant', () => {
    const result = recommendModel(input({ det: [4, 4, 4], sto: [3, 3, 3], pValue: 0.003, better: 'stochastic', verdict: 'stochastic' }), settings({}, 3));
    expect(result.reasons.join(' ')).toContain('p = 0.003 in favour of the stochastic trend: significant at 5%.');
    expect(result.model).toBe('stochastic');
    expect(result.decided_by).toBe('evidence');
  });

  it('takes a stochastic fit that undoes its differencing as evidence for the fixed line', () => {
    const result = recommendModel(input({ ...EARNS_IT, stochasticSetAside: 'undoes-differencing' }), settings());
    expect(result.evidence.find((e) => e.check === 'differencing')?.favours).toBe('deterministic');
    expect(result.model).toBe('deterministic');
  });

  it('falls back to the stochastic trend without a backtest, and says so', () => {
    const result = recommendModel({ verdict: 'deterministic', deterministicBreak: null, stochasticSetAside: null }, settings());
    expect(result.model).toBe('stochastic');
    expect(result.decided_by).toBe('policy');
    expect(result.reasons[0]).toBe('There are no backtest 95% interval scores to compare.');
  });

  it('treats an unavailable comparison as not significant', () => {
    expect(recommendModel(input({ ...EARNS_IT, pValue: null, better: null }), settings()).model).toBe('stochastic');
  });
});

describe('lowest-interval-score and fixed models', () => {
  it('picks the lower average score over the upper-half horizons', () => {
    const result = recommendModel(input({ det: [9, 9, 3, 3, 3], sto: [1, 1, 4, 4, 4], pValue: 0.5, better: null }), settings({ rule: 'lowest-interval-score' }));
    expect(result.model).toBe('deterministic');
    expect(result.decided_by).toBe('evidence');
    expect(result.reasons[0]).toContain('h = 3, 4, 5');
  });

  it('says why it recommends the fixed line despite a break printed beside it', () => {
    const result = recommendModel(input({ det: [3, 3, 3], sto: [4, 4, 4], pValue: 0.5, better: null, deterministicBreak: true }), settings({ rule: 'lowest-interval-score' }, 3));
    expect(result.model).toBe('deterministic');
    expect(result.reasons).toContain('A break was found in the fixed trend line; this rule weighs the backtest scores alone, so the break did not enter the choice.');
  });

  it('honours a model fixed by the config with its justification', () => {
    const result = recommendModel(input({ det: [3], sto: [1], pValue: 0.5, better: null }), settings({ model: 'deterministic', justification: 'Contracted volumes grow linearly.' }));
    expect(result.model).toBe('deterministic');
    expect(result.fixed_by_config).toBe(true);
    expect(result.decided_by).toBe('config');
    expect(result.reasons[0]).toContain('Contracted volumes grow linearly.');
  });
});

describe('the scored level', () => {
  it('compares the interval scores at the level the settings name, and says which', () => {
    // At 95% the stochastic trend scores 2.5 against 3 at the longer horizons; at 80% it scores
    // 0.8 × 2.5 = 2 (constructed above) against the deterministic trend's 1 set here.
    const lopsided = input({ det: [3, 3, 3, 3, 3], sto: [3, 3, 2.5, 2.5, 2.5], pValue: 0.5, better: null });
    lopsided.backtest?.per_horizon.deterministic.forEach((row) => (row.interval_score['80'] = 1));
    const at80 = recommendModel(lopsided, settings({ rule: 'lowest-interval-score', scored_level: 80 }));
    const at95 = recommendModel(lopsided, settings({ rule: 'lowest-interval-score', scored_level: 95 }));
    expect([at80.model, at95.model]).toEqual(['deterministic', 'stochastic']);
    expect(at80.scored_level).toBe(80);
    expect(at80.reasons[0]).toContain('average 80% interval score');
    expect(at80.rule_text).toContain('80% interval score');
  });

  it('falls back to the stochastic trend when the backtest has no scores at that level', () => {
    const result = recommendModel(input({ det: [3, 3, 3], sto: [4, 4, 4], pValue: 0.01, better: 'deterministic' }), settings({ scored_level: 90 }, 3));
    expect(result.model).toBe('stochastic');
    expect(result.reasons[0]).toBe('There are no backtest 90% interval scores to compare.');
  });
});
