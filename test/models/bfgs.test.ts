// The quasi-Newton minimiser (src/models/bfgs.ts) on textbook problems, and the curvature a
// warm start carries (the inverse Hessian a neighbouring fit ended with) on a seasonal fit of
// the Nottingham temperatures (test/fixtures/seasonal-models/, provenance in
// test/fixtures/README.md).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { minimizeBfgs } from '../../src/models/bfgs.js';
import { fitRegressionArma } from '../../src/models/fitRegressionArma.js';
import { trendDesign } from '../../src/models/trendDesign.js';

describe('BFGS on textbook problems', () => {
  // f(x) = ½ x'Ax − b'x has its minimum at A⁻¹b; started from the exact inverse Hessian A⁻¹ the
  // first direction is the Newton step, and on a quadratic the whole Newton step passes the
  // Armijo test for any constant below ½ (Nocedal & Wright 2006, §3.1; from memory).
  const a = [4, 1, 1, 3];
  const b = [1, 2];
  const quadratic = (x: Float64Array): number => 0.5 * (a[0] * x[0] * x[0] + 2 * a[1] * x[0] * x[1] + a[3] * x[1] * x[1]) - b[0] * x[0] - b[1] * x[1];
  const exact = (x: Float64Array, _fx: number, out: Float64Array): boolean => {
    out[0] = a[0] * x[0] + a[1] * x[1] - b[0];
    out[1] = a[2] * x[0] + a[3] * x[1] - b[1];
    return true;
  };
  const det = a[0] * a[3] - a[1] * a[2];
  const inverse = Float64Array.from([a[3] / det, -a[1] / det, -a[2] / det, a[0] / det]);
  const solution = [(a[3] * b[0] - a[1] * b[1]) / det, (a[0] * b[1] - a[2] * b[0]) / det];

  it('takes the Newton step in one iteration from the exact inverse Hessian', () => {
    const result = minimizeBfgs(quadratic, [3, -2], { gradient: exact, inverseHessian: inverse });
    expect(result.iterations).toBe(1);
    expect(result.x[0]).toBeCloseTo(solution[0], 12);
    expect(result.x[1]).toBeCloseTo(solution[1], 12);
  });

  it('needs more iterations from the identity, and ends at the same point with its curvature learnt', () => {
    const result = minimizeBfgs(quadratic, [3, -2], { gradient: exact });
    expect(result.iterations).toBeGreaterThan(1);
    expect(result.converged).toBe(true);
    expect(result.x[0]).toBeCloseTo(solution[0], 6);
    expect(result.x[1]).toBeCloseTo(solution[1], 6);
    // BFGS's update reproduces the inverse Hessian of a quadratic along the steps it took.
    for (let i = 0; i < 4; i++) expect(result.inverseHessian[i]).toBeCloseTo(inverse[i], 2);
  });

  // Rosenbrock (1960); (−1.2, 1) is the usual start (Moré, Garbow & Hillstrom 1981, problem 1; from memory).
  it('minimises the Rosenbrock function from (−1.2, 1)', () => {
    const rosenbrock = (x: Float64Array): number => 100 * (x[1] - x[0] * x[0]) ** 2 + (1 - x[0]) ** 2;
    const gradient = (x: Float64Array, _fx: number, out: Float64Array): boolean => {
      out[0] = -400 * x[0] * (x[1] - x[0] * x[0]) - 2 * (1 - x[0]);
      out[1] = 200 * (x[1] - x[0] * x[0]);
      return true;
    };
    const result = minimizeBfgs(rosenbrock, [-1.2, 1], { maxIterations: 500, gradient });
    expect(result.x[0]).toBeCloseTo(1, 4);
    expect(result.x[1]).toBeCloseTo(1, 4);
    expect(result.value).toBeLessThan(1e-8);
  });
});

describe('a warm start with its curvature', () => {
  const text = readFileSync(new URL('../fixtures/seasonal-models/nottingham-temperature.csv', import.meta.url), 'utf8');
  const w = Float64Array.from(text.trim().split('\n').slice(1), (line) => Number(line.split(',')[1]));
  const seasonal = { period: 12, P: 1, Q: 1 };
  const designOf = (length: number) => trendDesign('deterministic', w.subarray(0, length), { period: 12, firstSeason: 0, harmonics: 0, seasonalDifferencing: false });

  it('reaches the cold fit\'s optimum one observation on, in fewer evaluations than from the same point without it', () => {
    const shorter = designOf(w.length - 1);
    const neighbour = fitRegressionArma(shorter.response, shorter.regressors, 1, 1, { seasonal });
    const design = designOf(w.length);
    const cold = fitRegressionArma(design.response, design.regressors, 1, 1, { seasonal });
    const warm = fitRegressionArma(design.response, design.regressors, 1, 1, { seasonal, starts: [neighbour.unconstrained], startsOnly: true, curvature: neighbour.inverseHessian });
    const flat = fitRegressionArma(design.response, design.regressors, 1, 1, { seasonal, starts: [neighbour.unconstrained], startsOnly: true });
    expect(warm.converged).toBe(true);
    expect(Math.abs(warm.loglik - cold.loglik)).toBeLessThan(1e-6);
    expect(Math.abs(flat.loglik - cold.loglik)).toBeLessThan(1e-6);
    expect(warm.evaluations).toBeLessThan(flat.evaluations);
  });
});
