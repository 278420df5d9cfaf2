// Reruns give the same bytes (DESIGN.md "Output and safety"): SOURCE_DATE_EPOCH sets the run
// date, and neither the thread count, the working folder nor TMPDIR reaches an output. The
// PDF check prints twice with separate browsers: Chromium's only varying bytes are its
// /CreationDate and /ModDate, which the run sets from the run date.
import { mkdirSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { runCli } from '../support/runCli.js';
import { fixRunDate, monthlyFolder } from './monthlySetup.js';

fixRunDate();
const saved = { tmpdir: process.env.TMPDIR, cwd: process.cwd() };
afterEach(() => {
  process.chdir(saved.cwd);
  if (saved.tmpdir === undefined) delete process.env.TMPDIR;
  else process.env.TMPDIR = saved.tmpdir;
});

function filesOf(folder: string): Map<string, Buffer> {
  return new Map(
    readdirSync(folder, { recursive: true, withFileTypes: true })
      .filter((entry) => entry.isFile())
      .map((entry) => {
        const path = join(entry.parentPath, entry.name);
        return [path.slice(folder.length + 1), readFileSync(path)];
      }),
  );
}

describe('a rerun', () => {
  it('writes the same bytes on one thread and three, from another working folder, under another TMPDIR', async () => {
    const root = monthlyFolder('2025-12');
    const elsewhere = mkdtempSync(join(tmpdir(), 'tb-cwd-'));
    mkdirSync(join(elsewhere, 'nested'));
    process.chdir(root);
    process.env.TMPDIR = mkdtempSync(join(tmpdir(), 'tb-tmp-a-'));
    expect((await runCli(['run', 'memo.yaml', '--threads', '1', '--quiet'])).code).toBe(0);
    const first = filesOf(join(root, 'out/lake-outlook/2025-12'));
    process.chdir(join(elsewhere, 'nested'));
    process.env.TMPDIR = mkdtempSync(join(tmpdir(), 'tb-tmp-b-'));
    expect((await runCli(['run', join(root, 'memo.yaml'), '--threads', '3', '--quiet'])).code).toBe(0);
    const second = filesOf(join(root, 'out/lake-outlook/2025-12'));
    expect([...first.keys()].sort()).toEqual(['forecasts.csv', 'inputs/config/memo.yaml', 'inputs/data/lake-huron.csv', 'manifest.json', 'memo.html', 'record.json']);
    for (const [file, bytes] of first) expect(second.get(file)?.equals(bytes), file).toBe(true);
    const manifest = JSON.parse(first.get('manifest.json')?.toString('utf8') ?? '{}') as { command: string };
    expect(manifest.command).toBe('trendbrief run memo.yaml');
    for (const [file, bytes] of first) {
      const text = bytes.toString('utf8');
      for (const place of [root, elsewhere, tmpdir()]) expect(text.includes(place), `${file} holds ${place}`).toBe(false);
    }
  });

  it('prints the same PDF twice, dated by the run date', async () => {
    const root = monthlyFolder('2025-12', '[pdf]');
    expect((await runCli(['run', join(root, 'memo.yaml'), '--quiet'])).code).toBe(0);
    const first = readFileSync(join(root, 'out/lake-outlook/2025-12/memo.pdf'));
    expect((await runCli(['run', join(root, 'memo.yaml'), '--quiet'])).code).toBe(0);
    const second = readFileSync(join(root, 'out/lake-outlook/2025-12/memo.pdf'));
    const text = first.toString('latin1');
    // 2026-01-01 at midnight UTC in the PDF date form (PDF 1.7 §7.9.4).
    expect(text).toContain("/CreationDate (D:20260101000000+00'00')");
    expect(text).toContain("/ModDate (D:20260101000000+00'00')");
    expect(second.equals(first)).toBe(true);
  });
});
