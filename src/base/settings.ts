// The analysis settings as one complete, immutable value, and the vocabulary of their choices.
// The config (src/config/settingsSpec.ts) and `fit`'s options both resolve into this value
// through the same specification (src/config/resolveSettings.ts); every stage takes it as it
// is and applies no default of its own. The keys are the config's own, snake_case as the user
// writes them, so a message, the record (`record.settings` is this value serialised) and the
// config name a setting alike.

export const TREND_MODELS = ['deterministic', 'stochastic'] as const;
/** Deterministic trend (levels on [1, t]) or stochastic trend (differences on a drift). */
export type TrendModelKind = (typeof TREND_MODELS)[number];

export const REFIT_POLICIES = ['reselect', 'reestimate', 'fixed'] as const;
export type RefitPolicy = (typeof REFIT_POLICIES)[number];

export const WINDOW_KINDS = ['expanding', 'sliding'] as const;
export type WindowKind = (typeof WINDOW_KINDS)[number];

/** Names of the rules that pick the recommended model; the first is the default. */
export const RECOMMENDATION_RULES = ['prefer-stochastic', 'lowest-interval-score'] as const;
export type RecommendationRule = (typeof RECOMMENDATION_RULES)[number];

export const POINT_FORECASTS = ['median', 'mean'] as const;
/** How a chosen order's coefficients are estimated: restricted maximum likelihood (REML) or exact maximum likelihood. */
export const ESTIMATION_METHODS = ['reml', 'ml'] as const;
export type Estimation = (typeof ESTIMATION_METHODS)[number];
/** The back-transformed median, or the bias-adjusted mean. */
export type PointForecast = (typeof POINT_FORECASTS)[number];

/**
 * What a monthly or quarterly series' figure for a whole calendar year is: the sum of its
 * months or quarters (a flow: deliveries, sales) or their average (a level or a rate: a price,
 * a temperature, a stock). The tool cannot tell which a series is; the default is the one that
 * means something for both (builtInSettings.ts).
 */
export const YEAR_FIGURES = ['total', 'average'] as const;
export type YearFigure = (typeof YEAR_FIGURES)[number];

export const MISSING_POLICIES = ['error', 'allow'] as const;
export type MissingPolicy = (typeof MISSING_POLICIES)[number];

/**
 * The seasonal part of both models, for monthly and quarterly series: chosen from the data
 * (`auto`), left out (`none`, for seasonally adjusted data; annual data have none), or fixed by
 * the analyst. `period` is the observations per year the series' frequency gives (12, 4, or 1
 * for annual data), so a stage never works it out again.
 */
export type SeasonalSetting =
  | { readonly kind: 'auto'; readonly period: number }
  | { readonly kind: 'none'; readonly period: number }
  | {
      readonly kind: 'fixed';
      readonly period: number;
      /** Harmonic pairs of the fixed pattern, 0..⌊period/2⌋. */
      readonly harmonics: number;
      /** Seasonal AR and MA orders of a drifting pattern, 0 or 1. */
      readonly seasonal_ar: number;
      readonly seasonal_ma: number;
      /** Whether the stochastic model takes seasonal differences (1 − B^s). */
      readonly seasonal_differences: boolean;
    };

/** The transform of the values before both models are fitted (Box & Cox 1964; λ = 0 is the log). */
export type Transform = { readonly kind: 'none' } | { readonly kind: 'log' } | { readonly kind: 'box-cox'; readonly lambda: number };

export interface BacktestChoices {
  /** Origins asked for; fewer are scored when the series is too short. */
  readonly origins: number;
  /** Steps forecast from each origin. */
  readonly horizon: number;
  readonly refit: RefitPolicy;
  readonly window: WindowKind;
  /** Fewest observations in a training window. */
  readonly min_train: number;
}

export interface RecommendationChoices {
  readonly rule: RecommendationRule;
  readonly significance: number;
  /** The interval level, in percent and one of `levels`, whose backtest interval scores the rule compares. */
  readonly scored_level: number;
  /** The model fixed by the config instead of the rule; null when the rule decides. */
  readonly model: TrendModelKind | null;
  /** Why the model is fixed; null unless it is. */
  readonly justification: string | null;
}

export interface AnalysisSettings {
  /** Forecast steps. */
  readonly horizon: number;
  readonly transform: Transform;
  /** Prediction interval levels in percent, ascending, one to four of them, each strictly between 0 and 100. */
  readonly levels: readonly number[];
  /** Whether the intervals include the uncertainty of the estimated trend coefficients. */
  readonly coefficient_uncertainty: boolean;
  readonly point: PointForecast;
  /** A monthly or quarterly series' figure for the next full calendar year: the total or the average of its periods (unused for annual series). */
  readonly year_figure: YearFigure;
  /** How the chosen order's coefficients are estimated; the order is chosen by AICc on the exact likelihood either way. */
  readonly estimation: Estimation;
  readonly seasonal: SeasonalSetting;
  readonly max_p: number;
  readonly max_q: number;
  /** Significance level of the unit-root and residual tests. */
  readonly significance: number;
  readonly backtest: BacktestChoices;
  readonly recommendation: RecommendationChoices;
  readonly missing: MissingPolicy;
}

/**
 * Fewest backtest origins for a comparison of the two models to count as evidence: with fewer,
 * a single unusual period moves the averages and the comparison tests have little power (our
 * threshold). The recommendation rule, the default backtest horizon (shortened to leave this
 * many) and the memo's thin-backtest caveat all read it.
 */
export const MIN_BACKTEST_ORIGINS = 10;

/** The key of a level in the record's interval tables: 95 → "95", 99.5 → "99.5". */
export function levelKey(level: number): string {
  return String(level);
}
