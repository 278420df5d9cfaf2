// Stationarity and invertibility by reparametrisation: unconstrained reals → partial
// autocorrelations in (−1, 1) → AR coefficients by the Durbin-Levinson recursion
// (Barndorff-Nielsen & Schou 1973; Jones 1980; Monahan 1984). Every real vector maps to a
// stationary AR (or invertible MA) polynomial and every such polynomial is reached.
// The map x ↦ x / √(1 + x²) to the partial autocorrelations is smooth and keeps the
// optimiser's steps moderate near the boundary.

/**
 * Maps unconstrained `x[offset..offset+order)` to the coefficients of a stationary AR
 * polynomial 1 − a₁z − … − a_p z^p, written into `out[0..order)`. `work` needs `order` slots.
 */
export function constrainAr(x: ArrayLike<number>, offset: number, order: number, out: Float64Array, work: Float64Array): void {
  for (let k = 0; k < order; k++) {
    const xk = x[offset + k];
    const rk = xk / Math.sqrt(1 + xk * xk);
    // Durbin-Levinson: a_{k,j} = a_{k−1,j} − r_k a_{k−1,k−j}, a_{k,k} = r_k.
    for (let j = 0; j < k; j++) work[j] = out[j] - rk * out[k - 1 - j];
    for (let j = 0; j < k; j++) out[j] = work[j];
    out[k] = rk;
  }
}

/** MA version: θ = −a, so that 1 + θ₁z + … + θ_q z^q has its roots outside the unit circle. */
export function constrainMa(x: ArrayLike<number>, offset: number, order: number, out: Float64Array, work: Float64Array): void {
  constrainAr(x, offset, order, out, work);
  for (let j = 0; j < order; j++) out[j] = -out[j];
}

/**
 * Inverse of `constrainAr`: the partial autocorrelations of a stationary AR polynomial,
 * mapped back to the reals. Returns undefined when the polynomial is not stationary.
 */
export function unconstrainAr(coefficients: ArrayLike<number>): Float64Array | undefined {
  const order = coefficients.length;
  let a = Float64Array.from(coefficients);
  const x = new Float64Array(order);
  for (let k = order - 1; k >= 0; k--) {
    const rk = a[k];
    if (!(Math.abs(rk) < 1)) return undefined;
    x[k] = rk / Math.sqrt(1 - rk * rk);
    const next = new Float64Array(k);
    const scale = 1 - rk * rk;
    for (let j = 0; j < k; j++) next[j] = (a[j] + rk * a[k - 1 - j]) / scale;
    a = next;
  }
  return x;
}

/** Inverse of `constrainMa`. */
export function unconstrainMa(coefficients: ArrayLike<number>): Float64Array | undefined {
  return unconstrainAr(Array.from(coefficients, (c) => -c));
}

/** True when 1 − a₁z − … − a_p z^p has every root outside the unit circle. */
export function isStationary(coefficients: ArrayLike<number>): boolean {
  return unconstrainAr(coefficients) !== undefined;
}
