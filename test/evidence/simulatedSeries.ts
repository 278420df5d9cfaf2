// The two data-generating processes the trend verdict must tell apart.

/** y_t = intercept + slope·t + u_t, u_t = phi·u_{t−1} + e_t, u started from its stationary law. */
export function trendStationaryAr1(
  normal: () => number,
  n: number,
  { intercept, slope, phi, sigma }: { intercept: number; slope: number; phi: number; sigma: number },
): Float64Array {
  const y = new Float64Array(n);
  let u = (sigma / Math.sqrt(1 - phi * phi)) * normal();
  for (let t = 0; t < n; t++) {
    if (t > 0) u = phi * u + sigma * normal();
    y[t] = intercept + slope * (t + 1) + u;
  }
  return y;
}

/** y_t = y_{t−1} + drift + e_t from y_0 = start. */
export function randomWalkWithDrift(
  normal: () => number,
  n: number,
  { start, drift, sigma }: { start: number; drift: number; sigma: number },
): Float64Array {
  const y = new Float64Array(n);
  let level = start;
  for (let t = 0; t < n; t++) {
    level += drift + sigma * normal();
    y[t] = level;
  }
  return y;
}
