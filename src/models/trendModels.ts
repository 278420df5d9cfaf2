// The two trend models, both regression with ARMA errors on the shared engine:
//   deterministic: w_t = b₀ + b₁t + η_t on the (transformed) levels, t = 1 at the first
//                  observation (trend-stationary);
//   stochastic:    w_t − w_{t−1} = c + η_t on the first differences (difference-stationary,
//                  ARIMA(p,1,q) with drift c).
// η ~ stationary, invertible ARMA(p,q) in both. Only the design differs (trendDesign.ts).
// A seasonal series adds a seasonal part chosen from the data (seasonalSearch.ts): harmonic
// regressors for a fixed pattern, a seasonal ARMA factor in η for a pattern that drifts, and
// for the stochastic model, when the caller says so, seasonal differences.
//
// The order is chosen by AICc on the exact (full) likelihood, which the reference checks
// compare candidate by candidate. The chosen order's coefficients are then estimated by
// restricted maximum likelihood (REML) by default: exact ML's AR estimates are biased towards
// zero when a trend or mean is estimated from few observations, and the slope's standard
// error with them (at n = 40, trend plus AR(1) φ = 0.5: mean φ̂ 0.40 by ML, 0.48 by REML; the
// slope's standard error 0.79 and 0.94 of its actual spread; Cheang & Reinsel 2000). A REML
// fit that is not admissible or did not converge is not used: the ML fit stays, and says why.
import type { Estimation, TrendModelKind } from '../base/settings.js';
import { fitRegressionArma, olsFit, type RegressionArmaFit } from './fitRegressionArma.js';
import { forecastRegressionArma, type ForecastInput, type ForecastMoments, type Integration } from '../statespace/forecast.js';
import type { GapSums } from '../statespace/filterWorkspace.js';
import { createProfileLikelihood, type SeasonalPart } from './profileLikelihood.js';
import { admissibility, type InadmissibleReason } from './admissibility.js';
import { aicc, searchOrders } from './orderSearch.js';
import { armaStandardErrors, type StandardErrorMethod } from './standardErrors.js';
import { harmonicColumnCount, seasonalPattern } from './harmonics.js';
import { packFactors } from './seasonalArma.js';
import {
  fixedPartDesign,
  searchSeasonalModel,
  searchWithSeasonalPart,
  type CandidateOptima,
  type FixedSeasonalPart,
  type SeasonalCandidate,
  type SeasonalChoice,
  type SeasonalSearchSpec,
} from './seasonalSearch.js';
import { designWorkspace, trendDesign, type TrendDesign } from './trendDesign.js';

export { designWorkspace, trendDesign, type DesignSeasonality, type SeasonalLevels, type TrendDesign } from './trendDesign.js';
export type { CandidateOptima, FixedSeasonalPart, SeasonalCandidate, SeasonalChoice, SeasonalSearchSpec } from './seasonalSearch.js';

/** The seasonal side of a model's order, for `minimumObservations`. */
export interface SeasonalOrderSize {
  period: number;
  P: number;
  Q: number;
  harmonics: number;
  seasonalDifferencing: boolean;
}

/** Fewest observations (of w) a model needs for an order (p, q), with its seasonal part if any, so that AICc exists. */
export function minimumObservations(kind: TrendModelKind, p: number, q: number, seasonal?: SeasonalOrderSize): number {
  const seasonalDifferencing = kind === 'stochastic' && seasonal?.seasonalDifferencing === true;
  const regression = (kind === 'deterministic' ? 2 : 1) + (seasonal === undefined ? 0 : harmonicColumnCount(seasonal.period, seasonal.harmonics));
  const k = p + q + (seasonal?.P ?? 0) + (seasonal?.Q ?? 0) + regression + 1;
  // AICc needs m > k + 1; the stochastic model loses one observation to differencing, s to seasonal differencing.
  return k + 2 + (kind === 'stochastic' ? (seasonalDifferencing ? (seasonal?.period ?? 1) : 1) : 0);
}

/** Why a model asked for REML kept its exact-ML estimates. */
export type RestrictedFallback = 'not-converged' | InadmissibleReason;

export interface TrendModelOptions {
  /** How the chosen order's coefficients are estimated; 'reml' (REML) when absent. */
  estimation?: Estimation;
  /**
   * A seasonal series: the limits of the seasonal search, or a seasonal part fixed by the
   * analyst (then only (p, q) is searched). Absent: no seasonal part.
   */
  seasonal?: SeasonalSearchSpec | FixedSeasonalPart;
  /** A seasonal search's candidates start from these optima of the same search on a neighbouring series (`searchSeasonalModel`). */
  warm?: CandidateOptima;
}

export interface FixedOrderOptions {
  estimation?: Estimation;
  seasonal?: FixedSeasonalPart;
}

/** The seasonal part of a fitted model. */
export interface SeasonalModelPart extends SeasonalChoice {
  period: number;
  /** The stochastic model works on seasonal differences (1 − B^s). */
  seasonalDifferencing: boolean;
  /** The fixed pattern the harmonics describe, one value per position in the year (0 = January or Q1); null without harmonics. */
  pattern: number[] | null;
  /** A fixed part's seasonal factors that no admissible fit could carry, and why; the model runs without them. Null otherwise. */
  droppedFactors: { P: number; Q: number; reason: InadmissibleReason } | null;
}

export interface TrendModelFit {
  kind: TrendModelKind;
  design: TrendDesign;
  /**
   * The estimates the model reports and forecasts with (REML unless `restrictedFallback`).
   * With a seasonal ARMA factor `fit.ar`/`fit.ma` are the expanded process; `fit.order` and
   * `fit.factors` the multiplicative form.
   */
  fit: RegressionArmaFit;
  /** The full log-likelihood and AICc of the chosen order at its exact-ML optimum (the selection's figures). */
  loglik: number;
  aicc: number;
  /** Set when REML was asked for but its fit was not used (the ML fit stands). */
  restrictedFallback?: RestrictedFallback;
  /** Every fit of the search; P, Q and harmonics are 0 for a model without a seasonal part. */
  candidates: SeasonalCandidate[];
  /** The regression coefficients by name (intercept, slope or drift; cos1, sin1, … with harmonics). */
  coefficients: Record<string, number>;
  /** The seasonal part chosen; null for a model fitted without a seasonal search. */
  seasonal: SeasonalModelPart | null;
  /**
   * The fit of lower AICc that the search set aside as not admissible (admissibility.ts),
   * absent when the selected fit is also the AICc best. `ar` and `ma` are the nonseasonal
   * factors; a seasonal model adds its seasonal part.
   */
  setAside?: {
    p: number;
    q: number;
    ar: number[];
    ma: number[];
    aicc: number;
    reason: InadmissibleReason;
  } & Partial<SeasonalChoice & { seasonalAr: number[]; seasonalMa: number[] }>;
  /** A seasonal search's candidates' optima, for a warm search of a neighbouring series; absent otherwise. */
  optima?: CandidateOptima;
  /** Standard errors for the regression coefficients (GLS) and the ARMA factors (observed information). */
  stderr: { regression: Record<string, number>; ar: number[]; ma: number[]; seasonalAr: number[]; seasonalMa: number[]; method: StandardErrorMethod };
}

/** Order search for one model, the chosen order's estimates, then their standard errors. */
export function fitTrendModel(kind: TrendModelKind, w: Float64Array, maxP: number, maxQ: number, options: TrendModelOptions = {}): TrendModelFit {
  if (options.seasonal !== undefined) return fitSeasonalTrendModel(kind, w, maxP, maxQ, options.seasonal, options);
  const design = trendDesign(kind, w);
  const search = searchOrders(design.response, design.regressors, maxP, maxQ, { ...designWorkspace(design), differenced: kind === 'stochastic' });
  const candidates = search.candidates.map((candidate) => ({ ...candidate, P: 0, Q: 0, harmonics: 0 }));
  const model = describeFit(kind, design, search.best, search.bestAicc, candidates, null, options);
  const { setAside } = search;
  return setAside === null ? model : { ...model, setAside: { p: setAside.fit.p, q: setAside.fit.q, ar: Array.from(setAside.fit.ar), ma: Array.from(setAside.fit.ma), aicc: setAside.aicc, reason: setAside.reason } };
}

function fitSeasonalTrendModel(
  kind: TrendModelKind,
  w: Float64Array,
  maxP: number,
  maxQ: number,
  spec: SeasonalSearchSpec | FixedSeasonalPart,
  options: TrendModelOptions,
): TrendModelFit {
  const search = 'harmonics' in spec ? searchWithSeasonalPart(kind, w, maxP, maxQ, spec) : searchSeasonalModel(kind, w, maxP, maxQ, spec, options.warm);
  const part = { ...seasonalPart(search.design, search.choice), droppedFactors: search.droppedFactors };
  const model = { ...describeFit(kind, search.design, search.best, search.bestAicc, search.candidates, part, options), optima: search.optima };
  const { setAside } = search;
  if (setAside === null) return model;
  const { factors, order } = setAside.fit;
  return {
    ...model,
    setAside: {
      p: order.p,
      q: order.q,
      ar: Array.from(factors.ar),
      ma: Array.from(factors.ma),
      aicc: setAside.aicc,
      reason: setAside.reason,
      ...setAside.choice,
      seasonalAr: Array.from(factors.seasonalAr),
      seasonalMa: Array.from(factors.seasonalMa),
    },
  };
}

/** A model at a fixed order (no search), e.g. for a backtest that keeps orders fixed; a seasonal part follows `fixedPartDesign`'s rules. */
export function fitTrendModelAtOrder(kind: TrendModelKind, w: Float64Array, p: number, q: number, options: FixedOrderOptions = {}): TrendModelFit {
  const fixedPart = options.seasonal === undefined ? undefined : fixedPartDesign(kind, w, options.seasonal);
  const design = fixedPart?.design ?? trendDesign(kind, w);
  const fixed = fixedPart?.choice;
  const seasonal = seasonalPartOf(design, fixed);
  const fit = fitRegressionArma(design.response, design.regressors, p, q, { ...designWorkspace(design), seasonal });
  const k = p + q + (fixed?.P ?? 0) + (fixed?.Q ?? 0) + design.regressors.length + 1;
  const value = aicc(fit.loglik, k, fit.nobs);
  const candidate: SeasonalCandidate = {
    p,
    q,
    P: fixed?.P ?? 0,
    Q: fixed?.Q ?? 0,
    harmonics: fixed?.harmonics ?? 0,
    loglik: fit.loglik,
    aicc: value,
    converged: fit.converged,
    ...admissibility(fit, kind === 'stochastic'),
  };
  const part = fixed === undefined ? null : seasonalPart(design, fixed);
  return describeFit(kind, design, fit, value, [candidate], part, options);
}

/** The seasonal ARMA part a fit at this design and choice runs with (none without a seasonal factor). */
function seasonalPartOf(design: TrendDesign, choice: SeasonalChoice | undefined): SeasonalPart | undefined {
  const period = design.seasonality?.period;
  if (choice === undefined || period === undefined || choice.P + choice.Q === 0) return undefined;
  return { period, P: choice.P, Q: choice.Q };
}

function seasonalPart(design: TrendDesign, choice: SeasonalChoice): SeasonalModelPart {
  const seasonality = design.seasonality;
  if (seasonality === undefined) throw new Error('trendModels: a seasonal part needs a design with a seasonality');
  return {
    harmonics: choice.harmonics,
    P: choice.P,
    Q: choice.Q,
    period: seasonality.period,
    seasonalDifferencing: seasonality.seasonalDifferencing,
    pattern: null,
    droppedFactors: null,
  };
}

/** The REML fit at the ML fit's order, started from its optimum, or why the ML fit stays. */
function restrictedFit(kind: TrendModelKind, design: TrendDesign, ml: RegressionArmaFit, seasonal: SeasonalPart | undefined): RegressionArmaFit | RestrictedFallback {
  const fit = fitRegressionArma(design.response, design.regressors, ml.order.p, ml.order.q, {
    ...designWorkspace(design),
    estimation: 'reml',
    seasonal,
    // REML moves the optimum a little from exact ML's; for a seasonal design the usual starts
    // would only find it again (27% of those fits' time), and it starts from that optimum's
    // curvature as well. A plain design keeps them, so annual and seasonally adjusted series
    // are estimated exactly as before seasonal parts existed.
    starts: [ml.unconstrained],
    startsOnly: design.seasonality !== undefined,
    curvature: ml.inverseHessian,
  });
  if (!fit.converged) return 'not-converged';
  const verdict = admissibility(fit, kind === 'stochastic');
  return verdict.admissible ? fit : (verdict.reason ?? 'not-converged');
}

function describeFit(
  kind: TrendModelKind,
  design: TrendDesign,
  ml: RegressionArmaFit,
  aicc: number,
  candidates: SeasonalCandidate[],
  part: SeasonalModelPart | null,
  options: TrendModelOptions | FixedOrderOptions,
): TrendModelFit {
  const seasonal = seasonalPartOf(design, part ?? undefined);
  const restricted = (options.estimation ?? 'reml') === 'reml' ? restrictedFit(kind, design, ml, seasonal) : undefined;
  const fit = typeof restricted === 'object' ? restricted : ml;
  const coefficients: Record<string, number> = {};
  const regression: Record<string, number> = {};
  const k = design.coefficientNames.length;
  design.coefficientNames.forEach((name, i) => {
    coefficients[name] = fit.beta[i];
    regression[name] = Math.sqrt(fit.covBeta[i * k + i]);
  });
  const ols = olsFit(design.response, design.regressors);
  const likelihood = createProfileLikelihood(ols.residuals, design.regressors, fit.order.p, fit.order.q, {
    ...designWorkspace(design),
    estimation: fit.estimation,
    seasonal,
  });
  const armaSe = armaStandardErrors(likelihood, packFactors(fit.factors));
  const { p, q, P } = fit.order;
  const harmonicAt = design.coefficientNames.length - (part === null ? 0 : harmonicColumnCount(part.period, part.harmonics));
  return {
    kind,
    design,
    fit,
    loglik: ml.loglik,
    aicc,
    ...(typeof restricted === 'string' ? { restrictedFallback: restricted } : {}),
    candidates,
    coefficients,
    seasonal: part === null ? null : { ...part, pattern: part.harmonics === 0 ? null : seasonalPattern(part.period, part.harmonics, fit.beta.subarray(harmonicAt)) },
    stderr: {
      regression,
      ar: Array.from(armaSe.values.subarray(0, p)),
      ma: Array.from(armaSe.values.subarray(p, p + q)),
      seasonalAr: Array.from(armaSe.values.subarray(p + q, p + q + P)),
      seasonalMa: Array.from(armaSe.values.subarray(p + q + P)),
      method: armaSe.method,
    },
  };
}

/**
 * How a design's forecasts are integrated to levels (none for the deterministic model). For
 * seasonal differences, `pending` is the fit's gap-filter output when some seasons' last levels
 * are missing: their sums, moved from the filter's seasons to the forecast seasons, with the
 * drift's regressor summed over those changes.
 */
export function designIntegration(design: TrendDesign, pending?: GapSums): { lastLevel: number } | Integration | undefined {
  const levels = design.seasonalIntegration;
  if (levels === undefined) return design.integrateFrom === undefined ? undefined : { lastLevel: design.integrateFrom };
  const { period, lastLevels, pendingCounts, filterSeasonOffset } = levels;
  if (pending === undefined) {
    if (pendingCounts.some((count) => count > 0)) throw new Error('designIntegration: a season has unseen changes, so the fit\'s pending sums are needed');
    return { period, lastLevels };
  }
  const k = design.regressors.length;
  const r = pending.cross.length / period;
  const from = (q: number): number => (filterSeasonOffset + q) % period;
  const futureRow = design.futureRows(1)[0];
  return {
    period,
    lastLevels,
    pending: {
      sums: pending.sums.map((sums) => Float64Array.from({ length: period }, (_, q) => sums[from(q)])),
      regressorTotals: Float64Array.from({ length: period * k }, (_, i) => pendingCounts[Math.floor(i / k)] * futureRow[i % k]),
      cross: Float64Array.from({ length: period * r }, (_, i) => pending.cross[from(Math.floor(i / r)) * r + (i % r)]),
      variance: Float64Array.from({ length: period }, (_, q) => pending.variance[from(q)]),
    },
  };
}

/** A design filtered at given process coefficients: what forecasts at those parameters start from. */
export interface FilteredDesign {
  /** The profile log-likelihood there (β and σ² at their estimates); NaN outside the stationary region. */
  loglik: number;
  finalState: Float64Array[];
  finalCovariance: Float64Array;
  pending?: GapSums;
}

/**
 * Filters a design's response and regressors at fixed AR and MA coefficients of the process
 * (with a seasonal part, the expanded ones), e.g. for forecasts at parameters estimated
 * elsewhere (Harvey 1989, §3.5).
 */
export function filterDesign(design: TrendDesign, ar: ArrayLike<number>, ma: ArrayLike<number>): FilteredDesign {
  const likelihood = createProfileLikelihood(design.response, design.regressors, ar.length, ma.length, designWorkspace(design));
  const loglik = likelihood.atCoefficients(ar, ma, true);
  const { state, pmat, r, ncol, gaps } = likelihood.workspace;
  const finalState = Array.from({ length: ncol }, (_, c) => state.slice(c * r, (c + 1) * r));
  const filtered = { loglik, finalState, finalCovariance: pmat.slice() };
  if (gaps === undefined || gaps.period === 1) return filtered;
  return {
    ...filtered,
    pending: {
      period: gaps.period,
      sums: Array.from({ length: ncol }, (_, c) => gaps.pendingSums.slice(c * gaps.period, (c + 1) * gaps.period)),
      cross: gaps.pendingCross.slice(),
      variance: gaps.pendingVariance.slice(),
    },
  };
}

/** Model-scale forecast moments for h = 1..horizon from a design and the filtered state at its end (and, with gaps, the fit's pending sums). */
export function forecastDesign(design: TrendDesign, input: ForecastInput & { pending?: GapSums }, horizon: number): ForecastMoments {
  return forecastRegressionArma(input, design.futureRows(horizon), designIntegration(design, input.pending));
}

/** Model-scale forecast moments for h = 1..horizon. */
export function forecastTrendModel(model: TrendModelFit, horizon: number): ForecastMoments {
  return forecastDesign(model.design, model.fit, horizon);
}
