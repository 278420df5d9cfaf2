// The files under a folder, read into memory as output files named from the memo folder
// (`revisions/1/memo.html`), so that a folder being replaced can carry them into its
// successor through writeOutputFolder's complete-or-nothing publish.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { OutputFile } from './writeOutputFolder.js';

/**
 * Every regular file under `root/sub`, recursively, named `sub/...` with forward slashes (or
 * from `root` itself when `sub` is ''), leaving out the entries of `sub` named in `skip`; none
 * when the folder does not exist. Links are not followed.
 */
export function folderFiles(root: string, sub: string, skip: readonly string[] = []): OutputFile[] {
  let entries;
  try {
    entries = readdirSync(join(root, sub), { withFileTypes: true });
  } catch {
    return [];
  }
  const files: OutputFile[] = [];
  for (const entry of entries.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0))) {
    if (skip.includes(entry.name)) continue;
    const name = sub === '' ? entry.name : `${sub}/${entry.name}`;
    if (entry.isDirectory()) files.push(...folderFiles(root, name));
    else if (entry.isFile()) files.push({ name, content: readFileSync(join(root, name)) });
  }
  return files;
}
