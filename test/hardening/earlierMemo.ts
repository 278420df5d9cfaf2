// The workspace every hardening case starts from: the base config and series of
// test/fixtures/hardening/base/ and the memo a good run wrote from them into out/, which a
// later bad run must leave byte for byte as it was; and the fixed run date of all these runs.
import { cpSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../support/runCli.js';
import { EPOCH_2026_01_01, fixRunDate } from '../support/fixRunDate.js';
import { HARDENING_FIXTURES } from './refusedCases.js';

export const EARLIER_MEMO = 'out/tarnwick-cargo';

/** SOURCE_DATE_EPOCH for every run here: 2026-01-01T00:00:00Z. */
export const RUN_EPOCH = EPOCH_2026_01_01;

/** Fixes the run date of every run in the calling test file; call it before other hooks. */
export function pinRunDate(): void {
  fixRunDate('all');
}

export async function workspaceWithEarlierMemo(): Promise<string> {
  const root = mkdtempSync(join(tmpdir(), 'tb-hardening-base-'));
  cpSync(join(HARDENING_FIXTURES, 'base'), root, { recursive: true });
  const run = await runCli(['run', join(root, 'memo.yaml'), '--quiet']);
  if (run.code !== 0) throw new Error(`the good run of the base config failed (exit ${run.code}): ${run.stderr}`);
  return root;
}
