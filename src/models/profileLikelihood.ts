// The profile log-likelihood of y = Xβ + η, η ~ ARMA(p,q), as a function of the ARMA
// parameters alone (β and σ² concentrated out by the filter; see statespace/kalmanFilter):
// the full (exact ML) one, or the restricted one that REML maximises. With a seasonal part,
// η follows the multiplicative ARMA of seasonalArma.ts and the filter runs its expansion.
import { createWorkspace, profileLoglik, restrictedLoglik, runFilter, setArma } from '../statespace/kalmanFilter.js';
import { createAdjointScratch, createGainScratch, createSensitivities, filterSensitivities, gainRecursionAdjoint } from '../statespace/filterAdjoint.js';
import { stateDimension } from '../statespace/armaStateSpace.js';
import { isStationary } from './constraints.js';
import { type FilterWorkspace, type WorkspaceOptions } from '../statespace/filterWorkspace.js';
import {
  checkSeasonalOrder,
  constrainFactors,
  emptyFactors,
  expandFactors,
  hasSeasonalPart,
  parameterCount,
  plainOrder,
  processOrders,
  unpackFactors,
  type ArmaFactors,
  type SeasonalArmaOrder,
} from './seasonalArma.js';

import type { Estimation } from '../base/settings.js';

/** A seasonal ARMA part: factors of orders P and Q in the lag B^period. */
export interface SeasonalPart {
  period: number;
  P: number;
  Q: number;
}

export interface LikelihoodOptions extends WorkspaceOptions {
  /** Which likelihood the functions return; 'ml' when absent. */
  estimation?: Estimation;
  /** Multiplies a seasonal ARMA part into the noise; absent or P = Q = 0: none. */
  seasonal?: SeasonalPart;
}

export interface ProfileLikelihood {
  /** Orders of the ARMA process the filter runs (expanded: p + sP, q + sQ with a seasonal part). */
  readonly p: number;
  readonly q: number;
  /** The order in multiplicative form; its p and q are the nonseasonal factors'. */
  readonly order: SeasonalArmaOrder;
  readonly estimation: Estimation;
  readonly workspace: FilterWorkspace;
  /** The filtered columns: y first, then the regressors. */
  readonly columns: readonly Float64Array[];
  /** Log-likelihood at the process's AR/MA coefficients given directly; NaN outside the stationary region. */
  atCoefficients(ar: ArrayLike<number>, ma: ArrayLike<number>, keepCovariance?: boolean): number;
  /**
   * Log-likelihood at the factors' coefficients packed as (AR, MA, seasonal AR, seasonal MA)
   * (seasonalArma.ts); NaN when a factor is not stationary or not invertible.
   */
  atParameters(theta: Float64Array): number;
  /** Log-likelihood at unconstrained parameters in the same layout. */
  atUnconstrained(x: ArrayLike<number>): number;
  /**
   * The gradient of `atUnconstrained` at x into `out`, by the filter's adjoint (filterAdjoint.ts:
   * the columns, then the gain recursion) and forward differences of what the parameters move,
   * φ and the stationary covariance's first column; false where that route does not apply
   * (missing values), and the caller differences the whole likelihood instead.
   */
  gradientAtUnconstrained(x: Float64Array, out: Float64Array): boolean;
  /** The process's AR and MA coefficients for unconstrained `x`. */
  coefficientsOf(x: ArrayLike<number>): { ar: Float64Array; ma: Float64Array };
  /** The factors' coefficients for unconstrained `x`. */
  factorsOf(x: ArrayLike<number>): ArmaFactors;
}

export function createProfileLikelihood(
  y: Float64Array,
  regressors: readonly Float64Array[],
  p: number,
  q: number,
  options: LikelihoodOptions = {},
): ProfileLikelihood {
  const seasonal = options.seasonal;
  // Without seasonal factors the order is a plain one, whatever period was passed along.
  const order: SeasonalArmaOrder = seasonal === undefined || seasonal.P + seasonal.Q === 0 ? plainOrder(p, q) : { p, q, P: seasonal.P, Q: seasonal.Q, period: seasonal.period };
  checkSeasonalOrder(order);
  const process = processOrders(order);
  const columns = [y, ...regressors];
  const workspace = createWorkspace(stateDimension(process.p, process.q), columns, options);
  const estimation = options.estimation ?? 'ml';
  const loglikOf = estimation === 'reml' ? restrictedLoglik : profileLoglik;
  const ar = new Float64Array(process.p);
  const ma = new Float64Array(process.q);
  const factors = emptyFactors(order);
  const work = new Float64Array(Math.max(p, q, order.P, order.Q, 1));

  let evaluatedAt: Float64Array | undefined;
  const atCoefficients = (arCoef: ArrayLike<number>, maCoef: ArrayLike<number>, keepCovariance = false): number => {
    evaluatedAt?.fill(Number.NaN);
    if (!setArma(workspace, arCoef, process.p, maCoef, process.q, !keepCovariance && workspace.complete)) return Number.NaN;
    if (!runFilter(workspace, columns, keepCovariance)) return Number.NaN;
    return loglikOf(workspace);
  };
  const fill = (x: ArrayLike<number>): void => {
    constrainFactors(x, order, factors, work);
    expandFactors(factors, order.period, ar, ma);
  };
  const atUnconstrained = (x: ArrayLike<number>): number => {
    fill(x);
    const value = atCoefficients(ar, ma);
    evaluatedAt?.set(x);
    return value;
  };
  // The adjoint route needs the Chandrasekhar run of a complete series.
  const adjoint =
    workspace.complete && workspace.gaps === undefined
      ? {
          shiftedRun: createWorkspace(workspace.r, [y]),
          sensitivities: createSensitivities(workspace.stride, workspace.n),
          scratch: createAdjointScratch(workspace.r, workspace.ncol, workspace.n),
          gainScratch: createGainScratch(workspace.r),
          phiBar: new Float64Array(workspace.stride),
          columnBar: new Float64Array(workspace.r),
        }
      : undefined;
  if (adjoint !== undefined) evaluatedAt = new Float64Array(parameterCount(order)).fill(Number.NaN);
  return {
    p: process.p,
    q: process.q,
    order,
    estimation,
    workspace,
    columns,
    atCoefficients,
    atParameters(theta) {
      if (theta.length !== parameterCount(order)) throw new RangeError(`atParameters needs ${parameterCount(order)} parameters, got ${theta.length}`);
      if (!hasSeasonalPart(order)) return atCoefficients(theta.subarray(0, p), theta.subarray(p));
      const given = unpackFactors(theta, order);
      const inside = isStationary(given.ar) && isStationary(given.seasonalAr) && isStationary(given.ma.map((v) => -v)) && isStationary(given.seasonalMa.map((v) => -v));
      if (!inside) return Number.NaN;
      const expandedAr = new Float64Array(process.p);
      const expandedMa = new Float64Array(process.q);
      expandFactors(given, order.period, expandedAr, expandedMa);
      return atCoefficients(expandedAr, expandedMa);
    },
    atUnconstrained,
    gradientAtUnconstrained(x, out) {
      if (adjoint === undefined) return false;
      // The workspace must hold the run at x: the optimiser asks right after evaluating there.
      let same = evaluatedAt !== undefined;
      for (let j = 0; j < x.length; j++) if (evaluatedAt?.[j] !== x[j]) same = false;
      if (!same && !Number.isFinite(atUnconstrained(x))) return false;
      if (!(workspace.steadyFrom >= 0)) return false;
      const { sensitivities, phiBar, columnBar, shiftedRun } = adjoint;
      filterSensitivities(workspace, columns, estimation, process.p, adjoint.scratch, sensitivities);
      phiBar.set(sensitivities.phi);
      if (!gainRecursionAdjoint(workspace, sensitivities, adjoint.gainScratch, phiBar, columnBar)) return false;
      // ℓ depends on the parameters only through φ and the first column of the stationary P:
      // each parameter's derivative is their change, by forward differences, times the sensitivities.
      const { r } = workspace;
      const shifted = Float64Array.from(x);
      for (let j = 0; j < x.length; j++) {
        const h = 1e-7 * Math.max(1, Math.abs(x[j]));
        shifted[j] = x[j] + h;
        fill(shifted);
        shifted[j] = x[j];
        if (!setArma(shiftedRun, ar, process.p, ma, process.q, true)) return false;
        let change = 0;
        for (let i = 0; i < r; i++) change += phiBar[i] * (shiftedRun.phi[i] - workspace.phi[i]) + columnBar[i] * (shiftedRun.pmat[i * r] - workspace.pmat[i * r]);
        out[j] = change / h;
      }
      // `ar` and `ma` back at x, as after an evaluation there.
      fill(x);
      return true;
    },
    coefficientsOf(x) {
      fill(x);
      return { ar: ar.slice(), ma: ma.slice() };
    },
    factorsOf(x) {
      fill(x);
      return { ar: factors.ar.slice(), ma: factors.ma.slice(), seasonalAr: factors.seasonalAr.slice(), seasonalMa: factors.seasonalMa.slice() };
    },
  };
}
