// Missing required keys, rules across keys, and hostile text: the exact place and field of
// each problem. Expected messages are our spec (src/errors.ts, Config section).
import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../src/config/loadConfig.js';
import { formatProblem } from '../../src/base/problem.js';
import { problemsOf } from '../data/problemsOf.js';
import { BASE, onlyProblem, planOf, problemsIn } from './configText.js';

const REVIEWERS = ['  reviewers:', '    - name: Ada Quill', '    - name: Ben Moss'];

/** BASE with memo lines inserted after the title (from line 4 on). */
function memoWith(...lines: string[]): string[] {
  return [...BASE.slice(0, 3), ...lines, ...BASE.slice(3)];
}

describe('missing required keys', () => {
  it('reports a missing key at the start of the mapping that lacks it', () => {
    expect(onlyProblem(['memo:', '  title: Water outlook', ...BASE.slice(3)]).text).toBe(
      'memo.yaml:2:3: memo.id: is required but missing; add id: (Identifier of the memo; names its output folder. Lowercase letters, digits and single hyphens)',
    );
    expect(onlyProblem(['memo:', '  id: water-outlook', ...BASE.slice(3)])).toMatchObject({ where: '2:3 memo.title', code: 'config.missing' });
  });

  it('reports a missing series id and file at the series entry', () => {
    expect(onlyProblem([...BASE.slice(0, 4), '  - file: data/inflow.csv'])).toMatchObject({ where: '5:5 series[0].id', code: 'config.missing' });
    expect(onlyProblem([...BASE.slice(0, 5), '    title: Inflow'])).toMatchObject({ where: '5:5 series[0].file', code: 'config.missing' });
  });

  it('reports missing top-level sections at the first key', () => {
    expect(problemsIn(['output:', '  folder: out']).map((p) => `${p.line}:${p.column} ${p.field}`)).toEqual(['1:1 memo', '1:1 series']);
  });
});

describe('rules across keys', () => {
  it('refuses a series id used twice, naming the first use', () => {
    expect(onlyProblem([...BASE, '  - id: inflow', '    file: data/other.csv']).text).toBe(
      "memo.yaml:7:9: series[1].id: series id 'inflow' is already used by series[0].id (line 5); give every series its own id",
    );
  });

  it('refuses a reviewer listed twice', () => {
    expect(onlyProblem(memoWith(...REVIEWERS, '    - name: Ada Quill'))).toMatchObject({ where: '7:13 memo.reviewers[2].name', code: 'config.duplicate-reviewer' });
  });

  it('refuses a sign-off by someone who is not a listed reviewer, suggesting the closest name', () => {
    const lines = memoWith(...REVIEWERS, '  sign_off:', '    - reviewer: Ada Quil', '      date: 2026-10-05', '      decision: approved');
    expect(onlyProblem(lines).text).toBe(
      "memo.yaml:8:17: memo.sign_off[0].reviewer: 'Ada Quil' signs off but is not a listed reviewer; the reviewers are 'Ada Quill', 'Ben Moss'; did you mean 'Ada Quill'?",
    );
  });

  it('refuses a sign-off when no reviewer is listed', () => {
    const lines = memoWith('  sign_off: [{reviewer: Ada Quill, date: 2026-10-05, decision: rejected}]');
    expect(onlyProblem(lines)).toMatchObject({ where: '4:25 memo.sign_off[0].reviewer', code: 'config.unknown-reviewer' });
  });

  it('refuses a fixed recommendation model without a justification', () => {
    expect(onlyProblem([...BASE, '    recommendation:', '      model: stochastic']).text).toBe(
      'memo.yaml:8:14: series[0].recommendation.model: model is set to stochastic, which needs justification beside it; add justification: beside model:, or remove model:',
    );
    const justified = planOf([...BASE, '    recommendation:', '      model: stochastic', '      justification: The client plans on a drifting path.']);
    expect(justified.series[0].settings.recommendation?.model).toBe('stochastic');
  });
});

describe('text', () => {
  it('refuses control characters, naming the character and its place', () => {
    expect(onlyProblem(memoWith('  client: "Fen\\u0007wick"')).text).toBe(
      'memo.yaml:4:11: memo.client: holds the invisible control character U+0007 at character 4; remove it; write this value on one line with visible characters only',
    );
  });

  it('refuses a right-to-left override, which would make the text display out of order', () => {
    expect(onlyProblem(memoWith('  author: "A\\u202Egnp.exe"'))).toMatchObject({ where: '4:11 memo.author', code: 'config.control-character' });
  });

  it('refuses a line break in a one-line field but keeps it in notes', () => {
    expect(onlyProblem(memoWith('  reference: "BWB\\n07"')).text).toContain('holds a line break at character 4');
    const plan = planOf([...BASE, '    notes: |', '      First line.', '      Second line.']);
    expect(plan.series[0].notes).toBe('First line.\nSecond line.\n');
  });

  it('keeps punctuation such as < and &, which the memo escapes later', () => {
    expect(planOf(memoWith('  client: "Moss & Quill <advisory>"')).memo.client).toBe('Moss & Quill <advisory>');
  });

  it('refuses empty and over-long text', () => {
    expect(onlyProblem(memoWith('  client: ""'))).toMatchObject({ where: '4:11 memo.client', code: 'config.empty-text' });
    expect(onlyProblem(memoWith(`  client: ${'x'.repeat(201)}`)).text).toBe(
      'memo.yaml:4:11: memo.client: is 201 characters long; at most 200 are allowed; shorten it',
    );
  });
});

describe('many mistakes at once', () => {
  it('reports all five mistakes of one config in one run, in file order', () => {
    // test/fixtures/config/five-mistakes.yaml: one mistake on each of lines 2, 5, 9, 10 and 12.
    const file = 'test/fixtures/config/five-mistakes.yaml';
    expect(problemsOf(() => loadConfig(file)).map(formatProblem)).toEqual([
      `${file}:2:7: memo.id: 'Reservoir Outlook' is not an id of lowercase letters, digits and single hyphens; write an id such as water-demand-2026 (it becomes a folder name, so no spaces, capitals or other signs)`,
      `${file}:5:3: defaults.horizn: unknown key 'horizn'; did you mean 'horizon'?`,
      `${file}:9:12: series[0].max_p: 9 is above the largest allowed, 8; write a whole number from 0 to 8`,
      `${file}:10:9: series[1].id: series id 'inflow' is already used by series[0].id (line 7); give every series its own id`,
      `${file}:12:12: series[1].point: 'meen' is not one of median, mean; did you mean 'mean'?`,
    ]);
  });

  it('still checks the other series when one entry is not a mapping', () => {
    const problems = problemsIn([...BASE.slice(0, 4), '  - just-a-name', '  - id: inflow', '    file: a.csv', '  - id: inflow', '    file: b.csv']);
    expect(problems.map((p) => `${p.code}@${p.line}:${p.column} ${p.field}`)).toEqual([
      'config.wrong-type@5:5 series[0]',
      'config.duplicate-id@8:9 series[2].id',
    ]);
  });
});
