// Default number of residual autocorrelations to test and show: min(10, floor(n/5)), a
// common-practice choice that keeps each lag's estimate on at least 4n/5 products.

/** min(10, floor(n/5)) for n residuals. */
export function defaultAcfLags(n: number): number {
  return Math.min(10, Math.floor(n / 5));
}
