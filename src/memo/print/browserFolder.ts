// Where the browser that prints the PDF keeps its files: one folder per run under the system's
// temporary folder, named with the run's process id, holding the browser's profile and the home
// folder it is given. The browser writes nothing to the user's home (its HOME and XDG folders
// point here), and a run that was killed leaves at most this folder behind, which the next run
// removes once no process of that id is alive.
import { mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { InputError } from '../../base/problem.js';
import { printMessages } from '../messages.js';

const PREFIX = 'trendbrief-browser-';

export interface BrowserFolder {
  /** The browser's profile (its user data directory). */
  profile: string;
  /** The environment the browser starts with: the run's, with HOME and the XDG folders inside this folder. */
  env: Record<string, string | undefined>;
  /** Removes the folder and everything the browser wrote. */
  remove(): void;
}

/** Whether a process with this id is alive (a process we may not signal still is). */
function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return error instanceof Error && 'code' in error && error.code === 'EPERM';
  }
}

/** Removes the browser folders of runs that are no longer alive. */
export function removeStaleBrowserFolders(parent = tmpdir()): void {
  let entries: string[];
  try {
    entries = readdirSync(parent);
  } catch {
    return;
  }
  for (const entry of entries) {
    if (!entry.startsWith(PREFIX)) continue;
    const pid = Number(entry.slice(PREFIX.length).split('-')[0]);
    if (Number.isInteger(pid) && pid > 0 && pid !== process.pid && !alive(pid)) rmSync(join(parent, entry), { recursive: true, force: true });
  }
}

export function openBrowserFolder(parent = tmpdir()): BrowserFolder {
  removeStaleBrowserFolders(parent);
  let root: string;
  try {
    root = mkdtempSync(join(parent, `${PREFIX}${process.pid}-`));
    mkdirSync(join(root, 'profile'));
    mkdirSync(join(root, 'home', '.config'), { recursive: true });
    mkdirSync(join(root, 'home', '.cache'), { recursive: true });
  } catch (error) {
    const code = error instanceof Error && 'code' in error ? String(error.code) : 'unknown';
    throw new InputError(printMessages.temporaryUnusable(parent, code));
  }
  const home = join(root, 'home');
  return {
    profile: join(root, 'profile'),
    env: { ...process.env, HOME: home, XDG_CONFIG_HOME: join(home, '.config'), XDG_CACHE_HOME: join(home, '.cache'), XDG_DATA_HOME: join(home, '.local', 'share') },
    remove: () => rmSync(root, { recursive: true, force: true }),
  };
}
