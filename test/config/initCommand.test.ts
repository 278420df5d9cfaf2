// `trendbrief init` in-process: the starter files are written, pass `check`, are the same on
// every run, and nothing is ever overwritten.
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { configSchemaText } from '../../src/config/toJsonSchema.js';
import { runCli } from '../support/runCli.js';

const DIR = mkdtempSync(join(tmpdir(), 'trendbrief-init-'));
afterAll(() => rmSync(DIR, { recursive: true, force: true }));

const FILES = ['memo.yaml', 'config.schema.json', 'data/annual-boardings.csv'];

describe('trendbrief init', () => {
  it('writes the starter config, its schema and the example series into a new folder', async () => {
    const target = join(DIR, 'fresh', 'nested');
    const run = await runCli(['init', target]);
    expect(run.code).toBe(0);
    expect(run.stdout).toBe(`${FILES.map((file) => `wrote ${join(target, file)}`).join('\n')}\nnext: trendbrief check ${join(target, 'memo.yaml')}\n`);
    expect(readFileSync(join(target, 'config.schema.json'), 'utf8')).toBe(configSchemaText());
    const config = readFileSync(join(target, 'memo.yaml'), 'utf8');
    expect(config.split('\n')[0]).toBe('# yaml-language-server: $schema=./config.schema.json');
    const series = readFileSync(join(target, 'data/annual-boardings.csv'), 'utf8').trimEnd().split('\n');
    expect(series[0]).toBe('year,boardings');
    expect(series.length).toBe(53);
  });

  it('writes a config that passes check', async () => {
    const target = join(DIR, 'checked');
    await runCli(['init', target]);
    const run = await runCli(['check', join(target, 'memo.yaml')]);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    expect(run.stdout).toBe(`${join(target, 'memo.yaml')}: ok, memo ferry-boardings-outlook, 1 series: annual-boardings 1974 to 2025 (52 annual)\n`);
  });

  it('writes the same bytes every time', async () => {
    await runCli(['init', join(DIR, 'first')]);
    await runCli(['init', join(DIR, 'second')]);
    for (const file of FILES) expect(readFileSync(join(DIR, 'second', file))).toEqual(readFileSync(join(DIR, 'first', file)));
  });

  it('refuses to overwrite, names the file, and writes nothing', async () => {
    const target = join(DIR, 'occupied');
    mkdirSync(target);
    writeFileSync(join(target, 'memo.yaml'), 'memo: {}\n');
    const run = await runCli(['init', target]);
    expect(run.code).toBe(2);
    expect(run.stdout).toBe('');
    expect(run.errorLines).toEqual([
      `${join(target, 'memo.yaml')}: already exists, and init never overwrites a file; choose another folder, or move this file away first`,
    ]);
    expect(readFileSync(join(target, 'memo.yaml'), 'utf8')).toBe('memo: {}\n');
    expect(existsSync(join(target, 'config.schema.json'))).toBe(false);
    expect(existsSync(join(target, 'data'))).toBe(false);
  });

  it('refuses a path that is a file, and more than one folder', async () => {
    const file = join(DIR, 'plain.txt');
    writeFileSync(file, 'x\n');
    const run = await runCli(['init', file]);
    expect(run.code).toBe(2);
    expect(run.errorLines).toEqual([`${file}: exists but is not a folder; give the path of a folder, or of one to create`]);
    const two = await runCli(['init', join(DIR, 'a'), join(DIR, 'b')]);
    expect(two.code).toBe(2);
    expect(two.errorLines).toEqual([`unexpected argument ${join(DIR, 'b')}; give one folder, e.g. trendbrief init forecasts`]);
  });

  it('writes into the current folder when no folder is given', async () => {
    const target = join(DIR, 'here');
    mkdirSync(target);
    const before = process.cwd();
    process.chdir(target);
    try {
      const run = await runCli(['init']);
      expect(run.code).toBe(0);
      expect(run.stdout.split('\n')[0]).toBe('wrote memo.yaml');
    } finally {
      process.chdir(before);
    }
    expect(existsSync(join(target, 'data/annual-boardings.csv'))).toBe(true);
  });
});
