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


describe('check warns about what the run will do but the memo will be weaker for', () => {
  // Invented series, written here. Settings resolve as src/config/resolveSettings.ts says:
  // min_train = max(20, 3 × (max_p + max_q + 3)), 27 at the default orders 3 and 3, 20 at (1, 0);
  // the backtest horizon is the horizon, shortened to keep 10 origins (n − min_train − 9).
  const annual = (name: string, n: number, first: number, value: (i: number) => number): string =>
    written(name, ['year,value', ...Array.from({ length: n }, (_, i) => `${first + i},${value(i)}`)]);
  /** A wobble with no seasonal period: 7 does not divide 12. */
  const wobble = (i: number): number => [3, -1, 4, -1, -5, 9, -2][i % 7];
  const monthly = (name: string, seasonal: boolean): string =>
    written(name, ['month,value', ...Array.from({ length: 48 }, (_, i) => `${2021 + Math.floor(i / 12)}-${String((i % 12) + 1).padStart(2, '0')},${(500 + 2 * i + (seasonal ? 40 * Math.sin((2 * Math.PI * (i % 12)) / 12) : 0) + wobble(i)).toFixed(2)}`)]);
  const config = (name: string, file: string, settings: readonly string[], asOf?: string): string =>
    written(name, ['memo:', '  id: pre-flight', '  title: Pre-flight', ...(asOf === undefined ? [] : [`  as_of: ${asOf}`]), 'series:', '  - id: s', `    file: ${file}`, ...settings.map((s) => `    ${s}`)]);
  annual('a30.csv', 30, 1995, (i) => 100 + 3 * i + (i % 4));
  annual('a25.csv', 25, 2000, (i) => 50 + 2 * i + (i % 3));
  annual('a40.csv', 40, 1985, (i) => 200 + i + ((i * 7) % 5));
  monthly('m48.csv', true);
  monthly('m48flat.csv', false);

  async function warnings(file: string): Promise<string[]> {
    const run = await runCli(['check', file]);
    expect(run.code).toBe(0);
    expect(run.stdout.startsWith(`${file}: ok,`)).toBe(true);
    return run.errorLines;
  }

  it('a backtest with fewer origins than a comparison needs, and a horizon it cannot reach', async () => {
    // n = 30, min_train 27: one step scored, 30 − 1 − 27 + 1 = 3 origins.
    const file = config('thin.yaml', 'a30.csv', ['horizon: 10']);
    expect(await warnings(file)).toEqual([
      `${file}:5:5: series[0].backtest.min_train: warning: series 's' leaves room for 3 backtest origins (30 observations, training windows of at least 27), fewer than the 10 a comparison needs to count; the memo will call the backtest a rough guide; supply a longer history, or lower backtest.min_train or max_p and max_q`,
      `${file}:7:14: series[0].horizon: warning: series 's' is forecast 10 steps ahead, but its history lets the backtest score only 1; beyond 1 neither model's accuracy is checked and the choice rests on the models' assumptions; supply a longer history, or shorten horizon; the memo says how far the backtest reached`,
    ]);
  });

  it('a series too short for any backtest', async () => {
    // n = 25 < 27 + 1.
    const file = config('nobacktest.yaml', 'a25.csv', []);
    expect(await warnings(file)).toEqual([
      `${file}:5:5: series[0].backtest.min_train: warning: series 's' has 25 observations, too few for a backtest, which needs 28 (27 to train on, 1 to score); the memo will say that neither model's accuracy has been checked; supply a longer history, or lower max_p and max_q (the shortest training window is max(20, 3 × (max_p + max_q + 3)))`,
    ]);
  });

  it('a horizon beyond the backtest, or, with the backtest horizon written, beyond half the history', async () => {
    // n = 40, min_train 20: the backtest reaches 40 − 20 − 9 = 11 steps.
    const beyond = config('beyond.yaml', 'a40.csv', ['max_p: 1', 'max_q: 0', 'horizon: 25']);
    expect(await warnings(beyond)).toEqual([
      `${beyond}:9:14: series[0].horizon: warning: series 's' is forecast 25 steps ahead, but its history lets the backtest score only 11; beyond 11 neither model's accuracy is checked and the choice rests on the models' assumptions; supply a longer history, or shorten horizon; the memo says how far the backtest reached`,
    ]);
    const long = config('long.yaml', 'a40.csv', ['max_p: 1', 'max_q: 0', 'horizon: 25', 'backtest:', '  horizon: 5']);
    expect(await warnings(long)).toEqual([
      `${long}:9:14: series[0].horizon: warning: series 's' is forecast 25 steps ahead from 40 observations, more than half its history; the trends are extrapolated further than the data reach back; consider a horizon of at most 20, and read the far end of the memo's intervals as the models' assumptions rather than evidence`,
    ]);
    expect(await warnings(config('short-horizon.yaml', 'a40.csv', ['max_p: 1', 'max_q: 0', 'horizon: 5']))).toEqual([]);
  });

  it('a clear seasonal pattern under seasonal: none, and none for data without one', async () => {
    // A monthly pattern of amplitude 40 (variance 40²/2 = 800) over a wobble of variance about 18.6:
    // by hand F_S ≈ 1 − 18.6/818.6 ≈ 0.98 if all the wobble stayed in the remainder; STL leaves less of it there.
    const file = config('seasonal.yaml', 'm48.csv', ['seasonal: none', 'max_p: 1', 'max_q: 1', 'horizon: 12']);
    expect(await warnings(file)).toEqual([
      `${file}:7:15: series[0].seasonal: warning: series 's' is monthly and shows a clear seasonal pattern (STL seasonal strength 0.99 on a scale from 0 to 1), but seasonal: none leaves it out of both models; seasonal: none is for seasonally adjusted data; if these data are not adjusted, remove the key or write seasonal: auto so that the models carry the pattern`,
    ]);
    expect(await warnings(config('flat.yaml', 'm48flat.csv', ['seasonal: none', 'max_p: 1', 'max_q: 1', 'horizon: 12']))).toEqual([]);
  });

  it('data ending well before memo.as_of (a warning) and data past it (refused, as the run does)', async () => {
    const early = config('asof.yaml', 'a40.csv', ['max_p: 1', 'max_q: 0', 'horizon: 5'], '2030');
    expect(await warnings(early)).toEqual([
      `${early}:4:10: memo.as_of: warning: series 's' (a40.csv) ends in 2024, 6 years before 2030, the last period the as-of period 2030 can include; check that a40.csv holds the latest observations, or set memo.as_of to the period the data speak for; the run goes on and the memo notes the gap`,
    ]);
    const past = await runCli(['check', config('past.yaml', 'a40.csv', ['max_p: 1', 'max_q: 0', 'horizon: 5'], '2020')]);
    expect(past.code).toBe(2);
    expect(past.errorLines).toHaveLength(1);
    expect(past.errorLines[0]).toMatch(/^.*past\.yaml:4:10: memo\.as_of: /);
  });
});
