import { describe, expect, it } from 'vitest';
import { gaussianCrps } from '../../src/backtest/gaussianCrps.js';
import { normalCdf } from '../../src/linalg/distributions.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { scoreReference } from './scoreReference.js';

/** ∫ (F(x) − 1{x ≥ y})² dx by composite Simpson on each side of y, over ±12 sd. */
function crpsByIntegration(mean: number, sd: number, y: number): number {
  const simpson = (a: number, b: number, f: (x: number) => number): number => {
    const steps = 20000;
    const width = (b - a) / steps;
    let sum = f(a) + f(b);
    for (let i = 1; i < steps; i++) sum += (i % 2 === 1 ? 4 : 2) * f(a + i * width);
    return (sum * width) / 3;
  };
  const cdf = (x: number): number => normalCdf((x - mean) / sd);
  const low = Math.min(y, mean - 12 * sd);
  const high = Math.max(y, mean + 12 * sd);
  return simpson(low, y, (x) => cdf(x) ** 2) + simpson(y, high, (x) => (1 - cdf(x)) ** 2);
}

describe('gaussianCrps', () => {
  it('matches the closed form of Gneiting et al. (2005) at the published points', () => {
    // (√2 − 1)/√π: the closed form at N(0, 1), y = 0, evaluated with scipy 1.10.
    expectRelative(gaussianCrps(0, 1, 0), 0.23369497725510913, 1e-14);
    // N(0.1, 0.4²), y = 0: the closed form evaluated with scipy 1.10, equal to quadrature to 1e-15.
    expectRelative(gaussianCrps(0.1, 0.4, 0), 0.10339992515976167, 1e-14);
  });

  it('matches scipy quadrature of the defining integral', () => {
    // test/fixtures/backtest/scoreReference.json: scipy 1.10.1 integrate.quad, epsrel 1e-13.
    for (const { mean, sd, y, crps } of scoreReference.crps) expectRelative(gaussianCrps(mean, sd, y), crps, 1e-10);
  });

  it('matches our own Simpson integration of (F(x) − 1{x ≥ y})²', () => {
    for (const [mean, sd, y] of [
      [0, 1, 0],
      [0.1, 0.4, 0],
      [3, 2, -1.5],
      [578.2, 0.85, 580.1],
    ]) {
      expectRelative(gaussianCrps(mean, sd, y), crpsByIntegration(mean, sd, y), 1e-9);
    }
  });

  it('reduces to the absolute error for a point forecast and rejects a negative sd', () => {
    // CRPS of a point mass is |y − x| (Gneiting & Raftery 2007, §4.2).
    expect(gaussianCrps(2, 0, 5.5)).toBe(3.5);
    expect(() => gaussianCrps(0, -1, 0)).toThrow(/non-negative standard deviation/);
  });
});
