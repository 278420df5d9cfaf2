// Delimiters and decimal marks: set for the series or read from the file, refused when the file
// could be read two ways. What `1234,5` means with a decimal comma (1234.5) is the convention of
// the spreadsheet exports in much of Europe, where the cells are then separated by semicolons
// (common practice). The values are small invented numbers.
import { describe, expect, it } from 'vitest';
import { formatProblem } from '../../src/base/problem.js';
import { detectDelimiter } from '../../src/data/detectDialect.js';
import { parseSeriesCsv, type SeriesOptions } from '../../src/data/parseSeriesCsv.js';
import { parseValue } from '../../src/data/parseValue.js';
import { codesAndLines, problemsOf } from './problemsOf.js';

const parse = (text: string, options: Partial<SeriesOptions> = {}) => parseSeriesCsv(text, 'in.csv', { missing: 'error', ...options });
const problems = (text: string, options: Partial<SeriesOptions> = {}) => problemsOf(() => parse(text, options));

describe('parseValue with either decimal mark', () => {
  it('reads a comma as the decimal mark only when asked to', () => {
    expect(parseValue('1234,5', 'comma')).toEqual({ kind: 'number', value: 1234.5 });
    expect(parseValue('-0,25', 'comma')).toEqual({ kind: 'number', value: -0.25 });
    expect(parseValue('1234,5', 'point')).toEqual({ kind: 'other-mark' });
    expect(parseValue('1234.5', 'comma')).toEqual({ kind: 'other-mark' });
  });

  it('never reads a thousands separator', () => {
    expect(parseValue('1.234,5', 'comma')).toEqual({ kind: 'grouped' });
    expect(parseValue('1,234.5', 'point')).toEqual({ kind: 'grouped' });
    expect(parseValue('1.234.567', 'comma')).toEqual({ kind: 'invalid' });
  });
});

describe('the delimiter', () => {
  it('is read from the header line', () => {
    expect(detectDelimiter('period;value\n2001;1,5\n', 'in.csv')).toBe('semicolon');
    expect(detectDelimiter('period\tvalue\n2001\t1.5\n', 'in.csv')).toBe('tab');
    expect(detectDelimiter('period,value\n2001,"1,5"\n', 'in.csv')).toBe('comma');
    // A comma inside a semicolon file's column name: the comma does not split every line alike
    // into the header's width, or leaves no period in the first cell.
    expect(detectDelimiter('period;sales, EUR\n2001;1,5\n2002;2,5\n', 'in.csv')).toBe('semicolon');
  });

  it('is refused as ambiguous when two delimiters read the file alike, naming the setting', () => {
    const found = problemsOf(() => detectDelimiter('a;b,c\nx;1,5\n', 'in.csv'));
    expect(found.map(formatProblem)).toEqual([
      'in.csv:1: the header line holds commas and semicolons, and the file could be read with either as the delimiter; set delimiter in the config (--delimiter for fit) to comma or semicolon',
    ]);
  });
});

describe('semicolons and decimal commas', () => {
  it('reads the usual European export', () => {
    const series = parse('Monat;Umsatz\n2021-01;1234,5\n2021-02;1240,25\n2021-03;1198\n2021-04;1305,75\n');
    expect(series).toMatchObject({ periodColumn: 'Monat', column: 'Umsatz', frequency: 'monthly', n: 4 });
    expect([...series.values]).toEqual([1234.5, 1240.25, 1198, 1305.75]);
  });

  it('reads tab-separated cells with decimal points', () => {
    expect([...parse('period\tvalue\n2001\t1.5\n2002\t2.75\n2003\t2.5\n').values]).toEqual([1.5, 2.75, 2.5]);
  });

  it('reads a decimal comma in a comma file when it is set, the cells quoted', () => {
    expect([...parse('period,value\n2001,"1,5"\n2002,"2,75"\n2003,"2,5"\n', { decimalMark: 'comma' }).values]).toEqual([1.5, 2.75, 2.5]);
  });

  it('follows the settings over what detection would choose', () => {
    // Three digits after each point in a semicolon file could be thousands; set to point, they are decimals.
    const text = 'period;value\n2001;1.234\n2002;1.250\n2003;1.125\n';
    expect(problems(text)[0]).toMatchObject({ code: 'csv.decimal-mark-ambiguous', line: 2, column: 2 });
    expect([...parse(text, { decimalMark: 'point' }).values]).toEqual([1.234, 1.25, 1.125]);
    // Set to a semicolon, a header with commas in it is not split at them.
    expect(parse('period;value, in EUR\n2001;1,5\n2002;2,75\n2003;2,5\n', { delimiter: 'semicolon' }).column).toBe('value, in EUR');
  });

  it('refuses values that could be thousands', () => {
    const found = problems('period;value\n2001;12,345\n2002;12,500\n2003;13,125\n');
    expect(found.map(formatProblem)).toEqual([
      "in.csv:2:2: value: '12,345' could be read two ways: every marked value has three digits after its comma, which is how a thousands separator looks too; set decimal_mark in the config (--decimal-mark for fit) to point or comma; thousands separators are never read",
    ]);
  });

  it('refuses a column that mixes points and commas', () => {
    const found = problems('period;value\n2001;1,5\n2002;2.75\n2003;2,5\n');
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ code: 'csv.decimal-mark-ambiguous', line: 3, message: "'2.75' could be read two ways: some values use a point and others a comma as the decimal mark" });
  });

  it('refuses a thousands separator once the mark is known, at each cell', () => {
    const found = problems('period;value\n2001;1.234,5\n2002;1240,25\n2003;1.198,0\n');
    expect(codesAndLines(found)).toEqual(['csv.bad-value@2', 'csv.bad-value@4']);
    expect(found[0].message).toBe("'1.234,5' groups its digits with a thousands separator, which is not read");
  });

  it('names the setting for a value written with the other mark', () => {
    const found = problems('period;value\n2001;1,5\n2002;2,75\n2003;2,5\n', { decimalMark: 'point' });
    expect(found).toHaveLength(3);
    expect(formatProblem(found[0])).toBe(
      "in.csv:2:2: value: '1,5' is written with a comma as its decimal mark, but the decimal mark is a point; write it with a point, or set decimal_mark: comma in the config (--decimal-mark comma for fit) if every value uses a comma",
    );
  });
});
