// A run writes only inside the output folder it was given: its memo's name (a link), the hidden
// version folder it links to and, while it writes, a hidden temporary folder beside it. Ids that could name a path elsewhere are
// refused before anything is written (our spec; DEVELOPERS.md, Config, "Text").
import { cpSync, mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../support/runCli.js';
import { pinRunDate } from './earlierMemo.js';
import { manifestMismatches } from './memoIntegrity.js';
import { HARDENING_FIXTURES } from './refusedCases.js';
import { treeSnapshot, type TreeSnapshot } from './treeSnapshot.js';

let root = '';
let config = '';

pinRunDate();

beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'tb-contained-'));
  config = readFileSync(join(HARDENING_FIXTURES, 'base/memo.yaml'), 'utf8');
});

afterAll(() => {
  rmSync(root, { recursive: true, force: true });
});

/** A fresh workspace holding the base config and series, and a sibling folder outside it. */
function workspace(name: string): { folder: string; outside: string } {
  const folder = join(root, name, 'project');
  cpSync(join(HARDENING_FIXTURES, 'base'), folder, { recursive: true });
  const outside = join(root, name, 'elsewhere');
  mkdirSync(outside);
  writeFileSync(join(outside, 'keep.txt'), 'not the run\'s to touch\n');
  return { folder, outside };
}

/** Paths added, changed or removed between two snapshots. */
function changed(before: TreeSnapshot, after: TreeSnapshot): string[] {
  return [...new Set([...Object.keys(before), ...Object.keys(after)])].filter((path) => before[path] !== after[path]);
}

describe('where a run writes', () => {
  it('writes only the memo folder inside the config\'s output folder', async () => {
    const { folder } = workspace('config-folder');
    const before = treeSnapshot(join(root, 'config-folder'));
    const run = await runCli(['run', join(folder, 'memo.yaml'), '--quiet']);
    expect(run.code, run.stderr).toBe(0);
    const after = treeSnapshot(join(root, 'config-folder'));
    expect(changed(before, after).filter((path) => path !== 'project/out' && !path.startsWith('project/out/.tarnwick-cargo.v1/'))).toEqual(['project/out/.tarnwick-cargo.v1', 'project/out/tarnwick-cargo']);
  });

  it('writes only inside the --out folder, and nothing beside the config', async () => {
    const { folder, outside } = workspace('out-option');
    const before = treeSnapshot(join(root, 'out-option'));
    const run = await runCli(['run', join(folder, 'memo.yaml'), '--quiet', '--out', join(outside, 'memos')]);
    expect(run.code, run.stderr).toBe(0);
    const after = treeSnapshot(join(root, 'out-option'));
    expect(changed(before, after).filter((path) => path !== 'elsewhere/memos' && !path.startsWith('elsewhere/memos/.tarnwick-cargo.v1/'))).toEqual(['elsewhere/memos/.tarnwick-cargo.v1', 'elsewhere/memos/tarnwick-cargo']);
    expect(manifestMismatches(join(outside, 'memos/tarnwick-cargo'))).toEqual([]);
  });

  it('refuses a memo folder that is a link to a folder elsewhere, naming it, and writes nothing', async () => {
    const { folder, outside } = workspace('linked-memo');
    mkdirSync(join(folder, 'out'));
    symlinkSync(outside, join(folder, 'out/tarnwick-cargo'));
    const before = treeSnapshot(join(root, 'linked-memo'));
    const run = await runCli(['run', join(folder, 'memo.yaml'), '--quiet']);
    expect(run.code).toBe(2);
    expect(run.errorLines).toEqual([expect.stringMatching(/^.*memo\.yaml:\d+:\d+: output\.folder: '.*out\/tarnwick-cargo' is a symbolic link to '.*elsewhere', and a run writes only inside its output folder; remove the link/)]);
    expect(treeSnapshot(join(root, 'linked-memo'))).toEqual(before);
  });

  it('refuses a link at the memo id\'s folder of an as-of memo, and at the as-of folder', async () => {
    const { folder, outside } = workspace('linked-id');
    writeFileSync(join(folder, 'memo.yaml'), config.replace('  client: Tarnwick Harbour Authority', '  client: Tarnwick Harbour Authority\n  as_of: 2024'));
    mkdirSync(join(folder, 'out'));
    symlinkSync(outside, join(folder, 'out/tarnwick-cargo'));
    const before = treeSnapshot(join(root, 'linked-id'));
    const atId = await runCli(['run', join(folder, 'memo.yaml'), '--quiet']);
    expect(atId.code).toBe(2);
    expect(atId.stderr).toContain("out/tarnwick-cargo' is a symbolic link to");
    expect(treeSnapshot(join(root, 'linked-id'))).toEqual(before);
    rmSync(join(folder, 'out/tarnwick-cargo'));
    mkdirSync(join(folder, 'out/tarnwick-cargo'));
    symlinkSync(outside, join(folder, 'out/tarnwick-cargo/2024'));
    const atAsOf = await runCli(['run', join(folder, 'memo.yaml'), '--quiet']);
    expect(atAsOf.code).toBe(2);
    expect(atAsOf.stderr).toContain("out/tarnwick-cargo/2024' is a symbolic link to");
    expect(treeSnapshot(outside)).toEqual({ 'keep.txt': before['elsewhere/keep.txt'] });
  });

  it('refuses a review through a link to a memo elsewhere, and leaves that memo as it was', async () => {
    const { folder, outside } = workspace('review-link');
    writeFileSync(join(folder, 'memo.yaml'), config.replace('  client: Tarnwick Harbour Authority', '  client: Tarnwick Harbour Authority\n  reviewers:\n    - name: H. Marsh'));
    expect((await runCli(['run', join(folder, 'memo.yaml'), '--quiet', '--out', join(outside, 'memos')])).code).toBe(0);
    mkdirSync(join(folder, 'out'));
    symlinkSync(join(outside, 'memos/tarnwick-cargo'), join(folder, 'out/tarnwick-cargo'));
    const before = treeSnapshot(join(root, 'review-link'));
    const review = await runCli(['review', join(folder, 'out/tarnwick-cargo'), '--reviewer', 'H. Marsh', '--decision', 'approve', '--date', '2026-01-02']);
    expect(review.code).toBe(2);
    expect(review.errorLines).toEqual([expect.stringContaining("out/tarnwick-cargo' is neither a memo folder written by this tool nor free; move it away")]);
    expect(treeSnapshot(join(root, 'review-link'))).toEqual(before);
  });

  it('keeps a run, a revision, a review and their lock files inside the output folder, which may itself be reached through a link', async () => {
    const { folder, outside } = workspace('through-link');
    mkdirSync(join(outside, 'memos'));
    // The output folder is the user's to choose, links included; what lies inside it is checked.
    symlinkSync(join(outside, 'memos'), join(folder, 'out'));
    const reviewed = config.replace('  client: Tarnwick Harbour Authority', '  client: Tarnwick Harbour Authority\n  reviewers:\n    - name: H. Marsh');
    writeFileSync(join(folder, 'memo.yaml'), reviewed);
    const memo = join(folder, 'out/tarnwick-cargo');
    expect((await runCli(['run', join(folder, 'memo.yaml'), '--quiet'])).code).toBe(0);
    const review = await runCli(['review', memo, '--reviewer', 'H. Marsh', '--decision', 'approve', '--date', '2026-01-02']);
    expect(review.stderr).toBe('');
    writeFileSync(join(folder, 'memo.yaml'), reviewed.replace('title: Tarnwick cargo outlook', 'title: Tarnwick cargo outlook, revised'));
    expect((await runCli(['run', join(folder, 'memo.yaml'), '--quiet', '--new-revision'])).code).toBe(0);
    expect(readFileSync(join(memo, 'memo.html'), 'utf8')).toContain('Tarnwick cargo outlook, revised');
    expect(manifestMismatches(join(memo, 'revisions/1'))).toEqual([]);
    expect(readFileSync(join(memo, 'revisions/1/sign-offs.jsonl'), 'utf8')).toContain('H. Marsh');
    const entries = Object.keys(treeSnapshot(outside)).filter((path) => !path.startsWith('memos/.tarnwick-cargo.v'));
    expect(entries).toEqual(['keep.txt', 'memos', 'memos/tarnwick-cargo']);
  });
});

describe('ids that could name a path elsewhere', () => {
  // Each is refused as a memo id; the folder it would name lies outside out/, or poses as
  // one of the run's hidden folders, or is not a portable folder name.
  const memoIds = ['../escape', '../../etc/passwd', 'a/b', 'a\\\\b', '.', '..', '.partial-x', '.previous-x', '/tmp/x', 'C:\\\\x', 'x..y', 'a--b', '-a', 'Memo', 'mémo', 'a b', 'a'.repeat(65)];

  for (const id of memoIds) {
    it(`refuses the memo id ${JSON.stringify(id)} and writes nothing`, async () => {
      const name = `id-${memoIds.indexOf(id)}`;
      const { folder } = workspace(name);
      writeFileSync(join(folder, 'memo.yaml'), config.replace('  id: tarnwick-cargo', `  id: "${id}"`));
      const before = treeSnapshot(join(root, name));
      const run = await runCli(['run', join(folder, 'memo.yaml'), '--quiet']);
      expect(run.code).toBe(2);
      expect(run.stderr).toMatch(/memo\.yaml:2:7: memo\.id: /);
      expect(treeSnapshot(join(root, name))).toEqual(before);
    });
  }

  it('refuses an as-of period that is not a period, since it may name a folder', async () => {
    const { folder } = workspace('as-of');
    writeFileSync(join(folder, 'memo.yaml'), config.replace('  client: Tarnwick Harbour Authority', '  client: Tarnwick Harbour Authority\n  as_of: ../2024-12'));
    const before = treeSnapshot(join(root, 'as-of'));
    const run = await runCli(['run', join(folder, 'memo.yaml'), '--quiet']);
    expect(run.code).toBe(2);
    expect(run.stderr).toContain("memo.yaml:5:10: memo.as_of: '../2024-12' is not a period");
    expect(treeSnapshot(join(root, 'as-of'))).toEqual(before);
  });
});
