// Bad input on the command line: exit code 2, nothing on stdout, and one stderr line per
// problem in the form `file:line:column: field: what is wrong; what to do`, absent parts left out
// (the contract in the design notes, "Interface contracts").
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../support/runCli.js';

const LAKE_HURON = 'test/fixtures/lake-huron.csv';
const DIR = mkdtempSync(join(tmpdir(), 'trendbrief-cli-'));
afterAll(() => rmSync(DIR, { recursive: true, force: true }));

/** Lines of lake-huron.csv (R 4.2.2 datasets::LakeHuron): header on line 1, year Y on line Y − 1873. */
const LAKE_LINES = readFileSync(LAKE_HURON, 'utf8').trimEnd().split('\n');

function writeSeries(name: string, lines: readonly string[]): string {
  const file = join(DIR, name);
  writeFileSync(file, `${lines.join('\n')}\n`);
  return file;
}

/** The 1900 line removed, so 1901 sits on line 27 right after 1899. */
const GAP_FILE = writeSeries('gap.csv', LAKE_LINES.filter((line) => !line.startsWith('1900,')));
/** Header and the first 10 years. */
const TEN_YEARS = writeSeries('ten-years.csv', LAKE_LINES.slice(0, 11));
/** Header and the first 4 years. */
const FOUR_YEARS = writeSeries('four-years.csv', LAKE_LINES.slice(0, 5));

/** The run failed with exit code 2, printed nothing on stdout, and gave one line per expected place. */
async function expectProblems(argv: readonly string[], places: readonly string[]): Promise<string[]> {
  const run = await runCli(argv);
  expect(run.code).toBe(2);
  expect(run.stdout).toBe('');
  expect(run.stderr.endsWith('\n')).toBe(true);
  expect(run.errorLines).toHaveLength(places.length);
  run.errorLines.forEach((line, index) => {
    expect(line.startsWith(places[index]), `${line} starts with ${places[index]}`).toBe(true);
    // What is wrong, then what to do, separated by one semicolon.
    expect(line.slice(places[index].length)).toMatch(/^[^;]+; \S.*$/);
  });
  return run.errorLines;
}

describe('bad commands and options', () => {
  it('names an unknown command and suggests the closest one', async () => {
    const [line] = await expectProblems(['fti', LAKE_HURON], ['']);
    expect(line).toBe("unknown command 'fti'; did you mean 'fit'? See trendbrief --help");
  });

  it('names an unknown command without a guess when none is close', async () => {
    const [line] = await expectProblems(['forecast'], ['']);
    expect(line).toBe("unknown command 'forecast'; see trendbrief --help for the commands");
  });

  it('asks for a command when none is given', async () => {
    await expectProblems([], ['']);
  });

  it('names an unknown option and suggests the closest', async () => {
    const [unknown, misspelt] = await expectProblems(['fit', LAKE_HURON, '--colour', '--horizn', '5'], ['--colour: ', '--horizn: ']);
    expect(unknown).toBe('--colour: unknown option; see trendbrief fit --help for the options');
    expect(misspelt).toBe('--horizn: unknown option; did you mean --horizon? See trendbrief fit --help');
  });

  it('asks for a CSV file when none is given', async () => {
    await expectProblems(['fit', '--json'], ['']);
  });

  it('asks for the value an option needs', async () => {
    await expectProblems(['fit', LAKE_HURON, '--horizon'], ['--horizon: ']);
  });

  it('refuses a value given to a switch', async () => {
    const [line] = await expectProblems(['fit', LAKE_HURON, '--json=yes'], ['--json: ']);
    expect(line).toBe('--json: is a switch and takes no value; write --json alone, or see trendbrief fit --help');
  });

  // The horizon range 1 to 1000 is the fit command's documented limit (fit --help).
  it.each(['0', '-3', 'abc', '5000', '2.5'])('refuses --horizon %s', async (value) => {
    const [line] = await expectProblems(['fit', LAKE_HURON, '--horizon', value], ['--horizon: ']);
    expect(line).toBe(`--horizon: '${value}' is not a whole number from 1 to 1000; give --horizon a whole number from 1 to 1000`);
  });

  it('refuses --max-p 99', async () => {
    const [line] = await expectProblems(['fit', LAKE_HURON, '--max-p', '99'], ['--max-p: ']);
    expect(line).toContain('from 0 to 8');
  });

  it('refuses --levels 120', async () => {
    const [line] = await expectProblems(['fit', LAKE_HURON, '--levels', '120'], ['--levels: ']);
    expect(line).toContain("'120'");
  });

  it('refuses --transform box-cox:abc', async () => {
    const [line] = await expectProblems(['fit', LAKE_HURON, '--transform', 'box-cox:abc'], ['--transform: ']);
    expect(line).toContain('box-cox:LAMBDA');
  });

  it('refuses a year figure that is neither total nor average', async () => {
    const [line] = await expectProblems(['fit', LAKE_HURON, '--year-figure', 'sum'], ['--year-figure: ']);
    expect(line).toContain('total, average');
  });

  it('reports several bad options in one run, one line each', async () => {
    await expectProblems(
      ['fit', LAKE_HURON, '--bogus', '--horizon', '0', '--max-p', '99', '--levels', '120', '--transform', 'box-cox:abc', '--point', 'mode'],
      ['--bogus: ', '--transform: ', '--horizon: ', '--max-p: ', '--levels: ', '--point: '],
    );
  });
});

describe('bad series files', () => {
  it('names a missing file', async () => {
    const missing = join(DIR, 'absent.csv');
    const [line] = await expectProblems(['fit', missing], [`${missing}: `]);
    expect(line).toContain('not found');
  });

  it('names a directory given as the file', async () => {
    const [line] = await expectProblems(['fit', 'test/fixtures'], ['test/fixtures: ']);
    expect(line).toContain('directory');
  });

  it('points at the line after a gap and names the missing period', async () => {
    const [line] = await expectProblems(['fit', GAP_FILE], [`${GAP_FILE}:27:1: period: `]);
    expect(line).toContain('missing 1900 before 1901');
  });

  // AICc = −2 logL + 2k + 2k(k+1)/(m − k − 1) is finite only for m > k + 1 (Hurvich & Tsai 1989).
  // At max orders (3,3): deterministic k = 3 + 3 + 2 + 1 = 9, m = n, so n ≥ 11; stochastic k = 8,
  // m = n − 1, so n ≥ 11 as well.
  it('states the minimum of 11 observations for the default orders', async () => {
    const [line] = await expectProblems(['fit', TEN_YEARS], [`${TEN_YEARS}: value: `]);
    expect(line).toContain('has 10 observations; at least 11 are needed');
  });

  // At max orders (0,0): deterministic k = 3 needs n ≥ 5; stochastic k = 2 needs n − 1 ≥ 4.
  it('states the smaller minimum of 5 for --max-p 0 --max-q 0', async () => {
    const [line] = await expectProblems(['fit', FOUR_YEARS, '--max-p', '0', '--max-q', '0'], [`${FOUR_YEARS}: value: `]);
    expect(line).toContain('has 4 observations; at least 5 are needed');
    const longer = await runCli(['fit', TEN_YEARS, '--max-p', '0', '--max-q', '0', '--json']);
    expect(longer.code).toBe(0);
  });
});
