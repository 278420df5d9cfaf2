// Expanding-window estimates of the trend coefficient of either model: the deterministic
// slope or the stochastic drift, re-estimated on w[0..end) for a growing `end`, with the
// ARMA orders held at the full-sample orders and only the parameters re-estimated. A
// coefficient that wanders beyond its standard errors as data accrue is a sign of an
// unstable trend (the recursive-estimates idea of Brown, Durbin & Evans 1975, §2.5).
//
// A model with a seasonal part keeps all of it in every window: its design restricted to the
// window (the same harmonic pairs, anchored to the calendar from the series' first season, or
// the same seasonal differences) and its seasonal ARMA factors at the model's orders.
import { fitRegressionArma, type RegressionArmaFit } from '../models/fitRegressionArma.js';
import { trendDesign, type TrendDesign } from '../models/trendModels.js';
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
 * The windows are fitted from the longest down, each started from the optimum of the window one
 * step longer and from zero, each run to the end, rather than from the usual starts: successive
 * windows differ by a few observations, so their optima lie close. On our 24 plain study series
 * and models (the three shared open datasets, the demo's three annual series and four seeded
 * series, both trend models at their selected orders, ML and REML; 1,076 windows) this reached
 * the cold fit's log-likelihood in every window to 5e-6 and a higher one in two, in 17% less time.
 */
export function expandingEstimates(
  kind: TrendModelKind,
  w: Float64Array,
  ends: readonly number[],
  fullFit: RegressionArmaFit,
): WindowEstimate[] {
  for (const end of ends) checkEnd(end, w.length, 'expandingEstimates');
  const estimates: WindowEstimate[] = new Array<WindowEstimate>(ends.length);
  let longer = fullFit.unconstrained;
  for (let index = ends.length - 1; index >= 0; index--) {
    const end = ends[index];
    const design = trendDesign(kind, w.slice(0, end));
    const fit =
      end === w.length
        ? fullFit
        : fitRegressionArma(design.response, design.regressors, fullFit.p, fullFit.q, {
            estimation: fullFit.estimation,
            starts: [longer, new Float64Array(longer.length)],
            startsOnly: true,
          });
    longer = fit.unconstrained;
    estimates[index] = trendEstimate(kind, end, design, fit);
  }
  return estimates;
}

/** A fitted model with a seasonal part: its design on the whole series and its fit there. */
export interface SeasonalTrendFit {
  design: TrendDesign;
  fit: RegressionArmaFit;
}

/**
 * `expandingEstimates` for a model with a seasonal part: each window's design is the model's
 * restricted to w[0..end) (every window starts at the series' first observation, so its first
 * season is the model's), fitted at the model's orders (p, q)(P, Q)s and estimated as the
 * model was (`fit.estimation`). Each window starts from the full-sample optimum and from zero
 * alone rather than from the usual starts. On Nottingham temperatures (monthly) and UK gas
 * (quarterly, log), 136 windows of both models, this reached the optimum of a cold fit (zero,
 * Hannan-Rissanen, seasonal autocorrelation and edge starts, and for REML the model's own path,
 * ML first and REML from its optimum) in 129 windows and a higher one in the other 7, at a fifth
 * to two fifths of its cost; the full-sample optimum alone ended 0.63 below in one UK gas
 * window. DEVELOPERS.md, "Trend stability", has the figures.
 */
export function seasonalExpandingEstimates(kind: TrendModelKind, w: Float64Array, ends: readonly number[], model: SeasonalTrendFit): WindowEstimate[] {
  return ends.map((end) => {
    checkEnd(end, w.length, 'seasonalExpandingEstimates');
    if (end === w.length) return trendEstimate(kind, end, model.design, model.fit);
    const { design, fit } = seasonalWindowFit(kind, w, end, model);
    return trendEstimate(kind, end, design, fit);
  });
}

/** The model with its seasonal part fitted to w[0..end), as `seasonalExpandingEstimates` fits each window. */
export function seasonalWindowFit(kind: TrendModelKind, w: Float64Array, end: number, model: SeasonalTrendFit): SeasonalTrendFit {
  const seasonality = model.design.seasonality;
  if (seasonality === undefined) throw new Error('seasonalWindowFit needs a design with its seasonality');
  const { p, q, P, Q } = model.fit.order;
  const design = trendDesign(kind, w.slice(0, end), seasonality);
  const fit = fitRegressionArma(design.response, design.regressors, p, q, {
    estimation: model.fit.estimation,
    seasonal: P + Q > 0 ? { period: seasonality.period, P, Q } : undefined,
    starts: [model.fit.unconstrained, new Float64Array(model.fit.unconstrained.length)],
    startsOnly: true,
  });
  return { design, fit };
}

function checkEnd(end: number, n: number, caller: string): void {
  if (!Number.isInteger(end) || end < 1 || end > n) throw new Error(`${caller} needs window ends from 1 to ${n}, not ${end}`);
}

/** The slope (deterministic) or the drift (stochastic) of a fit and its standard error. */
function trendEstimate(kind: TrendModelKind, end: number, design: TrendDesign, fit: RegressionArmaFit): WindowEstimate {
  const index = design.coefficientNames.indexOf(kind === 'deterministic' ? 'slope' : 'drift');
  const k = design.coefficientNames.length;
  return { end, estimate: fit.beta[index], se: Math.sqrt(fit.covBeta[index * k + index]) };
}
