import { describe, expect, it } from 'vitest';
import { checkSeries, exactPatternProblem } from '../../src/data/checkSeries.js';

const series = (values: number[]) => ({ file: 's.csv', column: 'value', values: Float64Array.from(values), lines: values.map((_, i) => i + 2) });

describe('checkSeries', () => {
  it('is silent on a series that meets every rule', () => {
    expect(checkSeries(series([1, 2, 3]), { minObservations: 3, transform: { kind: 'log' } })).toEqual([]);
    expect(checkSeries(series([-1, 0, 3]), { transform: { kind: 'none' } })).toEqual([]);
    expect(checkSeries(series([5]))).toEqual([]);
  });

  it('says how many observations are needed and how many there are', () => {
    const found = checkSeries(series([1, 2, 3]), { minObservations: 10 });
    expect(found).toEqual([
      expect.objectContaining({ code: 'series.too-few', file: 's.csv', field: 'value', message: 'has 3 observations; at least 10 are needed' }),
    ]);
    expect(checkSeries(series([1]), { minObservations: 2 })[0].message).toBe('has 1 observation; at least 2 are needed');
  });

  it('refuses a constant series', () => {
    const found = checkSeries(series([4.5, 4.5, 4.5, 4.5]));
    expect(found).toEqual([expect.objectContaining({ code: 'series.constant', message: 'all 4 values equal 4.5' })]);
    expect(checkSeries(series([4.5, 4.5, 4.5000001]))).toEqual([]);
  });

  it('lists every non-positive value under a log or Box-Cox transform, with its line', () => {
    const found = checkSeries(series([3, 0, 2, -1]), { transform: { kind: 'log' } });
    expect(found.map((item) => [item.code, item.line])).toEqual([
      ['series.non-positive', 3],
      ['series.non-positive', 5],
    ]);
    expect(found[0].message).toBe('value 0 is not positive, which the log transform needs');
    const boxCox = checkSeries(series([3, -2]), { transform: { kind: 'box-cox', lambda: 0.25 } });
    expect(boxCox[0]).toMatchObject({ line: 3, message: 'value -2 is not positive, which the Box-Cox (lambda 0.25) transform needs' });
  });

  it('works without line numbers for values that did not come from a file', () => {
    const [found] = checkSeries({ file: 'mem', column: 'x', values: [1, -1] }, { transform: { kind: 'box-cox', lambda: 0.5 } });
    expect(found).toMatchObject({ code: 'series.non-positive', line: undefined, message: 'value -1 is not positive, which the Box-Cox (lambda 0.5) transform needs' });
  });
});

describe('exactPatternProblem', () => {
  const at = { file: 's.csv', field: 'value' };
  // A straight line, and a line plus a fixed monthly pattern (common practice: data without random
  // variation cannot be modelled with an error term; the likelihood has no maximum as σ² → 0).
  const line = Array.from({ length: 30 }, (_, t) => 100 + 3 * t);
  const pattern = [0, 2, 5, 4, 8, 10, 12, 11, 9, 6, 3, 1];
  const seasonal = Array.from({ length: 36 }, (_, t) => 10 + t / 12 + pattern[t % 12]);

  it('refuses an exact line, with or without gaps, and an exact line plus a pattern', () => {
    expect(exactPatternProblem(line, 1, at)).toMatchObject({ code: 'series.exact-line', message: 'all 30 values lie exactly on a straight line' });
    const gappy = line.map((v, t) => (t === 4 || t === 5 || t === 17 ? Number.NaN : v));
    expect(exactPatternProblem(gappy, 1, at)?.code).toBe('series.exact-line');
    expect(exactPatternProblem(seasonal, 12, at)).toMatchObject({
      code: 'series.exact-pattern',
      message: 'all 36 values are exactly a straight line plus a pattern that repeats every 12 periods',
    });
    // A line is a line whatever the frequency.
    expect(exactPatternProblem(line, 4, at)?.code).toBe('series.exact-line');
    expect(exactPatternProblem(line.map((_, t) => Math.log(100) + 0.03 * t), 1, at, 'log')?.message).toBe('all 30 values lie exactly on a straight line after the log transform');
  });

  it('accepts the same shapes with any random variation, and a pattern seen only once', () => {
    const noisy = (values: number[]) => values.map((v, t) => v + 1e-6 * Math.sin(7 * t));
    expect(exactPatternProblem(noisy(line), 1, at)).toBeUndefined();
    expect(exactPatternProblem(noisy(seasonal), 12, at)).toBeUndefined();
    // An exact pattern and line on fewer than two years cannot be told from a series with variation.
    expect(exactPatternProblem(seasonal.slice(0, 20), 12, at)).toBeUndefined();
    // With annual data a pattern means nothing: only the line is checked.
    expect(exactPatternProblem(seasonal, 1, at)).toBeUndefined();
  });
});
