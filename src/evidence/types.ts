// Records of the evidence stage. Keys are snake_case because they go into the
// AnalysisRecord as plain JSON; once landed they are fixed (add keys, rename none).

/** Critical values of the KPSS statistic by test size in percent (KPSS 1992, Table 1). */
export interface KpssCritical {
  '10': number;
  '5': number;
  '2.5': number;
  '1': number;
}

/**
 * How the lag truncation was set: 'auto' chosen from the data (Hobijn, Franses & Ooms 2004),
 * 'fixed' not chosen from the data (the ceil(12(n/100)^{1/4}) rule, or a count the caller gave).
 */
export type KpssLagRule = 'auto' | 'fixed';

/** KPSS test of level- or trend-stationarity. */
export interface KpssResult {
  stat: number;
  lags: number;
  /** Interpolated in KPSS Table 1; at the table's edge when `p_bound` is set. */
  p_value: number;
  /** 'below': the true p-value is under 0.01; 'above': it is over 0.10. */
  p_bound?: 'below' | 'above';
  critical: KpssCritical;
  regression: 'level' | 'trend';
  lag_rule: KpssLagRule;
}

/** Critical values of the ADF statistic by test size in percent (MacKinnon 2010). */
export interface AdfCritical {
  '1': number;
  '5': number;
  '10': number;
}

/** 'aic': lag order chosen by AIC on a common sample; 'fixed': the caller's lag order. */
export type AdfLagRule = 'aic' | 'fixed';

/** Augmented Dickey-Fuller test of a unit root. */
export interface AdfResult {
  /** t-ratio of the lagged level in the test regression. */
  stat: number;
  /** Lagged differences in the test regression. */
  lags: number;
  /** Rows of the test regression. */
  nobs: number;
  /** MacKinnon (1994) approximate p-value. */
  p_value: number;
  critical: AdfCritical;
  regression: 'constant' | 'trend';
  lag_rule: AdfLagRule;
}

/** Ljung-Box portmanteau test on residuals. */
export interface LjungBoxResult {
  lags: number;
  /** Chi-square degrees of freedom: lags − p − q. */
  df: number;
  stat: number;
  p_value: number;
}

/** Sample autocorrelations at lags 1..L with the ±1.96/√n bounds. */
export interface AcfResult {
  lag: number[];
  acf: number[];
  bound: number;
}

/** Jarque-Bera normality test. */
export interface JarqueBeraResult {
  stat: number;
  p_value: number;
  skewness: number;
  /** Raw (not excess) kurtosis: 3 for a normal distribution. */
  kurtosis: number;
}

/** What the KPSS and ADF trend tests say together. */
export type TrendVerdictKind = 'deterministic' | 'stochastic' | 'conflicting' | 'inconclusive';

/** The combined reading of the KPSS-trend and ADF-trend tests. */
export interface TrendVerdict {
  verdict: TrendVerdictKind;
  significance: number;
  kpss_rejects: boolean;
  adf_rejects: boolean;
  /** A short plain-language explanation with the numbers behind the verdict. */
  summary: string;
}

/** Critical values of a sup-Wald break statistic by test size in percent. */
export interface SupWaldCritical {
  '10': number;
  '5': number;
  '1': number;
}

/** Whether a sup-Wald break test rejects "no break" at each size in percent. */
export interface SupWaldRejects {
  '10': boolean;
  '5': boolean;
  '1': boolean;
}

/** Where the p-value lies relative to the 1%, 5% and 10% critical values. */
export type SupWaldPBound = 'p < 0.01' | '0.01 < p < 0.05' | '0.05 < p < 0.10' | 'p > 0.10';

/** A test for one break at an unknown date in the trend line (deterministic) or the drift (stochastic). */
export interface BreakTestResult {
  method: string;
  source: string;
  /** The largest Wald statistic over the candidate dates. */
  stat: number;
  /** Coefficients allowed to change at the break: 2 (level and slope) or 1 (drift). */
  restrictions: number;
  /** Fraction of the sample cut from each end of the range of candidate dates. */
  trimming: number;
  /** 0-based position in the series of the first observation after the break that maximises the statistic. */
  break_index: number;
  critical: SupWaldCritical;
  reject: SupWaldRejects;
  p_bound: SupWaldPBound;
  /** A short plain-language sentence on whether the line (or drift) looks stable. */
  summary: string;
}

/** The deterministic slope estimated on the first `end` observations. */
export interface SlopeWindow {
  end: number;
  slope: number;
  se: number;
}

/** The stochastic drift estimated on the first `end` observations. */
export interface DriftWindow {
  end: number;
  drift: number;
  se: number;
}

/** Estimates on expanding windows w[0..end), ARMA orders fixed at the full-sample orders. */
export interface StabilityWindows {
  deterministic: SlopeWindow[];
  stochastic: DriftWindow[];
  /** Observations in the first window. */
  min_window: number;
  /** Observations added from one window to the next (the last step may be shorter). */
  step: number;
}

/** Trend stability: expanding-window estimates and a test for a break at an unknown date. */
export interface StabilityRecord {
  windows: StabilityWindows;
  break_test: {
    deterministic: BreakTestResult;
    stochastic: BreakTestResult;
  };
}

/** Critical values of the Canova-Hansen statistic by test size in percent (VM(p) quantiles). */
export interface SeasonalCritical {
  '10': number;
  '5': number;
  '1': number;
}

/** The Canova-Hansen statistic for the seasonal cycle(s) of one frequency. */
export interface SeasonalFrequencyTest {
  /** Cycles per year j: the frequency 2πj/s (j = s/2 is the half-year or two-quarter cycle). */
  cycles_per_year: number;
  stat: number;
  /** 2 (a cosine and a sine), or 1 at j = s/2. */
  restrictions: number;
  p_value: number;
  critical: SeasonalCritical;
}

/**
 * Canova & Hansen (1995) test of a stable seasonal pattern against seasonal unit roots, on the
 * first differences of the model-scale levels.
 */
export interface SeasonalUnitRootResult {
  method: 'canova-hansen';
  source: string;
  /** The series the test regression ran on. */
  tested: 'first differences';
  /** Joint statistic over all seasonal frequencies. */
  stat: number;
  /** s − 1: the harmonic coefficients allowed to wander under the alternative. */
  restrictions: number;
  /** Bartlett-window truncation of the long-run covariance. */
  lags: number;
  lag_rule: string;
  /** Observations in the test regression. */
  n: number;
  period: number;
  /** Asymptotic p-value from the VM(s − 1) distribution. */
  p_value: number;
  critical: SeasonalCritical;
  significance: number;
  /** True when the stable pattern is rejected at `significance`: seasonal differencing is indicated. */
  seasonal_differencing: boolean;
  by_frequency: SeasonalFrequencyTest[];
  /** A short plain-language sentence on what the test says. */
  text: string;
}

/** Strength of the seasonal pattern and of the trend, from an STL decomposition. */
export interface SeasonalStrength {
  method: 'stl';
  source: string;
  /** F_S = max(0, 1 − Var(R)/Var(S + R)); null when S + R does not vary. */
  seasonal: number | null;
  /** F_T = max(0, 1 − Var(R)/Var(T + R)); null when T + R does not vary. */
  trend: number | null;
  /** The STL settings used: spans (odd), local degrees, inner and outer passes. */
  stl: {
    seasonal_span: number | 'periodic';
    seasonal_degree: number;
    trend_span: number;
    trend_degree: number;
    low_pass_span: number;
    low_pass_degree: number;
    inner: number;
    outer: number;
    robust: boolean;
  };
  /** A short plain-language sentence on the strength and stability of the pattern. */
  text: string;
}

/** The STL seasonal pattern by month or quarter, and how it changed over the series. */
export interface SeasonalPattern {
  period: number;
  /** Month (1–12) or quarter (1–4) of each entry below. */
  season: number[];
  /** Mean seasonal effect of each season over the whole series, on the model scale. */
  mean_effect: number[];
  /** Largest minus smallest mean effect. */
  amplitude: number;
  /** Calendar years with all s observations. */
  complete_years: number;
  /** The first and last complete calendar years; null when the start year is unknown or fewer than two. */
  first_year: number | null;
  last_year: number | null;
  /** Seasonal effects in the first and last complete years; null with fewer than two complete years. */
  first_year_effect: number[] | null;
  last_year_effect: number[] | null;
  /** Largest absolute change of one season's effect between those years, and that season. */
  largest_change: number | null;
  largest_change_season: number | null;
  /** largest_change / amplitude; null when it cannot be formed. */
  change_share: number | null;
}
