// Every bad input of the corpus (test/fixtures/hardening/refused/) run as `trendbrief run`:
// exit 2, messages that name the file and the line or field, nothing written anywhere in
// the workspace, and the memo of an earlier good run left byte for byte (our spec).
import { readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../support/runCli.js';
import { EARLIER_MEMO, pinRunDate, workspaceWithEarlierMemo } from './earlierMemo.js';
import { caseArguments, caseWorkspace, HARDENING_FIXTURES, refusedCases } from './refusedCases.js';
import { treeSnapshot, type TreeSnapshot } from './treeSnapshot.js';

const CASES = refusedCases();
let baseline = '';
let earlierMemo: TreeSnapshot = {};

pinRunDate();

beforeAll(async () => {
  baseline = await workspaceWithEarlierMemo();
  earlierMemo = treeSnapshot(join(baseline, EARLIER_MEMO));
});

afterAll(() => {
  rmSync(baseline, { recursive: true, force: true });
});

/** `path[:line[:column]]: ...` with the path inside the workspace, or `--option: ...`. */
function namesItsPlace(line: string, root: string): boolean {
  return line.startsWith(`${root}/`) || /^--[a-z]+: /.test(line);
}

describe('refused inputs', () => {
  it('holds at least 30 cases', () => {
    expect(CASES.length).toBeGreaterThanOrEqual(30);
  });

  for (const refused of CASES) {
    it(`${refused.name}: ${refused.wrong}`, async () => {
      const root = caseWorkspace(baseline, refused);
      try {
        const before = treeSnapshot(root);
        // --quiet leaves only the problems on stderr, so every line can be held to the message form.
        const run = await runCli(['run', join(root, 'memo.yaml'), '--quiet', ...caseArguments(refused, root)]);
        expect(run.code, run.stderr).toBe(2);
        for (const fragment of refused.expect) expect(run.stderr).toContain(fragment);
        expect(run.errorLines.length).toBeGreaterThan(0);
        for (const line of run.errorLines) expect(namesItsPlace(line, root), line).toBe(true);
        // Text echoed from the input never reaches the terminal as control characters.
        expect(run.stderr).not.toMatch(/[\u0000-\u0009\u000B-\u001F\u007F-\u009F\u2028\u2029\u202A-\u202E\u2066-\u2069]/u);
        expect(treeSnapshot(root)).toEqual(before);
        expect(treeSnapshot(join(root, EARLIER_MEMO))).toEqual(earlierMemo);
      } finally {
        rmSync(root, { recursive: true, force: true });
      }
    });
  }

  it('lists every case in the README table with its fragments', () => {
    const readme = readFileSync(join(HARDENING_FIXTURES, 'README.md'), 'utf8');
    const lines = readme.split('\n');
    const rows = lines
      .slice(lines.indexOf('| case | what is wrong | expected message fragments |'))
      .filter((line) => line.startsWith('| `'))
      .map((line) => line.split(' | ').map((cell) => cell.replace(/^\| /, '').replace(/ \|$/, '')));
    const listed = rows.map(([name, wrong, fragments]) => ({ name: name.replaceAll('`', ''), wrong, fragments }));
    expect(listed).toEqual(CASES.map((refused) => ({ name: refused.name, wrong: refused.wrong, fragments: refused.expect.map((fragment) => `\`${fragment}\``).join('; ') })));
  });
});
