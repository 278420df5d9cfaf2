// The seasonal naive yardstick and its MASE scale, worked by hand from the definitions:
// ŷ_{T+h} = y_{T+h−s⌈h/s⌉} with standard error σ√⌈h/s⌉ (the seasonal random walk; Hyndman &
// Athanasopoulos, Forecasting: Principles and Practice, 3rd ed., §5.2 and §5.5, from memory),
// and the in-sample mean absolute lag-s difference as the MASE scale (Hyndman & Koehler 2006,
// §3.4; seasonal form as in Forecasting: Principles and Practice, 2nd ed., §3.4, from memory).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { inSampleNaiveMae, naiveForecast } from '../../src/backtest/naiveForecast.js';
import { readSeriesCsv } from '../../src/data/readSeriesCsv.js';
import { expectRelative } from '../evidence/expectRelative.js';

interface RandomWalkReference {
  name: string;
  file: string;
  period: number;
  transform: 'none' | 'log';
  training_length: number;
  steps: number;
  sigma2: number;
  mean: number[];
  se: number[];
}
const randomWalks = (
  JSON.parse(readFileSync(new URL('../fixtures/backtest/seasonalNaiveReference.json', import.meta.url), 'utf8')) as { seasonal_random_walk: RandomWalkReference[] }
).seasonal_random_walk;

// Two years of a quarterly series: lag-4 changes 1, 2, −1, 3.
const QUARTERLY = [10, 20, 30, 40, 11, 22, 29, 43];

describe('naiveForecast at a seasonal period', () => {
  it('repeats the last value of the same season, one more step of its walk per cycle', () => {
    const { mean, se } = naiveForecast(QUARTERLY, 9, 4);
    // h = 1..4 take the last year, h = 5..8 the same again, h = 9 the first quarter once more.
    expect(mean).toEqual([11, 22, 29, 43, 11, 22, 29, 43, 11]);
    // σ² = (1 + 4 + 1 + 9)/4, no mean removed (no drift); ⌈h/4⌉ = 1, 1, 1, 1, 2, 2, 2, 2, 3.
    const sigma = Math.sqrt(15 / 4);
    const cycles = [1, 1, 1, 1, 2, 2, 2, 2, 3];
    se.forEach((value, i) => expectRelative(value, sigma * Math.sqrt(cycles[i]), 1e-15));
  });

  it('is the no-change forecast at period 1', () => {
    // Changes 2, −1, 3: σ² = 14/3 (the no-change random walk's, σ√h).
    const { mean, se } = naiveForecast([1, 3, 2, 5], 3, 1);
    expect(mean).toEqual([5, 5, 5]);
    expect(se).toEqual(naiveForecast([1, 3, 2, 5], 3).se);
    se.forEach((value, i) => expectRelative(value, Math.sqrt(14 / 3) * Math.sqrt(i + 1), 1e-15));
  });

  it('forecasts a season whose last value is missing from its latest observed one, and skips changes across the gap', () => {
    // The second year's Q2 is missing: Q2 is forecast from 20, two steps of its walk away.
    const gappy = [10, 20, 30, 40, 11, Number.NaN, 29, 43];
    const { mean, se } = naiveForecast(gappy, 6, 4);
    expect(mean).toEqual([11, 20, 29, 43, 11, 20]);
    // Lag-4 changes 1, −1, 3 (the one into the gap is left out): σ² = 11/3.
    const sigma = Math.sqrt(11 / 3);
    const cycles = [1, 2, 1, 1, 2, 3];
    se.forEach((value, i) => expectRelative(value, sigma * Math.sqrt(cycles[i]), 1e-15));
  });

  // statsmodels 0.13.5 SARIMAX(order=(0, 0, 0), seasonal_order=(0, 1, 0, s), use_exact_diffuse=True)
  // smoothed at σ² = the window's mean squared lag-s change, get_forecast(steps): predicted_mean
  // and se_mean (test/fixtures/backtest/seasonalNaiveReference.json, seasonal_random_walk).
  it.each(randomWalks.map((check) => [check.name, check] as const))('gives the seasonal random walk’s exact forecast moments (%s, statsmodels SARIMAX)', (_, check) => {
    const series = readSeriesCsv(new URL(`../fixtures/seasonal/${check.file}`, import.meta.url).pathname, { missing: 'error' });
    const w = series.values.slice(0, check.training_length).map((v) => (check.transform === 'log' ? Math.log(v) : v));
    const { mean, se } = naiveForecast(w, check.steps, check.period);
    expect(mean).toHaveLength(check.steps);
    mean.forEach((value, i) => expectRelative(value, check.mean[i], 1e-12));
    se.forEach((value, i) => expectRelative(value, check.se[i], 1e-12));
    // Beyond one cycle the standard error grows by √2, then √3 (Hyndman & Athanasopoulos, §5.5, from memory).
    expectRelative(se[check.period] / se[0], Math.SQRT2, 1e-12);
    expectRelative(se[0] ** 2, check.sigma2, 1e-12);
  });

  it('refuses a window with no change a full period long, and a period that is not a whole number', () => {
    expect(() => naiveForecast([1, 2, 3, 4], 2, 4)).toThrow(/at least one observation more than the seasonal period/);
    expect(() => naiveForecast(QUARTERLY, 2, 0)).toThrow(/whole seasonal period/);
  });
});

describe('inSampleNaiveMae at a seasonal period', () => {
  it('averages the absolute lag-s changes over observed pairs', () => {
    // |1| + |2| + |−1| + |3| over 4.
    expect(inSampleNaiveMae(QUARTERLY, 4)).toBe(7 / 4);
    // One-step changes 10, 10, 10, −29, 11, 7, 14: mean absolute 91/7 (period 1, the default).
    expect(inSampleNaiveMae(QUARTERLY)).toBe(91 / 7);
    expect(inSampleNaiveMae(QUARTERLY, 1)).toBe(91 / 7);
    // The pair into the gap and the one out of it are left out: |1| + |−1| + |3| over 3.
    expect(inSampleNaiveMae([10, 20, 30, 40, 11, Number.NaN, 29, 43], 4)).toBe(5 / 3);
  });
});
