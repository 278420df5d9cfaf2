// Continuous ranked probability score of a Gaussian predictive distribution, in closed form
// (Gneiting, Raftery, Westveld & Goldman 2005, eq. 5):
//   CRPS(N(μ, σ²), y) = σ [ z (2Φ(z) − 1) + 2φ(z) − 1/√π ],  z = (y − μ)/σ,
// the integral ∫ (F(x) − 1{x ≥ y})² dx. Lower is better; it has the units of y.
import { normalCdf } from '../linalg/distributions.js';

const INV_SQRT_PI = 1 / Math.sqrt(Math.PI);
const INV_SQRT_2PI = 1 / Math.sqrt(2 * Math.PI);

/** CRPS of N(mean, sd²) at the outcome y; with sd = 0 it is the absolute error. */
export function gaussianCrps(mean: number, sd: number, y: number): number {
  if (!(sd >= 0)) throw new RangeError('gaussianCrps needs a non-negative standard deviation');
  if (sd === 0) return Math.abs(y - mean);
  const z = (y - mean) / sd;
  const density = INV_SQRT_2PI * Math.exp(-0.5 * z * z);
  return sd * (z * (2 * normalCdf(z) - 1) + 2 * density - INV_SQRT_PI);
}
