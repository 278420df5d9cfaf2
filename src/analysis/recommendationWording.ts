// The recommendation's sentences, written into the record (and so read by the memo and the
// terminal summary alike). Each says what the data showed or what the policy decided, never
// the one as the other.
import { groupThousands } from '../base/groupThousands.js';
import { formatPValue } from '../base/pValueText.js';
import type { RecommendationRule, TrendModelKind } from '../base/settings.js';

function percent(fraction: number): string {
  return `${Number((fraction * 100).toPrecision(6))}%`;
}

function hList(hs: readonly number[]): string {
  return hs.length > 3 ? `${hs[0]} to ${hs[hs.length - 1]}` : hs.join(', ');
}

/** Four significant digits, thousands grouped as the memo prints numbers: 10,330, 5.346. */
function fourDigits(value: number): string {
  return groupThousands(String(Number(value.toPrecision(4))));
}

export const recommendationWording = {
  ruleText(rule: RecommendationRule, level: number, minOrigins: number): string {
    return rule === 'prefer-stochastic'
      ? `Policy: recommend the stochastic trend, which lets the trend change direction, unless the deterministic trend earns its narrower intervals on every count: better backtest ${level}% interval scores at every longer horizon, confirmed by a significant comparison test over at least ${minOrigins} origins, no unit-root evidence for a stochastic trend, no break in its trend line, and a backtest that reaches the memo's horizon.`
      : `Policy: recommend the model with the lower average ${level}% interval score over the longer backtest horizons; the scores alone decide.`;
  },
  fixedRuleText: 'The model was fixed in the configuration, with the justification given.',
  fixed(model: TrendModelKind, justification: string): string {
    return `Fixed to the ${model} trend by the configuration: ${justification}.`;
  },
  noScores(level: number): string {
    return `There are no backtest ${level}% interval scores to compare.`;
  },
  scores(level: number, hs: readonly number[], deterministic: number, stochastic: number, everyHorizon: boolean): string {
    const which = deterministic < stochastic ? `the deterministic trend scored lower${everyHorizon ? ', at every one of them' : ', though not at every one of them'}` : deterministic > stochastic ? 'the stochastic trend scored lower' : 'the two scored the same';
    return `Backtest: at h = ${hList(hs)} the average ${level}% interval score was ${fourDigits(deterministic)} for the deterministic trend and ${fourDigits(stochastic)} for the stochastic trend (lower is better): ${which}.`;
  },
  testUnavailable(h: number): string {
    return `The comparison test at h = ${h} could not be computed.`;
  },
  test(h: number, p: number, better: string | null, significant: boolean, significance: number, origins: number, counts: boolean): string {
    const side = better === null ? '' : ` in favour of the ${better} trend`;
    const verdict = significant ? `significant at ${percent(significance)}` : `not significant at ${percent(significance)}`;
    const weight = counts ? '' : `, but over ${origins} origins it does not count as evidence`;
    return `The comparison test at h = ${h} gives ${formatPValue({ p_value: p })}${side}: ${verdict}${weight}.`;
  },
  fewOrigins(origins: number, minimum: number): string {
    return `The backtest has ${origins} origin${origins === 1 ? '' : 's'}, fewer than the ${minimum} a comparison needs to count.`;
  },
  shortReach(reach: number, horizon: number): string {
    return `The backtest checked forecasts up to ${reach} step${reach === 1 ? '' : 's'} ahead; the memo forecasts ${horizon}. Beyond ${reach} the choice rests on the models' assumptions, not on their record.`;
  },
  unitRoot(verdict: string): string {
    if (verdict === 'stochastic') return 'The unit-root checks point to a stochastic trend.';
    if (verdict === 'deterministic') return 'The unit-root checks point to a fixed trend line.';
    return `The unit-root checks do not settle it (reading: ${verdict}).`;
  },
  trendBreak(broken: boolean): string {
    return broken ? 'The break test finds a break in the fixed trend line (see the caveats).' : 'The break test finds no break in the fixed trend line.';
  },
  differencingUndone:
    'The best-fitting stochastic model nearly undoes its own differencing, which is what a fixed trend line looks like from its changes: evidence against a wandering trend. The stochastic trend shown is the best one that does wander.',
  despiteBreak: 'A break was found in the fixed trend line; this rule weighs the backtest scores alone, so the break did not enter the choice.',
  despiteFewOrigins: 'The backtest has few origins; this rule takes its scores as they are.',
  despiteShortReach: 'The backtest did not reach the memo\u2019s horizon; this rule takes the scores over the horizons it did reach.',
  /** The policy's conditions the fixed line did not meet. */
  unmet(conditions: readonly ('scores' | 'test' | 'unitRoot' | 'noBreak' | 'reach')[]): string {
    const words = {
      scores: 'better scores at every longer horizon',
      test: 'a significant comparison test over enough origins',
      unitRoot: 'unit-root checks free of evidence for a stochastic trend',
      noBreak: 'a trend line without a break',
      reach: 'a backtest that reaches the memo\u2019s horizon',
    };
    const list = conditions.map((c) => words[c]);
    const joined = list.length <= 1 ? list.join('') : `${list.slice(0, -1).join(', ')} and ${list[list.length - 1]}`;
    return `The fixed line does not meet the policy's conditions: it lacks ${joined}.`;
  },
  /** `mixed`: some evidence speaks for each model. */
  conclusion(model: TrendModelKind, decidedBy: 'evidence' | 'policy', mixed: boolean): string {
    if (model === 'deterministic') return 'So the deterministic trend is recommended; its narrower intervals rest on the trend line continuing unchanged.';
    if (decidedBy === 'evidence') return 'So the stochastic trend is recommended: the evidence that speaks at all speaks for it.';
    return `${mixed ? 'The evidence is mixed' : 'The evidence does not settle the choice'}, so the policy\u2019s default applies: the stochastic trend is recommended.`;
  },
};
