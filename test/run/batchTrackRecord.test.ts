// Two as-of memos of one memo id in one batch, the later given first: the earlier runs first
// and the later compares with it and tracks its forecasts (our spec: DEVELOPERS.md "Batches of
// as-of memos" and "The track record"). Data: the Lake Huron fixture (test/fixtures/lake-huron.csv),
// the earlier memo's copy cut after 1968.
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Manifest } from '../../src/run/manifest.js';
import { runCli, type CliRun } from '../support/runCli.js';
import { fixRunDate } from './monthlySetup.js';

fixRunDate('all');

function config(asOf: string, file: string): string {
  return `memo:
  id: lake-outlook
  title: Lake outlook
  as_of: ${asOf}
defaults:
  max_p: 1
  max_q: 1
  backtest: {origins: 4, horizon: 2, refit: reestimate}
series:
  - id: lake-level
    title: Lake level
    units: ft
    file: ${file}
    horizon: 4
output:
  folder: out
  formats: [html, json, csv]
`;
}

let root = '';
let run: CliRun;

beforeAll(async () => {
  root = mkdtempSync(join(tmpdir(), 'tb-batch-'));
  mkdirSync(join(root, 'data'));
  const lines = readFileSync(resolve('test/fixtures/lake-huron.csv'), 'utf8').trimEnd().split('\n');
  writeFileSync(join(root, 'data/lake-1972.csv'), `${lines.join('\n')}\n`);
  writeFileSync(join(root, 'data/lake-1968.csv'), `${lines.filter((line) => !/^(1969|197\d),/.test(line)).join('\n')}\n`);
  writeFileSync(join(root, 'later.yaml'), config('1972', 'data/lake-1972.csv'));
  writeFileSync(join(root, 'earlier.yaml'), config('1968', 'data/lake-1968.csv'));
  run = await runCli(['run', join(root, 'later.yaml'), join(root, 'earlier.yaml'), '--quiet', '--threads', '2']);
});

function read(path: string): string {
  return readFileSync(join(root, 'out/lake-outlook', path), 'utf8');
}

describe('a batch with two as-of memos of one id', () => {
  it('runs the earlier period first, so the later memo compares with it', () => {
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    const html = read('1972/memo.html').replace(/<[^>]+>/g, ' ').replace(/\s+/g, ' ');
    expect(html).toContain('This memo, as of 1972, set against the memo as of 1968 (run on 2026-01-01)');
    const manifest = JSON.parse(read('1972/manifest.json')) as Manifest;
    expect(manifest.inputs.filter((input) => input.role === 'earlier-record').map((input) => input.path)).toEqual(['1968/record.json']);
  });
});
