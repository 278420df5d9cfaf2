// Approximate asymptotic p-values of the Dickey-Fuller τ statistic for one variable (N = 1),
// MacKinnon (1994), "Approximate asymptotic distribution functions for unit-root and
// cointegration tests", JBES 12(2): p = Φ(γ₀ + γ₁τ + γ₂τ² [+ γ₃τ³]), with a quadratic fitted
// to the lower tail (Table 3, "small p") and a cubic to the rest (Table 4, "large p"),
// switching at τ*, and p fixed at 0 below τ_min and 1 above τ_max.
// The coefficients were typed in from memory of the published tables; they are checked
// against statsmodels 0.13.5 `mackinnonp` p-values and Stata's values in the tests.
import { normalCdf } from '../linalg/distributions.js';
import { polynomial } from './polynomial.js';
import type { AdfResult } from './types.js';

interface SurfaceCoefficients {
  smallP: readonly number[];
  largeP: readonly number[];
  tauStar: number;
  tauMin: number;
  tauMax: number;
}

const SURFACES: Record<AdfResult['regression'], SurfaceCoefficients> = {
  constant: {
    smallP: [2.1659, 1.4412, 0.038269],
    largeP: [1.7339, 0.93202, -0.12745, -0.010368],
    tauStar: -1.61,
    tauMin: -18.83,
    tauMax: 2.74,
  },
  trend: {
    smallP: [3.2512, 1.6047, 0.049588],
    largeP: [2.5261, 0.61654, -0.37956, -0.060285],
    tauStar: -2.89,
    tauMin: -16.18,
    tauMax: 0.7,
  },
};

/** MacKinnon (1994) approximate p-value of an ADF statistic. */
export function mackinnonPValue(stat: number, regression: AdfResult['regression']): number {
  if (Number.isNaN(stat)) throw new Error('mackinnonPValue needs a statistic that is a number');
  const surface = SURFACES[regression];
  if (stat > surface.tauMax) return 1;
  if (stat < surface.tauMin) return 0;
  const coefficients = stat <= surface.tauStar ? surface.smallP : surface.largeP;
  return normalCdf(polynomial(coefficients, stat));
}
