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
import { inverseRoots, type Complex } from '../linalg/rootModulus.js';

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

/** Whether a fit may be selected, and if not, why. `differenced`: the model is for first differences. */
export function admissibility(fit: { ar: ArrayLike<number>; ma: ArrayLike<number>; converged: boolean }, differenced: boolean): Admissibility {
  const reject = (reason: InadmissibleReason): Admissibility => ({ admissible: false, reason });
  if (!fit.converged) return reject('not-converged');
  const ar = inverseRoots(fit.ar);
  const ma = maInverseRoots(fit.ma);
  // The inverse root 1 of the differencing (1 − B), close to a real MA inverse root.
  if (differenced && ma.some((root) => Math.hypot(root.re - 1, root.im) < CANCELLATION_DISTANCE)) return reject('undoes-differencing');
  const inside = 1 / (1 + UNIT_ROOT_MARGIN);
  if (ar.some((root) => modulus(root) > inside)) return reject('ar-unit-root');
  if (ma.some((root) => modulus(root) > inside)) return reject('ma-unit-root');
  if (ar.some((a) => ma.some((m) => Math.hypot(a.re - m.re, a.im - m.im) < CANCELLATION_DISTANCE))) return reject('cancelling-factors');
  return { admissible: true, reason: null };
}
