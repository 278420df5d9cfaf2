// `trendbrief verify` end to end on a small memo (our spec: exit 0 on a match, 3 with the
// differences listed, 2 when an input is missing or changed; DEVELOPERS.md "verify").
import { execFileSync } from 'node:child_process';
import { readFileSync, rmSync, symlinkSync, unlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { sha256, type Manifest } from '../../src/run/manifest.js';
import { runCli } from '../support/runCli.js';
import { EPOCH_2026_01_01, fixRunDate, monthlyFolder, reviseData, setAsOf } from '../run/monthlySetup.js';

fixRunDate();

/** A memo folder for 2025-11 written once; each test works on its own copy of the inputs and outputs. */
async function issuedMemo(): Promise<{ root: string; folder: string }> {
  const root = monthlyFolder('2025-11');
  const run = await runCli(['run', join(root, 'memo.yaml'), '--quiet']);
  if (run.code !== 0) throw new Error(run.stderr);
  return { root, folder: join(root, 'out/lake-outlook/2025-11') };
}

function readManifest(folder: string): Manifest {
  return JSON.parse(readFileSync(join(folder, 'manifest.json'), 'utf8')) as Manifest;
}

/** Rewrites an output and the manifest's hash of it, so only the content can tell. */
function replaceOutput(folder: string, file: string, content: string): void {
  writeFileSync(join(folder, file), content);
  const manifest = readManifest(folder);
  for (const output of manifest.outputs) if (output.file === file) Object.assign(output, { sha256: sha256(content), bytes: Buffer.byteLength(content) });
  writeFileSync(join(folder, 'manifest.json'), `${JSON.stringify(manifest, null, 2)}\n`);
}

describe('verify on an untouched memo', () => {
  let memo: { root: string; folder: string };
  beforeAll(async () => {
    process.env.SOURCE_DATE_EPOCH = EPOCH_2026_01_01;
    memo = await issuedMemo();
  });

  it('finds everything as recorded and the rerun byte-identical, whatever the clock says now', async () => {
    process.env.SOURCE_DATE_EPOCH = '1800000000';
    const run = await runCli(['verify', memo.folder]);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    const lines = run.stdout.trimEnd().split('\n');
    expect(lines[0]).toMatch(/: run on 2026-01-01 with trendbrief \d+\.\d+\.\d+; reproduce in the config's folder with: trendbrief run memo\.yaml$/);
    expect(lines).toContain('inputs: 2 files with the SHA-256 the manifest records');
    expect(lines).toContain('outputs: 3 of 3 with the SHA-256 the manifest records');
    expect(lines.find((line) => line.startsWith('records:'))).toMatch(/^records: 1 series recomputed; \d+ numbers compared within relative 1e-9 \(absolute 1e-12 near zero\)$/);
    expect(lines).toContain('rerun bytes: memo.html identical, record.json identical, forecasts.csv identical');
    expect(lines.at(-1)).toBe(`ok: ${memo.folder} is what its inputs give`);
  });

  it('accepts a stored number within the tolerance, and says the bytes differ', async () => {
    const { folder } = await issuedMemo();
    const document = JSON.parse(readFileSync(join(folder, 'record.json'), 'utf8')) as { records: { forecasts: { stochastic: { point: number }[] } }[] };
    document.records[0].forecasts.stochastic[3].point *= 1 + 1e-11;
    replaceOutput(folder, 'record.json', `${JSON.stringify(document, null, 2)}\n`);
    const run = await runCli(['verify', folder]);
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('rerun bytes: memo.html identical, record.json differs, forecasts.csv identical');
  });
});

describe('verify finds differences (exit 3)', () => {
  it('lists a changed number by its path with the stored and the recomputed value, and the changed hash', async () => {
    const { folder } = await issuedMemo();
    const text = readFileSync(join(folder, 'record.json'), 'utf8');
    const document = JSON.parse(text) as { records: { series: { id: string }; forecasts: { stochastic: { point: number; period: string }[] } }[] };
    const original = document.records[0].forecasts.stochastic[3].point;
    const { period } = document.records[0].forecasts.stochastic[3];
    const { id } = document.records[0].series;
    document.records[0].forecasts.stochastic[3].point = original + 0.3;
    const changed = `${JSON.stringify(document, null, 2)}\n`;
    writeFileSync(join(folder, 'record.json'), changed);
    const run = await runCli(['verify', folder]);
    expect(run.code).toBe(3);
    const recorded = readManifest(folder).outputs.find((output) => output.file === 'record.json')?.sha256 ?? '';
    expect(run.stdout).toContain('differences (2), stored vs recomputed:');
    expect(run.stdout).toContain(`  record.json: SHA-256 ${sha256(changed)}, the manifest records ${recorded}`);
    // Named by the series and the period, not by list positions.
    expect(run.stdout).toContain(`  record.json ${id}: forecasts.stochastic ${period}: point: ${original + 0.3} vs ${original}`);
    expect(run.stdout.trimEnd().split('\n').at(-1)).toBe(`mismatch: ${folder} differs from what its inputs give in 2 places`);
  });

  it('holds memo.html to its bytes and reports a missing output', async () => {
    const { folder } = await issuedMemo();
    const html = readFileSync(join(folder, 'memo.html'), 'utf8');
    replaceOutput(folder, 'memo.html', html.replace('Lake outlook', 'Lake outlook, amended'));
    unlinkSync(join(folder, 'forecasts.csv'));
    const run = await runCli(['verify', folder]);
    expect(run.code).toBe(3);
    expect(run.stdout).toContain('  forecasts.csv: listed in the manifest but missing');
    expect(run.stdout).toMatch(/ {2}memo\.html: the rerun differs from the stored file from line \d+\n/);
  });
});

describe('verify refuses changed or missing inputs (exit 2)', () => {
  it('names a changed data file with the recorded and the actual hash', async () => {
    const { root, folder } = await issuedMemo();
    const recorded = readManifest(folder).inputs[1].sha256;
    reviseData(root, '1924', 0.5, 580.1);
    const run = await runCli(['verify', folder]);
    expect(run.code).toBe(2);
    expect(run.stdout).toBe('');
    const actual = sha256(readFileSync(join(root, 'data/lake-huron.csv')));
    expect(run.errorLines).toEqual([
      `${folder}/manifest.json: inputs[1]: the data file ${join(root, 'data/lake-huron.csv')} has changed: SHA-256 ${actual}, the manifest records ${recorded}; restore the file as it was when the memo was run, or rerun the memo to issue a new one`,
    ]);
  });

  it('uses the folder\u2019s copies when the config and the earlier record are gone, and names missing copies', async () => {
    const { root } = await issuedMemo();
    setAsOf(root, '2025-12');
    expect((await runCli(['run', join(root, 'memo.yaml'), '--quiet'])).code).toBe(0);
    const folder = join(root, 'out/lake-outlook/2025-12');
    expect((await runCli(['verify', folder])).code).toBe(0);
    const inputs = readManifest(folder).inputs;
    rmSync(join(root, 'out/lake-outlook/2025-11'), { recursive: true });
    unlinkSync(join(root, 'memo.yaml'));
    const archived = await runCli(['verify', folder]);
    expect(archived.code).toBe(0);
    expect(archived.stdout).toContain("originals: 1 found unchanged at their places, 2 not found (the memo folder's copies were used)\n");
    unlinkSync(join(folder, 'inputs/config/memo.yaml'));
    unlinkSync(join(folder, 'inputs/earlier-record/record.json'));
    const run = await runCli(['verify', folder]);
    expect(run.code).toBe(2);
    expect(run.errorLines).toEqual([
      `${folder}/manifest.json: inputs[0]: the copy of the config ${join(folder, 'inputs/config/memo.yaml')} is missing (expected SHA-256 ${inputs[0].sha256}); put the file back where the manifest says, or rerun the memo`,
      `${folder}/manifest.json: inputs[2]: the copy of the earlier record ${join(folder, 'inputs/earlier-record/record.json')} is missing (expected SHA-256 ${inputs[2].sha256}); put the file back where the manifest says, or rerun the memo`,
    ]);
    // A FIFO and a link to /dev/zero in the copies' places are refused without being opened (our spec: nothing makes verify wait).
    execFileSync('mkfifo', [join(folder, 'inputs/config/memo.yaml')]);
    symlinkSync('/dev/zero', join(folder, 'inputs/earlier-record/record.json'));
    const special = await runCli(['verify', folder]);
    expect(special.code).toBe(2);
    expect(special.errorLines).toEqual([
      `${folder}/manifest.json: inputs[0]: the copy of the config ${join(folder, 'inputs/config/memo.yaml')} is not a regular file (expected one with SHA-256 ${inputs[0].sha256}); put the file back where the manifest says, or rerun the memo`,
      `${folder}/manifest.json: inputs[2]: the copy of the earlier record ${join(folder, 'inputs/earlier-record/record.json')} is not a regular file (expected one with SHA-256 ${inputs[2].sha256}); put the file back where the manifest says, or rerun the memo`,
    ]);
  });

  it('asks for a memo folder, and for one of its as-of folders when given the memo id folder', async () => {
    const { root } = await issuedMemo();
    expect((await runCli(['verify'])).errorLines).toEqual(['verify needs the memo folder to check; give one, e.g. trendbrief verify out/lake-outlook/2026-01']);
    const run = await runCli(['verify', join(root, 'out/lake-outlook')]);
    expect(run.code).toBe(2);
    expect(run.errorLines[0]).toBe(`${join(root, 'out/lake-outlook')}: '${join(root, 'out/lake-outlook')}' has no manifest.json; it holds as-of memos: give one of them, e.g. ${join(root, 'out/lake-outlook')}/2025-11`);
  });

  it('names a manifest written before inputs carried their place from the memo folder', async () => {
    const { folder } = await issuedMemo();
    const manifest = readManifest(folder);
    const inputs = manifest.inputs.map(({ from_output: place, ...input }, i) => (i === 1 ? input : { ...input, from_output: place }));
    writeFileSync(join(folder, 'manifest.json'), JSON.stringify({ ...manifest, inputs }));
    const run = await runCli(['verify', folder]);
    expect(run.code).toBe(2);
    expect(run.errorLines).toEqual([
      `${folder}/manifest.json: inputs[1]: does not say where the input lies relative to the memo folder (from_output); the memo was written by an earlier version; rerun it with this version, then verify`,
    ]);
  });
});

describe('verify names what it could not find (exit 2)', () => {
  it('says a folder that does not exist is not found, and names a changed forecasts.csv cell by series, model and period', async () => {
    const missing = await runCli(['verify', '/nonexistent/memo']);
    expect(missing.code).toBe(2);
    expect(missing.errorLines).toEqual(["/nonexistent/memo: '/nonexistent/memo' is not found; check the path and its spelling; give the memo folder a run wrote, e.g. out/lake-outlook/2026-01"]);
    const { folder } = await issuedMemo();
    const csv = readFileSync(join(folder, 'forecasts.csv'), 'utf8').split('\r\n');
    const header = csv[0].split(',');
    const cells = csv[3].split(',');
    const point = header.indexOf('point');
    const stored = Number(cells[point]);
    cells[point] = String(stored + 1);
    replaceOutput(folder, 'forecasts.csv', [csv[0], csv[1], csv[2], cells.join(','), ...csv.slice(4)].join('\r\n'));
    const run = await runCli(['verify', folder]);
    expect(run.code).toBe(3);
    const [id, model, period] = ['series_id', 'model', 'period'].map((name) => cells[header.indexOf(name)]);
    expect(run.stdout).toContain(`  forecasts.csv ${id} ${model} ${period}: point: ${stored + 1} vs ${stored}\n`);
  });
});
