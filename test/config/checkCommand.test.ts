// `trendbrief check` in-process: one OK line per passing config, every problem of the others,
// series files read with the run's checks, exit code 0 or 2. Expected wording is our spec.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../support/runCli.js';

const FULL = 'test/fixtures/config/plans/full.yaml';
const MINIMAL = 'test/fixtures/config/minimal.yaml';
const FIVE_MISTAKES = 'test/fixtures/config/five-mistakes.yaml';
const DIR = mkdtempSync(join(tmpdir(), 'trendbrief-check-'));
afterAll(() => rmSync(DIR, { recursive: true, force: true }));

function written(name: string, lines: readonly string[]): string {
  const file = join(DIR, name);
  writeFileSync(file, `${lines.join('\n')}\n`);
  return file;
}

/** Eight invented annual values, one of them zero. */
const SHORT = written('short.csv', ['year,value', '2017,5', '2018,7', '2019,6', '2020,0', '2021,9', '2022,8', '2023,11', '2024,12']);

function configFor(name: string, ...settings: string[]): string {
  return written(name, ['memo:', '  id: short-memo', '  title: Short', 'series:', '  - id: short', '    file: short.csv', ...settings.map((s) => `    ${s}`)]);
}

describe('trendbrief check', () => {
  it('prints one line per config that passes and exits 0', async () => {
    const run = await runCli(['check', FULL, MINIMAL]);
    expect(run.code).toBe(0);
    expect(run.stderr).toBe('');
    expect(run.stdout).toBe(
      `${FULL}: ok, memo brackenfold-water-2026, 2 series: reservoir-inflow 1995 to 2024 (30 annual); meter-reads 2014-Q1 to 2024-Q4 (44 quarterly)\n` +
        `${MINIMAL}: ok, memo meter-reads, 1 series: meter-reads 2014-Q1 to 2024-Q4 (44 quarterly)\n`,
    );
  });

  it('checks every config, reports every problem, and exits 2 when any fails', async () => {
    const run = await runCli(['check', FIVE_MISTAKES, MINIMAL]);
    expect(run.code).toBe(2);
    expect(run.stdout).toBe(`${MINIMAL}: ok, memo meter-reads, 1 series: meter-reads 2014-Q1 to 2024-Q4 (44 quarterly)\n`);
    expect(run.errorLines.map((line) => line.split(': ')[0])).toEqual(['2:7', '5:3', '9:12', '10:9', '12:12'].map((at) => `${FIVE_MISTAKES}:${at}`));
  });

  it('asks the series for as many observations as the order limits need', async () => {
    // requiredObservations: 11 for max_p = max_q = 3 (the default), 6 for max_p 1, max_q 0.
    const strict = await runCli(['check', configFor('strict.yaml')]);
    expect(strict.code).toBe(2);
    expect(strict.errorLines).toEqual([
      `${SHORT}: value: has 8 observations; at least 11 are needed; supply a longer series, or choose settings that need fewer observations`,
    ]);
    const loose = await runCli(['check', configFor('loose.yaml', 'max_p: 1', 'max_q: 0')]);
    expect(loose.code).toBe(0);
    expect(loose.stdout).toBe(`${join(DIR, 'loose.yaml')}: ok, memo short-memo, 1 series: short 2017 to 2024 (8 annual)\n`);
  });

  it('checks the values against the transform', async () => {
    const run = await runCli(['check', configFor('logged.yaml', 'max_p: 1', 'max_q: 0', 'transform: log')]);
    expect(run.code).toBe(2);
    expect(run.errorLines).toEqual([
      `${SHORT}:5: value: value 0 is not positive, which the log transform needs; choose no transform, or a series whose values are all above zero`,
    ]);
  });

  it('names a config file that does not exist, and asks for one when none is given', async () => {
    const missing = join(DIR, 'absent.yaml');
    expect((await runCli(['check', missing])).errorLines).toEqual([`${missing}: config file not found; check the path and its spelling`]);
    const none = await runCli(['check']);
    expect(none.code).toBe(2);
    expect(none.errorLines).toEqual(['check needs at least one config file; give one or more, e.g. trendbrief check memo.yaml']);
  });

  it('refuses an unknown option', async () => {
    const run = await runCli(['check', '--strict', MINIMAL]);
    expect(run.code).toBe(2);
    expect(run.errorLines).toEqual(['--strict: unknown option; see trendbrief check --help for the options']);
  });

  it('prints its help', async () => {
    const run = await runCli(['check', '--help']);
    expect(run.code).toBe(0);
    expect(run.stdout.startsWith('Usage: trendbrief check CONFIG.yaml...\n')).toBe(true);
  });

  it('reports a scored level outside the levels once, at the line that sets it, however many series it applies to', async () => {
    const file = written('scored.yaml', [
      'memo:',
      '  id: scored-memo',
      '  title: Scored',
      'defaults:',
      '  max_p: 0',
      '  max_q: 0',
      '  recommendation: {scored_level: 90}',
      'series:',
      '  - id: first',
      '    file: short.csv',
      '    transform: none',
      '  - id: second',
      '    file: short.csv',
      '    transform: none',
    ]);
    const run = await runCli(['check', file]);
    expect(run.code).toBe(2);
    // Built-in levels [80, 95] (src/config/builtInSettings.ts); the rule is ours (src/config/resolveSettings.ts).
    expect(run.errorLines).toEqual([
      `${file}:7:34: defaults.recommendation.scored_level: 90 is not one of the interval levels (80, 95); give one of 80, 95, or add 90 to levels`,
    ]);
  });
});

