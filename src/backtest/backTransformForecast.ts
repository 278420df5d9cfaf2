// From a Gaussian predictive on the model scale, N(mean, se²), to the data's scale: interval
// limits are the back-transformed quantiles (a monotone transform keeps quantiles), the point
// is the back-transformed median or the bias-adjusted mean — the same rules as the main
// analysis (src/models/transform.ts).
import { normalInv } from '../linalg/distributions.js';
import { biasAdjustedMean, inverseTransform, type TransformSpec } from '../models/transform.js';

/** The central `level`% interval (level in percent) on the data's scale. */
export function centralInterval(transform: TransformSpec, mean: number, se: number, level: number): [number, number] {
  const z = normalInv(0.5 + level / 200);
  return [inverseTransform(transform, mean - z * se), inverseTransform(transform, mean + z * se)];
}

export interface DataScaleForecast {
  point: number;
  intervals: Record<string, [number, number]>;
}

export function backTransformForecast(
  transform: TransformSpec,
  point: 'median' | 'mean',
  levels: readonly number[],
  mean: number,
  se: number,
): DataScaleForecast {
  const intervals: Record<string, [number, number]> = {};
  for (const level of levels) intervals[String(level)] = centralInterval(transform, mean, se, level);
  return { point: point === 'mean' ? biasAdjustedMean(transform, mean, se) : inverseTransform(transform, mean), intervals };
}
