// Trend stability as one record: expanding-window slope and drift, and the two break tests.
import { describe, expect, it } from 'vitest';
import { breakTestSummary } from '../../src/evidence/messages.js';
import { trendStability } from '../../src/evidence/trendStability.js';
import { expandingWindowSchedule } from '../../src/evidence/expandingWindows.js';
import { ols } from '../../src/linalg/ols.js';
import { fitTrendModelAtOrder } from '../../src/models/trendModels.js';
import { expectRelative } from './expectRelative.js';
import { seededNormals } from './seededNormals.js';
import { trendWithSlopeBreak } from './simulatedBreaks.js';

const ORDERS = { deterministic: { p: 1, q: 0 }, stochastic: { p: 1, q: 0 } };

describe('trendStability on a seeded trend-stationary AR(1) series, n = 120', () => {
  const w = trendWithSlopeBreak(seededNormals(51), 120, { intercept: 10, slope: 0.05, slopeChange: 0, breakAfter: 0, phi: 0.5, sigma: 1 });
  const record = trendStability(w, ORDERS);

  it('has the record keys, snake_case', () => {
    expect(Object.keys(record)).toEqual(['windows', 'break_test']);
    expect(Object.keys(record.windows)).toEqual(['deterministic', 'stochastic', 'min_window', 'step']);
    expect(Object.keys(record.windows.deterministic[0])).toEqual(['end', 'slope', 'se']);
    expect(Object.keys(record.windows.stochastic[0])).toEqual(['end', 'drift', 'se']);
    for (const test of [record.break_test.deterministic, record.break_test.stochastic]) {
      expect(Object.keys(test)).toEqual(['method', 'source', 'stat', 'restrictions', 'trimming', 'break_index', 'critical', 'reject', 'p_bound', 'summary']);
    }
    expect(JSON.parse(JSON.stringify(record))).toEqual(record);
  });

  it('windows start at max(20, 40% of n), grow, number at most 40 and end at n', () => {
    // 40% of 120 is 48; (120 − 48) / 39 rounds up to a step of 2.
    expect(record.windows.min_window).toBe(48);
    expect(record.windows.step).toBe(2);
    for (const windows of [record.windows.deterministic, record.windows.stochastic]) {
      const ends = windows.map((window) => window.end);
      expect(ends[0]).toBe(48);
      expect(ends.at(-1)).toBe(120);
      expect(ends.length).toBeLessThanOrEqual(40);
      ends.slice(1).forEach((end, i) => expect(end).toBeGreaterThan(ends[i]));
    }
  });

  it('the full-sample window is the full-sample fit at the same orders', () => {
    const deterministic = fitTrendModelAtOrder('deterministic', w, 1, 0, { estimation: 'ml' });
    const stochastic = fitTrendModelAtOrder('stochastic', w, 1, 0, { estimation: 'ml' });
    const lastSlope = record.windows.deterministic.at(-1);
    const lastDrift = record.windows.stochastic.at(-1);
    expectRelative(lastSlope?.slope ?? Number.NaN, deterministic.coefficients.slope, 1e-12);
    expectRelative(lastSlope?.se ?? Number.NaN, deterministic.stderr.regression.slope, 1e-12);
    expectRelative(lastDrift?.drift ?? Number.NaN, stochastic.coefficients.drift, 1e-12);
    expectRelative(lastDrift?.se ?? Number.NaN, stochastic.stderr.regression.drift, 1e-12);
  });

  it('takes a given full-sample fit at the same orders as it is, and refits one of other orders', () => {
    const deterministic = fitTrendModelAtOrder('deterministic', w, 1, 0, { estimation: 'ml' });
    // A copy whose slope is marked, to see which fit the full-sample window reports.
    const marked = { ...deterministic.fit, beta: Float64Array.from(deterministic.fit.beta, (b, i) => (i === 1 ? b + 1 : b)) };
    const given = trendStability(w, ORDERS, { deterministic: marked });
    expect(given.windows.deterministic.at(-1)?.slope).toBe(marked.beta[1]);
    expect(given.windows.stochastic).toEqual(record.windows.stochastic);
    const other = fitTrendModelAtOrder('deterministic', w, 2, 0, { estimation: 'ml' });
    expect(trendStability(w, ORDERS, { deterministic: other.fit }).windows.deterministic).toEqual(record.windows.deterministic);
  });

  it('each window agrees with a fit at the same orders on the first `end` observations', () => {
    const window = record.windows.deterministic[5];
    const fit = fitTrendModelAtOrder('deterministic', w.slice(0, window.end), 1, 0, { estimation: 'ml' });
    expectRelative(window.slope, fit.coefficients.slope, 1e-6);
    expectRelative(window.se, fit.stderr.regression.slope, 1e-4);
  });

  it('words each summary from its own p-value bound and break date', () => {
    for (const kind of ['deterministic', 'stochastic'] as const) {
      const test = record.break_test[kind];
      expect(test.summary).toBe(breakTestSummary(kind, test.p_bound, `observation ${test.break_index + 1}`));
    }
  });
});

describe('expanding windows with white-noise errors are OLS on the first `end` observations', () => {
  const w = trendWithSlopeBreak(seededNormals(52), 60, { intercept: 3, slope: 0.1, slopeChange: 0, breakAfter: 0, phi: 0, sigma: 1 });
  const record = trendStability(w, { deterministic: { p: 0, q: 0 }, stochastic: { p: 0, q: 0 } });

  it('slope and drift equal OLS; the s.e. uses the ML variance SSR/m, OLS SSR/(m − k) (common practice)', () => {
    expect(record.windows.min_window).toBe(24); // 40% of 60
    expect(record.windows.step).toBe(1);
    expect(record.windows.deterministic).toHaveLength(37);
    for (const window of record.windows.deterministic) {
      const m = window.end;
      const fit = ols(w.slice(0, m), [Array.from({ length: m }, () => 1), Array.from({ length: m }, (_, i) => i + 1)]);
      expectRelative(window.slope, fit.coefficients[1], 1e-9);
      expectRelative(window.se, fit.standardErrors[1] * Math.sqrt((m - 2) / m), 1e-9);
    }
    for (const window of record.windows.stochastic) {
      const differences = Array.from({ length: window.end - 1 }, (_, i) => w[i + 1] - w[i]);
      const m = differences.length;
      const fit = ols(differences, [differences.map(() => 1)]);
      expectRelative(window.drift, fit.coefficients[0], 1e-9);
      expectRelative(window.se, fit.standardErrors[0] * Math.sqrt((m - 1) / m), 1e-9);
    }
  });
});

describe('expandingWindowSchedule', () => {
  it('keeps at most 40 windows on a long series and always ends at n', () => {
    // n = 1000: first window 400, step ⌈600 / 39⌉ = 16, so 400, 416, ..., 992 and then 1000.
    const schedule = expandingWindowSchedule(1000);
    expect(schedule.minWindow).toBe(400);
    expect(schedule.step).toBe(16);
    expect(schedule.ends).toHaveLength(39);
    expect(schedule.ends.slice(-2)).toEqual([992, 1000]);
  });

  it('uses 20 observations below n = 50 and never more than n', () => {
    expect(expandingWindowSchedule(30).ends).toEqual([20, 21, 22, 23, 24, 25, 26, 27, 28, 29, 30]);
    expect(expandingWindowSchedule(15)).toEqual({ minWindow: 15, step: 1, ends: [15] });
  });

  it('starts later when the model needs more observations', () => {
    expect(expandingWindowSchedule(30, 25).ends).toEqual([25, 26, 27, 28, 29, 30]);
  });
});

describe('plain-language summaries', () => {
  it('name the break and its observation when the test rejects at 5%', () => {
    expect(breakTestSummary('deterministic', 'p < 0.01', 'observation 73')).toBe(
      'The trend line does not look stable: its level or slope appears to shift from observation 73 (p below 0.01), so one straight line through the whole history may mislead.',
    );
    expect(breakTestSummary('stochastic', '0.01 < p < 0.05', '2015')).toBe(
      'The drift does not look stable: the average change per period appears to shift from 2015 (p between 0.01 and 0.05), so the recent pace may differ from the long-run average.',
    );
  });

  it('call a 10% rejection weak and no rejection stable', () => {
    expect(breakTestSummary('stochastic', '0.05 < p < 0.10', '2015')).toMatch(/^The drift looks broadly stable, with weak signs of a shift .* from 2015 \(p between 0.05 and 0.10\)\.$/);
    expect(breakTestSummary('deterministic', 'p > 0.10', 'observation 73')).not.toMatch(/observation 73/);
  });

  it('the record numbers the break by observation, counting from 1', () => {
    const w = trendWithSlopeBreak(seededNormals(53), 100, { intercept: 10, slope: 0.05, slopeChange: 1.5, breakAfter: 60, phi: 0.5, sigma: 1 });
    const test = trendStability(w, ORDERS).break_test.deterministic;
    expect(test.reject['5']).toBe(true);
    expect(test.summary).toContain(`from observation ${test.break_index + 1} (`);
  });
});

describe('trendStability guards', () => {
  const w = Float64Array.from({ length: 40 }, (_, i) => i + Math.sin(i));

  it('refuses missing values, naming the position', () => {
    const gappy = w.slice();
    gappy[7] = Number.NaN;
    expect(() => trendStability(gappy, ORDERS)).toThrow(/trendStability needs finite values; position 7 is NaN/);
  });

  it('refuses orders that are not whole and non-negative', () => {
    expect(() => trendStability(w, { deterministic: { p: -1, q: 0 }, stochastic: { p: 0, q: 0 } })).toThrow(/trendStability needs whole, non-negative ARMA orders for the deterministic model/);
    expect(() => trendStability(w, { deterministic: { p: 0, q: 0 }, stochastic: { p: 0, q: 0.5 } })).toThrow(/for the stochastic model/);
  });

  it('refuses a series too short for the orders', () => {
    // ARMA(3,3) with drift: k = 8 coefficients, AICc needs m > k + 1 and differencing loses one.
    expect(() => trendStability(w.slice(0, 10), { deterministic: { p: 0, q: 0 }, stochastic: { p: 3, q: 3 } })).toThrow(/trendStability needs at least 11 observations for the stochastic model with ARMA\(3,3\)/);
  });
});
