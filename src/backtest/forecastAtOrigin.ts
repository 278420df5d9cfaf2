// One model at one backtest origin: refit on the training window by the refit policy and
// forecast B steps on the model scale. A pure function of its task, so it runs unchanged
// inline or on a worker thread (the pool calls this module's `forecastChain` export),
// and the results do not depend on which thread ran it. Tasks of one chain (consecutive
// origins of one model) run in order, each seasonal search warm from the previous origin's
// candidates (seasonalSearch.ts); chains are fixed by the plan, never by the thread count.
import { createProfileLikelihood } from '../models/profileLikelihood.js';
import type { Estimation, RefitPolicy, TrendModelKind } from '../base/settings.js';
import { fitTrendModel, fitTrendModelAtOrder, forecastTrendModel, trendDesign, type CandidateOptima, type FixedSeasonalPart, type SeasonalSearchSpec } from '../models/trendModels.js';
import { forecastRegressionArma, type ForecastMoments } from '../statespace/forecast.js';
import type { ArmaOrder } from './backtestRecord.js';

/** Full-sample parameters held fixed under the `fixed` policy, in the window's time index. */
export interface FixedParameters {
  ar: number[];
  ma: number[];
  beta: number[];
  /** Var(β̂), k×k row-major. */
  covBeta: number[];
  sigma2: number;
}

export interface OriginTask {
  kind: TrendModelKind;
  /** Model-scale training window. */
  w: Float64Array;
  horizon: number;
  refit: RefitPolicy;
  maxP: number;
  maxQ: number;
  /** How the coefficients are estimated at each refit. */
  estimation: Estimation;
  /** The seasonal part, its first season that of this window: searched (`reselect`) or kept (`reestimate`). */
  seasonal?: SeasonalSearchSpec | FixedSeasonalPart;
  /** The order under `reestimate` and `fixed`. */
  order?: ArmaOrder;
  /** The parameters under `fixed`. */
  parameters?: FixedParameters;
  /**
   * Tasks with the same chain run in task order in one thread, a reselecting seasonal search
   * starting warm from the previous task's candidates (the previous origin of the same model);
   * absent: the task runs alone, cold.
   */
  chain?: number;
}

export interface OriginForecast {
  p: number;
  q: number;
  /** Null under `fixed`: nothing is estimated. */
  loglik: number | null;
  converged: boolean;
  mean: number[];
  seProcess: number[];
  seTotal: number[];
}

export function forecastAtOrigin(task: OriginTask): OriginForecast {
  return forecastWarm(task, undefined).forecast;
}

/** The tasks of one chain, in order, each search warm from the one before. */
export function forecastChain(tasks: readonly OriginTask[]): OriginForecast[] {
  let optima: CandidateOptima | undefined;
  return tasks.map((task) => {
    const result = forecastWarm(task, optima);
    optima = result.optima;
    return result.forecast;
  });
}

function forecastWarm(task: OriginTask, warm: CandidateOptima | undefined): { forecast: OriginForecast; optima?: CandidateOptima } {
  if (task.refit === 'fixed') return { forecast: forecastWithFixedParameters(task) };
  const model =
    task.refit === 'reselect'
      ? fitTrendModel(task.kind, task.w, task.maxP, task.maxQ, { estimation: task.estimation, ...(task.seasonal === undefined ? {} : { seasonal: task.seasonal }), warm })
      : fitTrendModelAtOrder(task.kind, task.w, requireOrder(task).p, requireOrder(task).q, { estimation: task.estimation, ...(task.seasonal === undefined ? {} : { seasonal: fixedPart(task.seasonal) }) });
  return { forecast: originForecast(model.fit, forecastTrendModel(model, task.horizon)), optima: model.optima };
}

/** The part `reestimate` keeps: the full-series choice, given as a fixed part. */
function fixedPart(seasonal: SeasonalSearchSpec | FixedSeasonalPart): FixedSeasonalPart {
  if ('harmonics' in seasonal) return seasonal;
  throw new Error('forecastAtOrigin: reestimate needs the seasonal part chosen on the full series');
}

/**
 * Filters the window at the fixed ARMA parameters to get the state at the origin, then
 * forecasts with the fixed β, Var(β̂) and σ² (Harvey 1989, §3.5): only the data up to the
 * origin move the forecast.
 */
function forecastWithFixedParameters(task: OriginTask): OriginForecast {
  const { p, q } = requireOrder(task);
  const parameters = task.parameters;
  if (parameters === undefined) throw new Error('forecastAtOrigin: the fixed policy needs the full-sample parameters');
  const design = trendDesign(task.kind, task.w);
  const likelihood = createProfileLikelihood(design.response, design.regressors, p, q, { accumulateGaps: design.accumulateGaps });
  const loglik = likelihood.atCoefficients(parameters.ar, parameters.ma, true);
  if (Number.isNaN(loglik)) throw new Error('forecastAtOrigin: the fixed ARMA parameters are not stationary and invertible');
  const { state, pmat, r, ncol } = likelihood.workspace;
  const finalState = Array.from({ length: ncol }, (_, c) => state.slice(c * r, (c + 1) * r));
  const integrate = design.integrateFrom === undefined ? undefined : { lastLevel: design.integrateFrom };
  const moments = forecastRegressionArma({ ...parameters, finalState, finalCovariance: pmat.slice() }, design.futureRows(task.horizon), integrate);
  return originForecast({ p, q, loglik: null, converged: true }, moments);
}

function originForecast(fit: Pick<OriginForecast, 'p' | 'q' | 'loglik' | 'converged'>, moments: ForecastMoments): OriginForecast {
  return {
    p: fit.p,
    q: fit.q,
    loglik: fit.loglik,
    converged: fit.converged,
    mean: Array.from(moments.mean),
    seProcess: Array.from(moments.seProcess),
    seTotal: Array.from(moments.seTotal),
  };
}

function requireOrder(task: OriginTask): ArmaOrder {
  if (task.order === undefined) throw new Error(`forecastAtOrigin: the ${task.refit} policy needs an order`);
  return task.order;
}
