// The stated bounds on what a run reads, at their edges: a config of exactly 1 MB and a series
// file of exactly 20 MB are read and one byte more is refused; 100 alias dereferences are
// allowed and the 101st refused (our spec; DEVELOPERS.md, Config, "YAML").
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_ALIAS_COUNT } from '../../src/config/readYamlTree.js';
import { MAX_CONFIG_FILE_BYTES } from '../../src/config/loadConfig.js';
import { MAX_SERIES_FILE_BYTES } from '../../src/data/readSeriesCsv.js';
import { runCli } from '../support/runCli.js';
import { HARDENING_FIXTURES } from './refusedCases.js';

let root = '';
let config = '';

beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'tb-limits-'));
  cpSync(join(HARDENING_FIXTURES, 'base'), root, { recursive: true });
  config = readFileSync(join(root, 'memo.yaml'), 'utf8');
});

afterAll(() => rmSync(root, { recursive: true, force: true }));

/** The base config followed by a comment that brings it to exactly `bytes` bytes. */
function configOfSize(bytes: number): string {
  const comment = `# ${'padding '.repeat(bytes)}`.slice(0, bytes - config.length - 1);
  return `${config}${comment}\n`;
}

/** The base series with a comment column whose cells bring the file to exactly `bytes` bytes. */
function seriesOfSize(bytes: number): string {
  const rows = readFileSync(join(HARDENING_FIXTURES, 'base/data/cargo.csv'), 'utf8').trimEnd().split('\n');
  const header = `${rows[0]},comment\n`;
  const data = rows.slice(1);
  // Each data line gains `,` + its comment + the line end it already had.
  const room = bytes - header.length - data.reduce((sum, row) => sum + row.length + 2, 0);
  const cell = Math.floor(room / data.length);
  const extra = room - cell * data.length;
  return header + data.map((row, i) => `${row},${'x'.repeat(cell + (i === 0 ? extra : 0))}\n`).join('');
}

/** check's exit code and what it printed on stderr, less its warnings about the short fixture series' backtest. */
async function check(file: string): Promise<{ code: number; stderr: string }> {
  const run = await runCli(['check', file]);
  return { code: run.code, stderr: run.errorLines.filter((line) => !line.includes(': warning: ')).map((line) => `${line}\n`).join('') };
}

describe('size limits', () => {
  it('reads a config of exactly 1 MB and refuses one byte more', async () => {
    const file = join(root, 'sized.yaml');
    writeFileSync(file, configOfSize(MAX_CONFIG_FILE_BYTES));
    expect(readFileSync(file).byteLength).toBe(MAX_CONFIG_FILE_BYTES);
    expect(await check(file)).toEqual({ code: 0, stderr: '' });
    writeFileSync(file, configOfSize(MAX_CONFIG_FILE_BYTES + 1));
    expect(await check(file)).toEqual({
      code: 2,
      stderr: `${file}: is 1048577 bytes, above the 1 MB limit for a config file; a config describes a memo; keep data in the series CSV files it names\n`,
    });
  });

  it('reads a series file of exactly 20 MB and refuses one byte more', async () => {
    const series = join(root, 'data/cargo.csv');
    writeFileSync(series, seriesOfSize(MAX_SERIES_FILE_BYTES));
    expect(readFileSync(series).byteLength).toBe(MAX_SERIES_FILE_BYTES);
    expect(await check(join(root, 'memo.yaml'))).toMatchObject({ code: 0, stderr: '' });
    writeFileSync(series, seriesOfSize(MAX_SERIES_FILE_BYTES + 1));
    const refused = await check(join(root, 'memo.yaml'));
    expect(refused.code).toBe(2);
    expect(refused.stderr).toBe(
      `${join(root, 'memo.yaml')}:13:11: series[0].file: 'data/cargo.csv' is 20.1 MB, above the 20 MB limit for a series file; keep only the period column and the value columns you need\n`,
    );
    cpSync(join(HARDENING_FIXTURES, 'base/data/cargo.csv'), series);
  });
});

describe('aliases', () => {
  /** A config whose series share one backtest mapping: the first defines it, each other one is an alias. */
  function sharedBacktest(seriesCount: number): string {
    const entries = Array.from({ length: seriesCount }, (_, i) =>
      [`  - id: cargo-${i}`, '    file: data/cargo.csv', i === 0 ? '    backtest: &shared {origins: 3, horizon: 2}' : '    backtest: *shared'].join('\n'),
    );
    return `memo:\n  id: tarnwick-cargo\n  title: Tarnwick cargo outlook\ndefaults: {max_p: 1, max_q: 1}\nseries:\n${entries.join('\n')}\n`;
  }

  it(`allows ${MAX_ALIAS_COUNT} dereferences and refuses the next at its alias`, async () => {
    const file = join(root, 'aliases.yaml');
    writeFileSync(file, sharedBacktest(MAX_ALIAS_COUNT + 1));
    expect(await check(file)).toMatchObject({ code: 0, stderr: '' });
    writeFileSync(file, sharedBacktest(MAX_ALIAS_COUNT + 2));
    // Series 101 starts on line 6 + 3 × 101 = 309; its alias is on the third line of the entry, at column 15.
    expect(await check(file)).toEqual({
      code: 2,
      stderr: `${file}:311:15: aliases expand to more than 100 copies; write the repeated settings once under defaults instead of copying them with aliases\n`,
    });
  });
});
