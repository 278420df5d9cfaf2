// One writer at a time on a memo folder: a review appends to the sign-off log by writing the
// folder anew, and a run weighs the log before replacing the folder, so two of them at once
// could lose a recorded sign-off. Each holds a lock file beside the folder
// (`.lock-<folder name>`, holding its process id) from reading the folder to publishing it. A
// lock whose process is gone (a killed run) is taken over.
import { closeSync, existsSync, openSync, readFileSync, rmSync, writeSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { InputError } from '../base/problem.js';
import { shownPath } from '../base/shownPath.js';
import { lockMessages } from './messages.js';

function lockFile(folder: string): string {
  return join(dirname(folder), `.lock-${basename(folder)}`);
}

/** True when the process that wrote the lock still runs. */
function holderAlive(file: string): boolean {
  let pid: number;
  try {
    pid = Number(readFileSync(file, 'utf8'));
  } catch {
    return false;
  }
  if (!Number.isInteger(pid) || pid <= 0) return false;
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return error instanceof Error && 'code' in error && error.code === 'EPERM';
  }
}

function acquire(file: string, folder: string): void {
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const fd = openSync(file, 'wx');
      try {
        writeSync(fd, String(process.pid));
      } catch (error) {
        // A full disk: no lock, and no empty lock file left behind.
        rmSync(file, { force: true });
        throw error;
      } finally {
        closeSync(fd);
      }
      return;
    } catch (error) {
      if (!(error instanceof Error && 'code' in error && error.code === 'EEXIST')) throw error;
      if (holderAlive(file)) break;
      rmSync(file, { force: true });
    }
  }
  throw new InputError(lockMessages.busy(shownPath(folder)));
}

/**
 * Runs `work` holding the memo folder's lock. Where the folder's parent does not exist yet there
 * is no memo, and no sign-off, to protect: nothing is created for the lock.
 */
export async function withMemoLock<T>(folder: string, work: () => Promise<T>): Promise<T> {
  if (!existsSync(dirname(folder))) return work();
  const file = lockFile(folder);
  acquire(file, folder);
  try {
    return await work();
  } finally {
    rmSync(file, { force: true });
  }
}
