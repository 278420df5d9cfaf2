// Writes a set of output files so that a reader only ever sees a complete memo, and nothing
// lands outside the output folder: the files go into a hidden temporary folder beside the
// memo's name, created afresh and checked to lie inside the real output folder, and are
// published as the memo's next version by one atomic rename of a link (`memoVersions.ts`).
// A failed or killed run leaves the previous memo as it was.
import { mkdirSync, realpathSync, rmSync, writeFileSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { InputError } from '../base/problem.js';
import { shownPath } from '../base/shownPath.js';
import { containmentMessages } from './messages.js';
import { isMemoLink, kindOf, publishVersion, recoverMemoLink, TEMPORARY } from './memoVersions.js';
import { isInside, makeFolders, realFolderWithin } from './outputTree.js';
import { pauseAtStep } from './pauseAtStep.js';

export { isInside } from './outputTree.js';

export interface OutputFile {
  /** Path relative to the output folder, with forward slashes. */
  name: string;
  content: string | Uint8Array;
}

/**
 * Writes `files` as the memo at `target` (created or replaced as a whole). Every folder created
 * and every file written must resolve inside `within` (the output folder; by default the folder
 * holding `target`), and `target` must be missing or the link a previous publish left.
 */
export function writeOutputFolder(target: string, files: readonly OutputFile[], within = dirname(resolve(target))): void {
  const folder = resolve(target);
  const parent = dirname(folder);
  const owner = /^\.(.+)\.v[1-9]\d*$/.exec(basename(folder));
  if (owner !== null) throw new InputError(containmentMessages.hiddenVersion(shownPath(folder), shownPath(join(parent, owner[1]))));
  makeFolders(parent);
  if (realFolderWithin(within, parent) === null) throw new InputError(containmentMessages.leavesOutput(shownPath(parent), shownPath(realpathSync(parent)), shownPath(within)));
  recoverMemoLink(folder);
  if (kindOf(folder) !== 'missing' && !isMemoLink(folder)) throw new InputError(containmentMessages.nameTaken(shownPath(folder)));
  const temporary = join(parent, `${TEMPORARY}${basename(folder)}-${process.pid}`);
  rmSync(temporary, { recursive: true, force: true });
  mkdirSync(temporary);
  try {
    const real = realpathSync(temporary);
    for (const file of files) {
      const path = resolve(temporary, file.name);
      if (!isInside(temporary, path)) throw new Error(`writeOutputFolder: '${file.name}' would leave the output folder`);
      makeFolders(dirname(path));
      // Only folders this run created lie under the temporary folder; a link slipped in meanwhile is refused.
      if (realFolderWithin(real, dirname(path)) === null) throw new InputError(containmentMessages.leavesOutput(shownPath(dirname(path)), shownPath(realpathSync(dirname(path))), shownPath(within)));
      writeFileSync(path, file.content, { flag: 'wx' });
    }
    pauseAtStep('files-written');
    publishVersion(temporary, folder);
  } catch (error) {
    rmSync(temporary, { recursive: true, force: true });
    throw error;
  }
}
