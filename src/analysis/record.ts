// The AnalysisRecord: one series' complete analysis as plain JSON, the hinge between the
// statistics and everything that shows it (../../DEVELOPERS.md, "The AnalysisRecord").
// Keys are a contract: add freely, rename none. Numbers that do not exist (a standard
// error at a singular Hessian, say) are null, never NaN. The memo reads this module (the
// record's types and the names of its keys) and nothing else of the analysis stages, so the
// parts the stages define are named here too.
import type { Frequency } from '../base/period.js';
import type { AnalysisSettings, RecommendationRule, Transform, TrendModelKind } from '../base/settings.js';
import type { IntervalsByLevel } from '../base/transform.js';
import type { BacktestRecord } from '../backtest/backtestRecord.js';
import type { EvidenceRecord } from '../evidence/collectEvidence.js';
import type { InadmissibleReason } from '../models/admissibility.js';
import type { StandardErrorMethod } from '../models/standardErrors.js';
import type { SeasonalRecord } from './seasonalPlan.js';
export type { SeasonalRecord } from './seasonalPlan.js';
import type { NextYearRecord } from './nextYear.js';
export type { NextYearRecord, YearForecast } from './nextYear.js';
import type { Estimation } from '../base/settings.js';
import type { RestrictedFallback } from '../models/trendModels.js';

export type { ArmaOrder, BacktestForecast, BacktestMethod, BacktestRecord, ComparisonRow, ForecastMethod, HorizonScores, OriginRecord, YardstickMethod } from '../backtest/backtestRecord.js';
/** The comparison rows' loss name at an interval level, for readers that look rows up by level. */
export { intervalScoreLoss } from '../backtest/backtestRecord.js';
export type { EvidenceRecord } from '../evidence/collectEvidence.js';
export type { ResidualChecks, ResidualCheckName } from '../evidence/residualChecks.js';
export type { AdfResult, KpssResult, StabilityRecord, SupWaldPBound, TrendVerdictKind } from '../evidence/types.js';
export type { IntervalsByLevel } from '../base/transform.js';

export const RECORD_SCHEMA = 'trendbrief.analysis/1';

export type JsonNumber = number | null;

export interface CandidateRecord {
  p: number;
  q: number;
  /** With a seasonal part: its harmonic pairs and seasonal AR and MA orders. */
  harmonics?: number;
  P?: number;
  Q?: number;
  loglik: JsonNumber;
  aicc: JsonNumber;
  converged: boolean;
  /** Whether the order search may select it (src/models/admissibility.ts). */
  admissible: boolean;
  /** Why it may not: not-converged, ar-unit-root, ma-unit-root, cancelling-factors or undoes-differencing; null when it may. */
  reason: InadmissibleReason | null;
}

/** The candidate of lower AICc than the selected one that the search set aside, and why. */
export interface SetAsideRecord {
  p: number;
  q: number;
  /** With a seasonal part: its harmonic pairs, seasonal orders and factors. */
  harmonics?: number;
  P?: number;
  Q?: number;
  seasonalAr?: number[];
  seasonalMa?: number[];
  aicc: JsonNumber;
  reason: InadmissibleReason;
  ar: number[];
  ma: number[];
}

/** The deterministic trend's estimates: w_t = intercept + slope·t + η_t. */
export interface DeterministicCoefficients<N = number> {
  intercept: N;
  slope: N;
  ar: N[];
  ma: N[];
}

/** The stochastic trend's estimates: (1 − B)w_t = drift + η_t. */
export interface StochasticCoefficients<N = number> {
  drift: N;
  ar: N[];
  ma: N[];
}

export interface ModelRecord<C extends DeterministicCoefficients | StochasticCoefficients = DeterministicCoefficients | StochasticCoefficients> {
  p: number;
  q: number;
  nobs: number;
  /** The full log-likelihood and AICc of the chosen order at its exact-ML optimum: the figures the order was chosen by. */
  loglik: number;
  aicc: JsonNumber;
  /** How the coefficients, σ², standard errors and forecasts were estimated: REML ('reml') or exact ML ('ml'). */
  estimation: Estimation;
  /** The maximised restricted log-likelihood; null for exact ML. */
  restricted_loglik: JsonNumber;
  /** Why REML was asked for and not used (its fit did not converge or is not admissible); null otherwise. */
  restricted_fallback: RestrictedFallback | null;
  /** SSR/m for exact ML, SSR/(m − k) for REML (k regression coefficients). */
  sigma2: number;
  converged: boolean;
  coefficients: C;
  /** The same keys as `coefficients`; null where the standard error does not exist. */
  stderr: C extends DeterministicCoefficients ? DeterministicCoefficients<JsonNumber> : StochasticCoefficients<JsonNumber>;
  /** How the AR and MA standard errors were obtained; null without AR or MA terms, or when no method gave them. */
  stderr_method: StandardErrorMethod;
  /** The fit of lower AICc the search did not select, when there is one. */
  set_aside: SetAsideRecord | null;
  candidates: CandidateRecord[];
  /** The model in one line of algebra, with its estimates. */
  equation: string;
  /**
   * Smallest modulus of the AR and MA polynomial roots (null without such a part). Near 1:
   * the fit sits at the edge of stationarity or invertibility.
   */
  roots: { ar_min_modulus: JsonNumber; ma_min_modulus: JsonNumber };
  /**
   * The model's seasonal part; null for a model without one (annual data, `seasonal: none`,
   * or too few years). `p`, `q`, `coefficients.ar`/`ma` and `roots` are then the nonseasonal
   * factor's; the seasonal factor (1 − ΦB^s), (1 + ΘB^s) is here.
   */
  seasonal: SeasonalModelRecord | null;
}

/** A model's seasonal part: a fixed pattern (harmonic pairs), a drifting one (seasonal ARMA), and seasonal differences. */
export interface SeasonalModelRecord {
  period: number;
  harmonics: number;
  P: number;
  Q: number;
  /** The stochastic model works on seasonal differences w_t − w_{t−s}. */
  seasonal_differences: boolean;
  /** The fixed pattern the harmonics describe, one effect per month or quarter (January or Q1 first); null without harmonics. */
  pattern: number[] | null;
  /** Φ and Θ, with their standard errors (null where none could be had). */
  seasonal_ar: number[];
  seasonal_ma: number[];
  stderr: { seasonal_ar: JsonNumber[]; seasonal_ma: JsonNumber[]; harmonics: Record<string, JsonNumber> };
  /** The harmonic regression coefficients by name (cos1, sin1, …). */
  harmonic_coefficients: Record<string, number>;
}

export interface ForecastRow {
  h: number;
  period: string;
  point: number;
  /** One interval per level of `settings.levels`, keyed by levelKey(level). */
  intervals: IntervalsByLevel;
  model_scale: { mean: number; se_process: number; se_total: number };
}

/** One thing the data showed about the choice, in a sentence, and the model it speaks for (null: neither). */
export interface EvidenceItem {
  check: 'backtest-scores' | 'comparison-test' | 'origins' | 'backtest-reach' | 'unit-root' | 'trend-break' | 'differencing';
  finding: string;
  favours: TrendModelKind | null;
}

export interface RecommendationRecord {
  model: TrendModelKind;
  rule: RecommendationRule | 'fixed-by-config';
  /** The rule, a policy, in one plain sentence. */
  rule_text: string;
  /**
   * What settled the choice: the evidence (it met the policy's conditions, or spoke for the
   * model on its own), the policy (the evidence did not settle it, so the rule's default
   * applies), or the config.
   */
  decided_by: 'evidence' | 'policy' | 'config';
  /** What the data showed, item by item, whatever the rule made of it. */
  evidence: EvidenceItem[];
  fixed_by_config: boolean;
  justification?: string;
  significance: number;
  /** The interval level whose backtest scores the rule compared. */
  scored_level: number;
  reasons: string[];
}

export interface AnalysisRecord {
  schema: typeof RECORD_SCHEMA;
  tool: { name: string; version: string };
  series: {
    id: string;
    title: string;
    frequency: Frequency;
    first: string;
    last: string;
    n: number;
    transform: Transform;
    source: { file: string; sha256: string; column: string };
  };
  /** The settings the analysis ran at, complete (src/base/settings.ts). */
  settings: AnalysisSettings;
  models: { deterministic: ModelRecord<DeterministicCoefficients>; stochastic: ModelRecord<StochasticCoefficients> };
  forecasts: { deterministic: ForecastRow[]; stochastic: ForecastRow[] };
  /** Monthly and quarterly series: the forecast for the next full calendar year, its total or average (`settings.year_figure`), under both models; null for annual series. */
  next_year: NextYearRecord | null;
  evidence: EvidenceRecord;
  /** The seasonal part asked for, whether it was applied, and who decided the seasonal differences. */
  seasonal: SeasonalRecord;
  /** Rolling-origin backtest; null when the series is too short for one, absent when none was asked for. */
  backtest?: BacktestRecord | null;
  /** Why there is no backtest, when `backtest` is null. */
  backtest_unavailable?: string;
  recommendation?: RecommendationRecord;
}
