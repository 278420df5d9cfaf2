// Sums of lagged cross-products divided by n (not n − k): the divisor that keeps the
// autocovariance sequence positive semi-definite, used by the KPSS long-run variance
// (Kwiatkowski et al. 1992, §2), the Hobijn et al. (2004) lag rule and the sample ACF
// (Box & Jenkins, common practice).

/**
 * c[k] = (1/n) Σ_{t=k}^{n−1} x[t]·x[t−k] for k = 0..maxLag, taken about zero: pass demeaned
 * values (or regression residuals) to get sample autocovariances.
 */
export function autocovariances(x: Float64Array, maxLag: number): Float64Array {
  const n = x.length;
  if (!Number.isInteger(maxLag) || maxLag < 0) {
    throw new Error('autocovariances needs a whole, non-negative maxLag');
  }
  if (maxLag >= n) throw new Error('autocovariances needs more observations than maxLag');
  const c = new Float64Array(maxLag + 1);
  for (let k = 0; k <= maxLag; k++) {
    let sum = 0;
    for (let t = k; t < n; t++) sum += x[t] * x[t - k];
    c[k] = sum / n;
  }
  return c;
}

/** x minus its mean, as a new array. */
export function demean(x: Float64Array): Float64Array {
  let mean = 0;
  for (let i = 0; i < x.length; i++) mean += x[i];
  mean /= x.length;
  return x.map((value) => value - mean);
}
