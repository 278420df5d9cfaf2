// `trendbrief run` end to end on small configs in a temporary folder (expected files and
// behaviour: our spec, DESIGN.md "Output and safety" and the memo issue).
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { beforeEach, describe, expect, it } from 'vitest';
import { sha256 } from '../../src/run/manifest.js';
import { runCli } from '../support/runCli.js';
import { fixRunDate, memoConfig } from './monthlySetup.js';

const FIXTURES = resolve('test/fixtures');

function config(title: string): string {
  return memoConfig(undefined, undefined, title);
}

let root = '';
fixRunDate();

beforeEach(() => {
  root = mkdtempSync(join(tmpdir(), 'tb-run-'));
  mkdirSync(join(root, 'data'));
  copyFileSync(join(FIXTURES, 'lake-huron.csv'), join(root, 'data/lake-huron.csv'));
});

describe('trendbrief run', () => {
  it('writes the memo folder with every file the manifest lists, and no machine path', async () => {
    writeFileSync(join(root, 'memo.yaml'), config('Lake outlook'));
    const run = await runCli(['run', join(root, 'memo.yaml')]);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    const folder = join(root, 'out/lake-outlook');
    expect(readdirSync(folder).sort()).toEqual(['forecasts.csv', 'inputs', 'manifest.json', 'memo.html', 'record.json']);
    expect(readdirSync(join(folder, 'inputs/data'))).toEqual(['lake-huron.csv']);
    const manifest = JSON.parse(readFileSync(join(folder, 'manifest.json'), 'utf8')) as {
      run_date: string;
      inputs: { role: string; path: string; sha256: string }[];
      outputs: { file: string; sha256: string }[];
    };
    // SOURCE_DATE_EPOCH 1767225600 is 2026-01-01T00:00:00Z (common practice: date -u -d @1767225600).
    expect(manifest.run_date).toBe('2026-01-01');
    expect(manifest.inputs.map((input) => input.path)).toEqual(['memo.yaml', 'data/lake-huron.csv']);
    expect(manifest.inputs[1].sha256).toBe(sha256(readFileSync(join(root, 'data/lake-huron.csv'))));
    for (const output of manifest.outputs) expect(sha256(readFileSync(join(folder, output.file))), output.file).toBe(output.sha256);
    for (const file of readdirSync(folder, { recursive: true, encoding: 'utf8' })) {
      if (file.endsWith('.csv') || file.endsWith('.json') || file.endsWith('.html') || file.endsWith('.yaml')) expect(readFileSync(join(folder, file), 'utf8'), file).not.toContain(root);
    }
    const record = JSON.parse(readFileSync(join(folder, 'record.json'), 'utf8')) as { records: { series: { id: string; source: { file: string } }; recommendation: { model: string } }[] };
    expect(record.records[0].series.id).toBe('lake-level');
    expect(record.records[0].series.source.file).toBe('data/lake-huron.csv');
    expect(['deterministic', 'stochastic']).toContain(record.records[0].recommendation.model);
  });

  it('writes the same bytes twice under SOURCE_DATE_EPOCH', async () => {
    writeFileSync(join(root, 'memo.yaml'), config('Lake outlook'));
    await runCli(['run', join(root, 'memo.yaml'), '--quiet']);
    const folder = join(root, 'out/lake-outlook');
    const first = Object.fromEntries(
      readdirSync(folder, { withFileTypes: true })
        .filter((entry) => entry.isFile())
        .map((entry) => [entry.name, readFileSync(join(folder, entry.name), 'utf8')]),
    );
    await runCli(['run', join(root, 'memo.yaml'), '--quiet']);
    for (const [file, content] of Object.entries(first)) expect(readFileSync(join(folder, file), 'utf8'), file).toBe(content);
  });

  it('leaves an earlier memo untouched when a later run fails on bad data, and exits 2', async () => {
    writeFileSync(join(root, 'memo.yaml'), config('Lake outlook'));
    expect((await runCli(['run', join(root, 'memo.yaml'), '--quiet'])).code).toBe(0);
    const folder = join(root, 'out/lake-outlook');
    const before = readFileSync(join(folder, 'memo.html'), 'utf8');
    const lines = readFileSync(join(root, 'data/lake-huron.csv'), 'utf8').split('\n');
    writeFileSync(join(root, 'data/lake-huron.csv'), [...lines.slice(0, 10), ...lines.slice(11)].join('\n'));
    const run = await runCli(['run', join(root, 'memo.yaml')]);
    expect(run.code).toBe(2);
    expect(run.errorLines[0]).toMatch(/lake-huron\.csv:\d+.*missing/);
    expect(readFileSync(join(folder, 'memo.html'), 'utf8')).toBe(before);
    expect(readdirSync(join(root, 'out')).sort()).toEqual(['.lake-outlook.v1', 'lake-outlook']);
  });

  it('reports config mistakes with their line and writes nothing', async () => {
    writeFileSync(join(root, 'memo.yaml'), config('Lake outlook').replace('horizon: 4', 'horizon: 4\n    horizn: 6'));
    const run = await runCli(['run', join(root, 'memo.yaml')]);
    expect(run.code).toBe(2);
    expect(run.errorLines.join('\n')).toMatch(/memo\.yaml:\d+:\d+: series\[0\]\.horizn: .*horizon/);
    expect(existsSync(join(root, 'out'))).toBe(false);
  });

  it('runs the other configs when one fails, and rejects an unknown format', async () => {
    writeFileSync(join(root, 'memo.yaml'), config('Lake outlook'));
    const run = await runCli(['run', join(root, 'missing.yaml'), join(root, 'memo.yaml'), '--quiet']);
    expect(run.code).toBe(2);
    expect(existsSync(join(root, 'out/lake-outlook/memo.html'))).toBe(true);
    const formats = await runCli(['run', join(root, 'memo.yaml'), '--formats', 'html,docx']);
    expect(formats.code).toBe(2);
    expect(formats.errorLines[0]).toMatch(/--formats: 'docx' is not one of html, pdf, json, csv/);
  });
});

describe('a batch', () => {
  it('refuses a second config that would write the same memo folder, and still writes the first', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'tb-batch-'));
    mkdirSync(join(dir, 'data'));
    copyFileSync(join(FIXTURES, 'lake-huron.csv'), join(dir, 'data/lake-huron.csv'));
    writeFileSync(join(dir, 'a.yaml'), config('First'));
    writeFileSync(join(dir, 'b.yaml'), config('Second'));
    const run = await runCli(['run', join(dir, 'a.yaml'), join(dir, 'b.yaml')]);
    expect(run.code).toBe(2);
    expect(run.errorLines[0]).toMatch(/b\.yaml: memo\.id: writes the same memo folder as .*a\.yaml/);
    expect(readFileSync(join(dir, 'out/lake-outlook/memo.html'), 'utf8')).toContain('First');
    // The summary table names the failed config (our spec).
    expect(run.stdout).toMatch(/b\.yaml\s+-\s+-\s+failed: 1 input problem/);
  });
});
