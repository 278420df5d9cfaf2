// One config mistake at a time: the exact line, column and field of the one problem reported,
// its code, and for each kind the wording. Expected messages are our spec (src/errors.ts,
// Config section); positions are read off the numbered lines of each config.
import { describe, expect, it } from 'vitest';
import { BASE, onlyProblem, planOf } from './configText.js';

/** BASE with `lines` added to the first series (from line 7 on). */
function seriesWith(...lines: string[]): string[] {
  return [...BASE, ...lines.map((line) => `    ${line}`)];
}

describe('unknown keys', () => {
  it('suggests the closest valid key', () => {
    expect(onlyProblem(seriesWith('horizn: 12'))).toEqual({
      where: '7:5 series[0].horizn',
      code: 'config.unknown-key',
      text: "memo.yaml:7:5: series[0].horizn: unknown key 'horizn'; did you mean 'horizon'?",
    });
  });

  it('lists the keys allowed when none is close', () => {
    const { where, text } = onlyProblem([...BASE, 'colour: blue']);
    expect(where).toBe('7:1 colour');
    expect(text).toBe("memo.yaml:7:1: colour: unknown key 'colour'; the keys allowed here are memo, defaults, series, output");
  });

  it('finds unknown keys nested in settings groups', () => {
    expect(onlyProblem(seriesWith('backtest:', '  orgins: 5')).where).toBe('8:7 series[0].backtest.orgins');
  });
});

describe('wrong types', () => {
  it('names what was expected and what was found', () => {
    expect(onlyProblem(seriesWith('horizon: twelve'))).toEqual({
      where: '7:14 series[0].horizon',
      code: 'config.wrong-type',
      text: "memo.yaml:7:14: series[0].horizon: expected a whole number from 1 to 1000, found text 'twelve'; write a whole number from 1 to 1000",
    });
  });

  it('asks for a quoted number without its quotes', () => {
    expect(onlyProblem(seriesWith('max_q: "2"')).text).toBe(
      "memo.yaml:7:12: series[0].max_q: expected a whole number from 0 to 8, found text '2'; write the number without quotes",
    );
  });

  it('reports a key without a value at the key', () => {
    expect(onlyProblem(seriesWith('title:')).text).toBe('memo.yaml:7:5: series[0].title: has no value; give it text, or remove it');
  });

  it('refuses a list where a mapping belongs, and true where text belongs', () => {
    expect(onlyProblem([...BASE, 'defaults: [horizon]']).where).toBe('7:11 defaults');
    expect(onlyProblem(seriesWith('units: true')).text).toBe(
      'memo.yaml:7:12: series[0].units: expected text, found true; put the value in quotes if it is meant as text, or write text',
    );
  });

  it('refuses a transform that is neither a name nor a box_cox mapping', () => {
    expect(onlyProblem(seriesWith('transform: [log]')).text).toBe(
      'memo.yaml:7:16: series[0].transform: expected none, log, or a mapping such as {box_cox: 0.5}, found a list; write none, log, or a mapping such as {box_cox: 0.5}',
    );
  });

  it('refuses a switch written as yes (YAML 1.2 reads it as text)', () => {
    expect(onlyProblem(seriesWith('coefficient_uncertainty: yes')).where).toBe('7:30 series[0].coefficient_uncertainty');
  });
});

describe('numbers out of range', () => {
  // Ranges from our spec: horizon 1..1000, orders 0..8, levels 50..99.9, significance 0.01..0.10,
  // Box-Cox lambda -2..2, backtest origins 1..200 and horizon 1..100.
  it.each([
    ['horizon: 0', '7:14 series[0].horizon', '0 is below the smallest allowed, 1; write a whole number from 1 to 1000'],
    ['horizon: 1001', '7:14 series[0].horizon', '1001 is above the largest allowed, 1000; write a whole number from 1 to 1000'],
    ['max_p: 9', '7:12 series[0].max_p', '9 is above the largest allowed, 8; write a whole number from 0 to 8'],
    ['max_q: -1', '7:12 series[0].max_q', '-1 is below the smallest allowed, 0; write a whole number from 0 to 8'],
    ['levels: [80, 100]', '7:18 series[0].levels[1]', '100 is not below 100; write a number above 0 and below 100'],
    ['levels: [0]', '7:14 series[0].levels[0]', '0 is not above 0; write a number above 0 and below 100'],
    ['significance: 0.2', '7:19 series[0].significance', '0.2 is above the largest allowed, 0.1; write a number from 0.01 to 0.1'],
    ['transform: {box_cox: -2.5}', '7:26 series[0].transform.box_cox', '-2.5 is below the smallest allowed, -2; write a number from -2 to 2'],
    ['backtest: {origins: 201}', '7:25 series[0].backtest.origins', '201 is above the largest allowed, 200; write a whole number from 1 to 200'],
    ['backtest: {horizon: 101}', '7:25 series[0].backtest.horizon', '101 is above the largest allowed, 100; write a whole number from 1 to 100'],
    ['recommendation: {significance: 0.005}', '7:36 series[0].recommendation.significance', '0.005 is below the smallest allowed, 0.01; write a number from 0.01 to 0.1'],
  ])('%s', (line, where, text) => {
    const problem = onlyProblem(seriesWith(line));
    expect(problem.where).toBe(where);
    expect(problem.code).toBe('config.out-of-range');
    expect(problem.text).toBe(`memo.yaml:${where.replace(' ', ': ')}: ${text}`);
  });

  it('refuses a fraction where a whole number belongs, and infinity', () => {
    expect(onlyProblem(seriesWith('horizon: 2.5'))).toMatchObject({ where: '7:14 series[0].horizon', code: 'config.not-whole' });
    expect(onlyProblem(seriesWith('significance: .inf'))).toMatchObject({ where: '7:19 series[0].significance', code: 'config.not-finite' });
  });
});

describe('choices, periods, ids and dates', () => {
  it('suggests the closest choice', () => {
    expect(onlyProblem(seriesWith('point: meen')).text).toBe("memo.yaml:7:12: series[0].point: 'meen' is not one of median, mean; did you mean 'mean'?");
    expect(onlyProblem(seriesWith('year_figure: sum'))).toEqual({
      where: '7:18 series[0].year_figure',
      code: 'config.bad-choice',
      text: "memo.yaml:7:18: series[0].year_figure: 'sum' is not one of total, average; write one of total, average",
    });
  });

  it('refuses a period that is none of the three forms, and accepts a bare year', () => {
    const lines = [...BASE.slice(0, 3), '  as_of: 2026-13', ...BASE.slice(3)];
    expect(onlyProblem(lines)).toMatchObject({ where: '4:10 memo.as_of', code: 'config.bad-period' });
    expect(planOf([...BASE.slice(0, 3), '  as_of: 2026', ...BASE.slice(3)]).memo.asOf).toBe('2026');
  });

  it('refuses an id that cannot be a folder name', () => {
    const lines = ['memo:', '  id: ../Water Outlook', ...BASE.slice(2)];
    expect(onlyProblem(lines)).toMatchObject({ where: '2:7 memo.id', code: 'config.bad-slug' });
    expect(onlyProblem([...BASE.slice(0, 4), '  - id: Inflow--A', BASE[5]])).toMatchObject({ where: '5:9 series[0].id', code: 'config.bad-slug' });
  });

  it('refuses a badly written date and a day the calendar lacks', () => {
    const signed = (date: string) => [...BASE.slice(0, 3), '  reviewers: [{name: Ada Quill}]', '  sign_off:', '    - reviewer: Ada Quill', `      date: ${date}`, '      decision: approved', ...BASE.slice(3)];
    expect(onlyProblem(signed('05/10/2026')).text).toBe("memo.yaml:7:13: memo.sign_off[0].date: '05/10/2026' is not a date; write the date as YYYY-MM-DD, e.g. 2026-10-05");
    expect(onlyProblem(signed('2026-02-29'))).toMatchObject({ where: '7:13 memo.sign_off[0].date', code: 'config.bad-date' });
    expect(planOf(signed('2028-02-29')).memo.signOff[0].date).toBe('2028-02-29');
  });
});

describe('lists', () => {
  it('refuses an empty series list and a level listed twice', () => {
    expect(onlyProblem([...BASE.slice(0, 3), 'series: []']).text).toBe('memo.yaml:4:9: series: has 0 items; at least 1 is needed; add items to the list');
    expect(onlyProblem(seriesWith('levels: [80, 95, 80]')).text).toBe(
      'memo.yaml:7:22: series[0].levels[2]: 80 is already listed at series[0].levels[0]; list each value once',
    );
  });
});
