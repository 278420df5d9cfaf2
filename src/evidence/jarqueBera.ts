// Jarque & Bera (1987) normality test: JB = n/6 · (S² + (K − 3)²/4) from the sample skewness S
// and kurtosis K (moments about the mean with divisor n), chi-square with 2 degrees of freedom.
import { chiSquareCdf } from '../linalg/distributions.js';
import { demean } from '../linalg/autocovariances.js';
import { finiteSeries } from './finiteSeries.js';
import type { JarqueBeraResult } from './types.js';

/** Jarque-Bera statistic, p-value, skewness and (raw) kurtosis of `residuals`. */
export function jarqueBera(residuals: ArrayLike<number>): JarqueBeraResult {
  const series = finiteSeries(residuals, 'jarqueBera');
  const n = series.length;
  if (n < 3) throw new Error('jarqueBera needs at least 3 observations');
  const centred = demean(series);
  let m2 = 0;
  let m3 = 0;
  let m4 = 0;
  for (const e of centred) {
    const e2 = e * e;
    m2 += e2;
    m3 += e2 * e;
    m4 += e2 * e2;
  }
  m2 /= n;
  m3 /= n;
  m4 /= n;
  if (!(m2 > 0)) throw new Error('jarqueBera needs residuals that are not all equal');
  const skewness = m3 / Math.pow(m2, 1.5);
  const kurtosis = m4 / (m2 * m2);
  const stat = (n / 6) * (skewness * skewness + ((kurtosis - 3) * (kurtosis - 3)) / 4);
  return { stat, p_value: 1 - chiSquareCdf(stat, 2), skewness, kurtosis };
}
