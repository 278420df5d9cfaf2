// A cheap reading of a series' seasonal strength for `check`: the STL strength the evidence
// stage reports (src/evidence/seasonalStrength.ts), on the modelling scale, without fitting
// any model. Only for a complete monthly or quarterly series with two full cycles or more.
import type { Series } from '../base/series.js';
import { periodsPerYear } from '../base/period.js';
import type { Transform } from '../base/settings.js';
import { transformValue } from '../base/transform.js';
import { seasonalStrength } from '../evidence/seasonalStrength.js';

/**
 * The STL seasonal strength F_S from 0 to 1 of `series` on the modelling scale; null for
 * annual data, fewer than two full cycles, or missing values (which STL does not take).
 */
export function seasonalStrengthOf(series: Pick<Series, 'values' | 'frequency'>, transform: Transform): number | null {
  const period = periodsPerYear(series.frequency);
  if (period <= 1 || series.values.length < 2 * period) return null;
  const w = series.values.map((y) => transformValue(transform, y));
  if (w.some((v) => !Number.isFinite(v))) return null;
  return seasonalStrength(w, period).strength.seasonal;
}
