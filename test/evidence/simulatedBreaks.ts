// Series with and without a break in their trend, for the stability tests. Breaks are placed
// after the first `breakAfter` observations, so position `breakAfter` (0-based) is the first
// observation of the new regime.

/**
 * w_t = intercept + slope·t + slopeChange·max(0, t − breakAfter) + u_t, t = 1..n, with
 * u_t = phi·u_{t−1} + e_t started from its stationary law: a kink in the trend line.
 */
export function trendWithSlopeBreak(
  normal: () => number,
  n: number,
  spec: { intercept: number; slope: number; slopeChange: number; breakAfter: number; phi: number; sigma: number },
): Float64Array {
  const { intercept, slope, slopeChange, breakAfter, phi, sigma } = spec;
  const w = new Float64Array(n);
  let u = (sigma / Math.sqrt(1 - phi * phi)) * normal();
  for (let i = 0; i < n; i++) {
    if (i > 0) u = phi * u + sigma * normal();
    const t = i + 1;
    w[i] = intercept + slope * t + slopeChange * Math.max(0, t - breakAfter) + u;
  }
  return w;
}

/**
 * w_t = w_{t−1} + c_t + u_t from w_0 = start, u_t = phi·u_{t−1} + e_t (stationary start),
 * with drift c_t = drift for t ≤ breakAfter and drift + driftChange after: ARIMA(1,1,0).
 */
export function walkWithDriftShift(
  normal: () => number,
  n: number,
  spec: { start: number; drift: number; driftChange: number; breakAfter: number; phi: number; sigma: number },
): Float64Array {
  const { start, drift, driftChange, breakAfter, phi, sigma } = spec;
  const w = new Float64Array(n);
  let u = (sigma / Math.sqrt(1 - phi * phi)) * normal();
  let level = start;
  for (let i = 0; i < n; i++) {
    if (i > 0) u = phi * u + sigma * normal();
    level += (i + 1 <= breakAfter ? drift : drift + driftChange) + u;
    w[i] = level;
  }
  return w;
}
