// Every test in this stage copies its input first, so a caller's array is never changed and
// a missing value fails loudly instead of turning every statistic into NaN.

/** Copies `values` into a Float64Array, throwing (naming `caller`) on any non-finite value. */
export function finiteSeries(values: ArrayLike<number>, caller: string): Float64Array {
  const copy = Float64Array.from(values);
  for (let i = 0; i < copy.length; i++) {
    if (!Number.isFinite(copy[i])) {
      throw new Error(`${caller} needs finite values; position ${i} is ${copy[i]}`);
    }
  }
  return copy;
}
