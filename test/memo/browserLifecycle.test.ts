// The browser dies with the run and leaves nothing in the user's home (our spec, DESIGN.md
// "Output and safety"): a real run holding a printer is killed with SIGKILL, then the process
// table (/proc) is searched for the browsers it started; the next run removes the folder the
// killed one left; the home folder the run was given stays empty.
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { removeStaleBrowserFolders } from '../../src/memo/print/browserFolder.js';

/** Process ids whose command line mentions `text` (a real process listing, from /proc). */
function processesMentioning(text: string): number[] {
  return readdirSync('/proc')
    .filter((entry) => /^\d+$/.test(entry))
    .filter((pid) => {
      try {
        return readFileSync(`/proc/${pid}/cmdline`, 'utf8').includes(text);
      } catch {
        return false;
      }
    })
    .map(Number);
}

async function until(check: () => boolean, seconds: number): Promise<boolean> {
  for (let waited = 0; waited < seconds * 10; waited++) {
    if (check()) return true;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return check();
}

describe('the browser that prints the PDF', () => {
  it('ends when its run is killed, and writes nothing to the home folder', async () => {
    const temporary = mkdtempSync(join(tmpdir(), 'tb-kill-tmp-'));
    const home = mkdtempSync(join(tmpdir(), 'tb-kill-home-'));
    const child = spawn(process.execPath, ['--import', 'tsx', 'test/support/holdPrinter.ts'], {
      env: { ...process.env, TMPDIR: temporary, HOME: home },
      stdio: ['ignore', 'pipe', 'inherit'],
    });
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => (output += chunk.toString()));
    expect(await until(() => output.includes('ready'), 60)).toBe(true);
    // The browser runs, its profile inside the run's own folder under TMPDIR.
    const folders = readdirSync(temporary).filter((entry) => entry.startsWith(`trendbrief-browser-${child.pid}-`));
    expect(folders).toHaveLength(1);
    expect(processesMentioning(join(temporary, folders[0])).length).toBeGreaterThan(0);

    child.kill('SIGKILL');
    expect(await until(() => processesMentioning(join(temporary, folders[0])).length === 0, 30)).toBe(true);
    expect(readdirSync(home)).toEqual([]);

    // The killed run left its folder; the next run removes it, as no process of that id lives.
    expect(existsSync(join(temporary, folders[0]))).toBe(true);
    removeStaleBrowserFolders(temporary);
    // (tsx, which runs the child, keeps its own cache there too.)
    expect(readdirSync(temporary).filter((entry) => entry.startsWith('trendbrief-browser-'))).toEqual([]);
  }, 120_000);
});

describe('a temporary folder the browser cannot use', () => {
  it('is bad input the user can fix (exit 2), named with what to do', async () => {
    const { openBrowserFolder } = await import('../../src/memo/print/browserFolder.js');
    const { InputError } = await import('../../src/base/problem.js');
    const missing = join(tmpdir(), 'tb-no-such-folder', 'deeper');
    let thrown: unknown;
    try {
      openBrowserFolder(missing);
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(InputError);
    const [problem] = (thrown as InstanceType<typeof InputError>).problems;
    expect(problem).toMatchObject({ code: 'print.temporary-folder' });
    expect(problem.message).toBe(`the temporary folder ${missing} cannot take the browser's files for the PDF (ENOENT)`);
    expect(problem.hint).toContain('set TMPDIR to a writable folder');
  });
});
