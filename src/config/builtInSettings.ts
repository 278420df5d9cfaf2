// The value every overridable setting takes when neither the series nor `defaults` sets it.
// The spec shows these in the JSON Schema and the plan builder applies them, so each number
// is written here only. Settings whose default depends on the data (the horizon on the
// frequency, the backtest's training length on the order limits) have none here: the stage
// that knows the data chooses them, and the plan records them as undefined.

/** Names of the rules that can pick the recommended model; the first is the default. */
export const RECOMMENDATION_RULES = ['prefer-stochastic', 'lowest-interval-score'] as const;

export const BUILT_IN_SETTINGS = {
  transform: 'none',
  levels: [80, 95],
  coefficient_uncertainty: true,
  point: 'median',
  max_p: 3,
  max_q: 3,
  significance: 0.05,
  backtest: { origins: 20, refit: 'reselect', window: 'expanding' },
  recommendation: { rule: RECOMMENDATION_RULES[0], significance: 0.05 },
  missing: 'error',
} as const;
