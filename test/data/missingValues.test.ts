// missing: allow — empty cells, markers and missing periods become NaN observations (our spec).
import { describe, expect, it } from 'vitest';
import { parseSeriesCsv } from '../../src/data/parseSeriesCsv.js';
import { InputError } from '../../src/base/problem.js';

const TEXT = ['period,value', '2001,10', '2002,', '2003,NA', '2005,13', '2006,14.5'].join('\n');

describe('series with missing values allowed', () => {
  it('keeps every period from first to last, NaN where nothing was observed', () => {
    const series = parseSeriesCsv(TEXT, 'gaps.csv', { missing: 'allow' });
    expect(series.periods).toEqual(['2001', '2002', '2003', '2004', '2005', '2006']);
    expect(Array.from(series.values, (v) => (Number.isNaN(v) ? null : v))).toEqual([10, null, null, null, 13, 14.5]);
    expect(series.n).toBe(6);
    expect(series.missing).toBe(3);
  });

  it('still reports each gap and empty cell by default, with the way out named', () => {
    try {
      parseSeriesCsv(TEXT, 'gaps.csv', { missing: 'error' });
      throw new Error('expected an InputError');
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      const codes = error.problems.map((p) => p.code);
      expect(codes).toContain('csv.gap');
      expect(codes).toContain('csv.missing-value');
      expect(error.problems.find((p) => p.code === 'csv.gap')?.hint).toMatch(/missing: allow/);
    }
  });

  it('needs observed first and last periods, and counts only observed values towards the minimum', () => {
    const text = ['period,value', '2001,', '2002,3', '2003,4', '2004,'].join('\n');
    try {
      parseSeriesCsv(text, 'ends.csv', { missing: 'allow', minObservations: 3 });
      throw new Error('expected an InputError');
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      const lines = error.problems.map((p) => `${p.code}@${p.line ?? ''}`);
      expect(lines).toEqual(expect.arrayContaining(['series.missing-end@2', 'series.missing-end@5', 'series.too-few@']));
    }
  });
});
