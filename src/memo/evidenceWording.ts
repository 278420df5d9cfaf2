// Sentences the memo builds from the record's numbers outside the caveats: the unit-root
// table, the backtest, the comparison tests, the break tests and the recommendation. The
// numbers arrive formatted; these functions only choose the words.
import type { Frequency } from '../base/period.js';
import type { Estimation, TrendModelKind } from '../base/settings.js';
import { countPeriods, levelPercent, listInWords, MODEL_IN_TEXT, MODEL_NAME } from './wording.js';
import { type RefitPolicy, type WindowKind } from '../base/settings.js';
import type { ResidualCheckName } from '../analysis/record.js';

export const UNIT_ROOT_ROWS = {
  kpssLevel: { name: 'KPSS: steady level', holds: 'no evidence against a steady level', rejects: 'rules out a steady level' },
  kpssTrend: { name: 'KPSS: steady trend line', holds: 'no evidence against a steady trend line', rejects: 'rules out a steady trend line' },
  adfConstant: { name: 'ADF: lasting shocks, around a level', holds: 'cannot rule out lasting shocks', rejects: 'rules out lasting shocks' },
  adfTrend: { name: 'ADF: lasting shocks, around a trend line', holds: 'cannot rule out lasting shocks', rejects: 'rules out lasting shocks' },
} as const;

/**
 * How each rule behaved in the recommendation study kept with the tool (npm run study; the
 * table and its date in DEVELOPERS.md, "How the rule behaves"): the memo's method note.
 */
const RULE_STUDY: Readonly<Record<string, string>> = {
  'prefer-stochastic':
    'How this policy behaves, in a seeded simulation study kept with the tool (100 series per case, intervals checked 10 steps ahead): with 40 observations it recommended the stochastic trend every time; with 100 it backed the fixed line for 24\u201357% of series whose trend was a fixed line and for 10\u201313% of those whose trend wandered; the 95% intervals of its picks held 90\u2013100% of the held-out values.',
  'lowest-interval-score':
    'How this rule behaves, in a seeded simulation study kept with the tool (100 series per case, intervals checked 10 steps ahead): it picked the fixed line for 51\u201362% of series whose trend wandered, and the 95% intervals of its picks then held as few as 77% of the held-out values.',
};

/** Why a fit may not be selected, in words (the reasons of src/models/admissibility.ts). */
const SET_ASIDE_REASONS: Readonly<Record<string, string>> = {
  'not-converged': 'its optimisation did not converge',
  'ar-unit-root': 'an autoregressive root lies within 0.01 of the unit circle',
  'ma-unit-root': 'a moving-average root lies within 0.01 of the unit circle',
  'cancelling-factors': 'its autoregressive and moving-average factors nearly cancel',
};

export const evidenceWording = {
  unitRootIntro: (level: string) =>
    `Two kinds of check read the series from opposite starting points. KPSS starts from a steady line and looks for evidence against it; ADF starts from shocks that never fade (a unit root) and looks for evidence against those. Outcomes are judged at the ${level} level.`,
  unavailable: (test: string, reason: string) => `${test} could not be computed: ${reason}`,
  residualsIntro:
    'A well-specified model leaves one-step forecast errors with no pattern, no memory and a roughly bell-shaped spread. These checks test each model\u2019s errors for that.',

  backtestSettings: (a: {
    origins: number;
    firstLength: number;
    firstPeriod: string;
    lastLength: number;
    lastPeriod: string;
    horizon: number;
    frequency: Frequency;
    refit: RefitPolicy;
    seasonal: boolean;
    window: WindowKind;
    step: number;
    minTraining: number;
    maseScaling: 'naive' | 'seasonal_naive';
  }) =>
    `Each model was fitted to the history up to a past date (an origin) and its forecasts compared with what then happened. ` +
    `There were ${a.origins} origins, ${countPeriods(a.step, a.frequency)} apart, from ${a.firstPeriod} (${a.firstLength} observations) to ${a.lastPeriod} (${a.lastLength} observations), each forecast up to ${countPeriods(a.horizon, a.frequency)} ahead. ` +
    `${(a.seasonal ? SEASONAL_REFIT_WORDS : REFIT_WORDS)[a.refit]} ${a.window === 'expanding' ? 'Each fit used all the history up to its origin.' : `Each fit used a sliding window of at least ${a.minTraining} observations.`}`,
  backtestUnavailable: (reason: string) => `Why: ${reason}`,
  /** `level`: the one the recommendation rule scores, the only level the comparison tests run at. */
  comparisonIntro: (level: number) =>
    `At each horizon a Diebold-Mariano test of equal accuracy compares the two models\u2019 backtest losses: squared error for the point forecasts and the ${levelPercent(level)} interval score for the intervals. The outcome names the model with the lower average loss; a small p-value means the difference is unlikely to be chance.`,
  /** Short enough for the appendix's narrow column; "Det." and "Stoch." are named under the backtest table. */
  comparisonOutcome: (better: TrendModelKind | null, available: boolean) => (!available ? 'not tested' : better === null ? 'equal' : `${better === 'deterministic' ? 'Det.' : 'Stoch.'} lower`),
  noReason: 'no reason recorded',
  stabilitySummary: (likely: TrendModelKind[], weak: TrendModelKind[]) => {
    const names = (models: TrendModelKind[]) => listInWords(models.map((m) => MODEL_NAME[m].toLowerCase()));
    const where = '(chart and tests in the technical appendix)';
    if (likely.length > 0) return `Trend stability: a break is likely in the ${names(likely)} at the 5% level${weak.length > 0 ? `, with weak signs of one in the ${names(weak)}` : ''} ${where}.`;
    if (weak.length > 0) return `Trend stability: no break at the 5% level; weak signs of one in the ${names(weak)} at the 10% level ${where}.`;
    return `Trend stability: neither trend shows a break at the 10% level ${where}.`;
  },
  residualSummary: (models: { model: TrendModelKind; flagged: ResidualCheckName[] }[]) => {
    const what: Record<ResidualCheckName, string> = {
      ljung_box: 'leftover pattern over several lags (Ljung-Box)',
      acf: 'single autocorrelations beyond their bounds',
      normality: 'errors not bell-shaped (Jarque-Bera), so the normal-based intervals may misstate the chance of large surprises',
    };
    const flagged = models.filter((m) => m.flagged.length > 0);
    if (flagged.length === 0) return 'Checks of the one-step forecast errors find no problem in either model (detail in the technical appendix).';
    const parts = flagged.map((m) => `for the ${MODEL_NAME[m.model].toLowerCase()}, ${listInWords(m.flagged.map((c) => what[c]))}`);
    const clean = models.filter((m) => m.flagged.length === 0).map((m) => MODEL_NAME[m.model].toLowerCase());
    return `Checks of the one-step forecast errors find, ${parts.join('; ')}${clean.length > 0 ? `; for the ${clean[0]}, nothing` : ''} (detail in the technical appendix).`;
  },

  /** `yearSteps`: the stochastic model works on seasonal differences over this many periods (a year); absent otherwise. */
  breakTest: (a: { model: TrendModelKind; rejects5: boolean; rejects10: boolean; period: string; stat: string; critical5: string; pBound: string; yearSteps?: number }) => {
    const what =
      a.model === 'deterministic'
        ? 'the level or slope of the trend line'
        : a.yearSteps === undefined
          ? 'the drift (the average change per period)'
          : `the drift (the average change per period, measured as the average change over a year divided by ${a.yearSteps})`;
    if (a.rejects5) return `${MODEL_NAME[a.model]}: a break is likely. ${capitalise(what)} appears to shift from ${a.period} (statistic ${a.stat} against a 5% critical value of ${a.critical5}; ${a.pBound}).`;
    if (a.rejects10) return `${MODEL_NAME[a.model]}: broadly stable, with weak signs of a shift in ${what} from ${a.period} (statistic ${a.stat} against a 5% critical value of ${a.critical5}; ${a.pBound}).`;
    return `${MODEL_NAME[a.model]}: no break stands out. The largest shift in ${what}, from ${a.period}, gives a statistic of ${a.stat}, below the 5% critical value of ${a.critical5} (${a.pBound}).`;
  },
  breakMethod: (method: string, source: string, trimming: string) => `Method: ${method}; candidate dates exclude ${trimming} of the sample at each end. ${sourceSentence(source)}`,
  stabilitySettings: (a: { minWindow: number; step: number; windows: number; seasonal: boolean }) =>
    a.windows <= 1
      ? `The history is too short for growing stretches: the shortest the check uses is ${a.minWindow} observations, the whole series, so the charts show the full-history estimates alone and only the break tests speak to stability.`
      : `Both trends were re-estimated on ${a.windows} growing stretches of history, the first of ${a.minWindow} observations and each then longer by ${a.step}, with the ARMA orders${a.seasonal ? ' and each model\u2019s seasonal part' : ''} held at their full-history choice.`,
  /** Said under the break tests when a model has a fixed seasonal pattern (harmonics) or seasonal ARMA terms. */
  breakSeasonal: (a: { pattern: boolean; seasonalTerms: boolean }) =>
    [
      a.pattern
        ? 'A model with a fixed seasonal pattern keeps it in the test: the pattern is estimated alongside the trend, the same before and after the break, and the critical values are those for a break in the trend alone, which a pattern that does not break leaves unchanged in large samples.'
        : '',
      a.seasonalTerms ? 'The errors are whitened with their seasonal terms, held at the full-history estimates like the other ARMA terms.' : '',
    ]
      .filter((sentence) => sentence !== '')
      .join(' '),

  recommendation: (model: TrendModelKind) => `We recommend the ${MODEL_IN_TEXT[model]}.`,
  /** Who settled the choice, in one short sentence for page 1 and the series section. */
  decidedBy: { evidence: 'The evidence decided it.', policy: 'The policy decided it: the evidence alone does not settle the choice.', config: 'Fixed in the configuration.' },
  evidenceHeading: 'What the data showed',
  /** The method note on how the rule behaves; empty for a model fixed in the configuration. */
  ruleStudy: (rule: string) => RULE_STUDY[rule] ?? '',
  /** Said wherever the two models' intervals at the end of the horizon are about the same (memo/consistency). */
  modelsAgree: (ratio: string) =>
    `Here the two models give nearly the same interval at the end of the horizon (width ratio ${ratio}): for these numbers the choice between them matters little.`,
  shortBacktest: (reach: number, horizon: number) =>
    `The backtest checked forecasts only up to ${reach} step${reach === 1 ? '' : 's'} ahead, against ${horizon} in this memo: beyond that neither model has a track record here.`,
  favours: (favours: TrendModelKind | null) => (favours === null ? 'neither way' : favours === 'deterministic' ? 'for the fixed line' : 'for a wandering trend'),
  ruleApplied: (rule: string) => `Rule applied: ${rule}`,
  /** A fit of lower AICc the search did not select, and why (src/models/admissibility.ts). */
  setAside: (a: { model: TrendModelKind; order: string; reason: string }) =>
    a.reason === 'undoes-differencing'
      ? `The best-fitting stochastic model, ${a.order}, has a moving-average root so close to 1 that it nearly undoes its own differencing: the data do not support a wandering trend, which is evidence for the fixed line. The stochastic trend shown is the best fit that does wander, so that its assumption (each shock moves the trend for good) can be weighed.`
      : `A fit of lower AICc, ${a.order}, was not selected: ${SET_ASIDE_REASONS[a.reason] ?? a.reason}; its standard errors and intervals would not be reliable.`,
  stderrMethod: (method: string | null, hasTerms: boolean) =>
    !hasTerms ? '' : method === 'outer-product' ? 'The AR and MA standard errors come from the outer product of the scores, as the likelihood’s curvature could not be measured at this optimum.' : method === null ? 'The AR and MA standard errors could not be computed at this optimum.' : '',
  fixedByConfig: 'The model was fixed by the analyst in the configuration rather than chosen by the rule.',
  convergence: (converged: boolean) => (converged ? 'converged' : 'did not converge: treat its estimates with caution'),
  fitFacts: (a: { p: number; q: number; nobs: number; loglik: string; aicc: string; sigma2: string; converged: string; estimation: Estimation }) =>
    `ARMA(${a.p}, ${a.q}) errors, the order chosen by AICc on the exact likelihood (${a.nobs} observations; log-likelihood ${a.loglik}; AICc ${a.aicc}). ` +
    (a.estimation === 'reml'
      ? `Coefficients, innovation variance (${a.sigma2}) and standard errors by restricted maximum likelihood (REML), less biased than exact maximum likelihood when the trend is estimated alongside the errors. The fit ${a.converged}.`
      : `Coefficients, innovation variance (${a.sigma2}) and standard errors by exact maximum likelihood. The fit ${a.converged}.`),
  seasonalHeading: 'Seasonal pattern',
  patternColumns: { average: 'Average', fixedLine: 'Det. fixed pattern' },
  patternCaption: (transformed: boolean, period: number) =>
    `Seasonal effect of each ${period === 12 ? 'month' : 'quarter'} above or below the trend${transformed ? ', on the modelling scale' : ''}: the average over the whole history and the first and last complete years (STL decomposition), and the fixed pattern the deterministic trend model estimated, where it has one (Det. fixed pattern).`,
  seasonName: (period: number, season: number) =>
    period === 12 ? ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'][season - 1] : `Q${season}`,
  seasonalNone: 'The configuration says the series has no seasonal pattern to model (seasonally adjusted data), so neither model has a seasonal part.',
  seasonalDifferencesByConfig: (differences: boolean) =>
    `The configuration fixes the seasonal form: the stochastic model ${differences ? 'takes' : 'does not take'} seasonal differences, whatever the test says.`,
  /** A model's seasonal part in words: the fixed pattern, the drifting part, the seasonal differences. */
  seasonalPart: (kind: TrendModelKind, part: { period: number; harmonics: number; P: number; Q: number; seasonal_differences: boolean }, fixedByConfig: boolean) => {
    const season = part.period === 12 ? 'month' : 'quarter';
    if (part.harmonics === 0 && part.P + part.Q === 0 && !(kind === 'stochastic' && part.seasonal_differences)) {
      return fixedByConfig
        ? 'Seasonal part, as fixed in the configuration: none.'
        : 'Seasonal part: none. No selectable fit with a seasonal pattern, fixed or drifting, had a lower AICc, so the data show no seasonality this model needs.';
    }
    const pieces = [
      part.harmonics > 0
        ? `a fixed seasonal pattern (${part.harmonics} harmonic pair${part.harmonics === 1 ? '' : 's'}, S(t) in the equation)`
        : part.seasonal_differences
          ? ''
          : 'no fixed seasonal pattern',
      part.P + part.Q > 0
        ? `a seasonal ${[part.P > 0 ? 'autoregressive' : '', part.Q > 0 ? 'moving-average' : ''].filter(Boolean).join(' and ')} term at lag ${part.period}, which lets the seasonal swings drift from year to year${part.harmonics > 0 ? ' around that pattern' : ''}`
        : '',
      kind === 'stochastic' && part.seasonal_differences ? `seasonal differences: each ${season} is compared with the same ${season} a year earlier, so the pattern wanders with the trend` : '',
    ].filter((piece) => piece !== '');
    return `Seasonal part, ${fixedByConfig ? 'as fixed in the configuration' : 'chosen from the data with the order'}: ${pieces.join('; ')}.`;
  },
  /** REML was asked for, but its fit was not used. */
  restrictedFallback: (reason: string) =>
    `The restricted-likelihood (REML) estimates ${reason === 'not-converged' ? 'did not converge' : `were not admissible (${reason === 'undoes-differencing' ? 'a moving-average root so close to 1 that it undoes the differencing' : (SET_ASIDE_REASONS[reason] ?? reason)})`}, so the exact maximum-likelihood estimates are shown instead.`,
  scaleNote: (scale: string | null) => (scale === null ? 'Estimates are in the original units of the series.' : `Estimates are on the ${scale} scale of the series.`),
} as const;

const REFIT_WORDS: Record<RefitPolicy, string> = {
  reselect: 'At every origin both models were refitted, their ARMA orders chosen afresh by AICc.',
  reestimate: 'At every origin the coefficients were re-estimated, with the ARMA orders held at the full-history choice.',
  fixed: 'The full-history fits were used at every origin without re-estimation, so the scores are optimistic.',
};

const SEASONAL_REFIT_WORDS: Record<RefitPolicy, string> = {
  reselect: 'At every origin both models were refitted, their ARMA orders and seasonal parts chosen afresh by AICc.',
  reestimate: 'At every origin the coefficients were re-estimated, with the ARMA orders and seasonal parts held at the full-history choice.',
  fixed: REFIT_WORDS.fixed,
};

/** The break test's sources as a sentence: "statistic: A; critical values: B" reads "The statistic follows A; its critical values are B." */
function sourceSentence(source: string): string {
  const parts = /^statistic: (.*?); critical values: (.*)$/.exec(source);
  if (parts === null) return `Critical values: ${source}.`;
  return `The statistic follows ${parts[1]}; its critical values are the ${parts[2]}.`;
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
