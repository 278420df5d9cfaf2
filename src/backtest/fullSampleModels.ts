// What the `reestimate` and `fixed` policies take from the full sample: the orders (searched
// by AICc unless given) and, under `fixed`, every parameter. Using them at past origins is a
// look-ahead, which the record notes.
import { TREND_MODELS, type Estimation, type RefitPolicy, type TrendModelKind } from '../base/settings.js';
import { fitTrendModel, fitTrendModelAtOrder } from '../models/trendModels.js';
import type { ArmaOrder } from './backtestRecord.js';
import type { FixedParameters } from './forecastAtOrigin.js';

export interface FullSampleModels {
  orders: Record<TrendModelKind, ArmaOrder>;
  /** Under `fixed` only. */
  parameters?: Record<TrendModelKind, FixedParameters>;
}

export function fullSampleModels(
  w: Float64Array,
  refit: Exclude<RefitPolicy, 'reselect'>,
  maxP: number,
  maxQ: number,
  estimation: Estimation,
  orders?: Record<TrendModelKind, ArmaOrder>,
): FullSampleModels {
  if (refit === 'reestimate' && orders !== undefined) return { orders };
  const chosen = {} as Record<TrendModelKind, ArmaOrder>;
  const parameters = {} as Record<TrendModelKind, FixedParameters>;
  for (const kind of TREND_MODELS) {
    const given = orders?.[kind];
    const { fit } = given === undefined ? fitTrendModel(kind, w, maxP, maxQ, { estimation }) : fitTrendModelAtOrder(kind, w, given.p, given.q, { estimation });
    chosen[kind] = { p: fit.p, q: fit.q };
    parameters[kind] = { ar: Array.from(fit.ar), ma: Array.from(fit.ma), beta: Array.from(fit.beta), covBeta: Array.from(fit.covBeta), sigma2: fit.sigma2 };
  }
  return refit === 'fixed' ? { orders: chosen, parameters } : { orders: chosen };
}

/**
 * Full-sample parameters in the time index of a window that starts `start` observations in:
 * the deterministic trend b₀ + b₁t becomes (b₀ + b₁·start) + b₁t′, and Var(β̂) moves with it
 * (A V Aᵀ, A = [[1, start], [0, 1]]). The drift of the stochastic model does not depend on t.
 */
export function parametersForWindow(kind: TrendModelKind, parameters: FixedParameters, start: number): FixedParameters {
  if (kind === 'stochastic' || start === 0) return parameters;
  const [b0, b1] = parameters.beta;
  const [v00, v01, , v11] = parameters.covBeta;
  const intercept = v00 + 2 * start * v01 + start * start * v11;
  const cross = v01 + start * v11;
  return { ...parameters, beta: [b0 + b1 * start, b1], covBeta: [intercept, cross, cross, v11] };
}
