// The value every setting takes when neither the series nor `defaults` sets it, written once:
// the spec shows these in the JSON Schema and resolveSettings applies them. The defaults that
// depend on the data or on other settings (the horizon on the last observation, the backtest's
// shortest training window on the order limits, its horizon on the forecast horizon and the
// series' length, the scored level on the levels) are rules in
// resolveSettings.ts, stated in words in the spec.
import { RECOMMENDATION_RULES } from '../base/settings.js';

export const BUILT_IN_SETTINGS = {
  transform: 'none',
  levels: [80, 95],
  coefficient_uncertainty: true,
  point: 'median',
  // The average of a year's months means something for a flow too (its mean month, in the
  // series' own units); the total of a level or a rate (twelve temperatures added up) means
  // nothing. So a series that says nothing gets the figure that is never wrong, and a flow's
  // config asks for its total.
  year_figure: 'average',
  estimation: 'reml',
  seasonal: 'auto',
  max_p: 3,
  max_q: 3,
  significance: 0.05,
  backtest: { origins: 20, refit: 'reselect', window: 'expanding' },
  recommendation: { rule: RECOMMENDATION_RULES[0], significance: 0.05 },
  missing: 'error',
} as const;


/** The shortest backtest training window when none is set: at least this many observations ... */
export const MIN_TRAIN_FLOOR = 20;
/** ... and this many per parameter of the largest candidate (the deterministic trend at max_p, max_q). */
export const MIN_TRAIN_PER_PARAMETER = 3;
