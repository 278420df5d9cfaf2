// Finite-sample critical values of the Dickey-Fuller τ statistic for one variable (N = 1),
// MacKinnon (2010), "Critical values for cointegration tests", Queen's Economics Department
// Working Paper 1227, Table 2: c(T) = β∞ + β₁/T + β₂/T² + β₃/T³, T the test regression's rows.
// Typed in from memory of the published table; checked in the tests against the paper's own
// T = 100 values and statsmodels 0.13.5 `mackinnoncrit`.
import { polynomial } from './polynomial.js';
import type { AdfCritical, AdfResult } from './types.js';

type Surface = readonly [number, number, number, number];

const SURFACES: Record<AdfResult['regression'], Record<keyof AdfCritical, Surface>> = {
  constant: {
    '1': [-3.43035, -6.5393, -16.786, -79.433],
    '5': [-2.86154, -2.8903, -4.234, -40.04],
    '10': [-2.56677, -1.5384, -2.809, 0],
  },
  trend: {
    '1': [-3.95877, -9.0531, -28.428, -134.155],
    '5': [-3.41049, -4.3904, -9.036, -45.374],
    '10': [-3.12705, -2.5856, -3.925, -22.38],
  },
};

/** 1%, 5% and 10% critical values for a test regression with `nobs` rows. */
export function mackinnonCritical(regression: AdfResult['regression'], nobs: number): AdfCritical {
  if (!(nobs > 0)) throw new Error('mackinnonCritical needs a positive number of observations');
  const surfaces = SURFACES[regression];
  const inverseT = 1 / nobs;
  return {
    '1': polynomial(surfaces['1'], inverseT),
    '5': polynomial(surfaces['5'], inverseT),
    '10': polynomial(surfaces['10'], inverseT),
  };
}
