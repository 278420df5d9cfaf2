// Which fitted candidates an order search may select. A maximum of the likelihood can sit on
// the edge of the parameter space or carry a redundant pair of factors: a moving-average root
// on the unit circle (the "pile-up" of the MA(1) estimator at θ = −1 in finite samples,
// Sargan & Bhargava 1983; Davis & Dunsmuir 1996), an autoregressive root at the edge of
// stationarity, or AR and MA factors that nearly cancel, which leaves the parameters barely
// identified (Box, Jenkins & Reinsel 2008, §7.3.5, parameter redundancy). Such optima are
// real, but their standard errors and forecast intervals are not to be trusted, so they stay
// in the candidate list with their likelihood and the reason, and the search selects among
// the others. The margin follows the automatic ARIMA order selection literature, which
// discards fits with a root within 0.01 of the unit circle (Hyndman & Khandakar 2008, J. Stat.
// Software 27(3), §3, from memory); the cancellation distance is ours, checked by the
// simulation tests in test/models/admissibleSelection.test.ts.
//
// For the stochastic trend a moving-average root near z = 1 nearly undoes the differencing:
// (1 − B)y = (1 − ρB)ε with ρ near 1 is a fixed line again. Such a fit is evidence against a
// wandering trend, not a wandering trend, so that model may not select it either.
//
// A seasonal ARMA part (seasonalArma.ts) is judged factor by factor, each in its own variable:
// the seasonal factor 1 − ΦB^s by the root of 1 − Φz, z = B^s, so the margins say the same of
// Φ as of an AR(1) coefficient. (The expanded polynomial's roots, the s-th roots of 1/Φ, have
// modulus |Φ|^{−1/s}: judged there, every Φ above 1.01^{−12} = 0.887 would sit "at the unit
// circle" in a monthly model, and a seasonal pattern that drifts slowly is exactly what Φ near
// 0.9 describes; our choice.) Factors of different lags are checked for cancelling on the
// expanded roots, where they meet. A seasonal MA factor 1 + ΘB^s with Θ near −1 contains
// 1 − B (1 − B^s = (1 − B)(1 + B + … + B^{s−1})), so in the stochastic model it too undoes
// the differencing, whether the model differences once or seasonally.
import { inverseRoots, type Complex } from '../linalg/rootModulus.js';
import { hasSeasonalPart, type ArmaFactors, type SeasonalArmaOrder } from './seasonalArma.js';

/** Roots with modulus below 1 + this margin are too close to the unit circle. */
export const UNIT_ROOT_MARGIN = 0.01;
/** An AR and an MA inverse root closer than this nearly cancel. */
export const CANCELLATION_DISTANCE = 0.1;

export type InadmissibleReason = 'not-converged' | 'ar-unit-root' | 'ma-unit-root' | 'cancelling-factors' | 'undoes-differencing';

export interface Admissibility {
  admissible: boolean;
  reason: InadmissibleReason | null;
}

function modulus({ re, im }: Complex): number {
  return Math.hypot(re, im);
}

/** The MA inverse roots of 1 + θ₁B + … (the MA polynomial's sign convention). */
function maInverseRoots(ma: ArrayLike<number>): Complex[] {
  return inverseRoots(Array.from(ma, (v) => -v));
}

/** What admissibility reads of a fit: the process coefficients, and the factors when it has a seasonal part. */
export interface AdmissibilityInput {
  ar: ArrayLike<number>;
  ma: ArrayLike<number>;
  converged: boolean;
  order?: SeasonalArmaOrder;
  factors?: ArmaFactors;
}

/**
 * Whether a fit may be selected, and if not, why. `differenced`: the model is for differences
 * (first or seasonal), so an MA factor that contains 1 − B undoes them.
 */
export function admissibility(fit: AdmissibilityInput, differenced: boolean): Admissibility {
  const reject = (reason: InadmissibleReason): Admissibility => ({ admissible: false, reason });
  if (!fit.converged) return reject('not-converged');
  const seasonal = fit.order !== undefined && fit.factors !== undefined && hasSeasonalPart(fit.order) ? { order: fit.order, factors: fit.factors } : undefined;
  // Without a seasonal part the process coefficients are the one pair of factors.
  const ar = inverseRoots(seasonal?.factors.ar ?? fit.ar);
  const ma = maInverseRoots(seasonal?.factors.ma ?? fit.ma);
  const seasonalAr = seasonal === undefined ? [] : inverseRoots(seasonal.factors.seasonalAr);
  const seasonalMa = seasonal === undefined ? [] : maInverseRoots(seasonal.factors.seasonalMa);
  const nearOne = (root: Complex): boolean => Math.hypot(root.re - 1, root.im) < CANCELLATION_DISTANCE;
  // The inverse root 1 of the differencing (1 − B), close to a real MA inverse root (of either factor, each in its variable).
  if (differenced && (ma.some(nearOne) || seasonalMa.some(nearOne))) return reject('undoes-differencing');
  const inside = 1 / (1 + UNIT_ROOT_MARGIN);
  const atCircle = (roots: Complex[]): boolean => roots.some((root) => modulus(root) > inside);
  if (atCircle(ar) || atCircle(seasonalAr)) return reject('ar-unit-root');
  if (atCircle(ma) || atCircle(seasonalMa)) return reject('ma-unit-root');
  if (cancelling(ar, ma) || cancelling(seasonalAr, seasonalMa)) return reject('cancelling-factors');
  if (seasonal !== undefined) {
    const { period } = seasonal.order;
    if (cancelling(ar, lagRoots(seasonalMa, period)) || cancelling(lagRoots(seasonalAr, period), ma)) return reject('cancelling-factors');
  }
  return { admissible: true, reason: null };
}

/** Whether an AR and an MA inverse root lie within the cancellation distance. */
function cancelling(ar: Complex[], ma: Complex[]): boolean {
  return ar.some((a) => ma.some((m) => Math.hypot(a.re - m.re, a.im - m.im) < CANCELLATION_DISTANCE));
}

/** Inverse roots in B of a factor whose inverse roots in z = B^s are `roots`: their s-th roots. */
function lagRoots(roots: Complex[], period: number): Complex[] {
  return roots.flatMap(({ re, im }) => {
    const size = Math.hypot(re, im) ** (1 / period);
    const angle = Math.atan2(im, re);
    return Array.from({ length: period }, (_, k) => {
      const turn = (angle + 2 * Math.PI * k) / period;
      return { re: size * Math.cos(turn), im: size * Math.sin(turn) };
    });
  });
}
