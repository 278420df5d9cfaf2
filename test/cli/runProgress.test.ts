// What `run` tells someone watching a log rather than a terminal (our spec, README "What it
// does"): a line when it starts, one per series and per memo as each finishes, with the time
// since the start, on stdout before the summary table; stderr keeps the problems alone.
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HARDENING_FIXTURES } from '../hardening/refusedCases.js';
import { runCli } from '../support/runCli.js';

let root = '';

beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'tb-progress-'));
  cpSync(join(HARDENING_FIXTURES, 'base'), join(root, 'project'), { recursive: true });
  const config = readFileSync(join(root, 'project/memo.yaml'), 'utf8');
  writeFileSync(join(root, 'project/second.yaml'), config.replace('id: tarnwick-cargo', 'id: tarnwick-cargo-second'));
});

afterAll(() => rmSync(root, { recursive: true, force: true }));

describe('run outside a terminal', () => {
  it('prints a start line, one line per series and per memo with the time elapsed, and counts that read as counts', async () => {
    const missing = join(root, 'project/missing.yml');
    const result = await runCli(['run', join(root, 'project/memo.yaml'), missing, join(root, 'project/second.yaml'), '--out', join(root, 'out'), '--formats', 'json', '--threads', '1']);
    expect(result.code).toBe(2);
    const lines = result.stdout.split('\n');
    const progress = lines.filter((line) => /^(run:|series |memo )/.test(line));
    expect(progress[0]).toBe('run: 3 memos, 2 series to analyse');
    expect(progress.slice(1).map((line) => line.replace(/, \d+\.\d s$/, ', T'))).toEqual([
      'series 1 of 2 analysed: cargo (memo tarnwick-cargo), T',
      'memo 1 of 3 written: tarnwick-cargo, T',
      `memo 2 of 3 failed: config ${missing} (see the problems above), T`,
      'series 2 of 2 analysed: cargo (memo tarnwick-cargo-second), T',
      'memo 3 of 3 written: tarnwick-cargo-second, T',
    ]);
    // The missing config is named as a config, not as a memo.
    expect(result.errorLines).toEqual([`${missing}: config file not found; check the path and its spelling`]);
    // The summary follows the progress lines.
    expect(lines[progress.length]).toMatch(/^config\s+memo\s+series\s+result\s+folder$/);
  });
});
