// Default number of residual autocorrelations to test and show. Non-seasonal data (period 1):
// min(10, floor(n/5)), a common-practice choice that keeps each lag's estimate on at least 4n/5
// products. Seasonal data (period s = 4 or 12): at least two full cycles of lags, so that the
// autocorrelations at lags s and 2s, where a missed seasonal pattern shows, are tested too
// (common practice in checking seasonal models): max(min(10, floor(n/5)), min(2s, floor(n/2))).
// A series shorter than four cycles is tested to half its length, so each autocorrelation
// still rests on at least n/2 products.

/** Lags for n residuals of a series with `period` observations per year (default 1). */
export function defaultAcfLags(n: number, period = 1): number {
  if (!Number.isInteger(period) || period < 1) throw new Error('defaultAcfLags needs a whole period of at least 1');
  const nonSeasonal = Math.min(10, Math.floor(n / 5));
  if (period === 1) return nonSeasonal;
  return Math.max(nonSeasonal, Math.min(2 * period, Math.floor(n / 2)));
}
