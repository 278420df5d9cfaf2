import { describe, expect, it } from 'vitest';
import { checkSeries } from '../../src/data/checkSeries.js';

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
