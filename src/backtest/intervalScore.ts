// Interval score of a central (1 − α) prediction interval [l, u] at the outcome y
// (Gneiting & Raftery 2007, §6.2, eq. 43):
//   S_α(l, u; y) = (u − l) + (2/α)(l − y)·1{y < l} + (2/α)(y − u)·1{y > u}.
// Width is rewarded, misses are penalised in proportion to their distance; lower is better.

/** Interval score of [lower, upper] at a level in percent (e.g. 95, so α = 0.05). */
export function intervalScore(lower: number, upper: number, level: number, y: number): number {
  if (!(level > 0 && level < 100)) throw new RangeError('intervalScore needs a level strictly between 0 and 100 percent');
  const alpha = 1 - level / 100;
  let score = upper - lower;
  if (y < lower) score += (2 / alpha) * (lower - y);
  if (y > upper) score += (2 / alpha) * (y - upper);
  return score;
}
