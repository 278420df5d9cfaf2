// Monthly operation end to end: as-of folders, the comparison with the previous as-of memo,
// and the refusal to replace monthly memos (our spec: DEVELOPERS.md "As-of folders and
// revisions"). The numbers compared are the fixture's own: Lake Huron 1924 is 577.79 ft
// (test/fixtures/lake-huron.csv); the test raises it by 0.5 and appends an invented 1973.
import { cpSync, existsSync, readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { sha256, type Manifest } from '../../src/run/manifest.js';
import { runCli } from '../support/runCli.js';
import { fixRunDate, monthlyFolder, readText, reviseData, setAsOf } from './monthlySetup.js';

fixRunDate();

function sectionText(html: string): string {
  const start = html.indexOf('<section class="revisions"');
  const end = html.indexOf('</section>', start);
  return html.slice(start, end).replace(/<svg[\s\S]*?<\/svg>/g, '').replace(/<[^>]+>/g, ' ').replace(/\s+/g, ' ');
}

describe('a memo with an as-of period', () => {
  it('goes to <memo id>/<as-of>/, records the observed values, and says when there is nothing to compare with', async () => {
    const root = monthlyFolder('2025-11');
    const run = await runCli(['run', join(root, 'memo.yaml'), '--quiet']);
    // Lake Huron ends in 1972, long before 2025-11: the one line on stderr is the as-of warning (src/run/checkAsOf.ts).
    expect(run.errorLines).toHaveLength(1);
    expect(run.errorLines[0]).toMatch(/memo\.yaml:5:10: memo\.as_of: warning: series 'lake-level' \(data\/lake-huron\.csv\) ends in 1972, 52 years before 2024/);
    expect(run.code).toBe(0);
    // Beside the memo's name (a link) lies the hidden version it points at.
    expect(readdirSync(join(root, 'out/lake-outlook')).sort()).toEqual(['.2025-11.v1', '2025-11']);
    const folder = join(root, 'out/lake-outlook/2025-11');
    expect(readdirSync(folder).sort()).toEqual(['forecasts.csv', 'inputs', 'manifest.json', 'memo.html', 'record.json']);
    const document = JSON.parse(readText(folder, 'record.json')) as { history: { series_id: string; values: { period: string; value: number }[] }[] };
    expect(document.history[0].series_id).toBe('lake-level');
    expect(document.history[0].values).toHaveLength(98);
    expect(document.history[0].values[49]).toEqual({ period: '1924', value: 577.79 });
    // With nothing to compare, page 1 says so in one line and there is no section (our spec).
    const html = readText(folder, 'memo.html');
    expect(html).not.toContain('<section class="revisions"');
    expect(html).toContain('<p class="since-last">Since the last memo: no earlier memo (as of a period before 2025-11) was found beside this one.</p>');
    const manifest = JSON.parse(readText(folder, 'manifest.json')) as Manifest;
    expect(manifest.inputs.map((input) => [input.role, input.path, input.from_output])).toEqual([
      ['config', 'memo.yaml', '../../../memo.yaml'],
      ['data', 'data/lake-huron.csv', '../../../data/lake-huron.csv'],
    ]);
    for (const input of manifest.inputs) expect(sha256(readFileSync(resolve(folder, input.from_output)))).toBe(input.sha256);
  });

  it('compares with the previous as-of memo: forecast, data revisions and the earlier record as an input', async () => {
    const root = monthlyFolder('2025-11');
    expect((await runCli(['run', join(root, 'memo.yaml'), '--quiet'])).code).toBe(0);
    setAsOf(root, '2025-12');
    reviseData(root, '1924', 0.5, 580.1);
    const run = await runCli(['run', join(root, 'memo.yaml')]);
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('lake-outlook');
    const folder = join(root, 'out/lake-outlook/2025-12');
    const text = sectionText(readText(folder, 'memo.html'));
    expect(text).toContain('This memo, as of 2025-12, set against the memo as of 2025-11 (run on 2026-01-01)');
    expect(text).toContain('Latest observation: 1973 (previously 1972).');
    // 577.79 + 0.5 = 578.29, a change of 0.50 ft, 100 × 0.5 / 577.79 = 0.0865…%.
    expect(text).toContain('1924 577.79 578.29 +0.50 +0.09%');
    // 1974 was two steps ahead in November and is one step ahead now.
    expect(text).toMatch(/1974 2 → 1 /);
    const manifest = JSON.parse(readText(folder, 'manifest.json')) as Manifest;
    const earlier = manifest.inputs.find((input) => input.role === 'earlier-record');
    expect(earlier).toEqual({
      role: 'earlier-record',
      path: '2025-11/record.json',
      from_output: '../2025-11/record.json',
      sha256: sha256(readFileSync(join(root, 'out/lake-outlook/2025-11/record.json'))),
      copy: 'inputs/earlier-record/record.json',
    });
  });

  it('compares a rerun of an old month with the same memo as before, even when later months exist', async () => {
    const root = monthlyFolder('2025-11');
    expect((await runCli(['run', join(root, 'memo.yaml'), '--quiet'])).code).toBe(0);
    setAsOf(root, '2025-12');
    expect((await runCli(['run', join(root, 'memo.yaml'), '--quiet'])).code).toBe(0);
    const issued = readText(root, 'out/lake-outlook/2025-12/memo.html');
    cpSync(join(root, 'out/lake-outlook/2025-12'), join(root, 'out/lake-outlook/2026-01'), { recursive: true, dereference: true });
    expect((await runCli(['run', join(root, 'memo.yaml'), '--quiet'])).code).toBe(0);
    expect(readText(root, 'out/lake-outlook/2025-12/memo.html')).toBe(issued);
  });

  it('is refused without an as-of period when the memo folder holds as-of memos, which stay as they were', async () => {
    const root = monthlyFolder('2025-11');
    expect((await runCli(['run', join(root, 'memo.yaml'), '--quiet'])).code).toBe(0);
    const before = readText(root, 'out/lake-outlook/2025-11/memo.html');
    const monthless = monthlyFolder(undefined);
    cpSync(join(monthless, 'memo.yaml'), join(root, 'memo.yaml'));
    const run = await runCli(['run', join(root, 'memo.yaml')]);
    expect(run.code).toBe(2);
    expect(run.errorLines).toHaveLength(1);
    expect(run.errorLines[0]).toMatch(/memo\.yaml: memo\.as_of: the memo's folder '.*out\/lake-outlook' holds as-of memos \(2025-11\), which a run without an as-of period would replace; set memo\.as_of/);
    expect(readText(root, 'out/lake-outlook/2025-11/memo.html')).toBe(before);
    expect(existsSync(join(root, 'out/lake-outlook/memo.html'))).toBe(false);
  });
});
