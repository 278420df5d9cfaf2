// Order selection over every (p, q) with p ≤ maxP, q ≤ maxQ by AICc, one model at a time
// (AICc of the two trend models are never compared: they describe different data), among
// the admissible fits only (admissibility.ts); every candidate stays in the list with its
// log-likelihood and, when it may not be selected, the reason.
// Each order is started, besides zeros and Hannan-Rissanen, from the optima of its smaller
// neighbours padded with a zero partial autocorrelation, which reproduces the smaller
// model exactly, so a larger model never ends below a nested smaller one.
// With a seasonal part (P, Q) the grid runs over the nonseasonal (p, q) with the seasonal
// orders held, and every start carries the neighbour's seasonal coefficients along.
import { admissibility, type InadmissibleReason } from './admissibility.js';
import { unconstrainAr, unconstrainMa } from './constraints.js';
import { countObserved, fitRegressionArma, olsFit, type RegressionArmaFit } from './fitRegressionArma.js';
import { type WorkspaceOptions } from '../statespace/filterWorkspace.js';
import type { SeasonalPart } from './profileLikelihood.js';
import type { SeasonalArmaOrder } from './seasonalArma.js';

/** Real roots of the common factor tried by `cancellingStart` from the (p−1, q−1) optimum. */
const CANCELLING_ROOTS = [0.8, -0.8];
/** The complex pair tried from the (p−2, q−2) optimum. */
const CANCELLING_PAIR = { modulus: 0.8, angle: 0.8 };

export interface Candidate {
  p: number;
  q: number;
  loglik: number;
  aicc: number;
  converged: boolean;
  admissible: boolean;
  /** Why the candidate may not be selected; null when it may. */
  reason: InadmissibleReason | null;
}

export interface OrderSearchResult {
  /** The admissible fit of lowest AICc. */
  best: RegressionArmaFit;
  bestAicc: number;
  candidates: Candidate[];
  /** The converged fit of lowest AICc when it is not admissible (it would have been selected without the rule), else null. */
  setAside: { fit: RegressionArmaFit; aicc: number; reason: InadmissibleReason } | null;
}

export interface SearchOptions extends WorkspaceOptions {
  /** The model is for differences: a fit that undoes the differencing is not admissible. */
  differenced?: boolean;
  /** A seasonal ARMA part held fixed over the grid. */
  seasonal?: SeasonalPart;
}

/**
 * AICc = −2 logL + 2k + 2k(k+1)/(m − k − 1), k = p + q + regression coefficients + 1 (σ²),
 * m = observations in the likelihood (Hurvich & Tsai 1989). Infinite when m ≤ k + 1.
 */
export function aicc(loglik: number, parameters: number, nobs: number): number {
  if (nobs - parameters - 1 <= 0) return Number.POSITIVE_INFINITY;
  return -2 * loglik + 2 * parameters + (2 * parameters * (parameters + 1)) / (nobs - parameters - 1);
}

export function searchOrders(
  y: Float64Array,
  regressors: readonly Float64Array[],
  maxP: number,
  maxQ: number,
  options: SearchOptions = {},
): OrderSearchResult {
  const grid = fitGrid(y, regressors, maxP, maxQ, options);
  let best: GridFit | undefined;
  let bestSetAside: GridFit | undefined;
  for (const entry of grid) {
    const { candidate } = entry;
    if (candidate.admissible && candidate.aicc < (best?.candidate.aicc ?? Number.POSITIVE_INFINITY)) best = entry;
    if (candidate.reason !== null && candidate.reason !== 'not-converged' && candidate.aicc < (bestSetAside?.candidate.aicc ?? Number.POSITIVE_INFINITY)) {
      bestSetAside = entry;
    }
  }
  // (0, 0) has nothing to be inadmissible about, so an admissible fit exists whenever any fits.
  if (best === undefined) throw new Error('searchOrders: no order fits this many observations');
  const setAside =
    bestSetAside !== undefined && bestSetAside.candidate.reason !== null && bestSetAside.candidate.aicc < best.candidate.aicc
      ? { fit: bestSetAside.fit, aicc: bestSetAside.candidate.aicc, reason: bestSetAside.candidate.reason }
      : null;
  return { best: best.fit, bestAicc: best.candidate.aicc, candidates: grid.map((entry) => entry.candidate), setAside };
}

/** One fit of a grid with its candidate entry. */
export interface GridFit {
  fit: RegressionArmaFit;
  candidate: Candidate;
}

/**
 * Every (p, q) with p ≤ maxP, q ≤ maxQ that leaves AICc defined, fitted in order of p then q,
 * each started from its neighbours' optima, with its AICc and admissibility.
 */
export function fitGrid(y: Float64Array, regressors: readonly Float64Array[], maxP: number, maxQ: number, options: SearchOptions = {}): GridFit[] {
  const { differenced = false, seasonal, ...workspace } = options;
  const fits = new Map<string, RegressionArmaFit>();
  const seasonalCount = (seasonal?.P ?? 0) + (seasonal?.Q ?? 0);
  const grid: GridFit[] = [];
  const nobs = countObserved(y);
  // The trend regression that starts every candidate is the same for all of them.
  const ols = olsFit(y, regressors);
  for (let p = 0; p <= maxP; p++) {
    for (let q = 0; q <= maxQ; q++) {
      const parameters = p + q + seasonalCount + regressors.length + 1;
      if (nobs - parameters - 1 <= 0) continue;
      const starts = neighbourStarts((a, b) => fits.get(key(a, b)), p, q);
      const fit = fitRegressionArma(y, regressors, p, q, { ...workspace, seasonal, starts, ols });
      fits.set(key(p, q), fit);
      const value = aicc(fit.loglik, parameters, fit.nobs);
      const { admissible, reason } = admissibility(fit, differenced);
      grid.push({ fit, candidate: { p, q, loglik: fit.loglik, aicc: value, converged: fit.converged, admissible, reason } });
    }
  }
  return grid;
}

/**
 * Starts for (p, q) from the optima already found at smaller orders of the same model: the
 * (p − 1, q) and (p, q − 1) optima padded, and the (p − 1, q − 1) and (p − 2, q − 2) optima with
 * a common factor in both polynomials.
 */
export function neighbourStarts(fitAt: (p: number, q: number) => RegressionArmaFit | undefined, p: number, q: number): Float64Array[] {
  const starts = [fitAt(p - 1, q), fitAt(p, q - 1)].filter((fit): fit is RegressionArmaFit => fit !== undefined).map((fit) => padStart(fit, p, q));
  const diagonal = fitAt(p - 1, q - 1);
  if (diagonal !== undefined) {
    for (const root of CANCELLING_ROOTS) starts.push(...cancellingStart(diagonal, [-root]));
  }
  const second = fitAt(p - 2, q - 2);
  if (second !== undefined) {
    // A complex pair ρe^{±iω}: (1 − 2ρ cos ω B + ρ² B²).
    const { modulus, angle } = CANCELLING_PAIR;
    starts.push(...cancellingStart(second, [-2 * modulus * Math.cos(angle), modulus * modulus]));
  }
  return starts;
}

/**
 * A smaller fit's optimum with a common factor (1 + f₁B + …) multiplied into both its AR
 * and MA polynomials: the likelihood is unchanged, and the optimiser can pull the new roots
 * apart, which reaches optima with near-cancelling roots that the padded starts miss.
 */
function cancellingStart(fit: RegressionArmaFit, factor: readonly number[]): Float64Array[] {
  // AR polynomial 1 − a₁B − …: negate into "1 + c₁B + …" form, multiply, negate back.
  const ar = multiplyPolynomials(fit.factors.ar.map((v) => -v), factor).map((v) => -v);
  const ma = multiplyPolynomials(fit.factors.ma, factor);
  const xAr = unconstrainAr(ar);
  const xMa = unconstrainMa(ma);
  if (xAr === undefined || xMa === undefined) return [];
  const seasonalPart = seasonalParameters(fit);
  const x = new Float64Array(ar.length + ma.length + seasonalPart.length);
  x.set(xAr, 0);
  x.set(xMa, ar.length);
  x.set(seasonalPart, ar.length + ma.length);
  return [x];
}

/** The unconstrained seasonal parameters of a fit (after its p + q nonseasonal ones). */
function seasonalParameters(fit: RegressionArmaFit): Float64Array {
  return fit.unconstrained.subarray(fit.order.p + fit.order.q);
}

/** Coefficients after the leading 1 of (1 + a₁B + …)(1 + b₁B + …). */
function multiplyPolynomials(a: ArrayLike<number>, b: readonly number[]): Float64Array {
  const full = [1, ...Array.from(a)];
  const other = [1, ...b];
  const out = new Float64Array(full.length + other.length - 1);
  for (let i = 0; i < full.length; i++) for (let j = 0; j < other.length; j++) out[i + j] += full[i] * other[j];
  return out.slice(1);
}

/**
 * A smaller fit's optimum as a start for a larger order: extra partial autocorrelations set
 * to 0, which reproduces the smaller model exactly (the seasonal factors likewise).
 */
export function padStart(fit: RegressionArmaFit, p: number, q: number, P = fit.order.P, Q = fit.order.Q): Float64Array {
  const from: SeasonalArmaOrder = fit.order;
  const x = new Float64Array(p + q + P + Q);
  const u = fit.unconstrained;
  x.set(u.subarray(0, from.p), 0);
  x.set(u.subarray(from.p, from.p + from.q), p);
  x.set(u.subarray(from.p + from.q, from.p + from.q + from.P), p + q);
  x.set(u.subarray(from.p + from.q + from.P, from.p + from.q + from.P + from.Q), p + q + P);
  return x;
}

function key(p: number, q: number): string {
  return `${p},${q}`;
}
