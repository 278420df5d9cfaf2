// Full dates as period labels, and one problem for a period column unreadable throughout.
// The period a date falls in is the Gregorian calendar's (ISO 8601; common practice): months
// 1-3 make the first quarter, and February has 29 days in years divisible by 4, except
// centuries not divisible by 400. The values are small invented numbers.
import { describe, expect, it } from 'vitest';
import { parseSeriesCsv, type SeriesOptions } from '../../src/data/parseSeriesCsv.js';
import { dateSpacing, parseIsoDate, periodOfDate } from '../../src/data/periodDates.js';
import { formatProblem } from '../../src/base/problem.js';
import { codesAndLines, problemsOf } from './problemsOf.js';

const VALUES = [12.5, 14.25, 13, 17.5, 16, 19.75];
const csv = (labels: readonly string[], values: readonly number[] = VALUES) => `period,value\n${labels.map((label, i) => `${label},${values[i]}`).join('\n')}\n`;
const parse = (text: string, options: Partial<SeriesOptions> = {}) => parseSeriesCsv(text, 'in.csv', { missing: 'error', ...options });
const problems = (text: string, options: Partial<SeriesOptions> = {}) => problemsOf(() => parse(text, options));

describe('the calendar', () => {
  it('knows which days exist', () => {
    // Gregorian leap years (common practice): 2024 and 2000 are leap years, 1900 and 2023 are not.
    expect(parseIsoDate('2024-02-29')).toEqual({ year: 2024, month: 2, day: 29 });
    expect(parseIsoDate('2000-02-29')).toEqual({ year: 2000, month: 2, day: 29 });
    expect(parseIsoDate('1900-02-29')).toBe('no-such-day');
    expect(parseIsoDate('2023-02-29')).toBe('no-such-day');
    expect(parseIsoDate('2023-04-31')).toBe('no-such-day');
    expect(parseIsoDate('2023-13-01')).toBe('no-such-day');
    expect(parseIsoDate('2023-1-01')).toBeNull();
  });

  it('puts a date in its month, quarter and year', () => {
    const date = { year: 1949, month: 8, day: 31 };
    expect(periodOfDate(date, 'monthly')).toEqual({ frequency: 'monthly', year: 1949, sub: 8 });
    expect(periodOfDate(date, 'quarterly')).toEqual({ frequency: 'quarterly', year: 1949, sub: 3 });
    expect(periodOfDate(date, 'annual')).toEqual({ frequency: 'annual', year: 1949, sub: 1 });
  });

  it('reads the frequency from the most common spacing in months', () => {
    const months = (list: [number, number][]) => list.map(([year, month]) => ({ year, month, day: 1 }));
    expect(dateSpacing(months([[2001, 1], [2001, 2], [2001, 4], [2001, 5]]))).toEqual({ kind: 'frequency', frequency: 'monthly', months: 1 });
    expect(dateSpacing(months([[2001, 1], [2001, 7], [2002, 1]]))).toEqual({ kind: 'other', months: 6 });
    expect(dateSpacing(months([[2001, 1]]))).toEqual({ kind: 'single' });
  });
});

describe('dates as period labels', () => {
  const monthly = {
    first: ['1949-01-01', '1949-02-01', '1949-03-01', '1949-04-01', '1949-05-01', '1949-06-01'],
    last: ['1949-01-31', '1949-02-28', '1949-03-31', '1949-04-30', '1949-05-31', '1949-06-30'],
    mid: ['1949-01-15', '1949-02-15', '1949-03-15', '1949-04-15', '1949-05-15', '1949-06-15'],
  };
  for (const [day, labels] of Object.entries(monthly)) {
    it(`reads monthly data dated on the ${day} day of each month`, () => {
      const series = parse(csv(labels));
      expect(series).toMatchObject({ frequency: 'monthly', first: '1949-01', last: '1949-06', n: 6 });
      expect(series.periods).toEqual(['1949-01', '1949-02', '1949-03', '1949-04', '1949-05', '1949-06']);
      expect([...series.values]).toEqual(VALUES);
    });
  }

  const quarterly = {
    first: ['2019-01-01', '2019-04-01', '2019-07-01', '2019-10-01', '2020-01-01', '2020-04-01'],
    last: ['2019-03-31', '2019-06-30', '2019-09-30', '2019-12-31', '2020-03-31', '2020-06-30'],
    mid: ['2019-02-15', '2019-05-15', '2019-08-15', '2019-11-15', '2020-02-15', '2020-05-15'],
  };
  for (const [day, labels] of Object.entries(quarterly)) {
    it(`reads quarterly data dated on the ${day} day of each quarter`, () => {
      const series = parse(csv(labels));
      expect(series).toMatchObject({ frequency: 'quarterly', first: '2019-Q1', last: '2020-Q2', n: 6 });
    });
  }

  const annual = {
    first: ['2015-01-01', '2016-01-01', '2017-01-01', '2018-01-01', '2019-01-01', '2020-01-01'],
    last: ['2015-12-31', '2016-12-31', '2017-12-31', '2018-12-31', '2019-12-31', '2020-12-31'],
    mid: ['2015-07-01', '2016-07-01', '2017-07-01', '2018-07-01', '2019-07-01', '2020-07-01'],
  };
  for (const [day, labels] of Object.entries(annual)) {
    it(`reads annual data dated on the ${day} day of each year`, () => {
      expect(parse(csv(labels))).toMatchObject({ frequency: 'annual', first: '2015', last: '2020', n: 6 });
    });
  }

  it('maps each date into the frequency set, when it is set', () => {
    expect(parse(csv(quarterly.last), { frequency: 'quarterly' }).periods).toEqual(['2019-Q1', '2019-Q2', '2019-Q3', '2019-Q4', '2020-Q1', '2020-Q2']);
    // Quarterly dates read as annual would put four dates in each year.
    const found = problems(csv(quarterly.first), { frequency: 'annual' });
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ code: 'csv.dates-finer', line: 3, column: 1, field: 'period' });
    expect(found[0].message).toBe('dates 2019-01-01 and 2019-04-01 fall in one year: the dates are quarterly, but the frequency is set to annual');
  });

  it('reports two dates in one period as a duplicate at the second', () => {
    const labels = ['1949-01-01', '1949-02-01', '1949-03-01', '1949-03-20', '1949-04-01', '1949-05-01'];
    const found = problems(csv(labels));
    expect(codesAndLines(found)).toEqual(['csv.duplicate-period@5']);
    expect(found[0].message).toBe('date 1949-03-20 falls in 1949-03, as does 1949-03-01 on line 4');
  });

  it('refuses a day the calendar does not have, at its cell, without a follow-on gap', () => {
    const labels = ['2023-01-31', '2023-02-30', '2023-03-31', '2023-04-30', '2023-05-31', '2023-06-30'];
    const found = problems(csv(labels));
    expect(found.map(formatProblem)).toEqual(["in.csv:3:1: period: '2023-02-30' is not a day of the calendar; correct the date (YYYY-MM-DD, a day that exists in that month)"]);
  });

  it('refuses dates whose spacing is not a month, a quarter or a year', () => {
    const weekly = ['2024-01-01', '2024-01-08', '2024-01-15', '2024-01-22', '2024-01-29', '2024-02-05'];
    const found = problems(csv(weekly));
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ code: 'csv.date-spacing', message: 'most consecutive dates fall in the same month: daily or weekly data are not read' });
    const halfYears = ['2020-01-01', '2020-07-01', '2021-01-01', '2021-07-01', '2022-01-01', '2022-07-01'];
    expect(problems(csv(halfYears))[0].hint).toBe('set frequency in the config (--frequency for fit)');
  });

  it('refuses a period label among dates and a date among period labels', () => {
    const found = problems(csv(['2001-01-01', '2001-02', '2001-03-01', '2001-04-01', '2001-05-01', '2001-06-01']));
    expect(codesAndLines(found)).toEqual(['csv.mixed-period-form@3']);
    expect(found[0].message).toBe("'2001-02' is a period label, but the first period '2001-01-01' (line 2) is a date");
  });
});

describe('a period column unreadable throughout', () => {
  it('is one problem at its first bad cell, with the forms accepted and no follow-on count', () => {
    // 24 months labelled as a spreadsheet might display them: nothing here is a period.
    const labels = Array.from({ length: 24 }, (_, i) => `${['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'][i % 12]}-${49 + Math.floor(i / 12)}`);
    const text = `period,value\n${labels.map((label, i) => `${label},${100 + ((i * 7) % 11)}`).join('\n')}\n`;
    const found = problems(text, { minObservations: 11 });
    expect(found.map(formatProblem)).toEqual([
      "in.csv:2:1: period: 'Jan-49' is not a period, nor are the other 23 labels in this column; write periods as 2003 (annual), 2003-Q1 (quarterly) or 2003-01 (monthly), or as dates such as 2003-01-31; if the periods are in another column, name it with period_column in the config (--period-column for fit)",
    ]);
  });

  it('counts when most labels below a good first one are bad', () => {
    // Four of six labels bad: more than half.
    const labels = ['2001', '2002/', '2003/', '2004/', '2005/', '2006'];
    const found = problems(csv(labels));
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ code: 'csv.unreadable-periods', line: 3, message: "'2002/' is not a period, nor are 3 of the other 5 labels in this column" });
  });

  it('leaves a single bad label among good ones to the usual problems, with the other independent ones', () => {
    const labels = ['2001', '2002', '2003', 'two thousand four', '2005', '2006'];
    const text = csv(labels).replace('2006,19.75', '2006,abc');
    // Rows with a bad cell count as observations to be, so no "too few" follows from them, and
    // the gap the bad label's row leaves is its problem, not another.
    expect(codesAndLines(problems(text, { minObservations: 6 }))).toEqual(['csv.bad-period@5', 'csv.bad-value@7']);
  });
});
