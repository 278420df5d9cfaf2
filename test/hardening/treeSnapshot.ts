// Everything under a folder, as data: each path with its kind and, for a regular file, the
// SHA-256 of its bytes. Two snapshots are equal only when no file or folder was added,
// removed or changed. FIFOs are listed, never opened (opening one would wait for a writer).
import { lstatSync, readdirSync, readFileSync, readlinkSync } from 'node:fs';
import { join } from 'node:path';
import { sha256 } from '../../src/run/manifest.js';

export type TreeSnapshot = Record<string, string>;

export function treeSnapshot(root: string): TreeSnapshot {
  const entries: TreeSnapshot = {};
  const visit = (relative: string): void => {
    for (const name of readdirSync(join(root, relative)).sort()) {
      const path = relative === '' ? name : `${relative}/${name}`;
      const stats = lstatSync(join(root, path));
      if (stats.isDirectory()) {
        entries[path] = 'folder';
        visit(path);
      } else if (stats.isSymbolicLink()) entries[path] = `link to ${readlinkSync(join(root, path))}`;
      else if (stats.isFile()) entries[path] = `file ${sha256(readFileSync(join(root, path)))}`;
      else entries[path] = stats.isFIFO() ? 'fifo' : 'special';
    }
  };
  visit('');
  return entries;
}
