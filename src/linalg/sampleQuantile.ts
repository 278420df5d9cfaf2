// Quantiles of a sample: linear interpolation between order statistics, the definition
// Hyndman & Fan (1996) number 7 (R's default, numpy's 'linear').

/** The p-quantile (0 ≤ p ≤ 1) of `sorted`, which must be in ascending order and not empty. */
export function sampleQuantile(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) throw new RangeError('sampleQuantile needs at least one value');
  if (!(p >= 0 && p <= 1)) throw new RangeError(`sampleQuantile needs 0 ≤ p ≤ 1, got ${p}`);
  const position = (n - 1) * p;
  const below = Math.floor(position);
  const above = Math.min(below + 1, n - 1);
  const fraction = position - below;
  // Written so that an infinite order statistic (a Box-Cox inverse that ran off its range) is kept, not turned into NaN.
  return fraction === 0 || sorted[above] === sorted[below] ? sorted[below] : sorted[below] + fraction * (sorted[above] - sorted[below]);
}
