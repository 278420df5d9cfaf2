// Writes a set of output files so that a reader only ever sees a complete folder: the files
// go into a hidden temporary folder beside the target, which is renamed into place only once
// every file is written. A failed or killed run leaves the previous folder as it was.
//
// Replacing an existing folder takes two renames (old → backup, temporary → target); a run
// killed between them leaves the previous folder under its backup name, which the next run
// puts back before it starts (`recoverOutputFolder`).
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { basename, dirname, join, relative, resolve, sep } from 'node:path';

export interface OutputFile {
  /** Path relative to the output folder, with forward slashes. */
  name: string;
  content: string | Uint8Array;
}

const TEMPORARY = '.partial-';
const BACKUP = '.previous-';

/** Writes `files` into `target` (created or replaced as a whole). */
export function writeOutputFolder(target: string, files: readonly OutputFile[]): void {
  const folder = resolve(target);
  const parent = dirname(folder);
  const name = basename(folder);
  mkdirSync(parent, { recursive: true });
  recoverOutputFolder(folder);
  const temporary = join(parent, `${TEMPORARY}${name}-${process.pid}`);
  rmSync(temporary, { recursive: true, force: true });
  mkdirSync(temporary);
  try {
    for (const file of files) {
      const path = resolve(temporary, file.name);
      if (!isInside(temporary, path)) throw new Error(`writeOutputFolder: '${file.name}' would leave the output folder`);
      mkdirSync(dirname(path), { recursive: true });
      writeFileSync(path, file.content);
    }
    const backup = join(parent, `${BACKUP}${name}`);
    if (existsSync(folder)) renameSync(folder, backup);
    renameSync(temporary, folder);
    rmSync(backup, { recursive: true, force: true });
  } catch (error) {
    rmSync(temporary, { recursive: true, force: true });
    throw error;
  }
}

/**
 * Puts back a previous output folder left under its backup name by a run killed between its
 * two renames, and removes temporary folders of runs that died.
 */
export function recoverOutputFolder(target: string): void {
  const folder = resolve(target);
  const parent = dirname(folder);
  const name = basename(folder);
  if (!existsSync(parent)) return;
  const backup = join(parent, `${BACKUP}${name}`);
  if (existsSync(backup)) {
    if (existsSync(folder)) rmSync(backup, { recursive: true, force: true });
    else renameSync(backup, folder);
  }
  for (const entry of readdirSync(parent)) {
    if (entry.startsWith(`${TEMPORARY}${name}-`)) rmSync(join(parent, entry), { recursive: true, force: true });
  }
}

/** True when `path` lies inside `folder` (not equal to it, not above it). */
export function isInside(folder: string, path: string): boolean {
  const rel = relative(folder, path);
  return rel !== '' && !rel.startsWith(`..${sep}`) && rel !== '..' && !rel.startsWith(sep);
}
