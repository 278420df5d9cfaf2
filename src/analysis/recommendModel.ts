// The documented rule that turns evidence and backtest scores into a recommended model. Every
// interval score it reads is at the scored level (`recommendation.scored_level`, by default the
// widest interval level).
//
// Default rule, "prefer-stochastic": recommend the stochastic trend, the safer extrapolation
// because it lets the trend change direction (common practice), unless the deterministic
// trend earns its narrower intervals on all three counts:
//   1. a lower mean interval score than the stochastic trend at every horizon in the upper
//      half of the backtest (h > B/2),
//   2. the Diebold-Mariano comparison of interval scores at the longest horizon favours it at
//      the significance level,
//   3. the unit-root evidence does not point to a stochastic trend (reading ≠ 'stochastic').
// Alternative rule, "lowest-interval-score": the model with the lower mean interval score
// over the upper-half horizons (the stochastic trend on a tie or without a backtest).
// A config may instead fix the model with a written justification.
import { levelKey, type RecommendationChoices, type RecommendationRule, type TrendModelKind } from '../base/settings.js';
import { intervalScoreLoss } from '../backtest/backtestRecord.js';
import type { RecommendationRecord } from './record.js';

/** What the rule reads from a record: the evidence reading and the backtest scores. */
export interface RecommendationEvidence {
  verdict: string;
  backtest?: {
    per_horizon: Record<TrendModelKind, { h: number; interval_score: Record<string, number | null> }[]>;
    comparison: { h: number; loss: string; p_value: number | null; better: string | null; available?: boolean }[];
  };
}

function ruleText(rule: RecommendationRule | 'fixed-by-config', level: number): string {
  switch (rule) {
    case 'prefer-stochastic':
      return `Recommend the stochastic trend, which lets the trend change direction, unless the deterministic trend has better backtest ${level}% interval scores at the longer horizons, confirmed by a significant comparison test, and the unit-root evidence does not point to a stochastic trend.`;
    case 'lowest-interval-score':
      return `Recommend the model with the lower average ${level}% interval score over the longer backtest horizons.`;
    case 'fixed-by-config':
      return 'The model was fixed in the configuration, with the justification given.';
  }
}

export function recommendModel(evidence: RecommendationEvidence, choices: RecommendationChoices): RecommendationRecord {
  const { significance, scored_level: level } = choices;
  if (choices.model !== null) {
    return {
      model: choices.model,
      rule: 'fixed-by-config',
      rule_text: ruleText('fixed-by-config', level),
      fixed_by_config: true,
      justification: choices.justification ?? undefined,
      significance,
      scored_level: level,
      reasons: [`Fixed to the ${choices.model} trend by the configuration: ${choices.justification ?? 'no justification given'}.`],
    };
  }
  const { rule } = choices;
  const scores = longerHorizonScores(evidence, level);
  const reasons: string[] = [];
  let model: TrendModelKind = 'stochastic';
  if (scores === undefined) {
    reasons.push(`No backtest ${level}% interval scores are available, so the rule falls back to the stochastic trend.`);
  } else if (rule === 'lowest-interval-score') {
    reasons.push(scoreSentence(scores, level));
    if (scores.deterministicMean < scores.stochasticMean) model = 'deterministic';
  } else {
    const everyHorizonBetter = scores.rows.every((row) => row.deterministic < row.stochastic);
    reasons.push(
      everyHorizonBetter
        ? `The deterministic trend scored better at every longer horizon (h = ${scores.rows.map((r) => r.h).join(', ')}). ${scoreSentence(scores, level)}`
        : `The deterministic trend did not score better at every longer horizon. ${scoreSentence(scores, level)}`,
    );
    const test = evidence.backtest?.comparison.find((c) => c.h === scores.longest && c.loss === intervalScoreLoss(level));
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
  return { model, rule, rule_text: ruleText(rule, level), fixed_by_config: false, significance, scored_level: level, reasons };
}

interface LongerHorizonScores {
  longest: number;
  rows: { h: number; deterministic: number; stochastic: number }[];
  deterministicMean: number;
  stochasticMean: number;
}

/** Mean interval scores at `level` at the horizons above half the backtest horizon. */
function longerHorizonScores(evidence: RecommendationEvidence, level: number): LongerHorizonScores | undefined {
  const backtest = evidence.backtest;
  if (backtest === undefined) return undefined;
  const key = levelKey(level);
  const longest = Math.max(...backtest.per_horizon.deterministic.map((row) => row.h));
  const rows: LongerHorizonScores['rows'] = [];
  for (const det of backtest.per_horizon.deterministic) {
    if (det.h <= longest / 2 && det.h !== longest) continue;
    const sto = backtest.per_horizon.stochastic.find((row) => row.h === det.h);
    const a = det.interval_score[key];
    const b = sto?.interval_score[key];
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

function scoreSentence(scores: LongerHorizonScores, level: number): string {
  return `Average ${level}% interval score at h = ${scores.rows.map((r) => r.h).join(', ')}: deterministic ${scores.deterministicMean.toPrecision(4)}, stochastic ${scores.stochasticMean.toPrecision(4)} (lower is better).`;
}
