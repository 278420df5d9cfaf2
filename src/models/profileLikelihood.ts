// The profile log-likelihood of y = Xβ + η, η ~ ARMA(p,q), as a function of the ARMA
// parameters alone (β and σ² concentrated out by the filter; see statespace/kalmanFilter):
// the full (exact ML) one, or the restricted one that REML maximises.
import { createWorkspace, profileLoglik, restrictedLoglik, runFilter, setArma } from '../statespace/kalmanFilter.js';
import { stateDimension } from '../statespace/armaStateSpace.js';
import { constrainAr, constrainMa } from './constraints.js';
import { type FilterWorkspace, type WorkspaceOptions } from '../statespace/filterWorkspace.js';

import type { Estimation } from '../base/settings.js';

export interface LikelihoodOptions extends WorkspaceOptions {
  /** Which likelihood the functions return; 'ml' when absent. */
  estimation?: Estimation;
}

export interface ProfileLikelihood {
  readonly p: number;
  readonly q: number;
  readonly estimation: Estimation;
  readonly workspace: FilterWorkspace;
  /** The filtered columns: y first, then the regressors. */
  readonly columns: readonly Float64Array[];
  /** Log-likelihood at AR/MA coefficients given directly; NaN outside the stationary region. */
  atCoefficients(ar: ArrayLike<number>, ma: ArrayLike<number>, keepCovariance?: boolean): number;
  /** Log-likelihood at unconstrained parameters (first p map to AR, next q to MA). */
  atUnconstrained(x: ArrayLike<number>): number;
  /** Writes the AR and MA coefficients for unconstrained `x`. */
  coefficientsOf(x: ArrayLike<number>): { ar: Float64Array; ma: Float64Array };
}

export function createProfileLikelihood(
  y: Float64Array,
  regressors: readonly Float64Array[],
  p: number,
  q: number,
  options: LikelihoodOptions = {},
): ProfileLikelihood {
  const columns = [y, ...regressors];
  const workspace = createWorkspace(stateDimension(p, q), columns, options);
  const estimation = options.estimation ?? 'ml';
  const loglikOf = estimation === 'reml' ? restrictedLoglik : profileLoglik;
  const ar = new Float64Array(p);
  const ma = new Float64Array(q);
  const work = new Float64Array(Math.max(p, q, 1));

  const atCoefficients = (arCoef: ArrayLike<number>, maCoef: ArrayLike<number>, keepCovariance = false): number => {
    if (!setArma(workspace, arCoef, p, maCoef, q, !keepCovariance && workspace.complete)) return Number.NaN;
    if (!runFilter(workspace, columns, keepCovariance)) return Number.NaN;
    return loglikOf(workspace);
  };
  const fill = (x: ArrayLike<number>): void => {
    constrainAr(x, 0, p, ar, work);
    constrainMa(x, p, q, ma, work);
  };
  return {
    p,
    q,
    estimation,
    workspace,
    columns,
    atCoefficients,
    atUnconstrained(x) {
      fill(x);
      return atCoefficients(ar, ma);
    },
    coefficientsOf(x) {
      fill(x);
      return { ar: ar.slice(), ma: ma.slice() };
    },
  };
}
