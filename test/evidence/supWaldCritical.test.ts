// The critical values of both break tests against a seeded simulation of their limiting null
// distributions (supWaldLimit.ts): Andrews' sup ‖B(π) − πB(1)‖² / (π(1 − π)) for p = 1, 2 from
// the same 10000 Brownian paths, and the level-and-slope trend break from 5000 white-noise
// series, each on a grid of 1000 steps.
//
// Tolerance: a sup over a grid falls short of the continuous sup, and a tabulated value is the
// quantile over some grid at least as fine as ours (Andrews' own values were simulated on a
// grid too). So each value must lie between the quantile on our grid, taken 3 binomial
// standard deviations of the rank low, and the quantile extrapolated to a continuous sup,
// taken 3 standard deviations high; the rank band covers the Monte Carlo error. The band
// spans about ±4.5% of the value at 10% and ±5.5% to ±7% at 1%.
import { beforeAll, describe, expect, it } from 'vitest';
import { andrewsCritical } from '../../src/evidence/andrewsCritical.js';
import { trendBreakCritical } from '../../src/evidence/trendBreakCritical.js';
import type { SupWaldCritical } from '../../src/evidence/types.js';
import { seededNormals } from './seededNormals.js';
import { bridgeSupDraws, trendBreakSupDraws, upperQuantiles, type SupDraws } from './supWaldLimit.js';

const SIZES = ['10', '5', '1'] as const;

function expectWithinSimulation(critical: SupWaldCritical, draws: SupDraws): void {
  for (const size of SIZES) {
    const level = Number(size) / 100;
    const low = upperQuantiles(draws, level, -3).grid;
    const high = upperQuantiles(draws, level, 3).continuous;
    expect(critical[size], `${size}% value`).toBeGreaterThanOrEqual(low);
    expect(critical[size], `${size}% value`).toBeLessThanOrEqual(high);
  }
}

describe('Andrews (1993) Table 1, π0 = 0.15, against a simulation of the limit', () => {
  let bridge: SupDraws[] = [];
  beforeAll(() => {
    bridge = bridgeSupDraws(seededNormals(7), 2, { steps: 1000, replications: 10_000, coarsen: 4 });
  });

  it('1 restriction: 7.12, 8.68, 12.16 at 10%, 5%, 1% (typed from memory)', () => {
    expect(andrewsCritical(1)).toEqual({ '10': 7.12, '5': 8.68, '1': 12.16 });
    expectWithinSimulation(andrewsCritical(1), bridge[0]);
  });

  it('2 restrictions: 10.00, 11.72, 15.56 at 10%, 5%, 1% (typed from memory)', () => {
    expect(andrewsCritical(2)).toEqual({ '10': 10.0, '5': 11.72, '1': 15.56 });
    expectWithinSimulation(andrewsCritical(2), bridge[1]);
  });

  it('the grid bias is downward: the extrapolated quantile exceeds the grid quantile', () => {
    expect(bridge).toHaveLength(2);
    for (const draws of bridge) {
      for (const size of SIZES) {
        const { grid, continuous } = upperQuantiles(draws, Number(size) / 100);
        expect(continuous).toBeGreaterThan(grid);
      }
    }
  });

  it('has no values beyond 2 restrictions', () => {
    expect(() => andrewsCritical(3)).toThrow(/andrewsCritical has values for 1 to 2 restrictions/);
    expect(() => andrewsCritical(1.5)).toThrow(/andrewsCritical/);
  });
});

describe('level-and-slope trend break, π0 = 0.15, against a simulation of its limit', () => {
  it('11.23, 12.95, 16.67 at 10%, 5%, 1% (derived by simulation, supWaldCritical.ts)', () => {
    expect(trendBreakCritical()).toEqual({ '10': 11.23, '5': 12.95, '1': 16.67 });
    expectWithinSimulation(trendBreakCritical(), trendBreakSupDraws(seededNormals(8), { steps: 1000, replications: 5000, coarsen: 4 }));
  });

  it('lies above Andrews’ 2-restriction values at every size (Vogelsang 1997: trending regressors change the limit)', () => {
    const trendValues = trendBreakCritical();
    const andrews = andrewsCritical(2);
    for (const size of SIZES) expect(trendValues[size]).toBeGreaterThan(andrews[size] * 1.05);
  });
});
