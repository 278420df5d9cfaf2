// Where a run may create folders and write: only on an ordinary file system, and only inside the
// real path of the output folder it was given, whatever symbolic links sit inside that folder.
// Folders are created one level at a time: Node's recursive mkdir, asked for a folder under
// /proc/self, turns ENOENT into EEXIST and back forever.
import { accessSync, constants, lstatSync, mkdirSync, realpathSync, statfsSync } from 'node:fs';
import { dirname, relative, resolve, sep } from 'node:path';

/**
 * File systems that hold no files of ours: their type numbers as statfs(2) reports them
 * (linux/magic.h, from memory). A folder there is made up by the kernel.
 */
const PSEUDO_FILE_SYSTEMS: ReadonlyMap<number, string> = new Map([
  [0x9fa0, 'proc'],
  [0x62656572, 'sysfs'],
  [0x1cd1, 'devpts'],
  [0x27e0eb, 'cgroup'],
  [0x63677270, 'cgroup2'],
  [0x64626720, 'debugfs'],
  [0x73636673, 'securityfs'],
  [0x74726163, 'tracefs'],
  [0x62656570, 'configfs'],
  [0x6165676c, 'pstore'],
  [0xcafe4a11, 'bpf'],
  [0x42494e4d, 'binfmt_misc'],
  [0x6e736673, 'nsfs'],
]);

function exists(path: string): boolean {
  try {
    lstatSync(path);
    return true;
  } catch {
    return false;
  }
}

/** `path` itself when it exists, else the nearest folder above it that does. */
export function nearestExisting(path: string): string {
  let at = resolve(path);
  while (!exists(at) && dirname(at) !== at) at = dirname(at);
  return at;
}

/** The name of the pseudo file system `path` (or the nearest existing folder above it) lies on, or null. */
export function pseudoFileSystem(path: string): string | null {
  try {
    return PSEUDO_FILE_SYSTEMS.get(Number(statfsSync(nearestExisting(path)).type)) ?? null;
  } catch {
    return null;
  }
}

/** The error code when the nearest existing folder at or above `path` cannot be written (EROFS, EACCES), else null. */
export function unwritableAt(path: string): string | null {
  try {
    accessSync(nearestExisting(path), constants.W_OK);
    return null;
  } catch (error) {
    return error instanceof Error && 'code' in error ? String(error.code) : 'unknown';
  }
}

/** Creates `path` and the folders missing above it, one level at a time. */
export function makeFolders(path: string): void {
  const missing: string[] = [];
  for (let at = resolve(path); !exists(at) && dirname(at) !== at; at = dirname(at)) missing.push(at);
  for (const folder of missing.reverse()) mkdirSync(folder);
}

/** True when `path` lies inside `folder` (not equal to it, not above it). */
export function isInside(folder: string, path: string): boolean {
  const rel = relative(folder, path);
  return rel !== '' && !rel.startsWith(`..${sep}`) && rel !== '..' && !rel.startsWith(sep);
}

/**
 * The real path of `folder` (which exists) when it is `root`'s real path or lies inside it;
 * null when a symbolic link on the way leads elsewhere.
 */
export function realFolderWithin(root: string, folder: string): string | null {
  const realRoot = realpathSync(root);
  const real = realpathSync(folder);
  return real === realRoot || isInside(realRoot, real) ? real : null;
}
