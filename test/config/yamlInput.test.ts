// The YAML layer and the file: syntax errors with their position, duplicate keys, the alias
// budget, and the file-level limits of loadConfig. Expected messages are our spec.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadConfig, MAX_CONFIG_FILE_BYTES } from '../../src/config/loadConfig.js';
import { parseConfig } from '../../src/config/parseConfig.js';
import { MAX_ALIAS_COUNT } from '../../src/config/readYamlTree.js';
import { formatProblem } from '../../src/base/problem.js';
import { problemsOf } from '../data/problemsOf.js';
import { BASE, onlyProblem, planOf, yaml } from './configText.js';
import { resolveSettings } from '../../src/config/resolveSettings.js';

const DIR = mkdtempSync(join(tmpdir(), 'trendbrief-config-'));
afterAll(() => rmSync(DIR, { recursive: true, force: true }));

function written(name: string, content: string | Buffer): string {
  const file = join(DIR, name);
  writeFileSync(file, content);
  return file;
}

describe('YAML syntax', () => {
  it('reports an unclosed quote at the quote that opens it, not where the parser runs out of text', () => {
    expect(onlyProblem([...BASE.slice(0, 2), "  title: 'Water outlook", ...BASE.slice(3)]).text).toBe(
      'memo.yaml:3:10: not valid YAML: a quote opened here is never closed; end the value with the same quote mark, or remove this one',
    );
  });

  it('reports a tab used for indentation', () => {
    expect(onlyProblem([...BASE, '\tnotes: x']).text).toBe('memo.yaml:7:1: not valid YAML: a tab is used for indentation; indent with spaces');
  });

  it('reports a second document', () => {
    expect(onlyProblem([...BASE, '---', 'memo: {}'])).toMatchObject({ where: '7:1 undefined', code: 'config.syntax' });
  });

  it('reports a key given twice in one mapping with the line of the first', () => {
    expect(onlyProblem([...BASE, '    file: data/other.csv']).text).toBe('memo.yaml:7:5: series[0].file: key already given on line 6; keep one of the two');
  });

  it('refuses a key that is not a plain name', () => {
    expect(onlyProblem([...BASE, '? [a, b]', ': 1'])).toMatchObject({ where: '7:3 undefined', code: 'config.key-type' });
  });

  it('refuses a document that is not a mapping, and an empty one', () => {
    expect(onlyProblem(['- memo']).text).toMatch(/^memo\.yaml:1:1: expected a mapping of keys such as \{memo: /);
    expect(problemsOf(() => parseConfig('~\n', 'memo.yaml', '/')).map((p) => p.code)).toEqual(['config.empty']);
    expect(problemsOf(() => parseConfig('# only a comment\n', 'memo.yaml', '/')).map(formatProblem)).toEqual([
      'memo.yaml: holds no settings; write the memo and series sections; trendbrief init writes a starter config',
    ]);
  });
});

describe('aliases', () => {
  it('reads a value shared through an anchor and an alias', () => {
    const plan = planOf([...BASE, '    levels: &levels [90, 50]', '  - id: outflow', '    file: b.csv', '    levels: *levels']);
    expect(plan.series.map((s) => resolveSettings(s.settings, { frequency: 'annual', n: 100 }).levels)).toEqual([
      [50, 90],
      [50, 90],
    ]);
    expect(plan.series[1].settingPlaces.get('levels')).toEqual({ field: 'series[1].levels', line: 10, column: 13 });
  });

  it('refuses YAML merge keys, which the YAML 1.2 core schema does not define', () => {
    const lines = [...BASE, '    backtest: &test {origins: 2}', '  - id: outflow', '    file: b.csv', '    backtest:', '      <<: *test'];
    expect(onlyProblem(lines)).toMatchObject({ where: '11:7 series[1].backtest.<<', code: 'config.unknown-key' });
  });

  it('refuses aliases that expand beyond the budget', () => {
    // Each level lists the one above ten times. Line 2 makes 10 dereferences and each *b on
    // line 3 makes 11, so the count passes 100 inside the ninth *b, at column 10 + 4 * 8.
    const lines = ['x-a: &a [1, 2, 3]', `x-b: &b [${Array(10).fill('*a').join(', ')}]`, `x-c: &c [${Array(10).fill('*b').join(', ')}]`, `x-d: [${Array(10).fill('*c').join(', ')}]`];
    const problems = problemsOf(() => parseConfig(yaml([...lines, ...BASE]), 'memo.yaml', '/'));
    expect(problems.map(formatProblem)).toEqual([
      `memo.yaml:3:${10 + 4 * 8}: aliases expand to more than ${MAX_ALIAS_COUNT} copies; write the repeated settings once under defaults instead of copying them with aliases`,
    ]);
  });
});

describe('the config file', () => {
  it('refuses a file above the size limit before parsing it', () => {
    const text = `${yaml(BASE)}#${'x'.repeat(MAX_CONFIG_FILE_BYTES)}\n`;
    const file = written('large.yaml', text);
    expect(problemsOf(() => loadConfig(file)).map(formatProblem)).toEqual([
      `${file}: is ${Buffer.byteLength(text)} bytes, above the 1 MB limit for a config file; a config describes a memo; keep data in the series CSV files it names`,
    ]);
  });

  it('refuses text that is not UTF-8', () => {
    const file = written('latin1.yaml', Buffer.concat([Buffer.from(yaml(BASE)), Buffer.from([0x23, 0xe9, 0x0a])]));
    expect(problemsOf(() => loadConfig(file))).toMatchObject([{ code: 'config.not-utf8', file }]);
  });

  it('names a missing file and a folder given as a config', () => {
    const missing = join(DIR, 'nowhere.yaml');
    expect(problemsOf(() => loadConfig(missing))).toMatchObject([{ code: 'config.file-missing', file: missing }]);
    const folder = join(DIR, 'folder.yaml');
    mkdirSync(folder);
    expect(problemsOf(() => loadConfig(folder))).toMatchObject([{ code: 'config.not-a-file', file: folder }]);
  });
});
