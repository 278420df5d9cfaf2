// Asymptotic critical values of the KPSS statistic, Kwiatkowski, Phillips, Schmidt & Shin
// (1992), Table 1: η_μ for level-stationarity, η_τ for trend-stationarity, by upper-tail size.
import type { KpssCritical, KpssResult } from './types.js';

const SIZES = [0.1, 0.05, 0.025, 0.01] as const;

const CRITICAL: Record<KpssResult['regression'], readonly number[]> = {
  level: [0.347, 0.463, 0.574, 0.739],
  trend: [0.119, 0.146, 0.176, 0.216],
};

/** Table 1's critical values for the regression, keyed by size in percent. */
export function kpssCritical(regression: KpssResult['regression']): KpssCritical {
  const [ten, five, twoHalf, one] = CRITICAL[regression];
  return { '10': ten, '5': five, '2.5': twoHalf, '1': one };
}

/**
 * p-value by linear interpolation between Table 1's entries. Outside the table the p-value
 * is reported at the nearest edge with `p_bound` saying which side the true value lies on.
 */
export function kpssPValue(
  stat: number,
  regression: KpssResult['regression'],
): Pick<KpssResult, 'p_value' | 'p_bound'> {
  const critical = CRITICAL[regression];
  const last = critical.length - 1;
  if (stat < critical[0]) return { p_value: SIZES[0], p_bound: 'above' };
  if (stat > critical[last]) return { p_value: SIZES[last], p_bound: 'below' };
  let i = 0;
  while (i < last - 1 && stat > critical[i + 1]) i++;
  const weight = (stat - critical[i]) / (critical[i + 1] - critical[i]);
  return { p_value: SIZES[i] + weight * (SIZES[i + 1] - SIZES[i]) };
}
