// The settings a config may give once under `defaults` and override per series.
import { BUILT_IN_SETTINGS as BUILT_IN, RECOMMENDATION_RULES } from './builtInSettings.js';
import { choice, decimal, flag, list, object, shapes, text, whole } from './keySpec.js';

/** Limits shared with the `fit` command's options. */
export const MAX_HORIZON = 1000;
export const MAX_ORDER = 8;

const significance = (doc: string, fallback: number) => decimal(doc, 0.01, 0.1, { default: fallback });

const transform = shapes(
  'Transform applied to the values before both models are fitted; forecasts are transformed back.',
  choice('No transform, or the natural logarithm.', ['none', 'log']),
  object(
    'Box-Cox transform with the given lambda (0 is the logarithm).',
    { box_cox: decimal('The Box-Cox lambda.', -2, 2) },
    { required: ['box_cox'], example: '{box_cox: 0.5}' },
  ),
  { description: 'none, log, or a mapping such as {box_cox: 0.5}', default: BUILT_IN.transform },
);

const backtest = object(
  'Rolling-origin evaluation of both models.',
  {
    origins: whole('Number of forecast origins, the latest ones in the series; fewer when the series is too short for them.', 1, 200, { default: BUILT_IN.backtest.origins }),
    horizon: whole('Steps forecast from each origin.', 1, 100, { defaultText: '5' }),
    refit: choice(
      'At each origin: search the orders again (reselect), re-estimate the orders chosen on the full series (reestimate), or keep the full-series fit (fixed).',
      ['reselect', 'reestimate', 'fixed'],
      { default: BUILT_IN.backtest.refit },
    ),
    window: choice('Training data from the start of the series (expanding) or of constant length (sliding).', ['expanding', 'sliding'], {
      default: BUILT_IN.backtest.window,
    }),
    min_train: whole('Fewest observations in a training window.', 3, 10000, {
      defaultText: 'the fewest observations the order limits need',
    }),
  },
  { example: '{origins: 8, horizon: 4}' },
);

const recommendation = object(
  'How the memo picks the model it recommends.',
  {
    rule: choice(
      "The rule that picks the model. 'prefer-stochastic': the stochastic trend unless the deterministic one has better backtest interval scores at the longer horizons, a significant comparison test, and no unit-root evidence against it. 'lowest-interval-score': the model with the lower average 95% interval score at the longer horizons.",
      RECOMMENDATION_RULES,
      { default: BUILT_IN.recommendation.rule },
    ),
    significance: significance("Significance level of the rule's comparisons.", BUILT_IN.recommendation.significance),
    model: choice('Fixes the recommended model instead of applying the rule; needs a justification.', ['deterministic', 'stochastic'], {
      defaultText: 'chosen by the rule',
    }),
    justification: text('Why the model is fixed; printed in the memo.', { form: 'block' }),
  },
  { dependentRequired: { model: ['justification'] }, example: '{model: stochastic, justification: ...}' },
);

/** Keys shared by `defaults` and every series entry. */
export const SETTINGS_FIELDS = {
  horizon: whole('Forecast steps.', 1, MAX_HORIZON, { defaultText: '10 for annual, 12 for quarterly, 24 for monthly series' }),
  transform,
  levels: list('Prediction interval levels in percent.', decimal('An interval level in percent.', 50, 99.9), {
    minItems: 1,
    maxItems: 6,
    unique: true,
    example: '[80, 95]',
    default: BUILT_IN.levels,
  }),
  coefficient_uncertainty: flag('Widen the intervals by the uncertainty of the estimated trend coefficients.', {
    default: BUILT_IN.coefficient_uncertainty,
  }),
  point: choice('Point forecast: the back-transformed median, or the bias-adjusted mean.', ['median', 'mean'], { default: BUILT_IN.point }),
  max_p: whole('Largest autoregressive order searched.', 0, MAX_ORDER, { default: BUILT_IN.max_p }),
  max_q: whole('Largest moving-average order searched.', 0, MAX_ORDER, { default: BUILT_IN.max_q }),
  significance: significance('Significance level of the unit-root and residual tests.', BUILT_IN.significance),
  backtest,
  recommendation,
  missing: choice('Whether missing values in a series file are an error or are allowed.', ['error', 'allow'], { default: BUILT_IN.missing }),
};

export const DEFAULTS_SPEC = object('Settings for every series; a series may override any of them.', SETTINGS_FIELDS, {
  example: '{horizon: 12, levels: [80, 95]}',
});
