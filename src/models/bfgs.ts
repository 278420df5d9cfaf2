// Quasi-Newton minimisation: BFGS with a backtracking Armijo line search and forward-
// difference gradients, or the caller's gradient where it has one (Nocedal & Wright 2006,
// Algorithm 6.1 and §8.1). The objective may
// return NaN or ±Infinity for infeasible points; the line search treats those as +∞.

export type Objective = (x: Float64Array) => number;

export interface MinimizeOptions {
  /** Stop when every gradient component is below this (objective units per unit x). */
  gradientTolerance?: number;
  maxIterations?: number;
  /** Largest step in the unconstrained space, to keep the first steps from overshooting. */
  maxStep?: number;
  /**
   * The objective's gradient at x (where the objective was just evaluated, with value fx) into
   * `out`; false where it cannot be had, and forward differences are used instead.
   */
  gradient?: (x: Float64Array, fx: number, out: Float64Array) => boolean;
  /**
   * An inverse Hessian to start from (k×k, row-major), e.g. the one a neighbouring problem's
   * run ended with; the identity, scaled after the first step, when absent.
   */
  inverseHessian?: Float64Array;
}

export interface MinimizeResult {
  x: Float64Array;
  value: number;
  gradientNorm: number;
  iterations: number;
  evaluations: number;
  converged: boolean;
  /** The inverse-Hessian approximation at the end (k×k, row-major). */
  inverseHessian: Float64Array;
}

const ARMIJO = 1e-4;
const STALL_GRADIENT = 1e-4;
/** Iterations over which the decrease is measured, and the relative decrease that counts as none. */
const STALL_WINDOW = 5;
const STALL_DECREASE = 1e-10;

export function minimizeBfgs(objective: Objective, start: ArrayLike<number>, options: MinimizeOptions = {}): MinimizeResult {
  const gtol = options.gradientTolerance ?? 1e-6;
  const maxIterations = options.maxIterations ?? 200;
  const maxStep = options.maxStep ?? 5;
  const k = start.length;
  let evaluations = 0;
  const evaluate = (point: Float64Array): number => {
    evaluations++;
    const value = objective(point);
    return Number.isFinite(value) ? value : Number.POSITIVE_INFINITY;
  };

  const x = Float64Array.from(start);
  let fx = evaluate(x);
  if (k === 0 || !Number.isFinite(fx)) {
    return { x, value: fx, gradientNorm: 0, iterations: 0, evaluations, converged: k === 0 && Number.isFinite(fx), inverseHessian: identity(k) };
  }
  const grad = new Float64Array(k);
  const nextGrad = new Float64Array(k);
  const direction = new Float64Array(k);
  const trial = new Float64Array(k);
  const s = new Float64Array(k);
  const yv = new Float64Array(k);
  const hy = new Float64Array(k);
  const hinv = new Float64Array(k * k);
  const given = options.inverseHessian;
  const warm = given !== undefined && given.length === k * k;
  if (warm) hinv.set(given);
  else resetIdentity(hinv, k);
  const gradientAt = (point: Float64Array, value: number, out: Float64Array): void => {
    if (options.gradient !== undefined && options.gradient(point, value, out)) return;
    forwardGradient(evaluate, point, value, out);
  };
  gradientAt(x, fx, grad);
  let gnorm = maxAbs(grad);
  let iterations = 0;
  let freshHessian = !warm;
  let stalled = false;
  const history = new Float64Array(STALL_WINDOW).fill(Number.POSITIVE_INFINITY);

  while (gnorm > gtol && iterations < maxIterations) {
    iterations++;
    for (let i = 0; i < k; i++) {
      let sum = 0;
      for (let j = 0; j < k; j++) sum -= hinv[i * k + j] * grad[j];
      direction[i] = sum;
    }
    let slope = dot(direction, grad);
    if (!(slope < 0)) {
      resetIdentity(hinv, k);
      for (let i = 0; i < k; i++) direction[i] = -grad[i];
      slope = -dot(grad, grad);
      freshHessian = true;
    }
    const length = Math.sqrt(dot(direction, direction));
    let step = length > maxStep ? maxStep / length : 1;
    let ftrial = Number.POSITIVE_INFINITY;
    let accepted = false;
    for (let attempt = 0; attempt < 40; attempt++) {
      for (let i = 0; i < k; i++) trial[i] = x[i] + step * direction[i];
      ftrial = evaluate(trial);
      if (ftrial <= fx + ARMIJO * step * slope) {
        accepted = true;
        break;
      }
      // Quadratic interpolation of the decrease, safeguarded to [0.1, 0.5] of the step.
      const quadratic = Number.isFinite(ftrial) ? (-slope * step * step) / (2 * (ftrial - fx - slope * step)) : 0.1 * step;
      step = Math.min(0.5 * step, Math.max(0.1 * step, quadratic));
    }
    if (!accepted) {
      if (freshHessian) {
        stalled = true;
        break;
      }
      resetIdentity(hinv, k);
      freshHessian = true;
      continue;
    }
    gradientAt(trial, ftrial, nextGrad);
    for (let i = 0; i < k; i++) {
      s[i] = trial[i] - x[i];
      yv[i] = nextGrad[i] - grad[i];
    }
    const sy = dot(s, yv);
    history[iterations % STALL_WINDOW] = ftrial;
    x.set(trial);
    grad.set(nextGrad);
    fx = ftrial;
    gnorm = maxAbs(grad);
    if (sy > 1e-12 * Math.sqrt(dot(s, s) * dot(yv, yv))) {
      if (freshHessian) {
        // Nocedal & Wright (6.20): scale the first inverse-Hessian guess.
        const scale = sy / dot(yv, yv);
        for (let i = 0; i < k * k; i++) hinv[i] *= scale;
      }
      updateInverseHessian(hinv, s, yv, hy, sy, k);
      freshHessian = false;
    }
    // Stop on a ridge: over the last few iterations the objective has stopped moving.
    const older = history[(iterations + 1) % STALL_WINDOW];
    if (iterations >= STALL_WINDOW && older - fx <= STALL_DECREASE * (1 + Math.abs(fx))) {
      stalled = true;
      break;
    }
  }
  // A stall at a small gradient is the forward-difference noise floor, not a failure.
  const converged = gnorm <= gtol || (stalled && gnorm <= STALL_GRADIENT);
  return { x, value: fx, gradientNorm: gnorm, iterations, evaluations, converged, inverseHessian: hinv };
}

/** Forward differences with a step scaled to each coordinate (backward where forward is infeasible). */
function forwardGradient(evaluate: (x: Float64Array) => number, x: Float64Array, fx: number, out: Float64Array): void {
  const k = x.length;
  for (let i = 0; i < k; i++) {
    const xi = x[i];
    const h = 1e-7 * Math.max(1, Math.abs(xi));
    x[i] = xi + h;
    let fh = evaluate(x);
    if (Number.isFinite(fh)) {
      out[i] = (fh - fx) / h;
    } else {
      x[i] = xi - h;
      fh = evaluate(x);
      out[i] = (fx - fh) / h;
    }
    x[i] = xi;
  }
}

/** H ← (I − ρ s y') H (I − ρ y s') + ρ s s', ρ = 1 / y's. */
function updateInverseHessian(hinv: Float64Array, s: Float64Array, y: Float64Array, hy: Float64Array, sy: number, k: number): void {
  const rho = 1 / sy;
  for (let i = 0; i < k; i++) {
    let sum = 0;
    for (let j = 0; j < k; j++) sum += hinv[i * k + j] * y[j];
    hy[i] = sum;
  }
  const yhy = dot(y, hy);
  const factor = (1 + rho * yhy) * rho;
  for (let i = 0; i < k; i++) {
    for (let j = 0; j < k; j++) {
      hinv[i * k + j] += factor * s[i] * s[j] - rho * (hy[i] * s[j] + s[i] * hy[j]);
    }
  }
}

function identity(k: number): Float64Array {
  const matrix = new Float64Array(k * k);
  resetIdentity(matrix, k);
  return matrix;
}

function resetIdentity(matrix: Float64Array, k: number): void {
  matrix.fill(0);
  for (let i = 0; i < k; i++) matrix[i * k + i] = 1;
}

function dot(a: Float64Array, b: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < a.length; i++) sum += a[i] * b[i];
  return sum;
}

function maxAbs(a: Float64Array): number {
  let best = 0;
  for (let i = 0; i < a.length; i++) best = Math.max(best, Math.abs(a[i]));
  return best;
}
