// The loess smoother of STL (Cleveland, Cleveland, McRae & Terpenning 1990, §2.1 and §3.1;
// Cleveland & Devlin 1988): at each point a weighted least-squares fit of degree 0 or 1 to the
// `span` nearest observations with tricube neighbourhood weights, optionally multiplied by
// robustness weights. To save work the fit can be computed at every `jump`-th point only and
// linearly interpolated in between (§3.3, "computational considerations"); the last point is
// always fitted. Positions are 1-based, as in the paper, so the window arithmetic reads as
// written there: a span larger than the series widens the neighbourhood by half the excess.
// (Section numbers here and in stlDecomposition.ts are from memory.)

/** A loess smoother's settings: neighbourhood size (odd), local degree and jump. */
export interface LoessSettings {
  span: number;
  degree: 0 | 1;
  jump: number;
}

/**
 * The local fit at position `x` (1-based, may lie outside 1..n to extrapolate) from the
 * observations `left..right`; undefined when every weight is zero. `scratch` holds n weights.
 */
export function loessAt(
  y: ArrayLike<number>,
  n: number,
  settings: Pick<LoessSettings, 'span' | 'degree'>,
  x: number,
  left: number,
  right: number,
  robustness: ArrayLike<number> | null,
  scratch: Float64Array,
): number | undefined {
  let h = Math.max(x - left, right - x);
  if (settings.span > n) h += Math.floor((settings.span - n) / 2);
  const outer = 0.999 * h;
  const inner = 0.001 * h;
  let total = 0;
  for (let j = left; j <= right; j++) {
    const r = Math.abs(j - x);
    let w = 0;
    if (r <= outer) {
      w = r <= inner ? 1 : (1 - (r / h) ** 3) ** 3;
      if (robustness !== null) w *= robustness[j - 1];
    }
    scratch[j - 1] = w;
    total += w;
  }
  if (!(total > 0)) return undefined;
  for (let j = left; j <= right; j++) scratch[j - 1] /= total;
  if (h > 0 && settings.degree > 0) {
    // Local line: the weighted mean position and spread give the tilt of the weights
    // (Cleveland & Devlin 1988); a nearly degenerate spread keeps the local mean.
    let centre = 0;
    for (let j = left; j <= right; j++) centre += scratch[j - 1] * j;
    let spread = 0;
    for (let j = left; j <= right; j++) spread += scratch[j - 1] * (j - centre) ** 2;
    if (Math.sqrt(spread) > 0.001 * (n - 1)) {
      const slope = (x - centre) / spread;
      for (let j = left; j <= right; j++) scratch[j - 1] *= slope * (j - centre) + 1;
    }
  }
  let fit = 0;
  for (let j = left; j <= right; j++) fit += scratch[j - 1] * y[j - 1];
  return fit;
}

/** The loess smooth of y[0..n) at every position, with the jump's linear interpolation. */
export function loessSmooth(
  y: ArrayLike<number>,
  n: number,
  settings: LoessSettings,
  robustness: ArrayLike<number> | null,
): Float64Array {
  const smooth = new Float64Array(n);
  if (n < 2) {
    smooth[0] = y[0];
    return smooth;
  }
  const scratch = new Float64Array(n);
  const { span } = settings;
  const jump = Math.min(settings.jump, n - 1);
  const half = Math.floor((span + 1) / 2);
  let left = 1;
  let right = n;
  const fitAt = (i: number): void => {
    smooth[i - 1] = loessAt(y, n, settings, i, left, right, robustness, scratch) ?? y[i - 1];
  };
  if (span >= n) {
    for (let i = 1; i <= n; i += jump) fitAt(i);
  } else if (jump === 1) {
    right = span;
    for (let i = 1; i <= n; i++) {
      if (i > half && right !== n) {
        left++;
        right++;
      }
      fitAt(i);
    }
  } else {
    for (let i = 1; i <= n; i += jump) {
      if (i < half) {
        left = 1;
        right = span;
      } else if (i >= n - half + 1) {
        left = n - span + 1;
        right = n;
      } else {
        left = i - half + 1;
        right = span + i - half;
      }
      fitAt(i);
    }
  }
  if (jump === 1) return smooth;
  for (let i = 1; i <= n - jump; i += jump) {
    const step = (smooth[i + jump - 1] - smooth[i - 1]) / jump;
    for (let j = i + 1; j < i + jump; j++) smooth[j - 1] = smooth[i - 1] + step * (j - i);
  }
  const lastFitted = Math.floor((n - 1) / jump) * jump + 1;
  if (lastFitted !== n) {
    // The last point is fitted in the neighbourhood of the last jump.
    fitAt(n);
    if (lastFitted !== n - 1) {
      const step = (smooth[n - 1] - smooth[lastFitted - 1]) / (n - lastFitted);
      for (let j = lastFitted + 1; j < n; j++) smooth[j - 1] = smooth[lastFitted - 1] + step * (j - lastFitted);
    }
  }
  return smooth;
}
