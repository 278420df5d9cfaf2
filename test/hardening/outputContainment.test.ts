// A run writes only inside the output folder it was given: its memo's folder and, while it
// writes, a hidden temporary folder beside it. Ids that could name a path elsewhere are
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
    expect(changed(before, after).filter((path) => path !== 'project/out' && !path.startsWith('project/out/tarnwick-cargo/'))).toEqual(['project/out/tarnwick-cargo']);
  });

  it('writes only inside the --out folder, and nothing beside the config', async () => {
    const { folder, outside } = workspace('out-option');
    const before = treeSnapshot(join(root, 'out-option'));
    const run = await runCli(['run', join(folder, 'memo.yaml'), '--quiet', '--out', join(outside, 'memos')]);
    expect(run.code, run.stderr).toBe(0);
    const after = treeSnapshot(join(root, 'out-option'));
    expect(changed(before, after).filter((path) => path !== 'elsewhere/memos' && !path.startsWith('elsewhere/memos/tarnwick-cargo/'))).toEqual(['elsewhere/memos/tarnwick-cargo']);
    expect(manifestMismatches(join(outside, 'memos/tarnwick-cargo'))).toEqual([]);
  });

  it('replaces a memo folder that is a link to a folder elsewhere without touching what it points at', async () => {
    const { folder, outside } = workspace('linked-memo');
    mkdirSync(join(folder, 'out'));
    symlinkSync(outside, join(folder, 'out/tarnwick-cargo'));
    const before = treeSnapshot(outside);
    const run = await runCli(['run', join(folder, 'memo.yaml'), '--quiet']);
    expect(run.code, run.stderr).toBe(0);
    expect(treeSnapshot(outside)).toEqual(before);
    expect(Object.keys(before)).toEqual(['keep.txt']);
    expect(manifestMismatches(join(folder, 'out/tarnwick-cargo'))).toEqual([]);
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
