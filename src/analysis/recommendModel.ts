// The documented rule that turns evidence and backtest scores into a recommended model.
//
// Default rule, "prefer-stochastic": recommend the stochastic trend, the safer extrapolation
// because it lets the trend change direction (common practice), unless the deterministic
// trend earns its narrower intervals on all three counts:
//   1. a lower mean 95% interval score than the stochastic trend at every horizon in the
//      upper half of the backtest (h > B/2),
//   2. the Diebold-Mariano comparison of 95% interval scores at the longest horizon favours it
//      at the significance level,
//   3. the unit-root evidence does not point to a stochastic trend (reading ≠ 'stochastic').
// Alternative rule, "lowest-interval-score": the model with the lower mean 95% interval score
// over the upper-half horizons (the stochastic trend on a tie or without a backtest).
// A config may instead fix the model with a written justification.
import { RECOMMENDATION_RULES } from '../config/builtInSettings.js';
import type { TrendModelKind } from '../models/trendModels.js';

export { RECOMMENDATION_RULES };
export type RecommendationRule = (typeof RECOMMENDATION_RULES)[number];

export interface RecommendationRecord {
  model: TrendModelKind;
  rule: RecommendationRule | 'fixed-by-config';
  /** The rule in one plain sentence. */
  rule_text: string;
  fixed_by_config: boolean;
  justification?: string;
  significance: number;
  reasons: string[];
}

/** What the rule reads from a record: the evidence reading and the backtest scores. */
export interface RecommendationEvidence {
  verdict: string;
  backtest?: {
    per_horizon: Record<'deterministic' | 'stochastic', { h: number; interval_score: Record<string, number | null> }[]>;
    comparison: { h: number; loss: string; p_value: number | null; better: string | null; available?: boolean }[];
  };
}

export interface RecommendationOptions {
  rule?: RecommendationRule;
  significance?: number;
  /** Fixes the model; `justification` is then required. */
  model?: TrendModelKind;
  justification?: string;
}

const RULE_TEXT: Record<RecommendationRule | 'fixed-by-config', string> = {
  'prefer-stochastic':
    'Recommend the stochastic trend, which lets the trend change direction, unless the deterministic trend has better backtest interval scores at the longer horizons, confirmed by a significant comparison test, and the unit-root evidence does not point to a stochastic trend.',
  'lowest-interval-score': 'Recommend the model with the lower average 95% interval score over the longer backtest horizons.',
  'fixed-by-config': 'The model was fixed in the configuration, with the justification given.',
};

export function recommendModel(evidence: RecommendationEvidence, options: RecommendationOptions = {}): RecommendationRecord {
  const significance = options.significance ?? 0.05;
  if (options.model !== undefined) {
    return {
      model: options.model,
      rule: 'fixed-by-config',
      rule_text: RULE_TEXT['fixed-by-config'],
      fixed_by_config: true,
      justification: options.justification,
      significance,
      reasons: [`Fixed to the ${options.model} trend by the configuration: ${options.justification ?? 'no justification given'}.`],
    };
  }
  const rule = options.rule ?? 'prefer-stochastic';
  const scores = longerHorizonScores(evidence);
  const reasons: string[] = [];
  let model: TrendModelKind = 'stochastic';
  if (scores === undefined) {
    reasons.push('No backtest interval scores are available, so the rule falls back to the stochastic trend.');
  } else if (rule === 'lowest-interval-score') {
    reasons.push(scoreSentence(scores));
    if (scores.deterministicMean < scores.stochasticMean) model = 'deterministic';
  } else {
    const everyHorizonBetter = scores.rows.every((row) => row.deterministic < row.stochastic);
    reasons.push(
      everyHorizonBetter
        ? `The deterministic trend scored better at every longer horizon (h = ${scores.rows.map((r) => r.h).join(', ')}). ${scoreSentence(scores)}`
        : `The deterministic trend did not score better at every longer horizon. ${scoreSentence(scores)}`,
    );
    const test = evidence.backtest?.comparison.find((c) => c.h === scores.longest && c.loss === 'interval_score_95');
    const significant = test !== undefined && test.available !== false && test.p_value !== null && test.p_value < significance && test.better === 'deterministic';
    reasons.push(
      test === undefined || test.available === false || test.p_value === null
        ? `The comparison test at h = ${scores.longest} is not available.`
        : `The comparison test at h = ${scores.longest} gives p = ${test.p_value.toFixed(3)}${test.better === null ? '' : ` in favour of the ${test.better} trend`} (${significant ? 'significant' : 'not significant'} at ${significance * 100}%).`,
    );
    const unitRoot = evidence.verdict === 'stochastic';
    reasons.push(unitRoot ? 'The unit-root evidence points to a stochastic trend.' : `The unit-root evidence does not point to a stochastic trend (reading: ${evidence.verdict}).`);
    if (everyHorizonBetter && significant && !unitRoot) model = 'deterministic';
  }
  reasons.push(
    model === 'deterministic'
      ? 'So the deterministic trend is recommended; its narrower intervals rest on the trend line continuing unchanged.'
      : 'So the stochastic trend is recommended.',
  );
  return { model, rule, rule_text: RULE_TEXT[rule], fixed_by_config: false, significance, reasons };
}

interface LongerHorizonScores {
  longest: number;
  rows: { h: number; deterministic: number; stochastic: number }[];
  deterministicMean: number;
  stochasticMean: number;
}

/** Mean 95% interval scores at the horizons above half the backtest horizon. */
function longerHorizonScores(evidence: RecommendationEvidence): LongerHorizonScores | undefined {
  const backtest = evidence.backtest;
  if (backtest === undefined) return undefined;
  const longest = Math.max(...backtest.per_horizon.deterministic.map((row) => row.h));
  const rows: LongerHorizonScores['rows'] = [];
  for (const det of backtest.per_horizon.deterministic) {
    if (det.h <= longest / 2 && det.h !== longest) continue;
    const sto = backtest.per_horizon.stochastic.find((row) => row.h === det.h);
    const a = det.interval_score['95'];
    const b = sto?.interval_score['95'];
    if (a === null || a === undefined || b === null || b === undefined) return undefined;
    rows.push({ h: det.h, deterministic: a, stochastic: b });
  }
  if (rows.length === 0) return undefined;
  const mean = (values: number[]): number => values.reduce((s, v) => s + v, 0) / values.length;
  return {
    longest,
    rows,
    deterministicMean: mean(rows.map((r) => r.deterministic)),
    stochasticMean: mean(rows.map((r) => r.stochastic)),
  };
}

function scoreSentence(scores: LongerHorizonScores): string {
  return `Average 95% interval score at h = ${scores.rows.map((r) => r.h).join(', ')}: deterministic ${scores.deterministicMean.toPrecision(4)}, stochastic ${scores.stochasticMean.toPrecision(4)} (lower is better).`;
}
