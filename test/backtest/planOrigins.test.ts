import { describe, expect, it } from 'vitest';
import { availableOrigins } from '../../src/base/backtestOrigins.js';
import { originSeasons, planOrigins } from '../../src/backtest/planOrigins.js';

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

// The seasonal rule (src/backtest/planOrigins.ts): at least s origins one step apart, so
// their lengths mod s take every value; fewer only when the series allows fewer.
describe('planOrigins with a seasonal period', () => {
  it('raises the origins to one season’s worth, and every season is an origin', () => {
    // n = 72, B = 6, minimum 27: 40 available; 6 asked, 12 planned, ends 55..66.
    const plan = planOrigins(72, { horizon: 6, origins: 6, step: 1, window: 'expanding', minTrainingLength: 27, period: 12 });
    expect(plan.origins.map((o) => o.end)).toEqual(Array.from({ length: 12 }, (_, i) => 55 + i));
    expect(plan).toMatchObject({ requested: 6, planned: 12, available: 40 });
    expect(originSeasons(plan.origins, 12)).toBe(12);
  });

  it('keeps a count above the period, and takes what a short series allows', () => {
    const many = planOrigins(108, { horizon: 8, origins: 20, step: 1, window: 'expanding', minTrainingLength: 27, period: 4 });
    expect(many).toMatchObject({ requested: 20, planned: 20 });
    expect(originSeasons(many.origins, 4)).toBe(4);
    // n = 72, B = 6, minimum 60: 7 origins, ends 60..66, 7 of the 12 months.
    const short = planOrigins(72, { horizon: 6, origins: 4, step: 1, window: 'sliding', minTrainingLength: 60, period: 12 });
    expect(short.origins.map((o) => o.end)).toEqual([60, 61, 62, 63, 64, 65, 66]);
    expect(short.origins.map((o) => o.start)).toEqual([0, 1, 2, 3, 4, 5, 6]);
    expect(short).toMatchObject({ requested: 4, planned: 7, available: 7 });
    expect(originSeasons(short.origins, 12)).toBe(7);
  });

  it('plans exactly as before at period 1', () => {
    const plain = planOrigins(40, { horizon: 5, origins: 3, step: 1, window: 'expanding', minTrainingLength: 27 });
    expect(planOrigins(40, { horizon: 5, origins: 3, step: 1, window: 'expanding', minTrainingLength: 27, period: 1 })).toEqual(plain);
    expect(plain.origins.map((o) => o.end)).toEqual([33, 34, 35]);
    expect(originSeasons(plain.origins, 1)).toBe(1);
  });
});
