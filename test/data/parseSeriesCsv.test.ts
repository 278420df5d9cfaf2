import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseSeriesCsv, type SeriesOptions } from '../../src/data/parseSeriesCsv.js';
import { runCli } from '../support/runCli.js';
import { codesAndLines, problemsOf } from './problemsOf.js';

const parse = (text: string, options: Partial<SeriesOptions> = {}) => parseSeriesCsv(text, 'in.csv', { missing: 'error', ...options });
const problems = (text: string, options = {}) => problemsOf(() => parse(text, options));

describe('parseSeriesCsv on valid input', () => {
  it('reads the first column as periods and the second as values', () => {
    const series = parse('year,flow\n1871,1120\n1872,1160\n1873,963\n');
    expect(series).toMatchObject({
      file: 'in.csv',
      periodColumn: 'year',
      column: 'flow',
      frequency: 'annual',
      periods: ['1871', '1872', '1873'],
      first: '1871',
      last: '1873',
      n: 3,
    });
    expect([...series.values]).toEqual([1120, 1160, 963]);
  });

  it('accepts a BOM, CRLF, padded cells and trailing blank lines', () => {
    const series = parse('\uFEFFperiod , value \r\n 2008-Q4 , 1.5 \r\n2009-Q1,2.5\r\n\r\n\r\n');
    expect(series).toMatchObject({ periodColumn: 'period', column: 'value', frequency: 'quarterly', first: '2008-Q4', last: '2009-Q1', n: 2 });
    expect([...series.values]).toEqual([1.5, 2.5]);
  });

  it('picks columns by name, in any position', () => {
    // Neither column an exact straight line, which would be refused (series.exact-line).
    const text = 'gdp,period,cpi\n10,2001-11,1.5\n11,2001-12,1.75\n13,2002-01,2.5\n';
    const series = parse(text, { periodColumn: 'period', column: 'cpi' });
    expect(series).toMatchObject({ periodColumn: 'period', column: 'cpi', frequency: 'monthly', first: '2001-11', last: '2002-01' });
    expect([...series.values]).toEqual([1.5, 1.75, 2.5]);
    // With only the period column named, the values come from the first other column.
    expect([...parse(text, { periodColumn: 'period' }).values]).toEqual([10, 11, 13]);
  });

  it('reads signed, exponent and leading-point numbers', () => {
    expect([...parse('period,value\n2001,-1.5\n2002,+2\n2003,1e3\n2004,.25\n2005,7.\n').values]).toEqual([-1.5, 2, 1000, 0.25, 7]);
  });

  it('stays silent when every requirement is met', () => {
    const series = parse('period,value\n2001,1\n2002,2\n2003,3\n', {
      frequency: 'annual',
      minObservations: 3,
      transform: { kind: 'box-cox', lambda: 0.5 },
    });
    expect(series.n).toBe(3);
  });

  it('hashes the text as UTF-8', () => {
    // sha256sum (GNU coreutils 9.1) of the bytes `period,value\n2001,1\n2002,2\n`.
    expect(parse('period,value\n2001,1\n2002,2\n').sha256).toBe('95d13bd9d5046a62e10fecece5f982d21b9564aebbc17fa6433c95d0d541195a');
  });
});

describe('parseSeriesCsv header and columns', () => {
  it('refuses a file whose first line is data', () => {
    const found = problems('1875,580.38\n1876,581.86\n');
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ code: 'csv.no-header', file: 'in.csv', line: 1 });
    expect(found[0].message).toContain("'1875'");
  });

  it('refuses a first line that opens with a number, but accepts a column named like a year', () => {
    expect(problems('580.38,1875\n581.86,1876\n')[0]).toMatchObject({ code: 'csv.no-header', line: 1, message: "the first line holds '580.38', which is data, not a column name" });
    expect(parse('period,2019\n2001,1\n2002,2\n').column).toBe('2019');
  });

  it('refuses a header with no data below it', () => {
    expect(problems('period,value\n\n')[0]).toMatchObject({ code: 'csv.no-data', line: 1 });
  });

  it('refuses a single column when commas are set, and points at the semicolons', () => {
    const found = problems('period;value\n2001;1\n', { delimiter: 'comma' });
    expect(found[0]).toMatchObject({ code: 'csv.one-column', line: 1 });
    expect(found[0].hint).toBe('the header seems to separate cells with semicolons: set delimiter: semicolon in the config (--delimiter semicolon for fit)');
  });

  it('names the unknown column, lists the columns and suggests the closest', () => {
    const found = problems('period,value,gdp\n2001,1,2\n', { column: 'gpd' });
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ code: 'csv.unknown-column', file: 'in.csv', line: 1, field: 'gpd' });
    expect(found[0].message).toContain("'period', 'value', 'gdp'");
    expect(found[0].hint).toBe("did you mean 'gdp'?");
  });

  it('reports an unknown period column and an unknown value column together', () => {
    const found = problems('period,value\n2001,1\n', { periodColumn: 'date', column: 'price' });
    expect(found.map((item) => [item.code, item.field])).toEqual([
      ['csv.unknown-column', 'date'],
      ['csv.unknown-column', 'price'],
    ]);
    expect(found[0].hint).toBe('use one of the column names above');
  });

  it('refuses an ambiguous, a doubly chosen and an unnamed column', () => {
    expect(problems('period,value,value\n2001,1,2\n', { column: 'value' })[0]).toMatchObject({ code: 'csv.duplicate-column', field: 'value' });
    expect(problems('period,value\n2001,1\n', { column: 'period' })[0]).toMatchObject({ code: 'csv.same-column', field: 'period' });
    expect(problems('period,\n2001,1\n')[0]).toMatchObject({ code: 'csv.unnamed-column', line: 1, column: 2 });
  });
});

describe('parseSeriesCsv cells', () => {
  it('reports every bad value line with its line, column and field', () => {
    const text = 'period,value\n2001,1\n2002,abc\n2003,NaN\n2004,\n2005,inf\n2006,-Infinity\n2007,NA\n2008,1e999\n2009,2\n';
    const found = problems(text);
    expect(codesAndLines(found)).toEqual([
      'csv.bad-value@3',
      'csv.non-finite@4',
      'csv.missing-value@5',
      'csv.non-finite@6',
      'csv.non-finite@7',
      'csv.missing-value@8',
      'csv.non-finite@9',
    ]);
    for (const item of found) expect(item).toMatchObject({ file: 'in.csv', column: 2, field: 'value' });
    expect(found[0].message).toBe("'abc' is not a number");
    expect(found[2].message).toBe('the value cell is empty');
    expect(found[5].message).toBe("'NA' marks a missing value");
  });

  it('refuses a decimal comma in a comma-delimited file as ambiguous, and names the setting', () => {
    const found = problems('period,value\n2001,"1,5"\n2002,2\n');
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ code: 'csv.decimal-mark-ambiguous', line: 2, column: 2, field: 'value' });
    expect(found[0].hint).toBe('set decimal_mark in the config (--decimal-mark for fit) to point or comma; thousands separators are never read');
    const pointSet = problems('period,value\n2001,"1,5"\n2002,2\n', { decimalMark: 'point' });
    expect(pointSet[0]).toMatchObject({ code: 'csv.bad-value', line: 2 });
    expect(pointSet[0].hint).toContain('decimal_mark: comma in the config');
  });

  it('reports empty and unreadable periods, and a date among period labels', () => {
    const found = problems('month,value\n2001-01,1\n,2\n2001-03-01,3\n2001-M4,4\n');
    expect(codesAndLines(found)).toEqual(['csv.empty-period@3', 'csv.mixed-period-form@4', 'csv.bad-period@5']);
    expect(found[1]).toMatchObject({ column: 1, field: 'month' });
    expect(found[1].message).toBe("'2001-03-01' is a date, but the first period '2001-01' (line 2) is a period label");
    expect(found[2].hint).toContain('2003-Q1 (quarterly)');
  });

  it('reports rows with more or fewer cells than the header', () => {
    const found = problems('period,value\n2001,1\n2002,2,3\n2003\n');
    expect(codesAndLines(found)).toEqual(['csv.row-width@3', 'csv.row-width@4', 'csv.missing-value@4']);
    expect(found[0].message).toBe('has 3 cells but the header has 2');
    expect(found[0].hint).toContain('quote cells that contain commas');
  });

  it('counts lines in the file, blank lines included', () => {
    expect(codesAndLines(problems('period,value\n\n2001,1\n\n\n2002,x\n'))).toEqual(['csv.bad-value@6']);
  });

  it('summarises long runs of one problem instead of listing hundreds', () => {
    const rows = Array.from({ length: 30 }, (_, i) => `${2001 + i},x`);
    const found = problems(`period,value\n${rows.join('\n')}\n`);
    expect(found).toHaveLength(21);
    expect(found[19]).toMatchObject({ code: 'csv.bad-value', line: 21 });
    expect(found[20]).toMatchObject({ code: 'csv.bad-value', line: 22, field: 'value' });
    expect(found[20].message).toBe('and 10 more lines with this kind of problem: 22, 23, 24, 25, 26, ..., 31 (10 in all)');
  });
});

describe('a series without random variation', () => {
  it('is refused with the file and column named, on the scale the models see', () => {
    const line = `period,value\n${Array.from({ length: 12 }, (_, i) => `${2000 + i},${100 + 2.5 * i}`).join('\n')}\n`;
    expect(() => parse(line)).toThrow('in.csv: value: all 12 values lie exactly on a straight line;');
    // Growth of exactly 3% a year is a straight line after the log transform, and only then.
    const growth = `period,value\n${Array.from({ length: 12 }, (_, i) => `${2000 + i},${(100 * 1.03 ** i).toPrecision(15)}`).join('\n')}\n`;
    expect(() => parse(growth, { transform: { kind: 'log' } })).toThrow('all 12 values lie exactly on a straight line after the log transform');
    expect([...parse(growth).values]).toHaveLength(12);
  });
});

describe('fit on a series without random variation', () => {
  it('exits 2 naming the file, where it used to stop with an internal error', async () => {
    const file = join(mkdtempSync(join(tmpdir(), 'tb-exact-')), 'plan.csv');
    // Three years of a monthly plan: a fixed profile plus one unit a year, with no variation.
    const profile = [10, 12, 15, 14, 18, 20, 22, 21, 19, 16, 13, 11];
    writeFileSync(file, `period,value\n${Array.from({ length: 36 }, (_, t) => `${2020 + Math.floor(t / 12)}-${String((t % 12) + 1).padStart(2, '0')},${profile[t % 12] + Math.floor(t / 12)}`).join('\n')}\n`);
    const run = await runCli(['fit', file]);
    expect(run.code).toBe(2);
    expect(run.stderr).toContain('plan.csv: value: all 36 values are exactly a straight line plus a pattern that repeats every 12 periods;');
    expect(run.stderr).not.toContain('internal error');
  });
});
