// A run killed with SIGKILL at any moment leaves the memo's name resolving to the earlier memo
// byte for byte, or to a complete new memo whose manifest matches every file; what it leaves
// beside the name is hidden and removed by the next run (our spec; DEVELOPERS.md "Publishing").
// Real child processes run the built program; the kill times are spread over the whole
// measured duration of a run, drawn from a seeded generator so every test run repeats them,
// and runs are also held at each named step of publishing (TRENDBRIEF_PAUSE_AT) and killed there.
import { spawn } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
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
// Beside the name: its current version, and what a killed run may leave (a partial folder, a new
// link not yet renamed, a version not yet linked, the lock), all removed or taken over by the next run.
const LEFTOVER = new RegExp(`^\\.(partial-${MEMO}-\\d+|link-${MEMO}-\\d+|${MEMO}\\.v\\d+|lock-${MEMO})$`);
const CURRENT_VERSION = new RegExp(`^\\.${MEMO}\\.v\\d+$`);
/** Copies keep the memo's name a relative link to its version. */
const AS_THEY_ARE = { recursive: true, verbatimSymlinks: true } as const;

let build = '';
let root = '';
let runMilliseconds = 0;
let earlierMemo: TreeSnapshot = {};
const outcomes: string[] = [];

function startRun(config: string, pauseAt?: string): { kill(): void; exited: Promise<number | null>; paused: Promise<void> } {
  const child = spawn(process.execPath, [join(build, 'bin/trendbrief.js'), 'run', config, '--quiet'], {
    cwd: root,
    env: { ...process.env, SOURCE_DATE_EPOCH: RUN_EPOCH, ...(pauseAt === undefined ? {} : { TRENDBRIEF_PAUSE_AT: pauseAt }) },
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  const exited = new Promise<number | null>((settle) => child.on('exit', (code) => settle(code)));
  let stderr = '';
  const paused = new Promise<void>((settle, fail) => {
    child.stderr.on('data', (chunk: Buffer) => {
      stderr += chunk.toString();
      if (stderr.includes(`paused at ${String(pauseAt)}\n`)) settle();
    });
    child.on('exit', (code) => fail(new Error(`the run exited ${String(code)} before pausing: ${stderr}`)));
  });
  // Only a held run awaits `paused`; the others must not leave its rejection unhandled.
  paused.catch(() => undefined);
  return { kill: () => child.kill('SIGKILL'), exited, paused };
}

/** The output folder as a killed run left it: the memo's name resolves to the 'earlier' memo or the 'new' one. */
function judgeOutput(out: string): string {
  const entries = readdirSync(out);
  const visible = entries.filter((entry) => !entry.startsWith('.'));
  for (const entry of entries.filter((name) => name.startsWith('.'))) expect(entry).toMatch(LEFTOVER);
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
  cpSync(join(root, 'out'), join(root, 'earlier-out'), AS_THEY_ARE);
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
      cpSync(join(root, 'earlier-out'), out, AS_THEY_ARE);
      const run = startRun('revised.yaml');
      await sleep(fraction * runMilliseconds);
      run.kill();
      await run.exited;
      outcomes.push(judgeOutput(out));

      const next = await runCli(['run', join(root, 'revised.yaml'), '--quiet']);
      expect(next.stderr).toBe('');
      expect(next.code).toBe(0);
      expect(readdirSync(out).filter((entry) => !CURRENT_VERSION.test(entry))).toEqual([MEMO]);
      expect(manifestMismatches(join(out, MEMO))).toEqual([]);
      expect(readFileSync(join(out, MEMO, 'memo.html'), 'utf8')).toContain(REVISED_TITLE);
    });
  }

  // A kill lands between two steps of publishing only by luck, so runs are held at each step
  // and killed there: the name still resolves to a complete memo that verifies, and the next
  // run cleans up.
  for (const [step, expected] of [['files-written', 'earlier'], ['version-named', 'earlier'], ['link-swapped', 'new']] as const) {
    it(`held at '${step}' and killed, leaves the ${expected} memo under its name, which verifies`, async () => {
      const out = join(root, 'out');
      rmSync(out, { recursive: true, force: true });
      cpSync(join(root, 'earlier-out'), out, AS_THEY_ARE);
      const run = startRun('revised.yaml', step);
      await run.paused;
      run.kill();
      await run.exited;
      expect(judgeOutput(out)).toBe(expected);
      const verified = await runCli(['verify', join(out, MEMO)]);
      expect(verified.stderr).toBe('');
      expect(verified.code).toBe(0);
      expect((await runCli(['run', join(root, 'revised.yaml'), '--quiet'])).code).toBe(0);
      expect(readdirSync(out).filter((entry) => !CURRENT_VERSION.test(entry))).toEqual([MEMO]);
      expect(judgeOutput(out)).toBe('new');
    });
  }

  // A memo written before versions existed is a plain folder; the first run moves it aside as a
  // version and links it: two renames, the one moment the name is missing. A run killed there
  // leaves the complete memo as the version, which verifies, and the next run links it again.
  it('held between moving a plain memo folder aside and linking it, leaves a complete version the next run links', async () => {
    const out = join(root, 'out');
    rmSync(out, { recursive: true, force: true });
    mkdirSync(out);
    cpSync(join(root, 'earlier-out', MEMO), join(out, MEMO), { recursive: true, dereference: true });
    const run = startRun('revised.yaml', 'folder-moved-aside');
    await run.paused;
    run.kill();
    await run.exited;
    expect(readdirSync(out).filter((entry) => !entry.startsWith('.'))).toEqual([]);
    const version = join(out, `.${MEMO}.v1`);
    expect(treeSnapshot(version)).toEqual(earlierMemo);
    expect((await runCli(['verify', version])).code).toBe(0);
    expect((await runCli(['run', join(root, 'revised.yaml'), '--quiet'])).code).toBe(0);
    expect(judgeOutput(out)).toBe('new');
  });

  // Leftovers of the earlier two-rename publishing: a half-written temporary folder, and the
  // earlier memo under its backup name with the new one not yet in place.
  it('puts a memo left under the old backup name back and removes hidden remains', async () => {
    const out = join(root, 'out');
    rmSync(out, { recursive: true, force: true });
    mkdirSync(out);
    cpSync(join(root, 'earlier-out', MEMO), join(out, `.previous-${MEMO}`), { recursive: true, dereference: true });
    mkdirSync(join(out, `.partial-${MEMO}-424242`));
    writeFileSync(join(out, `.partial-${MEMO}-424242`, 'memo.html'), '<!DOCTYPE html><html><head><title>Tarnwick');
    expect((await runCli(['run', join(root, 'revised.yaml'), '--quiet'])).code).toBe(0);
    expect(readdirSync(out).filter((entry) => !CURRENT_VERSION.test(entry))).toEqual([MEMO]);
    expect(judgeOutput(out)).toBe('new');
  });

  it('found the earlier memo after the earliest kill', () => {
    expect(outcomes).toHaveLength(KILLS);
    expect(outcomes[0]).toBe('earlier');
  });
});
