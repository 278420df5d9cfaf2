// The Wald statistic for a break at each candidate date in a regression with ARMA errors,
// computed on the GLS-whitened regression: the ARMA parameters are held at their no-break
// estimates and every column (y, the no-break regressors and the break regressors) goes
// through the same Kalman filter, whose innovations divided by √F_t are the whitened data
// (Harvey 1989, §3.4). The filter is linear, so a break column filtered with the same
// parameters is the whitened break column; Σ v_c v_d / F_t are the whitened cross-products.
// Andrews (1993) takes the supremum of this sequence over a trimmed range of dates.
import { olsFit } from '../models/fitRegressionArma.js';
import { stateDimension } from '../statespace/armaStateSpace.js';
import { createWorkspace, residualSumOfSquares, runFilter, setArma } from '../statespace/kalmanFilter.js';
import { type FilterWorkspace } from '../statespace/filterWorkspace.js';

export interface BreakScanSpec {
  /** The response, with no missing values. */
  response: Float64Array;
  /** Regressors of the no-break model. */
  base: readonly Float64Array[];
  /** ARMA coefficients of the errors, held fixed (the no-break fit's estimates). */
  ar: ArrayLike<number>;
  ma: ArrayLike<number>;
  /** Number of break regressors (the restrictions tested). */
  restrictions: number;
  /** First and last candidate date, inclusive; the meaning of a date is the caller's. */
  first: number;
  last: number;
  /** Writes the break regressors for `date` into `columns` (each as long as the response). */
  fillBreak(date: number, columns: readonly Float64Array[]): void;
}

export interface BreakScan {
  /** The first candidate date; `wald[i]` is the statistic at date `first + i`. */
  first: number;
  /** Wald statistic at each candidate date, `first` to `last`. */
  wald: Float64Array;
  /** The largest Wald statistic and the date where it occurs (the earliest on a tie). */
  stat: number;
  date: number;
}

/** Wald = (SSR_restricted − SSR_unrestricted) / (SSR_unrestricted / (m − k)) at every candidate date. */
export function whitenedBreakScan(spec: BreakScanSpec): BreakScan {
  const { response, base, ar, ma, restrictions, first, last } = spec;
  const m = response.length;
  const k = base.length + restrictions;
  if (!(first <= last)) throw new Error('whitenedBreakScan needs at least one candidate date');
  if (m - k < 1) throw new Error('whitenedBreakScan needs more observations than regressors with a break');
  // Filter the no-break OLS residuals rather than y: both SSRs are unchanged (the residual
  // maker of the base regressors is part of each projection), and a large level does not
  // cost digits in Σ v² / F.
  const residuals = base.length > 0 ? olsFit(response, base).residuals : response;
  const r = stateDimension(ar.length, ma.length);
  const restrictedColumns = [residuals, ...base];
  const restricted = createWorkspace(r, restrictedColumns);
  const ssrRestricted = filteredSsr(restricted, restrictedColumns, ar, ma);

  const breakColumns = Array.from({ length: restrictions }, () => new Float64Array(m));
  const columns = [residuals, ...base, ...breakColumns];
  const unrestricted = createWorkspace(r, columns);
  const wald = new Float64Array(last - first + 1);
  let stat = Number.NEGATIVE_INFINITY;
  let date = first;
  for (let candidate = first; candidate <= last; candidate++) {
    spec.fillBreak(candidate, breakColumns);
    const ssr = filteredSsr(unrestricted, columns, ar, ma);
    const value = (ssrRestricted - ssr) / (ssr / (m - k));
    wald[candidate - first] = value;
    if (value > stat) {
      stat = value;
      date = candidate;
    }
  }
  return { first, wald, stat, date };
}

function filteredSsr(ws: FilterWorkspace, columns: readonly Float64Array[], ar: ArrayLike<number>, ma: ArrayLike<number>): number {
  if (!setArma(ws, ar, ar.length, ma, ma.length)) {
    throw new Error('whitenedBreakScan needs stationary AR coefficients');
  }
  if (!runFilter(ws, columns)) throw new Error('whitenedBreakScan needs positive innovation variances');
  const ssr = residualSumOfSquares(ws);
  if (!(ssr > 0)) throw new Error('whitenedBreakScan needs regressors of full rank and a response they do not fit exactly');
  return ssr;
}
