// Seeded simulation of y_t = b0 + b1·t + η_t, η ARMA(1,1) with N(0,1) shocks, after a
// burn-in of 200 draws so η starts near its stationary distribution.
import { seededNormals } from '../evidence/seededNormals.js';

export interface TrendArmaSpec {
  n: number;
  seed: number;
  phi: number;
  theta: number;
  intercept?: number;
  slope?: number;
}

export function simulateTrendArma({ n, seed, phi, theta, intercept = 5, slope = 0.2 }: TrendArmaSpec): Float64Array {
  const draw = seededNormals(seed);
  const y = new Float64Array(n);
  let eta = 0;
  let previousShock = 0;
  for (let t = -200; t < n; t++) {
    const shock = draw();
    eta = phi * eta + shock + theta * previousShock;
    previousShock = shock;
    if (t >= 0) y[t] = intercept + slope * (t + 1) + eta;
  }
  return y;
}
