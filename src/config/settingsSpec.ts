// The settings a config may give once under `defaults` and override per series.
import { ESTIMATION_METHODS, MIN_BACKTEST_ORIGINS, MISSING_POLICIES, POINT_FORECASTS, RECOMMENDATION_RULES, REFIT_POLICIES, TREND_MODELS, WINDOW_KINDS, YEAR_FIGURES } from '../base/settings.js';
import { BUILT_IN_SETTINGS as BUILT_IN, MIN_TRAIN_FLOOR, MIN_TRAIN_PER_PARAMETER } from './builtInSettings.js';
import { DEFAULT_YEARS_AHEAD } from '../base/periodEnd.js';
import { choice, decimal, flag, list, object, period, shapes, text, whole } from './keySpec.js';

const MAX_ORDER = 8;
/** Interval levels a memo shows at most: each is shaded in the charts and has its columns in the tables. */
const MAX_LEVELS = 4;

const significance = (doc: string, fallback: number) => decimal(doc, 0.01, 0.1, { default: fallback });

/** The Box-Cox λ, also read by the command line's --transform box-cox:LAMBDA. */
export const BOX_COX_LAMBDA = decimal('The Box-Cox lambda.', -2, 2);

/** One interval level, also read by the command line's --levels and --scored-level. */
export const LEVEL = decimal('An interval level in percent.', 0, 100, { exclusive: true });

const transform = shapes(
  'Transform applied to the values before both models are fitted; forecasts are transformed back.',
  choice('No transform, or the natural logarithm.', ['none', 'log']),
  object(
    'Box-Cox transform with the given lambda (0 is the logarithm).',
    { box_cox: BOX_COX_LAMBDA },
    { required: ['box_cox'], example: '{box_cox: 0.5}' },
  ),
  { description: 'none, log, or a mapping such as {box_cox: 0.5}', default: BUILT_IN.transform },
);

/** The fields of a seasonal form fixed by the analyst, kept by name for the command line. */
export const SEASONAL_FORM_FIELDS = {
  harmonics: whole('Harmonic (Fourier) pairs describing a fixed seasonal pattern: up to 6 for monthly, 2 for quarterly data.', 0, 6),
  seasonal_ar: whole('Seasonal autoregressive order of a pattern that drifts (0 or 1).', 0, 1),
  seasonal_ma: whole('Seasonal moving-average order of a pattern that drifts (0 or 1).', 0, 1),
  seasonal_differences: flag('Whether the stochastic model takes seasonal differences (1 − B^s) instead of first differences.'),
};

const seasonal = shapes(
  'Seasonal part of both models, for monthly and quarterly series.',
  choice('auto: chosen from the data (the seasonal evidence and AICc); none: no seasonal part, for seasonally adjusted data.', ['auto', 'none']),
  object('A seasonal form fixed by the analyst: the same in both models (harmonics, seasonal AR and MA), and whether the stochastic model differences seasonally.', SEASONAL_FORM_FIELDS, {
    required: ['harmonics', 'seasonal_ar', 'seasonal_ma', 'seasonal_differences'],
    example: '{harmonics: 2, seasonal_ar: 0, seasonal_ma: 1, seasonal_differences: false}',
  }),
  { description: 'auto, none, or a fixed form such as {harmonics: 2, seasonal_ar: 0, seasonal_ma: 1, seasonal_differences: false}; annual series have no seasonal part', default: BUILT_IN.seasonal },
);

/** The keys of `backtest`, each spec node kept by name for the command line's options. */
export const BACKTEST_FIELDS = {
  origins: whole('Number of forecast origins, the latest ones in the series; fewer when the series is too short for them.', 1, 200, { default: BUILT_IN.backtest.origins }),
  horizon: whole('Steps forecast from each origin.', 1, 100, {
    defaultText: `the forecast horizon, shortened where the series is too short to leave ${MIN_BACKTEST_ORIGINS} origins after the shortest training window`,
  }),
  refit: choice(
    'At each origin: search the orders again (reselect), re-estimate the orders chosen on the full series (reestimate), or keep the full-series fit (fixed).',
    REFIT_POLICIES,
    { default: BUILT_IN.backtest.refit },
  ),
  window: choice('Training data from the start of the series (expanding) or of constant length (sliding).', WINDOW_KINDS, {
    default: BUILT_IN.backtest.window,
  }),
  min_train: whole('Fewest observations in a training window.', 3, 10000, {
    defaultText: `max(${MIN_TRAIN_FLOOR}, ${MIN_TRAIN_PER_PARAMETER} × (max_p + max_q + 3)): ${MIN_TRAIN_PER_PARAMETER} observations per parameter of the largest candidate, the deterministic trend at the order limits`,
  }),
};

const backtest = object('Rolling-origin evaluation of both models.', BACKTEST_FIELDS, { example: '{origins: 8, horizon: 4}' });

const recommendation = object(
  'How the memo picks the model it recommends.',
  {
    rule: choice(
      "The rule that picks the model. 'prefer-stochastic': the stochastic trend unless the deterministic one has better backtest interval scores at the longer horizons, a significant comparison test, and no unit-root evidence against it. 'lowest-interval-score': the model with the lower average interval score at the longer horizons. Both score the intervals at scored_level.",
      RECOMMENDATION_RULES,
      { default: BUILT_IN.recommendation.rule },
    ),
    significance: significance("Significance level of the rule's comparisons.", BUILT_IN.recommendation.significance),
    scored_level: decimal('The interval level, in percent, whose backtest interval scores the rule compares; one of levels.', 0, 100, {
      exclusive: true,
      defaultText: 'the widest of levels',
    }),
    model: choice('Fixes the recommended model instead of applying the rule; needs a justification.', TREND_MODELS, {
      defaultText: 'chosen by the rule',
    }),
    justification: text('Why the model is fixed; printed in the memo.', { form: 'block' }),
  },
  { dependentRequired: { model: ['justification'] }, example: '{model: stochastic, justification: ...}' },
);

/** Keys shared by `defaults` and every series entry. */
export const SETTINGS_FIELDS = {
  horizon: whole('Forecast steps, instead of through.', 1, 1000, { defaultText: 'the steps to through' }),
  through: period(
    "The last period to forecast, instead of horizon: 2030 (its last month or quarter for monthly or quarterly data), 2030-Q4 or 2030-12. A series' own horizon or through replaces either under defaults.",
    {
      defaultText: `the end of the calendar year ${DEFAULT_YEARS_AHEAD.monthly} years after the last observation's for monthly and quarterly series (the rest of that year and ${DEFAULT_YEARS_AHEAD.monthly} full years), ${DEFAULT_YEARS_AHEAD.annual} years after it for annual series`,
    },
  ),
  transform,
  levels: list('Prediction interval levels in percent.', LEVEL, {
    minItems: 1,
    maxItems: MAX_LEVELS,
    unique: true,
    example: '[80, 95]',
    default: BUILT_IN.levels,
  }),
  coefficient_uncertainty: flag('Widen the intervals by the uncertainty of the estimated trend coefficients.', {
    default: BUILT_IN.coefficient_uncertainty,
  }),
  point: choice('Point forecast: the back-transformed median, or the bias-adjusted mean.', POINT_FORECASTS, { default: BUILT_IN.point }),
  year_figure: choice(
    "Monthly and quarterly series: the memo's figure for the next full calendar year. total: its months or quarters added up, for a flow (deliveries, sales); average: their mean, for a level or a rate (a price, a temperature, a stock), and the default because it means something for a flow too. Annual series have no such figure.",
    YEAR_FIGURES,
    { default: BUILT_IN.year_figure },
  ),
  estimation: choice(
    "How the chosen order's coefficients are estimated: restricted maximum likelihood (reml), less biased when a trend is estimated from a short series, or exact maximum likelihood (ml). The order is chosen by AICc on the exact likelihood either way.",
    ESTIMATION_METHODS,
    { default: BUILT_IN.estimation },
  ),
  seasonal,
  max_p: whole('Largest autoregressive order searched.', 0, MAX_ORDER, { default: BUILT_IN.max_p }),
  max_q: whole('Largest moving-average order searched.', 0, MAX_ORDER, { default: BUILT_IN.max_q }),
  significance: significance('Significance level of the unit-root and residual tests.', BUILT_IN.significance),
  backtest,
  recommendation,
  missing: choice('Whether missing values in a series file are an error or are allowed.', MISSING_POLICIES, { default: BUILT_IN.missing }),
};

export const DEFAULTS_SPEC = object('Settings for every series; a series may override any of them.', SETTINGS_FIELDS, {
  example: '{horizon: 12, levels: [80, 95]}',
});

/**
 * Every setting's key in spec order, groups flattened (`backtest.origins`): the order of the
 * memo's assumptions register. `transform` is one setting, whichever shape it is written in.
 */
export const SETTING_KEYS: readonly string[] = Object.entries(SETTINGS_FIELDS).flatMap(([key, spec]) =>
  spec.kind === 'object' ? Object.keys(spec.fields).map((inner) => `${key}.${inner}`) : [key],
);
