// The documented rule that turns evidence and backtest scores into a recommended model, and a
// reading of it that keeps apart what the data showed from what the policy decided. Every
// interval score it reads is at the scored level (`recommendation.scored_level`, by default the
// widest interval level).
//
// Default rule, "prefer-stochastic", a policy: recommend the stochastic trend, the safer
// extrapolation because it lets the trend change direction (common practice), unless the
// deterministic trend earns its narrower intervals on every count:
//   1. a lower mean interval score than the stochastic trend at every horizon in the upper
//      half of the backtest (h > B/2),
//   2. the Diebold-Mariano comparison of interval scores at the longest backtest horizon finds
//      it better at the significance level, over at least MIN_BACKTEST_ORIGINS origins,
//   3. the unit-root evidence does not point to a stochastic trend (reading ≠ 'stochastic'),
//   4. the break test finds no break in its trend line (at 5%, the level of the memo's caveat),
//   5. the backtest checked forecasts as far ahead as the memo makes them (B ≥ the horizon).
// Alternative rule, "lowest-interval-score": the model with the lower mean interval score over
// the upper-half horizons (the stochastic trend on a tie or without a backtest); it weighs the
// scores alone, and says so where a caveat speaks against its choice.
// A config may instead fix the model with a written justification.
import { levelKey, MIN_BACKTEST_ORIGINS, type AnalysisSettings, type TrendModelKind } from '../base/settings.js';
import { intervalScoreLoss } from '../backtest/backtestRecord.js';
import { recommendationWording as w } from './recommendationWording.js';
import type { InadmissibleReason } from '../models/admissibility.js';
import type { AnalysisRecord, EvidenceItem, RecommendationRecord } from './record.js';

/** What the rule reads from a record. */
export interface RecommendationInput {
  /** The unit-root reading (`evidence.reading.verdict`). */
  verdict: string;
  /** Whether the break test finds a break in the fixed trend line at 5%; null when it was not run. */
  deterministicBreak: boolean | null;
  /** Why the stochastic model's AICc-best fit was set aside, if it was. */
  stochasticSetAside: InadmissibleReason | null;
  backtest?: {
    /** Origins scored. */
    origins: number;
    /** The backtest horizon B. */
    horizon: number;
    per_horizon: Record<TrendModelKind, { h: number; interval_score: Record<string, number | null> }[]>;
    comparison: { h: number; loss: string; p_value: number | null; better: TrendModelKind | null; available: boolean }[];
  };
}

/** The rule's input read off a record's parts. */
export function recommendationInput(parts: Pick<AnalysisRecord, 'evidence' | 'backtest'> & { stochastic: Pick<AnalysisRecord['models']['stochastic'], 'set_aside'> }): RecommendationInput {
  const { evidence, backtest, stochastic } = parts;
  return {
    verdict: evidence.reading.verdict,
    deterministicBreak: evidence.stability === null ? null : evidence.stability.break_test.deterministic.reject['5'],
    stochasticSetAside: stochastic.set_aside?.reason ?? null,
    backtest:
      backtest === undefined || backtest === null
        ? undefined
        : { origins: backtest.origins.length, horizon: backtest.settings.horizon, per_horizon: backtest.per_horizon, comparison: backtest.comparison },
  };
}

interface LongerHorizonScores {
  longest: number;
  rows: { h: number; deterministic: number; stochastic: number }[];
  deterministicMean: number;
  stochasticMean: number;
}

export function recommendModel(input: RecommendationInput, settings: Pick<AnalysisSettings, 'horizon' | 'recommendation'>): RecommendationRecord {
  const choices = settings.recommendation;
  const { significance, scored_level: level } = choices;
  const { backtest } = input;
  const scores = longerHorizonScores(input, level);
  const origins = backtest?.origins ?? 0;
  const reach = backtest?.horizon ?? 0;
  const test = scores === undefined ? undefined : backtest?.comparison.find((c) => c.h === scores.longest && c.loss === intervalScoreLoss(level));
  const testAvailable = test !== undefined && test.available && test.p_value !== null;
  const significant = testAvailable && test.p_value !== null && test.p_value < significance;
  const testCounts = origins >= MIN_BACKTEST_ORIGINS;
  const { verdict } = input;
  const broken = input.deterministicBreak === true;
  const undoesDifferencing = input.stochasticSetAside === 'undoes-differencing';

  const evidence: EvidenceItem[] = [];
  const item = (check: EvidenceItem['check'], finding: string, favours: TrendModelKind | null): void => {
    evidence.push({ check, finding, favours });
  };
  const lower = scores === undefined ? null : scores.deterministicMean < scores.stochasticMean ? 'deterministic' : scores.stochasticMean < scores.deterministicMean ? 'stochastic' : null;
  const everyHorizonBetter = scores !== undefined && scores.rows.every((row) => row.deterministic < row.stochastic);
  if (scores === undefined) item('backtest-scores', w.noScores(level), null);
  else item('backtest-scores', w.scores(level, scores.rows.map((r) => r.h), scores.deterministicMean, scores.stochasticMean, everyHorizonBetter), lower);
  if (scores !== undefined) {
    if (!testAvailable || test === undefined || test.p_value === null) item('comparison-test', w.testUnavailable(scores.longest), null);
    else item('comparison-test', w.test(scores.longest, test.p_value, test.better, significant, significance, origins, testCounts), significant && testCounts ? test.better : null);
  }
  if (backtest !== undefined && origins < MIN_BACKTEST_ORIGINS) item('origins', w.fewOrigins(origins, MIN_BACKTEST_ORIGINS), null);
  if (backtest !== undefined && reach < settings.horizon) item('backtest-reach', w.shortReach(reach, settings.horizon), null);
  item('unit-root', w.unitRoot(verdict), verdict === 'stochastic' ? 'stochastic' : verdict === 'deterministic' ? 'deterministic' : null);
  if (input.deterministicBreak !== null) item('trend-break', w.trendBreak(broken), broken ? 'stochastic' : null);
  if (undoesDifferencing) item('differencing', w.differencingUndone, 'deterministic');

  const ruleText = w.ruleText(choices.rule, level, MIN_BACKTEST_ORIGINS);
  const base = { significance, scored_level: level, evidence };
  if (choices.model !== null) {
    const justification = choices.justification ?? 'no justification given';
    return {
      ...base,
      model: choices.model,
      rule: 'fixed-by-config',
      rule_text: w.fixedRuleText,
      fixed_by_config: true,
      justification: choices.justification ?? undefined,
      decided_by: 'config',
      reasons: [w.fixed(choices.model, justification)],
    };
  }
  const ruled = (model: TrendModelKind, decidedBy: 'evidence' | 'policy', reasons: string[]) => ({
    ...base,
    model,
    rule: choices.rule,
    rule_text: ruleText,
    fixed_by_config: false,
    decided_by: decidedBy,
    reasons,
  });
  if (choices.rule === 'lowest-interval-score') {
    const model: TrendModelKind = lower === 'deterministic' ? 'deterministic' : 'stochastic';
    const against = model === 'deterministic' ? [...(broken ? [w.despiteBreak] : []), ...(origins < MIN_BACKTEST_ORIGINS ? [w.despiteFewOrigins] : []), ...(reach < settings.horizon ? [w.despiteShortReach] : [])] : [];
    const decidedBy = scores === undefined ? 'policy' : 'evidence';
    return ruled(model, decidedBy, [...evidence.map((e) => e.finding), ...against, w.conclusion(model, decidedBy, false)]);
  }
  const conditions = {
    scores: everyHorizonBetter,
    test: significant && testCounts && test?.better === 'deterministic',
    unitRoot: verdict !== 'stochastic',
    noBreak: !broken,
    reach: reach >= settings.horizon,
  };
  const unmet = (Object.keys(conditions) as (keyof typeof conditions)[]).filter((condition) => !conditions[condition]);
  const model: TrendModelKind = unmet.length === 0 ? 'deterministic' : 'stochastic';
  // The evidence decides the stochastic trend only when something speaks for it and nothing for the fixed line.
  const speaksFor = (side: TrendModelKind): boolean => evidence.some((e) => e.favours === side);
  const decidedBy = model === 'deterministic' || (speaksFor('stochastic') && !speaksFor('deterministic')) ? 'evidence' : 'policy';
  return ruled(model, decidedBy, [...evidence.map((e) => e.finding), ...(model === 'stochastic' ? [w.unmet(unmet)] : []), w.conclusion(model, decidedBy, speaksFor('deterministic') && speaksFor('stochastic'))]);
}

/** Mean interval scores at `level` at the horizons above half the backtest horizon. */
function longerHorizonScores(input: RecommendationInput, level: number): LongerHorizonScores | undefined {
  const { backtest } = input;
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
  return { longest, rows, deterministicMean: mean(rows.map((r) => r.deterministic)), stochasticMean: mean(rows.map((r) => r.stochastic)) };
}

