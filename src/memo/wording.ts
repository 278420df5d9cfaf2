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

export const HEADINGS = {
  forecast: 'Forecast',
  backtest: 'Backtest accuracy',
  evidence: 'What the data say about the trend',
  models: 'The two models',
  residualChecks: 'Checks of each model\u2019s one-step forecast errors',
  stability: 'Trend stability',
  caveats: 'Caveats',
  assumptions: 'Assumptions register',
  cautions: 'Standing cautions',
  signOff: 'Review and sign-off',
  reproducibility: 'Appendix: reproducing this memo',
  detail: 'Technical appendix: models and checks in detail',
} as const;

/**
 * Names of the models' coefficients and fit figures, as the memo's model tables and the
 * terminal summary of `fit` both print them.
 */
export const COEFFICIENT_NAME = {
  intercept: 'Intercept (level at t = 0)',
  slope: 'Slope per period',
  drift: 'Drift per period',
  ar: (lag: number) => `AR ${lag} (\u03c6${lag})`,
  ma: (lag: number) => `MA ${lag} (\u03b8${lag})`,
  seasonalAr: (period: number) => `Seasonal AR (\u03a6, lag ${period})`,
  seasonalMa: (period: number) => `Seasonal MA (\u0398, lag ${period})`,
} as const;

export const FIT_FIGURE_NAME = {
  order: 'ARMA order (p, q)',
  seasonalPart: 'Seasonal part',
  sigma2: 'Innovation variance',
  loglik: 'Log-likelihood',
  aicc: 'AICc',
  nobs: 'Observations',
  estimation: 'Estimated by',
  converged: 'Converged',
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
  source: 'Source',
  notes: 'Notes',
  severity: { high: 'Weighs on the decision', medium: 'Bear in mind', low: 'For the record' },
  choice: 'Choice',
  value: 'Value',
  basis: 'Basis',
  setBy: 'Set by',
  setByValue: { config: 'Config', default: 'Default', data: 'Data' },
  allSeries: 'Every series, unless its own list below says otherwise',
  contentDigest: 'Content digest',
  feeds: (column: string, title: string) => `column \u201c${column}\u201d for ${title}`,
  openComment: 'Open comment',
  registerIntro: 'Each choice behind the memo, its value, where it comes from and who settled it: the config, the tool\u2019s default, or the data (a choice the analysis made by a documented rule). Each choice is listed once with the entry most series share; each series then lists only what is its own.',
  name: 'Name',
  role: 'Role',
  date: 'Date',
  decision: 'Decision',
  comment: 'Comment',
  signature: 'Signature',
  notSigned: 'Not yet signed',
  tool: 'Tool',
  command: 'Reproduce (in the config\u2019s folder)',
  runDate: 'Run date',
  config: 'Configuration file',
  sha256: 'SHA-256',
  file: 'File',
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
  recommendedMarker: 'recommended',
  assumes: 'It assumes',
  squaredErrorLoss: 'Squared error',
  intervalScoreLoss: (level: number) => `${levelPercent(level)} interval score`,
  intervalHead: (level: number) => `${levelPercent(level)} interval`,
  noAssumptions: 'No assumptions were recorded for this series.',
  forecastCaption: (units: string) => (units === '' ? 'Forecasts by period' : `Forecasts by period (${units})`),
  backtestCaption: (units: string) => (units === '' ? 'Accuracy by horizon' : `Accuracy by horizon (RMSE and interval score in ${units})`),
  comparisonCaption: 'Comparison tests by horizon',
  notTested: 'not tested',
  methodShort: { deterministic: 'Det.', stochastic: 'Stoch.', naive: 'Bench.', seasonal_naive: 'Bench.' } as Record<BacktestMethod, string>,
  coverHead: (level: number) => `${levelPercent(level)} cover`,
  backtestTableNote: (benchmark: string) => `Det.: deterministic trend. Stoch.: stochastic trend. Bench.: the ${benchmark.toLowerCase()} benchmark. Lower RMSE, MASE and interval score are better.`,
  /** Said once in the technical appendix for every backtest table. */
  backtestGlossary:
    'Backtest tables: RMSE is the root mean squared error. MASE is the mean absolute error over a fixed in-sample yardstick, the benchmark\u2019s mean error one step (for a seasonal series one season) ahead within the training history; values above 1 at longer horizons are usual for every method, the benchmark included. Cover is the share of outcomes inside the interval. The interval score is the width plus a penalty for outcomes outside it. MAPE, interval widths and CRPS at every horizon are in record.json.',
  ruleStudyPointer: 'How this rule behaves in simulation: see the technical appendix.',
  /** `files`: where every step is, e.g. "forecasts.csv and record.json". */
  rowsShown: (shown: readonly number[], files: string) => `Rows shown: steps ${listInWords(shown.map(String))}; every step is in ${files}.`,
  widthFlat: (level: number, low: string, high: string) =>
    `The deterministic model's ${levelPercent(level)} interval is ${low === high ? low : `${low} to ${high}`} times as wide as the stochastic model's at every horizon: the two models' uncertainty hardly differs.`,
  widthRange: (level: number, first: { period: string; ratio: string }, last: { period: string; ratio: string }, direction: 'narrower' | 'wider' | 'mixed') => {
    const words = { narrower: 'narrower at every horizon', wider: 'wider at every horizon', mixed: 'narrower at some horizons and wider at others' };
    return `Width ratio: the deterministic model's ${levelPercent(level)} interval divided by the stochastic model's, ${first.ratio} at ${first.period} and ${last.ratio} at ${last.period} (${words[direction]}).`;
  },
  /** Coverage at every level; width and score at the level the recommendation rule scores. */
} as const;

/** Page 1: the reviewer's overview of every series. */
export const PAGE_ONE = {
  heading: 'At a glance',
  issued: 'Issued',
  data: (span: string, last: string) => `${span}; last observation ${last}`,
  source: (source: string, vintage: string) =>
    source === '' && vintage === '' ? 'Source and vintage: not given in the config.' : `${source === '' ? 'Source not given' : `Source: ${source}`}${vintage === '' ? '' : `; vintage: ${vintage}`}.`,
  annual: 'next full year: as next period',
  yearBeyond: (year: string | number) => `${year}: beyond the horizon`,
  nextHead: 'Next period',
  yearHead: 'Next full year',
  endHead: 'End of horizon',
  widestInterval: 'Widest interval',
  noRecommendation: 'No recommendation was recorded; both models are shown.',
  recommendation: (model: string, decidedBy: string, reason: string, agreement: string) =>
    `Recommended: ${model.toLowerCase()} trend. ${decidedBy}${reason === '' ? '' : ` ${reason}`}${agreement === '' ? '' : ` ${agreement}`}`,
  caveats: (all: number, high: number, highLabel: string) =>
    all === 0 ? 'No caveats.' : `${all} caveat${all === 1 ? '' : 's'} on the series page${high === 0 ? '' : `, ${high} marked \u201c${highLabel.toLowerCase()}\u201d`}.`,
  noEarlier: (asOf: string) => `Since the last memo: no earlier memo (as of a period before ${asOf}) was found beside this one.`,
  changes: (a: { earlier: string; recommendation: string[]; orders: string[]; data: string[]; added: string[]; dropped: string[] }) => {
    const parts = [
      a.recommendation.length === 0 ? 'no recommendation changed' : `the recommendation changed for ${listInWords(a.recommendation)}`,
      a.orders.length === 0 ? 'no model order changed' : `model orders changed for ${listInWords(a.orders)}`,
      a.data.length === 0 ? 'no observation was revised' : `observations were revised for ${listInWords(a.data)}`,
      ...(a.added.length === 0 ? [] : [`new: ${listInWords(a.added)}`]),
      ...(a.dropped.length === 0 ? [] : [`dropped: ${listInWords(a.dropped)}`]),
    ];
    return `Since the memo as of ${a.earlier}: ${parts.join('; ')}. Forecast revisions are in the section that follows.`;
  },
  legend: (level: string) =>
    `\u25C6 marks the recommended model, whose row is set in bold. Each figure is a point forecast with its ${level} prediction interval beside it. Severity chips on the series pages: \u201cweighs on the decision\u201d, \u201cbear in mind\u201d, \u201cfor the record\u201d, from most to least serious.`,
} as const;

export const PAGE_FOOTER = { page: 'Page', of: 'of' } as const;

/** The standing cautions every memo carries, in this order. */
export const CAUTIONS = [
  'A forecast is an estimate, not a guarantee. Actual outcomes can and do fall outside the ranges shown.',
  'Prediction intervals assume the fitted model holds over the whole horizon. They do not cover changes in policy, technology, markets or measurement that the history does not contain.',
  'The deterministic-trend model in particular assumes the trend line continues unchanged; the further ahead it is extended, the harder that is to defend.',
  'Decisions that rest on these figures, including financial, capacity and regulatory decisions, remain with qualified professionals and the rules that apply to them.',
] as const;


export const NOT_RUN = {
  backtest: 'The backtest was not run for this series, so there is no out-of-sample check of either model.',
  stability: 'The trend-stability checks were not run for this series.',
  recommendation: 'No recommendation was recorded for this series; both models are shown side by side.',
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
