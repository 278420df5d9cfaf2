// Seeded simulation of y_t = b0 + b1·t + η_t, η ARMA(1,1) with N(0,1) shocks, after a
// burn-in of 200 draws so η starts near its stationary distribution. With `integrated`, the
// same η drives the first differences instead: y_t = y_{t−1} + b1 + η_t from y_0 = b0, an
// ARIMA(1,1,1) with drift b1.
import { seededNormals } from '../evidence/seededNormals.js';

export interface TrendArmaSpec {
  n: number;
  seed: number;
  phi: number;
  theta: number;
  intercept?: number;
  slope?: number;
  integrated?: boolean;
}

export function simulateTrendArma({ n, seed, phi, theta, intercept = 5, slope = 0.2, integrated = false }: TrendArmaSpec): Float64Array {
  const draw = seededNormals(seed);
  const y = new Float64Array(n);
  let eta = 0;
  let previousShock = 0;
  let level = intercept;
  for (let t = -200; t < n; t++) {
    const shock = draw();
    eta = phi * eta + shock + theta * previousShock;
    previousShock = shock;
    if (t < 0) continue;
    level += slope + eta;
    y[t] = integrated ? level : intercept + slope * (t + 1) + eta;
  }
  return y;
}
