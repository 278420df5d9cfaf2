// The two trend models, both regression with ARMA errors on the shared engine:
//   deterministic: w_t = b₀ + b₁t + η_t on the (transformed) levels, t = 1 at the first
//                  observation (trend-stationary);
//   stochastic:    w_t − w_{t−1} = c + η_t on the first differences (difference-stationary,
//                  ARIMA(p,1,q) with drift c).
// η ~ stationary, invertible ARMA(p,q) in both. Only the design differs.
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
import { forecastRegressionArma, type ForecastMoments } from '../statespace/forecast.js';
import { createProfileLikelihood } from './profileLikelihood.js';
import { admissibility, type InadmissibleReason } from './admissibility.js';
import { aicc, searchOrders, type Candidate } from './orderSearch.js';
import { armaStandardErrors, type StandardErrorMethod } from './standardErrors.js';


export interface TrendDesign {
  response: Float64Array;
  regressors: Float64Array[];
  /** Names of the regression coefficients, in order. */
  coefficientNames: string[];
  /** Regressor rows for h = 1..horizon. */
  futureRows(horizon: number): number[][];
  /** For the stochastic model: forecasts are integrated from this last level. */
  integrateFrom?: number;
  /** The response is the change since the last observed level, NaN at missing levels (gapFilter.ts). */
  accumulateGaps: boolean;
}

/** The response and regressors of a model for the model-scale series `w`. */
export function trendDesign(kind: TrendModelKind, w: Float64Array): TrendDesign {
  const n = w.length;
  if (kind === 'deterministic') {
    return {
      response: w,
      regressors: [new Float64Array(n).fill(1), Float64Array.from({ length: n }, (_, i) => i + 1)],
      coefficientNames: ['intercept', 'slope'],
      futureRows: (horizon) => Array.from({ length: horizon }, (_, h) => [1, n + h + 1]),
      accumulateGaps: false,
    };
  }
  // Δ_j = w_{j+1} − (the last observed level before it), g_j = the periods it spans; with no
  // missing levels these are the first differences and a column of ones.
  const changes = new Float64Array(n - 1);
  const spans = new Float64Array(n - 1);
  let last = 0;
  for (let t = 1; t < n; t++) {
    if (Number.isNaN(w[t])) {
      changes[t - 1] = Number.NaN;
      spans[t - 1] = 1;
      continue;
    }
    changes[t - 1] = w[t] - w[last];
    spans[t - 1] = t - last;
    last = t;
  }
  if (Number.isNaN(w[0]) || Number.isNaN(w[n - 1])) {
    throw new RangeError('trendDesign: the first and last observations must be present');
  }
  return {
    response: changes,
    regressors: [spans],
    coefficientNames: ['drift'],
    futureRows: (horizon) => Array.from({ length: horizon }, () => [1]),
    integrateFrom: w[n - 1],
    accumulateGaps: true,
  };
}

/** Fewest observations (of w) either model needs for an order (p, q), so that AICc exists. */
export function minimumObservations(kind: TrendModelKind, p: number, q: number): number {
  const k = p + q + (kind === 'deterministic' ? 2 : 1) + 1;
  // AICc needs m > k + 1; the stochastic model loses one observation to differencing.
  return k + 2 + (kind === 'stochastic' ? 1 : 0);
}

/** Why a model asked for REML kept its exact-ML estimates. */
export type RestrictedFallback = 'not-converged' | InadmissibleReason;

export interface TrendModelOptions {
  /** How the chosen order's coefficients are estimated; 'reml' (REML) when absent. */
  estimation?: Estimation;
}

export interface TrendModelFit {
  kind: TrendModelKind;
  design: TrendDesign;
  /** The estimates the model reports and forecasts with (REML unless `restrictedFallback`). */
  fit: RegressionArmaFit;
  /** The full log-likelihood and AICc of the chosen order at its exact-ML optimum (the selection's figures). */
  loglik: number;
  aicc: number;
  /** Set when REML was asked for but its fit was not used (the ML fit stands). */
  restrictedFallback?: RestrictedFallback;
  candidates: Candidate[];
  coefficients: Record<string, number>;
  /**
   * The fit of lower AICc that the search set aside as not admissible (admissibility.ts),
   * absent when the selected fit is also the AICc best.
   */
  setAside?: { p: number; q: number; ar: number[]; ma: number[]; aicc: number; reason: InadmissibleReason };
  /** Standard errors for the regression coefficients (GLS) and AR/MA (observed information). */
  stderr: { regression: Record<string, number>; ar: number[]; ma: number[]; method: StandardErrorMethod };
}

/** Order search for one model, the chosen order's estimates, then their standard errors. */
export function fitTrendModel(kind: TrendModelKind, w: Float64Array, maxP: number, maxQ: number, options: TrendModelOptions = {}): TrendModelFit {
  const design = trendDesign(kind, w);
  const search = searchOrders(design.response, design.regressors, maxP, maxQ, { accumulateGaps: design.accumulateGaps, differenced: kind === 'stochastic' });
  const model = describeFit(kind, design, search.best, search.bestAicc, search.candidates, options);
  const { setAside } = search;
  return setAside === null ? model : { ...model, setAside: { p: setAside.fit.p, q: setAside.fit.q, ar: Array.from(setAside.fit.ar), ma: Array.from(setAside.fit.ma), aicc: setAside.aicc, reason: setAside.reason } };
}

/** A model at a fixed order (no search), e.g. for a backtest that keeps orders fixed. */
export function fitTrendModelAtOrder(kind: TrendModelKind, w: Float64Array, p: number, q: number, options: TrendModelOptions = {}): TrendModelFit {
  const design = trendDesign(kind, w);
  const fit = fitRegressionArma(design.response, design.regressors, p, q, { accumulateGaps: design.accumulateGaps });
  const k = p + q + design.regressors.length + 1;
  const value = aicc(fit.loglik, k, fit.nobs);
  return describeFit(kind, design, fit, value, [{ p, q, loglik: fit.loglik, aicc: value, converged: fit.converged, ...admissibility(fit, kind === 'stochastic') }], options);
}

/** The REML fit at the ML fit's order, started from its optimum, or why the ML fit stays. */
function restrictedFit(kind: TrendModelKind, design: TrendDesign, ml: RegressionArmaFit): RegressionArmaFit | RestrictedFallback {
  const fit = fitRegressionArma(design.response, design.regressors, ml.p, ml.q, { accumulateGaps: design.accumulateGaps, estimation: 'reml', starts: [ml.unconstrained] });
  if (!fit.converged) return 'not-converged';
  const verdict = admissibility(fit, kind === 'stochastic');
  return verdict.admissible ? fit : (verdict.reason ?? 'not-converged');
}

function describeFit(
  kind: TrendModelKind,
  design: TrendDesign,
  ml: RegressionArmaFit,
  aicc: number,
  candidates: Candidate[],
  options: TrendModelOptions,
): TrendModelFit {
  const restricted = (options.estimation ?? 'reml') === 'reml' ? restrictedFit(kind, design, ml) : undefined;
  const fit = typeof restricted === 'object' ? restricted : ml;
  const coefficients: Record<string, number> = {};
  const regression: Record<string, number> = {};
  const k = design.coefficientNames.length;
  design.coefficientNames.forEach((name, i) => {
    coefficients[name] = fit.beta[i];
    regression[name] = Math.sqrt(fit.covBeta[i * k + i]);
  });
  const ols = olsFit(design.response, design.regressors);
  const likelihood = createProfileLikelihood(ols.residuals, design.regressors, fit.p, fit.q, { accumulateGaps: design.accumulateGaps, estimation: fit.estimation });
  const armaSe = armaStandardErrors(likelihood, fit.ar, fit.ma);
  return {
    kind,
    design,
    fit,
    loglik: ml.loglik,
    aicc,
    ...(typeof restricted === 'string' ? { restrictedFallback: restricted } : {}),
    candidates,
    coefficients,
    stderr: { regression, ar: Array.from(armaSe.values.subarray(0, fit.p)), ma: Array.from(armaSe.values.subarray(fit.p)), method: armaSe.method },
  };
}

/** Model-scale forecast moments for h = 1..horizon. */
export function forecastTrendModel(model: TrendModelFit, horizon: number): ForecastMoments {
  const integrate = model.design.integrateFrom === undefined ? undefined : { lastLevel: model.design.integrateFrom };
  return forecastRegressionArma(model.fit, model.design.futureRows(horizon), integrate);
}
