import { describe, expect, it } from 'vitest';
import { inSampleNaiveMae, naiveForecast } from '../../src/backtest/naiveForecast.js';
import { scoreHorizon, type ScoredForecast } from '../../src/backtest/scoreHorizon.js';
import { expectRelative } from '../evidence/expectRelative.js';

function forecast(actual: number, point: number, interval: [number, number], maseScale: number): ScoredForecast {
  return { actual, point, intervals: { '80': interval }, mean: point, se: 1, modelActual: actual, maseScale };
}

// Hand-worked from the definitions (Hyndman & Koehler 2006 for MASE; Gneiting & Raftery 2007, eq. 43).
describe('scoreHorizon', () => {
  it('scales absolute errors by each origin’s in-sample naive MAE (MASE)', () => {
    // Training window 1, 3, 2, 5: one-step changes 2, −1, 3, mean absolute 2.
    const scale = inSampleNaiveMae([1, 3, 2, 5]);
    expect(scale).toBe(2);
    // Second origin's window 4, 4, 5: changes 0, 1, mean absolute 0.5.
    const second = inSampleNaiveMae([4, 4, 5]);
    expect(second).toBe(0.5);
    // Errors 3 and −1: |3|/2 = 1.5 and |−1|/0.5 = 2, MASE = 1.75; MAE = 2, RMSE = √5.
    const scores = scoreHorizon(1, [forecast(8, 5, [4, 6], scale), forecast(6, 7, [6, 8], second)], [80]);
    expect(scores.mase).toBe(1.75);
    expect(scores.mae).toBe(2);
    expectRelative(scores.rmse ?? Number.NaN, Math.sqrt(5), 1e-15);
    // MAPE = 100·(3/8 + 1/6)/2.
    expectRelative(scores.mape ?? Number.NaN, (100 * (3 / 8 + 1 / 6)) / 2, 1e-14);
    // 8 lies above [4, 6]: 2 + 10·2 = 22; 6 sits on the lower limit of [6, 8]: 2. Mean 12.
    expectRelative(scores.interval_score['80'] ?? Number.NaN, 12, 1e-14);
    expect(scores.coverage['80']).toBe(0.5);
    expect(scores.width['80']).toBe(2);
  });

  it('gives no MAPE when an actual is not positive, and no MASE for a flat window', () => {
    const scores = scoreHorizon(2, [forecast(0, 1, [0, 2], 1), forecast(-2, -1, [-3, 1], 0)], [80]);
    expect(scores.mape).toBeNull();
    expect(scores.mase).toBeNull();
    expect(scores.mae).toBe(1);
  });
});

describe('naiveForecast', () => {
  it('repeats the last value with a random-walk standard error σ√h', () => {
    // Changes 2, −1, 3: σ² = (4 + 1 + 9)/3 (no drift, so no mean is removed).
    const { mean, se } = naiveForecast([1, 3, 2, 5], 3);
    expect(mean).toEqual([5, 5, 5]);
    const sigma = Math.sqrt(14 / 3);
    se.forEach((value, i) => expectRelative(value, sigma * Math.sqrt(i + 1), 1e-15));
  });
});
