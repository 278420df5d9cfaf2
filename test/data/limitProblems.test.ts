import { describe, expect, it } from 'vitest';
import { limitProblems } from '../../src/base/limitProblems.js';
import { problem } from '../../src/base/problem.js';
import { codesAndLines } from './problemsOf.js';

describe('limitProblems', () => {
  it('orders problems by line and puts problems about the whole file last', () => {
    const found = limitProblems([
      problem('series.too-few', 'has 3 observations; at least 10 are needed', 'hint', { file: 'f.csv' }),
      problem('csv.bad-value', 'x', 'hint', { file: 'f.csv', line: 9 }),
      problem('csv.gap', 'y', 'hint', { file: 'f.csv', line: 4 }),
    ]);
    expect(codesAndLines(found)).toEqual(['csv.gap@4', 'csv.bad-value@9', 'series.too-few@-']);
  });

  it('keeps the first problems of each code and folds the rest into one summary naming their lines', () => {
    const many = Array.from({ length: 5 }, (_, i) => problem('csv.bad-value', 'bad', 'fix it', { file: 'f.csv', line: i + 2, field: 'value' }));
    const found = limitProblems([...many, problem('csv.gap', 'gap', 'fill it', { file: 'f.csv', line: 3 })], 2);
    expect(codesAndLines(found)).toEqual(['csv.bad-value@2', 'csv.bad-value@3', 'csv.gap@3', 'csv.bad-value@4']);
    expect(found[3]).toMatchObject({ file: 'f.csv', field: 'value', hint: 'fix it', message: 'and 3 more lines with this kind of problem: 4, 5, 6' });
  });
});
