// The generalised von Mises distribution VM(p) of Nyblom (1989) and Hansen (1990): the law of
// ∫₀¹ B(r)'B(r) dr for a p-dimensional Brownian bridge B, the limit of the Canova-Hansen
// statistic with p restrictions (Canova & Hansen 1995, Theorem 1). By the Karhunen-Loève
// expansion of the bridge, VM(p) = Σ_k χ²_{p,k} / (k²π²) with independent chi-squares, so its
// characteristic function is the infinite product Π_k (1 − 2it/(k²π²))^{−p/2}, which the
// product formula of the sine closes: φ(t) = (√z / sin √z)^{p/2} with z = 2it (Anderson &
// Darling 1952, §4, for p = 1, the Cramér-von Mises limit). Tail probabilities come from the
// Gil-Pelaez (1951) inversion P(X > x) = ½ + (1/π) ∫₀^∞ Im[e^{−itx} φ(t)] / t dt, integrated by
// 16-point Gauss-Legendre panels until |φ(t)| has fallen below 1e-16.

const RULE = gaussLegendre16();
const NODES: readonly number[] = RULE.nodes;
const WEIGHTS: readonly number[] = RULE.weights;

/**
 * P(X > x) for X ~ VM(p): the asymptotic p-value of a statistic x with p restrictions.
 * Accurate to about 1e-12 absolute.
 */
export function vonMisesUpperTail(x: number, p: number): number {
  if (!Number.isInteger(p) || p < 1) throw new Error('vonMisesUpperTail needs a whole number of restrictions, at least 1');
  if (Number.isNaN(x)) throw new Error('vonMisesUpperTail needs a statistic that is a number');
  if (x <= 0) return 1;
  if (x === Infinity) return 0;
  // |φ(t)| ≤ (√(2t)/sinh √t)^{p/2}: stop where that bound is below 1e-16 relative to 1/t.
  const end = integrationEnd(p);
  // Panels short enough that e^{−itx} turns by at most two radians across each; φ itself
  // turns more slowly (its argument grows like √t).
  const width = Math.min(4, 2 / x);
  let integral = 0;
  let phase = Math.PI / 4;
  for (let start = 0; start < end; start += width) {
    for (let i = 0; i < NODES.length; i++) {
      const t = start + width * NODES[i];
      const value = characteristic(t, p, phase);
      phase = value.phase;
      const angle = value.argument - t * x;
      integral += (WEIGHTS[i] * width * value.modulus * Math.sin(angle)) / t;
    }
  }
  const tail = 0.5 + integral / Math.PI;
  return Math.min(1, Math.max(0, tail));
}

/** Upper quantile: the x with P(X > x) = size, by bisection on the tail (for tables and tests). */
export function vonMisesQuantile(size: number, p: number): number {
  if (!(size > 0 && size < 1)) throw new Error('vonMisesQuantile needs a size between 0 and 1');
  let low = 0;
  let high = 1;
  while (vonMisesUpperTail(high, p) > size) high *= 2;
  for (let i = 0; i < 60 && high - low > 1e-12 * high; i++) {
    const middle = (low + high) / 2;
    if (vonMisesUpperTail(middle, p) > size) low = middle;
    else high = middle;
  }
  return (low + high) / 2;
}

/** t beyond which (√(2t)/sinh √t)^{p/2} / t < 1e-16. */
function integrationEnd(p: number): number {
  let a = 1;
  while ((p / 2) * (Math.log(Math.SQRT2 * a) - Math.log(Math.sinh(a))) - 2 * Math.log(a) > Math.log(1e-16)) a += 0.5;
  return a * a;
}

/**
 * φ(t) = g(t)^{p/2} with g(t) = √z / sin √z, z = 2it, √z = a(1 + i), a = √t, as modulus and
 * argument. The argument of sin √z is carried on continuously from `previousPhase` (it moves by
 * less than a quarter turn between neighbouring nodes), which fixes the branch of the power.
 */
function characteristic(t: number, p: number, previousPhase: number): { modulus: number; argument: number; phase: number } {
  const a = Math.sqrt(t);
  // sin(a + ia) = sin a cosh a + i cos a sinh a
  const re = Math.sin(a) * Math.cosh(a);
  const im = Math.cos(a) * Math.sinh(a);
  let phase = Math.atan2(im, re);
  phase += 2 * Math.PI * Math.round((previousPhase - phase) / (2 * Math.PI));
  const modulus = Math.pow((Math.SQRT2 * a) / Math.hypot(re, im), p / 2);
  const argument = (p / 2) * (Math.PI / 4 - phase);
  return { modulus, argument, phase };
}

/**
 * Nodes and weights of the 16-point Gauss-Legendre rule moved from [−1, 1] to [0, 1]: the roots
 * of P₁₆ by Newton's method from the Chebyshev-like guesses cos(π(i − ¼)/(n + ½)), weights
 * 2 / ((1 − x²) P′₁₆(x)²) (Abramowitz & Stegun 1972, 25.4.29; Press et al. 2007, §4.6).
 */
function gaussLegendre16(): { nodes: number[]; weights: number[] } {
  const n = 16;
  const nodes: number[] = [];
  const weights: number[] = [];
  for (let i = 1; i <= n; i++) {
    let x = Math.cos((Math.PI * (i - 0.25)) / (n + 0.5));
    let derivative = 0;
    for (let iteration = 0; iteration < 100; iteration++) {
      let current = 1;
      let previous = 0;
      for (let k = 1; k <= n; k++) {
        const older = previous;
        previous = current;
        current = ((2 * k - 1) * x * previous - (k - 1) * older) / k;
      }
      derivative = (n * (x * current - previous)) / (x * x - 1);
      const step = current / derivative;
      x -= step;
      if (Math.abs(step) < 1e-16) break;
    }
    nodes.push((1 - x) / 2);
    weights.push(1 / ((1 - x * x) * derivative * derivative));
  }
  return { nodes, weights };
}
