// Refusals by the file system that the user can fix: each is exit 2 with one message line saying
// what happened and what to do, no stack trace, nothing written and the earlier memo byte for
// byte (our spec). Real mounts stand in for a read-only disk and a full one (a tmpfs mounted
// read-only, one filled to its size), the immutable flag for a folder root may not write to
// (chmod does not stop root, who runs these tests in CI), and /proc/self for a folder the
// kernel makes up.
import { execFileSync } from 'node:child_process';
import { closeSync, cpSync, mkdirSync, mkdtempSync, openSync, readFileSync, rmSync, writeFileSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/base/problem.js';
import { writeFailure } from '../../src/run/checkRunPaths.js';
import { runCli } from '../support/runCli.js';
import { pinRunDate } from './earlierMemo.js';
import { HARDENING_FIXTURES } from './refusedCases.js';
import { treeSnapshot } from './treeSnapshot.js';

const MEMO = 'tarnwick-cargo';
let root = '';
const mounts: string[] = [];

pinRunDate();

beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'tb-fs-refusals-'));
  cpSync(join(HARDENING_FIXTURES, 'base'), join(root, 'project'), { recursive: true });
  const config = readFileSync(join(root, 'project/memo.yaml'), 'utf8');
  writeFileSync(join(root, 'project/revised.yaml'), config.replace('title: Tarnwick cargo outlook', 'title: Tarnwick cargo outlook, revised'));
});

afterAll(() => {
  for (const mount of mounts) execFileSync('umount', [mount]);
  rmSync(root, { recursive: true, force: true });
});

/** A fresh tmpfs at `name` under the test's folder, with mount options such as 'ro' or 'size=1m'. */
function tmpfs(name: string, options: string): string {
  const folder = join(root, name);
  mkdirSync(folder);
  execFileSync('mount', ['-t', 'tmpfs', '-o', options, 'tmpfs', folder]);
  mounts.push(folder);
  return folder;
}

function run(config: string, ...options: string[]): ReturnType<typeof runCli> {
  return runCli(['run', join(root, 'project', config), '--quiet', ...options]);
}

/** Exit 2, one problem line holding every fragment, no internal error, no stack trace. */
function expectOneRefusal(result: Awaited<ReturnType<typeof runCli>>, ...fragments: string[]): void {
  expect(result.code, result.stderr).toBe(2);
  expect(result.errorLines).toHaveLength(1);
  for (const fragment of fragments) expect(result.errorLines[0]).toContain(fragment);
  expect(result.stderr).not.toMatch(/internal error|\n\s+at /);
}

describe('file-system refusals', () => {
  it('refuses an output folder under /proc/self at once instead of looping', async () => {
    expectOneRefusal(await run('memo.yaml', '--out', '/proc/self/memos/out'), "--out: the output folder '/proc/self/memos/out' lies on the proc file system");
  });

  it('refuses a not-yet-existing output folder under a read-only mount', async () => {
    const readOnly = tmpfs('read-only', 'ro');
    expectOneRefusal(await run('memo.yaml', '--out', join(readOnly, 'new/out')), `--out: the memo cannot be written into '${readOnly}' (EROFS: a read-only file system); choose an output folder on a writable disk`);
    expect(treeSnapshot(readOnly)).toEqual({});
  });

  it('refuses to write on a full disk and keeps the earlier memo and nothing else', async () => {
    const small = tmpfs('small', 'size=1m');
    const out = join(small, 'out');
    expect((await run('memo.yaml', '--out', out)).code).toBe(0);
    // Fill what is left of the disk.
    const filler = openSync(join(small, 'filler'), 'w');
    try {
      for (;;) writeSync(filler, Buffer.alloc(16384, 1));
    } catch (error) {
      expect(error).toMatchObject({ code: 'ENOSPC' });
    } finally {
      closeSync(filler);
    }
    const before = treeSnapshot(small);
    expectOneRefusal(await run('revised.yaml', '--out', out), `--out: the memo cannot be written into '${out}' (ENOSPC: no space left on the disk); free some space`);
    expect(treeSnapshot(small)).toEqual(before);
    expect(readFileSync(join(out, MEMO, 'memo.html'), 'utf8')).not.toContain('revised');
  });

  it('refuses an output folder root may not write to (immutable), keeping the earlier memo', async () => {
    const out = join(root, 'immutable-out');
    expect((await run('memo.yaml', '--out', out)).code).toBe(0);
    const before = treeSnapshot(out);
    execFileSync('chattr', ['+i', out]);
    try {
      expectOneRefusal(await run('revised.yaml', '--out', out), `--out: the memo cannot be written into '${out}' (EPERM: operation not permitted); choose an output folder you may write to`);
    } finally {
      execFileSync('chattr', ['-i', out]);
    }
    expect(treeSnapshot(out)).toEqual(before);
  });

  it('refuses a PDF when TMPDIR is read-only, saying so once, and writes nothing', async () => {
    const readOnly = tmpfs('read-only-tmp', 'ro');
    const out = join(root, 'pdf-out');
    const saved = process.env.TMPDIR;
    process.env.TMPDIR = readOnly;
    try {
      const result = await run('memo.yaml', '--out', out, '--formats', 'html,pdf');
      expectOneRefusal(result, readOnly);
    } finally {
      if (saved === undefined) delete process.env.TMPDIR;
      else process.env.TMPDIR = saved;
    }
    expect(treeSnapshot(root)['pdf-out']).toBeUndefined();
  });

  it('turns a folder missing on the way while writing into a message naming the output folder', () => {
    const paths = { outputFolder: '/work/out', idFolder: '/work/out/m', memoFolder: '/work/out/m', chosenAt: { field: '--out' } };
    const refusal = writeFailure(Object.assign(new Error('gone'), { code: 'ENOENT' }), paths);
    expect(refusal).toBeInstanceOf(InputError);
    expect(refusal instanceof InputError ? refusal.problems[0].message : '').toContain("the memo cannot be written into '/work/out' (ENOENT: a folder on the way is missing and cannot be created)");
    // Anything else is a defect of ours and stays one.
    const defect = new TypeError('x is undefined');
    expect(writeFailure(defect, paths)).toBe(defect);
  });
});
