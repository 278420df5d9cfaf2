import { describe, expect, it } from 'vitest';
import { checkPeriods, type DatedLine } from '../../src/data/checkPeriods.js';
import { parsePeriod } from '../../src/base/period.js';
import { parseSeriesCsv, type SeriesOptions } from '../../src/data/parseSeriesCsv.js';
import { codesAndLines, problemsOf } from './problemsOf.js';

const problems = (text: string, options: Partial<SeriesOptions> = {}) => problemsOf(() => parseSeriesCsv(text, 'p.csv', { missing: 'error', ...options }));

function dated(labels: readonly string[]): DatedLine[] {
  return labels.map((label, i) => {
    const period = parsePeriod(label);
    if (period === null) throw new Error(`bad test label ${label}`);
    return { line: i + 2, label, period };
  });
}

describe('checkPeriods', () => {
  const column = { file: 'p.csv', column: 1, field: 'period' };

  it('infers the frequency and finds nothing wrong in an unbroken run', () => {
    expect(checkPeriods(dated(['2009-Q3', '2009-Q4', '2010-Q1']), column)).toEqual({ frequency: 'quarterly', problems: [] });
    expect(checkPeriods(dated(['1999-12', '2000-01']), column, 'monthly')).toEqual({ frequency: 'monthly', problems: [] });
  });

  it('lists the periods missing in each gap, at the line after the gap', () => {
    const found = checkPeriods(dated(['2001', '2002', '2005', '2006', '2008']), column).problems;
    expect(found).toEqual([
      expect.objectContaining({ code: 'csv.gap', file: 'p.csv', line: 4, column: 1, field: 'period', message: 'missing 2003, 2004 before 2005' }),
      expect.objectContaining({ code: 'csv.gap', line: 6, message: 'missing 2007 before 2008' }),
    ]);
  });

  it('abbreviates a long gap', () => {
    const [gap] = checkPeriods(dated(['2001-12', '2004-01']), column).problems;
    expect(gap.message).toBe('missing 2002-01, 2002-02, 2002-03, 2002-04, 2002-05, ..., 2003-12 (24 in all) before 2004-01');
  });

  it('finds gaps across a quarterly year boundary', () => {
    const [gap] = checkPeriods(dated(['2009-Q3', '2010-Q2']), column).problems;
    expect(gap.message).toBe('missing 2009-Q4, 2010-Q1 before 2010-Q2');
  });
});

describe('period problems in a file', () => {
  it('reports duplicates with the line of the first occurrence', () => {
    const found = problems('period,value\n2001,1\n2002,2\n2002,3\n2003,4\n');
    expect(codesAndLines(found)).toEqual(['csv.duplicate-period@4']);
    expect(found[0]).toMatchObject({ field: 'period', message: 'period 2002 already appears on line 3' });
  });

  it('reports each period that comes after a later one', () => {
    const found = problems('period,value\n2001,1\n2003,2\n2002,3\n2004,4\n');
    expect(codesAndLines(found)).toEqual(['csv.unsorted@4']);
    expect(found[0].message).toBe('period 2002 comes after 2003 (line 3)');
  });

  it('reports a newest-first file once', () => {
    const found = problems('period,value\n2004,1\n2003,2\n2002,3\n2001,4\n');
    expect(codesAndLines(found)).toEqual(['csv.descending@3']);
    expect(found[0].message).toBe('periods run backwards, from 2004 down to 2001');
  });

  it('reports mixed frequencies once, listing the lines that disagree', () => {
    const found = problems('period,value\n2001-Q1,1\n2001-Q2,2\n2001-07,3\n2001-Q3,4\n2001-Q4,5\n2002,6\n');
    expect(codesAndLines(found)).toEqual(['csv.mixed-frequency@4']);
    expect(found[0].message).toBe("period '2001-07' is monthly, but the first period '2001-Q1' (line 2) is quarterly; 2 lines disagree: 4, 7");
  });

  it('checks a given frequency against the labels', () => {
    const found = problems('period,value\n2001,1\n2002,2\n', { frequency: 'quarterly' });
    expect(codesAndLines(found)).toEqual(['csv.frequency-mismatch@2']);
    expect(found[0].message).toBe("period '2001' is annual, but the frequency is set to quarterly; 2 lines disagree: 2, 3");
    expect(found[0].hint).toBe('set the frequency to annual, or write every period in the quarterly form');
  });
});
