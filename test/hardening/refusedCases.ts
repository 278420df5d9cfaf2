// The corpus of refused inputs in test/fixtures/hardening/refused/: one folder per case, its
// files laid over a copy of the base workspace, and case.json saying what is wrong, what
// else to set up and which fragments the messages must hold (our spec).
import { cpSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { applySetup, type SetupStep } from './caseSetup.js';

export const HARDENING_FIXTURES = resolve('test/fixtures/hardening');
const REFUSED = join(HARDENING_FIXTURES, 'refused');

export interface RefusedCase {
  name: string;
  /** What is wrong, in words; also in the README table. */
  wrong: string;
  /** Fragments that must all appear in the messages. */
  expect: string[];
  setup?: SetupStep[];
  /** Extra command-line words; `{root}` stands for the case's workspace. */
  args?: string[];
}

export function refusedCases(): RefusedCase[] {
  return readdirSync(REFUSED)
    .sort()
    .map((name) => ({ name, ...(JSON.parse(readFileSync(join(REFUSED, name, 'case.json'), 'utf8')) as Omit<RefusedCase, 'name'>) }));
}

/** A fresh workspace: a copy of `baseline` with the case's files laid over it and its setup applied. */
export function caseWorkspace(baseline: string, refused: RefusedCase): string {
  const root = mkdtempSync(join(tmpdir(), `tb-refused-${refused.name}-`));
  // The earlier memo's name is a relative link to its version: copied as it is.
  cpSync(baseline, root, { recursive: true, verbatimSymlinks: true });
  const folder = join(REFUSED, refused.name);
  for (const entry of readdirSync(folder)) {
    if (entry !== 'case.json') cpSync(join(folder, entry), join(root, entry), { recursive: true });
  }
  for (const step of refused.setup ?? []) applySetup(root, step);
  if (!existsSync(join(root, 'out'))) mkdirSync(join(root, 'out'));
  return root;
}

export function caseArguments(refused: RefusedCase, root: string): string[] {
  return (refused.args ?? []).map((word) => word.replaceAll('{root}', root));
}
