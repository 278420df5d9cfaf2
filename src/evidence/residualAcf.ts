// Sample autocorrelations of residuals, r_k = c_k / c_0 with the divisor-n autocovariances
// of the demeaned series, and the ±1.96/√n band inside which about 95% of them fall when the
// residuals are white noise (Bartlett 1946; Box & Jenkins, common practice).
import { autocovariances, demean } from '../linalg/autocovariances.js';
import { defaultAcfLags } from './defaultAcfLags.js';
import { finiteSeries } from './finiteSeries.js';
import type { AcfResult } from './types.js';

/**
 * Autocorrelations at lags 1..lags with their white-noise band; by default `defaultAcfLags(n,
 * period)` lags, min(10, floor(n/5)) for non-seasonal data (period 1).
 */
export function residualAcf(residuals: ArrayLike<number>, options: { lags?: number; period?: number } = {}): AcfResult {
  const series = finiteSeries(residuals, 'residualAcf');
  const n = series.length;
  const lags = options.lags ?? defaultAcfLags(n, options.period);
  return { ...autocorrelations(series, lags, 'residualAcf'), bound: 1.96 / Math.sqrt(n) };
}

/** Lags 1..lags and r_k for them; shared with the Ljung-Box statistic. */
export function autocorrelations(
  series: Float64Array,
  lags: number,
  caller: string,
): Pick<AcfResult, 'lag' | 'acf'> {
  if (!Number.isInteger(lags) || lags < 1) throw new Error(`${caller} needs a whole number of lags, at least 1`);
  if (lags >= series.length) throw new Error(`${caller} needs more observations than lags`);
  const c = autocovariances(demean(series), lags);
  if (!(c[0] > 0)) throw new Error(`${caller} needs residuals that are not all equal`);
  const lag = Array.from({ length: lags }, (_, i) => i + 1);
  return { lag, acf: lag.map((k) => c[k] / c[0]) };
}
