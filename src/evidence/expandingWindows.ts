// Expanding-window estimates of the trend coefficient of either model: the deterministic
// slope or the stochastic drift, re-estimated on w[0..end) for a growing `end`, with the
// ARMA orders held at the full-sample orders and only the parameters re-estimated. A
// coefficient that wanders beyond its standard errors as data accrue is a sign of an
// unstable trend (the recursive-estimates idea of Brown, Durbin & Evans 1975, §2.5).
import { fitRegressionArma, type RegressionArmaFit } from '../models/fitRegressionArma.js';
import { trendDesign } from '../models/trendModels.js';
import { type TrendModelKind } from '../base/settings.js';

/** Most windows reported, the full sample included. */
export const MAX_WINDOWS = 40;
/** The first window holds at least this many observations... */
export const MIN_WINDOW = 20;
/** ...and at least this percentage of the sample. */
export const MIN_WINDOW_PERCENT = 40;

export interface WindowSchedule {
  minWindow: number;
  step: number;
  /** Window lengths, increasing, the last equal to n. */
  ends: number[];
}

/**
 * Window lengths from max(20, ⌈0.4n⌉, `fewest`) (never more than n) to n in equal steps,
 * chosen so that there are at most 40 windows; n is always the last.
 */
export function expandingWindowSchedule(n: number, fewest = 0): WindowSchedule {
  if (!Number.isInteger(n) || n < 1) throw new Error('expandingWindowSchedule needs a whole, positive number of observations');
  const minWindow = Math.min(n, Math.max(MIN_WINDOW, Math.ceil((n * MIN_WINDOW_PERCENT) / 100), fewest));
  const step = Math.max(1, Math.ceil((n - minWindow) / (MAX_WINDOWS - 1)));
  const ends: number[] = [];
  for (let end = minWindow; end < n; end += step) ends.push(end);
  ends.push(n);
  return { minWindow, step, ends };
}

export interface WindowEstimate {
  end: number;
  estimate: number;
  se: number;
}

/**
 * The model's trend coefficient and its GLS standard error on w[0..end) for each `end`; the
 * window of the whole series takes `fullFit` as it is, so it agrees with the full-sample fit.
 */
export function expandingEstimates(
  kind: TrendModelKind,
  w: Float64Array,
  ends: readonly number[],
  fullFit: RegressionArmaFit,
): WindowEstimate[] {
  const name = kind === 'deterministic' ? 'slope' : 'drift';
  return ends.map((end) => {
    if (!Number.isInteger(end) || end < 1 || end > w.length) {
      throw new Error(`expandingEstimates needs window ends from 1 to ${w.length}, not ${end}`);
    }
    const design = trendDesign(kind, w.slice(0, end));
    const fit = end === w.length ? fullFit : fitRegressionArma(design.response, design.regressors, fullFit.p, fullFit.q, { estimation: fullFit.estimation });
    const index = design.coefficientNames.indexOf(name);
    const k = design.coefficientNames.length;
    return { end, estimate: fit.beta[index], se: Math.sqrt(fit.covBeta[index * k + index]) };
  });
}
