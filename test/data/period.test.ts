import { describe, expect, it } from 'vitest';
import {
  addPeriods,
  formatPeriod,
  parsePeriod,
  periodFromIndex,
  periodIndex,
  periodsPerYear,
} from '../../src/base/period.js';

describe('parsePeriod', () => {
  it('reads the three label forms', () => {
    expect(parsePeriod('1875')).toEqual({ frequency: 'annual', year: 1875, sub: 1 });
    expect(parsePeriod('1959-Q1')).toEqual({ frequency: 'quarterly', year: 1959, sub: 1 });
    expect(parsePeriod('2003-12')).toEqual({ frequency: 'monthly', year: 2003, sub: 12 });
  });

  it('rejects labels outside the three forms', () => {
    for (const label of ['', '75', '2003-Q0', '2003-Q5', '2003-00', '2003-13', '2003-1', '2003-01-01', '2003Q1', ' 2003']) {
      expect(parsePeriod(label)).toBeNull();
    }
  });

  it('round-trips through formatPeriod', () => {
    for (const label of ['0001', '1875', '1959-Q4', '2000-01', '2009-09']) {
      const period = parsePeriod(label);
      expect(period).not.toBeNull();
      if (period !== null) expect(formatPeriod(period)).toBe(label);
    }
  });
});

describe('periodIndex', () => {
  it('numbers consecutive periods consecutively across a year boundary', () => {
    const december = parsePeriod('1999-12');
    const january = parsePeriod('2000-01');
    if (december === null || january === null) throw new Error('labels did not parse');
    // Calendar fact (common practice): January 2000 directly follows December 1999.
    expect(periodIndex(january) - periodIndex(december)).toBe(1);
    expect(periodIndex(january)).toBe(2000 * 12);
  });

  it('is inverted by periodFromIndex', () => {
    expect(periodFromIndex('quarterly', 1959 * 4 + 3)).toEqual({ frequency: 'quarterly', year: 1959, sub: 4 });
    expect(periodFromIndex('monthly', 2000 * 12 - 1)).toEqual({ frequency: 'monthly', year: 1999, sub: 12 });
  });
});

describe('periodsPerYear', () => {
  it('is 1, 4 and 12', () => {
    expect([periodsPerYear('annual'), periodsPerYear('quarterly'), periodsPerYear('monthly')]).toEqual([1, 4, 12]);
  });
});

describe('addPeriods', () => {
  it('crosses year boundaries for quarterly labels', () => {
    // Calendar facts (common practice).
    expect(addPeriods('2009-Q3', 1)).toBe('2009-Q4');
    expect(addPeriods('2009-Q3', 2)).toBe('2010-Q1');
    expect(addPeriods('2009-Q3', 10)).toBe('2012-Q1');
    expect(addPeriods('2010-Q1', -1)).toBe('2009-Q4');
  });

  it('crosses year boundaries for monthly labels', () => {
    // Calendar facts (common practice).
    expect(addPeriods('1999-11', 1)).toBe('1999-12');
    expect(addPeriods('1999-11', 3)).toBe('2000-02');
    expect(addPeriods('1999-11', 26)).toBe('2002-01');
    expect(addPeriods('2000-01', -1)).toBe('1999-12');
  });

  it('spans the open datasets from their first to their last period', () => {
    // /work/shared/reference/README.md: US real GDP 1959Q1-2009Q3, n = 203; Lake Huron 1875-1972, n = 98.
    expect(addPeriods('1959-Q1', 202)).toBe('2009-Q3');
    expect(addPeriods('1875', 97)).toBe('1972');
    expect(addPeriods('1972', 0)).toBe('1972');
  });

  it('refuses a label it cannot read and a fractional step', () => {
    expect(() => addPeriods('1972-Q5', 1)).toThrow(RangeError);
    expect(() => addPeriods('1972', 1.5)).toThrow(RangeError);
  });
});
