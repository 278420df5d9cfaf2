import { describe, expect, it } from 'vitest';
import { availableOrigins, planOrigins } from '../../src/backtest/planOrigins.js';

// Expected origins from the definition in the issue: T = n − B − K + 1 .. n − B, step 1.
describe('planOrigins', () => {
  it('takes the last K training lengths that leave all B horizons to score', () => {
    // Lake Huron, n = 98, K = 20, B = 5: training lengths 74..93 (the reference backtest).
    const plan = planOrigins(98, { horizon: 5, origins: 20, step: 1, window: 'expanding', minTrainingLength: 27 });
    expect(plan.origins.map((o) => o.end)).toEqual(Array.from({ length: 20 }, (_, i) => 74 + i));
    expect(plan.origins.every((o) => o.start === 0)).toBe(true);
    expect(plan).toMatchObject({ requested: 20, available: 67 });
  });

  it('cuts origins at the minimum training length and says how many were possible', () => {
    // n = 40, B = 5, minimum 27: ends 27..35, 9 origins of the 20 asked for by default.
    const plan = planOrigins(40, { horizon: 5, origins: 20, step: 1, window: 'expanding', minTrainingLength: 27 });
    expect(plan.origins.map((o) => o.end)).toEqual([27, 28, 29, 30, 31, 32, 33, 34, 35]);
    expect(plan).toMatchObject({ requested: 20, available: 9 });
    expect(availableOrigins(31, { horizon: 5, step: 1, minTrainingLength: 27 })).toBe(0);
  });

  it('spaces origins by the step and keeps the first length in a sliding window', () => {
    const plan = planOrigins(60, { horizon: 4, origins: 4, step: 3, window: 'sliding', minTrainingLength: 20 });
    expect(plan.origins).toEqual([
      { end: 47, start: 0 },
      { end: 50, start: 3 },
      { end: 53, start: 6 },
      { end: 56, start: 9 },
    ]);
  });
});
