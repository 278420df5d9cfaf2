// The memo's fixed wording: headings, labels, model names, status and the standing cautions.
// Sentences built from numbers live in evidenceWording.ts and caveats/caveatWording.ts, so
// a reviewer can read every word the memo can say in these three modules.
import type { Frequency } from '../base/period.js';
import type { SignOffDecision } from './memoInput.js';
import type { BacktestMethod } from '../analysis/record.js';
import type { Transform, TrendModelKind } from '../base/settings.js';

export const MODEL_NAME: Record<TrendModelKind, string> = {
  deterministic: 'Deterministic trend',
  stochastic: 'Stochastic trend',
};

/** Lower-case model names for use inside sentences. */
export const MODEL_IN_TEXT: Record<BacktestMethod, string> = {
  deterministic: 'deterministic-trend model',
  stochastic: 'stochastic-trend model',
  naive: 'no-change benchmark',
  seasonal_naive: 'seasonal naive benchmark',
};

export const METHOD_NAME: Record<BacktestMethod, string> = {
  deterministic: 'Deterministic',
  stochastic: 'Stochastic',
  naive: 'No change',
  seasonal_naive: 'Seasonal naive',
};

/** What each model assumes, in one plain sentence. */
export const MODEL_GLOSS: Record<TrendModelKind, string> = {
  deterministic: 'a fixed trend line that holds for the whole horizon, with passing swings around it',
  stochastic: 'a trend that can wander: each shock shifts the future path, so uncertainty grows with the horizon',
};

const PERIOD_WORDS: Record<Frequency, [string, string]> = {
  annual: ['year', 'years'],
  quarterly: ['quarter', 'quarters'],
  monthly: ['month', 'months'],
};

/** "1 year", "12 quarters". */
export function countPeriods(count: number, frequency: Frequency): string {
  const [one, many] = PERIOD_WORDS[frequency];
  return `${count} ${count === 1 ? one : many}`;
}

export const FREQUENCY_NAME: Record<Frequency, string> = {
  annual: 'Annual',
  quarterly: 'Quarterly',
  monthly: 'Monthly',
};

export const TRANSFORM_NAME = {
  none: 'none (original units)',
  log: 'natural log',
  'box-cox': 'Box-Cox',
} as const;

/** The modelling scale in words: "natural log", "Box-Cox (λ = 0.5)". */
export function scaleName(transform: Transform): string {
  return transform.kind === 'box-cox' ? `Box-Cox (\u03bb = ${transform.lambda})` : TRANSFORM_NAME[transform.kind];
}

export const DECISION_NAME: Record<SignOffDecision, string> = {
  approved: 'Approved',
  'approved-with-changes': 'Approved with changes',
  rejected: 'Rejected',
};

export const STATUS = {
  draft: 'Draft',
  signedOff: 'Signed off',
  noReviewers: 'No reviewers are listed, so the memo cannot be signed off.',
  awaiting: (names: string[]) => `Awaiting sign-off from ${listInWords(names)}.`,
  rejectedBy: (names: string[]) => `Not approved by ${listInWords(names)}.`,
  complete: 'Every listed reviewer has signed off.',
} as const;

export const HEADINGS = {
  summary: 'Summary for the client',
  history: 'History',
  forecast: 'Forecast',
  widthRatio: 'How much narrower the deterministic intervals are',
  backtest: 'Backtest accuracy',
  evidence: 'What the data say about the trend',
  models: 'The two models',
  residualAcf: 'Leftover pattern in the forecast errors',
  stability: 'Trend stability',
  caveats: 'Caveats',
  assumptions: 'Assumptions register',
  cautions: 'Important cautions',
  signOff: 'Review and sign-off',
  reproducibility: 'Appendix: reproducing this memo',
} as const;

export const LABELS = {
  client: 'Client',
  preparedBy: 'Prepared by',
  reference: 'Reference',
  asOf: 'As of',
  author: 'Author',
  reviewers: 'Reviewers',
  status: 'Status',
  memoId: 'Memo',
  recommended: 'Recommended',
  point: 'Point',
  ratio: 'Width ratio',
  units: 'Units',
  span: 'History',
  transform: 'Modelling scale',
  notes: 'Notes',
  severity: { high: 'Important', medium: 'Caution', low: 'Note' },
  choice: 'Choice',
  value: 'Value',
  basis: 'Basis',
  setBy: 'Set by',
  setByValue: { config: 'Configuration', default: 'Tool default' },
  name: 'Name',
  role: 'Role',
  date: 'Date',
  decision: 'Decision',
  comment: 'Comment',
  signature: 'Signature',
  notSigned: 'Not yet signed',
  tool: 'Tool',
  command: 'Command',
  runDate: 'Run date',
  config: 'Configuration file',
  dataFile: 'Data file',
  recordSource: 'Series source',
  sha256: 'SHA-256',
  file: 'File',
  column: 'Column',
  horizon: 'h',
  period: 'Period',
  estimate: 'Estimate',
  stderr: 'Std. error',
  tRatio: 'Estimate / s.e.',
  coefficient: 'Coefficient',
  test: 'Check',
  statistic: 'Statistic',
  pValue: 'p-value',
  critical5: '5% critical value',
  outcome: 'Outcome',
  lags: 'Lags',
  origins: 'Origins',
} as const;

/** Short fixed text the templates place: table captions, column heads, small labels. */
export const TEMPLATE_TEXT = {
  memoKind: 'Forecast memo',
  atPeriod: (period: string) => `At ${period}`,
  recommendedMarker: 'recommended',
  assumes: 'It assumes',
  squaredErrorLoss: 'Squared error',
  intervalScoreLoss: (level: number) => `${levelPercent(level)} interval score`,
  intervalHead: (level: number) => `${levelPercent(level)} interval`,
  noAssumptions: 'No assumptions were recorded for this series.',
  forecastCaption: (units: string) => (units === '' ? 'Forecasts by period' : `Forecasts by period (${units})`),
  pointCaption: (units: string) => (units === '' ? 'Point accuracy by horizon' : `Point accuracy by horizon (RMSE in ${units})`),
  intervalCaption: (units: string, transformed: boolean) =>
    units === ''
      ? `Interval accuracy by horizon${transformed ? ' (CRPS on the modelling scale)' : ''}`
      : `Interval accuracy by horizon (width and score in ${units}; CRPS ${transformed ? 'on the modelling scale' : `in ${units}`})`,
  comparisonCaption: 'Comparison tests by horizon',
  pointColumns: ['RMSE', 'MAPE', 'MASE'],
  /** Coverage at every level; width and score at the level the recommendation rule scores. */
  intervalColumns: (levels: readonly number[], scored: number) => [
    ...levels.map((level) => `${levelPercent(level)} cover`),
    `${levelPercent(scored)} width`,
    `${levelPercent(scored)} score`,
    'CRPS',
  ],
  accuracyNote:
    'RMSE: root mean squared error. MAPE: mean absolute percentage error. MASE: mean absolute error divided by the in-sample error of the benchmark each backtest names (the no-change forecast, or for a seasonal series the same season a year earlier). ' +
    'Cover: share of outcomes inside the interval. Score: interval score, the width plus a penalty for outcomes outside it (lower is better). CRPS: continuous ranked probability score (lower is better).',
} as const;

export const PAGE_FOOTER = { page: 'Page', of: 'of' } as const;

/** The standing cautions every memo carries, in this order. */
export const CAUTIONS = [
  'A forecast is an estimate, not a guarantee. Actual outcomes can and do fall outside the ranges shown.',
  'Prediction intervals assume the fitted model holds over the whole horizon. They do not cover changes in policy, technology, markets or measurement that the history does not contain.',
  'The deterministic-trend model in particular assumes the trend line continues unchanged; the further ahead it is extended, the harder that is to defend.',
  'Decisions that rest on these figures, including financial, capacity and regulatory decisions, remain with qualified professionals and the rules that apply to them.',
] as const;

/** The summary's opening; `levels` is null when the series do not share one set of levels; `withYear` when a series is monthly or quarterly. */
export function summaryIntro(levels: readonly number[] | null, withYear = false): string {
  // Plural at one level too: each of the two models has its interval.
  const intervals = levels === null ? 'the prediction intervals set for each series' : `${levelList(levels)} prediction intervals`;
  const when = withYear ? 'at the end of the horizon and, for a monthly or quarterly series, for the next full calendar year,' : 'at the end of the horizon';
  return `For each series: the model we recommend, the forecast ${when} under both models with ${intervals}, and the caveat that matters most. The sections that follow give the evidence behind each choice.`;
}

export const NOT_RUN = {
  backtest: 'The backtest was not run for this series, so there is no out-of-sample check of either model.',
  stability: 'The trend-stability checks were not run for this series.',
  recommendation: 'No recommendation was recorded for this series; both models are shown side by side.',
  history: 'The observed values were not supplied with this memo, so the history chart is left out.',
} as const;

export const SIGN_OFF_NOTE =
  'A reviewer signs to confirm that the assumptions register above documents the choices behind this memo and that the evidence supports the recommendation.';

export const AICC_NOTE =
  'Each model\u2019s ARMA orders were chosen by AICc among its own candidates. AICc values of the two models are not compared with each other: one describes the levels, the other their changes.';

/** An interval level as the reader sees it: 95 → "95%", 99.5 → "99.5%". */
export function levelPercent(level: number): string {
  return `${level}%`;
}

/** "90%", "80% and 95%", "68%, 95% and 99%". */
export function levelList(levels: readonly number[]): string {
  return listInWords(levels.map(levelPercent));
}

/** "90% prediction interval", "80% and 95% prediction intervals". */
export function predictionIntervals(levels: readonly number[]): string {
  return `${levelList(levels)} prediction interval${levels.length === 1 ? '' : 's'}`;
}

/** "A", "A and B", "A, B and C". */
export function listInWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
