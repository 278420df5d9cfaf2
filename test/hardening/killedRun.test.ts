// A run killed with SIGKILL at any moment leaves the output folder with the earlier memo
// byte for byte, or a complete new memo whose manifest matches every file; a temporary folder
// it leaves is hidden and removed by the next run (our spec; DESIGN.md "Output and safety").
// Real child processes run the built program; the kill times are spread over the whole
// measured duration of a run, drawn from a seeded generator so every test run repeats them.
import { spawn } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../support/runCli.js';
import { seededUniforms } from '../support/seededUniforms.js';
import { EARLIER_MEMO, pinRunDate, RUN_EPOCH } from './earlierMemo.js';
import { manifestMismatches } from './memoIntegrity.js';
import { buildPrivateCopy } from './privateBuild.js';
import { HARDENING_FIXTURES } from './refusedCases.js';
import { treeSnapshot, type TreeSnapshot } from './treeSnapshot.js';

const KILLS = 8;
const SEED = 20260101;
const MEMO = 'tarnwick-cargo';
const REVISED_TITLE = 'Tarnwick cargo outlook, revised';
// A killed run may also leave the memo folder's lock, which the next run takes over (src/run/memoLock.ts).
const LEFTOVER = new RegExp(`^\\.(partial-${MEMO}-\\d+|previous-${MEMO}|lock-${MEMO})$`);

let build = '';
let root = '';
let runMilliseconds = 0;
let earlierMemo: TreeSnapshot = {};
const outcomes: string[] = [];

function startRun(config: string): { kill(): void; exited: Promise<number | null> } {
  const child = spawn(process.execPath, [join(build, 'bin/trendbrief.js'), 'run', config, '--quiet'], {
    cwd: root,
    env: { ...process.env, SOURCE_DATE_EPOCH: RUN_EPOCH },
    stdio: 'ignore',
  });
  const exited = new Promise<number | null>((settle) => child.on('exit', (code) => settle(code)));
  return { kill: () => child.kill('SIGKILL'), exited };
}

/** The output folder as a killed run left it: 'earlier', 'new' or 'earlier, under its backup name'. */
function judgeOutput(out: string): string {
  const entries = readdirSync(out);
  const visible = entries.filter((entry) => !entry.startsWith('.'));
  for (const entry of entries.filter((name) => name.startsWith('.'))) expect(entry).toMatch(LEFTOVER);
  if (visible.length === 0) {
    // Killed between the two renames: the earlier memo waits under its backup name.
    expect(treeSnapshot(join(out, `.previous-${MEMO}`))).toEqual(earlierMemo);
    return 'earlier, under its backup name';
  }
  expect(visible).toEqual([MEMO]);
  const memo = join(out, MEMO);
  const now = treeSnapshot(memo);
  if (JSON.stringify(now) === JSON.stringify(earlierMemo)) return 'earlier';
  expect(manifestMismatches(memo)).toEqual([]);
  expect(readFileSync(join(memo, 'memo.html'), 'utf8')).toContain(REVISED_TITLE);
  return 'new';
}

pinRunDate();

beforeAll(async () => {
  build = buildPrivateCopy();
  root = mkdtempSync(join(tmpdir(), 'tb-killed-'));
  cpSync(join(HARDENING_FIXTURES, 'base'), root, { recursive: true });
  const config = readFileSync(join(root, 'memo.yaml'), 'utf8');
  writeFileSync(join(root, 'revised.yaml'), config.replace('title: Tarnwick cargo outlook', `title: ${REVISED_TITLE}`));
  // The first run warms the file cache; the second, which rewrites the same bytes, is timed.
  for (let run = 0; run < 2; run++) {
    const started = performance.now();
    const code = await startRun('memo.yaml').exited;
    runMilliseconds = performance.now() - started;
    if (code !== 0) throw new Error(`the good run exited ${code}`);
  }
  earlierMemo = treeSnapshot(join(root, EARLIER_MEMO));
  cpSync(join(root, 'out'), join(root, 'earlier-out'), { recursive: true });
}, 60_000);

afterAll(() => {
  rmSync(root, { recursive: true, force: true });
  rmSync(build, { recursive: true, force: true });
});

describe('a run killed with SIGKILL', () => {
  const uniform = seededUniforms(SEED);
  for (let kill = 0; kill < KILLS; kill++) {
    // One kill in each eighth of the run's duration, at a random point within it.
    const fraction = (kill + uniform()) / KILLS;
    it(`at ${(fraction * 100).toFixed(1)}% of a run leaves a whole memo, and the next run cleans up`, async () => {
      const out = join(root, 'out');
      rmSync(out, { recursive: true, force: true });
      cpSync(join(root, 'earlier-out'), out, { recursive: true });
      const run = startRun('revised.yaml');
      await sleep(fraction * runMilliseconds);
      run.kill();
      await run.exited;
      outcomes.push(judgeOutput(out));

      const next = await runCli(['run', join(root, 'revised.yaml'), '--quiet']);
      expect(next.stderr).toBe('');
      expect(next.code).toBe(0);
      expect(readdirSync(out)).toEqual([MEMO]);
      expect(manifestMismatches(join(out, MEMO))).toEqual([]);
      expect(readFileSync(join(out, MEMO, 'memo.html'), 'utf8')).toContain(REVISED_TITLE);
    });
  }

  // A kill lands between writing files and renaming only by luck, so the two states it can
  // leave are also made by hand: a half-written temporary folder, and the earlier memo under
  // its backup name with the new one not yet in place.
  it('leaves hidden remains that the next run removes, putting a backed-up memo back first', async () => {
    const out = join(root, 'out');
    rmSync(out, { recursive: true, force: true });
    cpSync(join(root, 'earlier-out'), out, { recursive: true });
    mkdirSync(join(out, `.partial-${MEMO}-424242`));
    writeFileSync(join(out, `.partial-${MEMO}-424242`, 'memo.html'), '<!DOCTYPE html><html><head><title>Tarnwick');
    expect(judgeOutput(out)).toBe('earlier');
    renameSync(join(out, MEMO), join(out, `.previous-${MEMO}`));
    expect(judgeOutput(out)).toBe('earlier, under its backup name');
    expect(await startRun('revised.yaml').exited).toBe(0);
    expect(readdirSync(out)).toEqual([MEMO]);
    expect(judgeOutput(out)).toBe('new');
  });

  it('found the earlier memo after the earliest kill', () => {
    expect(outcomes).toHaveLength(KILLS);
    expect(outcomes[0]).toBe('earlier');
  });
});
