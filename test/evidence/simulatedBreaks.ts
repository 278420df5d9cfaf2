// Series with and without a break in their trend, for the stability tests. Breaks are placed
// after the first `breakAfter` observations, so position `breakAfter` (0-based) is the first
// observation of the new regime.

/** u_t = phi·u_{t−1} + sigma·e_t for t = 1..n, started from its stationary law. */
function ar1Errors(normal: () => number, n: number, phi: number, sigma: number): Float64Array {
  const u = new Float64Array(n);
  u[0] = (sigma / Math.sqrt(1 - phi * phi)) * normal();
  for (let i = 1; i < n; i++) u[i] = phi * u[i - 1] + sigma * normal();
  return u;
}

/**
 * w_t = intercept + slope·t + slopeChange·max(0, t − breakAfter) + u_t, t = 1..n, u AR(1):
 * a kink in the trend line.
 */
export function trendWithSlopeBreak(
  normal: () => number,
  n: number,
  spec: { intercept: number; slope: number; slopeChange: number; breakAfter: number; phi: number; sigma: number },
): Float64Array {
  const { intercept, slope, slopeChange, breakAfter } = spec;
  const u = ar1Errors(normal, n, spec.phi, spec.sigma);
  return u.map((error, i) => intercept + slope * (i + 1) + slopeChange * Math.max(0, i + 1 - breakAfter) + error);
}

/**
 * w_t = w_{t−1} + c_t + u_t from w_0 = start, u AR(1), with drift c_t = drift for
 * t ≤ breakAfter and drift + driftChange after: ARIMA(1,1,0) with a shift in drift.
 */
export function walkWithDriftShift(
  normal: () => number,
  n: number,
  spec: { start: number; drift: number; driftChange: number; breakAfter: number; phi: number; sigma: number },
): Float64Array {
  const { start, drift, driftChange, breakAfter } = spec;
  const u = ar1Errors(normal, n, spec.phi, spec.sigma);
  let level = start;
  return u.map((error, i) => {
    level += (i + 1 <= breakAfter ? drift : drift + driftChange) + error;
    return level;
  });
}
