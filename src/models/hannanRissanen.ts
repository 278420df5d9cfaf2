// Starting values for ARMA(p,q) by the Hannan-Rissanen (1982) two-stage regression:
// a long autoregression (Yule-Walker, so it is always stationary) estimates the innovations,
// then η_t is regressed on its own lags and the lagged innovation estimates.
// Brockwell & Davis (2016), §5.1.4.
import { autocovariances, demean } from '../linalg/autocovariances.js';
import { leastSquares } from '../linalg/ols.js';

export interface ArmaStart {
  ar: Float64Array;
  ma: Float64Array;
}

/** Hannan-Rissanen estimates for the zero-mean series `eta`; undefined when too short. */
export function hannanRissanen(eta: Float64Array, p: number, q: number): ArmaStart | undefined {
  const n = eta.length;
  if (p === 0 && q === 0) return { ar: new Float64Array(0), ma: new Float64Array(0) };
  let innovations = eta;
  let skip = 0;
  if (q > 0) {
    const longOrder = Math.min(Math.floor(n / 4), Math.max(p + q + 1, Math.ceil(10 * Math.log10(n))));
    if (longOrder < 1) return undefined;
    const longAr = yuleWalker(eta, longOrder);
    innovations = new Float64Array(n);
    for (let t = longOrder; t < n; t++) {
      let e = eta[t];
      for (let i = 0; i < longOrder; i++) e -= longAr[i] * eta[t - 1 - i];
      innovations[t] = e;
    }
    skip = longOrder;
  }
  const first = skip + Math.max(p, q);
  const rows = n - first;
  if (rows <= p + q + 1) return undefined;
  // Column i < p: η lagged i + 1; column p + j: the innovation estimates lagged j + 1.
  const columns = [
    ...Array.from({ length: p }, (_, i) => eta.subarray(first - 1 - i, n - 1 - i)),
    ...Array.from({ length: q }, (_, j) => innovations.subarray(first - 1 - j, n - 1 - j)),
  ];
  const fit = leastSquares(eta.subarray(first), columns);
  if (fit === undefined) return undefined;
  return { ar: fit.coefficients.slice(0, p), ma: fit.coefficients.slice(p, p + q) };
}

/** Yule-Walker AR(order) coefficients by the Durbin-Levinson recursion on the sample ACVF. */
export function yuleWalker(x: Float64Array, order: number): Float64Array {
  const acvf = autocovariances(demean(x), order);
  const phi = new Float64Array(order);
  const previous = new Float64Array(order);
  if (!(acvf[0] > 0)) return phi;
  let variance = acvf[0];
  for (let k = 0; k < order; k++) {
    let num = acvf[k + 1];
    for (let j = 0; j < k; j++) num -= previous[j] * acvf[k - j];
    const reflection = num / variance;
    for (let j = 0; j < k; j++) phi[j] = previous[j] - reflection * previous[k - 1 - j];
    phi[k] = reflection;
    variance *= 1 - reflection * reflection;
    previous.set(phi.subarray(0, k + 1));
  }
  return phi;
}
