// Distribution functions from @stdlib, behind one small module so the rest of the code
// never hand-rolls an approximation and the imports stay in one place.
import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import normalCdfFn from '@stdlib/stats-base-dists-normal-cdf';
import tCdfFn from '@stdlib/stats-base-dists-t-cdf';
import chisquareCdfFn from '@stdlib/stats-base-dists-chisquare-cdf';

/** Standard normal quantile Φ⁻¹(p). */
export function normalInv(p: number): number {
  return normalQuantile(p, 0, 1);
}

/** Standard normal CDF Φ(x). */
export function normalCdf(x: number): number {
  return normalCdfFn(x, 0, 1);
}

/** Student t CDF with `df` degrees of freedom. */
export function studentTCdf(x: number, df: number): number {
  return tCdfFn(x, df);
}

/** Chi-square CDF with `df` degrees of freedom. */
export function chiSquareCdf(x: number, df: number): number {
  return chisquareCdfFn(x, df);
}
