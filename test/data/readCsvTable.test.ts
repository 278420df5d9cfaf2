import { describe, expect, it } from 'vitest';
import { readCsvTable } from '../../src/data/readCsvTable.js';
import { problemsOf } from './problemsOf.js';

describe('readCsvTable', () => {
  it('numbers lines from 1 with the header as line 1', () => {
    const table = readCsvTable('period,value\n2001,1\n2002,2\n', 'a.csv');
    expect(table.header).toEqual({ line: 1, cells: ['period', 'value'] });
    expect(table.rows).toEqual([
      { line: 2, cells: ['2001', '1'] },
      { line: 3, cells: ['2002', '2'] },
    ]);
  });

  it('drops a BOM, reads CRLF and lone CR endings, trims cells and skips blank lines', () => {
    const expected = [
      { line: 2, cells: ['2001', '1'] },
      { line: 5, cells: ['2002', '2'] },
    ];
    expect(readCsvTable('\uFEFFperiod, value \r\n 2001 ,1\r\n\r\n   \r\n2002,"2"\r\n\r\n', 'a.csv').rows).toEqual(expected);
    expect(readCsvTable('period,value\r2001,1\r\r\r2002,2\r', 'a.csv').rows).toEqual(expected);
    expect(readCsvTable('period,value\n2001,1\n,\n \n2002, " 2 "\n,,\n\n', 'a.csv').rows).toEqual(expected);
  });

  it('gives a row spanning lines the line where it starts', () => {
    const table = readCsvTable('period,note\n2001,"two\nlines"\n2002,x\n', 'a.csv');
    expect(table.rows.map((row) => row.line)).toEqual([2, 4]);
  });

  it('keeps rows whose width differs from the header', () => {
    expect(readCsvTable('a,b\n1\n1,2,3\n', 'a.csv').rows.map((row) => row.cells.length)).toEqual([1, 3]);
  });

  it('reports an unclosed quote at the line where it opens', () => {
    const problems = problemsOf(() => readCsvTable('period,value\n2001,1\n\n2002,"2\n2003,3\n2004,4\n', 'q.csv'));
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ code: 'csv.syntax', file: 'q.csv', line: 4 });
    expect(problems[0].message).toContain('never closed');
  });

  it('reports text after a closing quote at its line', () => {
    const problems = problemsOf(() => readCsvTable('period,value\n2001,1\n2002,"2"x\n', 'q.csv'));
    expect(problems[0]).toMatchObject({ code: 'csv.syntax', line: 3 });
  });

  it('refuses text with no rows at all', () => {
    for (const text of ['', '\uFEFF', '\n\n', ' , \r\n']) {
      expect(problemsOf(() => readCsvTable(text, 'e.csv'))[0]).toMatchObject({ code: 'csv.empty', file: 'e.csv' });
    }
  });
});
