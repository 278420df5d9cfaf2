// How a memo's name always resolves to a complete memo. Each version of the memo is a hidden
// folder beside its name, `.<name>.v<N>`, renamed there only once every file is written; the
// name itself is a relative symbolic link to the current version. Publishing makes a new link
// and renames it over the name: rename(2) replaces the old link atomically (POSIX), so a reader
// or a killed run sees the old memo or the new one, never neither. Old versions are removed
// after the swap (a revision keeps its files under revisions/N of the new version).
//
// A memo written before versions existed is a plain folder: it is moved aside as a version and
// linked at once; a run killed between those two renames leaves the name missing, and the
// next run links the highest version again (`recoverMemoLink`).
import { lstatSync, readdirSync, readlinkSync, renameSync, rmSync, symlinkSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { pauseAtStep } from './pauseAtStep.js';

export const TEMPORARY = '.partial-';
const LEGACY_BACKUP = '.previous-';
const NEW_LINK = '.link-';

function versionName(name: string, version: number): string {
  return `.${name}.v${version}`;
}

function versionOf(name: string, entry: string): number | null {
  const prefix = `.${name}.v`;
  if (!entry.startsWith(prefix) || !/^[1-9]\d*$/.test(entry.slice(prefix.length))) return null;
  return Number(entry.slice(prefix.length));
}

/** What stands at a path, links not followed. */
export function kindOf(path: string): 'missing' | 'link' | 'folder' | 'other' {
  try {
    const stats = lstatSync(path);
    return stats.isSymbolicLink() ? 'link' : stats.isDirectory() ? 'folder' : 'other';
  } catch {
    return 'missing';
  }
}

/** The versions of `name` kept in `parent`, lowest first. */
function versions(parent: string, name: string): number[] {
  return readdirSync(parent)
    .map((entry) => versionOf(name, entry))
    .filter((version): version is number => version !== null && kindOf(join(parent, versionName(name, version))) === 'folder')
    .sort((a, b) => a - b);
}

/** The version a memo's name links to, when it is one of our links (relative, to a version folder beside it); else null. */
export function linkedVersion(folder: string): number | null {
  if (kindOf(folder) !== 'link') return null;
  const version = versionOf(basename(folder), readlinkSync(folder));
  return version !== null && kindOf(join(dirname(folder), versionName(basename(folder), version))) === 'folder' ? version : null;
}

/** True when `path` is a memo's name as publishing leaves it: a link to its current version. */
export function isMemoLink(path: string): boolean {
  return linkedVersion(path) !== null;
}

/** True when `entry` is `prefix` and a process id (so memo `a` never takes memo `a-b`'s leftovers for its own). */
function leftBy(prefix: string, entry: string): boolean {
  return entry.startsWith(prefix) && /^\d+$/.test(entry.slice(prefix.length));
}

function linkTo(folder: string, version: number): void {
  const link = join(dirname(folder), `${NEW_LINK}${basename(folder)}-${process.pid}`);
  rmSync(link, { force: true });
  symlinkSync(versionName(basename(folder), version), link);
  renameSync(link, folder);
}

/**
 * Brings a memo's name to a link to a complete version, removing what killed runs left: a memo
 * under the old backup name is put back, a plain folder becomes the first version, a missing
 * name is linked to the highest version, and partial folders, new links and versions nobody
 * links to are removed. A name that is some other link or a file is left alone.
 */
export function recoverMemoLink(folder: string): void {
  const parent = dirname(folder);
  const name = basename(folder);
  if (kindOf(parent) !== 'folder' && kindOf(parent) !== 'link') return;
  const backup = join(parent, `${LEGACY_BACKUP}${name}`);
  if (kindOf(backup) !== 'missing') {
    if (kindOf(folder) === 'missing') renameSync(backup, folder);
    else rmSync(backup, { recursive: true, force: true });
  }
  if (kindOf(folder) === 'folder') {
    const version = Math.max(0, ...versions(parent, name)) + 1;
    renameSync(folder, join(parent, versionName(name, version)));
    pauseAtStep('folder-moved-aside');
    linkTo(folder, version);
  }
  if (kindOf(folder) === 'missing') {
    const highest = versions(parent, name).at(-1);
    if (highest !== undefined) linkTo(folder, highest);
  }
  const current = linkedVersion(folder);
  for (const entry of readdirSync(parent)) {
    const version = versionOf(name, entry);
    const stale = leftBy(`${TEMPORARY}${name}-`, entry) || leftBy(`${NEW_LINK}${name}-`, entry) || (version !== null && version !== current);
    if (stale) rmSync(join(parent, entry), { recursive: true, force: true });
  }
}

/**
 * Publishes the complete folder `written` (beside the name) as the memo's next version: renamed
 * to its version name, linked in place of the old link in one rename, the old versions removed.
 * The name must be missing or one of our links (`recoverMemoLink` first).
 */
export function publishVersion(written: string, folder: string): void {
  const parent = dirname(folder);
  const name = basename(folder);
  const version = Math.max(0, ...versions(parent, name)) + 1;
  renameSync(written, join(parent, versionName(name, version)));
  pauseAtStep('version-named');
  linkTo(folder, version);
  pauseAtStep('link-swapped');
  for (const old of versions(parent, name)) {
    if (old !== version) rmSync(join(parent, versionName(name, old)), { recursive: true, force: true });
  }
}
