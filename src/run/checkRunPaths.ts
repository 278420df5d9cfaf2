// The places a run touches besides its config and data files, checked before any analysis: the
// output folder must be a folder or creatable as one, on a disk (not /proc or /sys) that can be
// written; no symbolic link may stand at <memo id> or <as-of> but the one publishing leaves;
// the memo's own folder, when it exists, must be a folder (a run replaces a folder it wrote,
// never a file the user keeps there); and a configured templates folder must exist. A run that would fail there fails at once, not after
// minutes of fitting; failures while writing become the same kind of message.
import { lstatSync, readlinkSync, statSync, type Stats } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import type { RunPlan } from '../config/runPlan.js';
import { InputError, type InputLocation, type InputProblem } from '../base/problem.js';
import { runMessages } from './messages.js';
import { shownPath } from '../base/shownPath.js';
import { isMemoLink, kindOf } from './memoVersions.js';
import { nearestExisting, pseudoFileSystem, unwritableAt } from './outputTree.js';

export interface RunPaths {
  /** Absolute folder the memo's folder is written into. */
  outputFolder: string;
  /** Absolute folder of the memo id: the output folder and the memo id. */
  idFolder: string;
  /** Absolute folder of the memo: the memo id's folder, and in it the as-of period when the memo has one. */
  memoFolder: string;
  /** Where the output folder was chosen, for messages. */
  chosenAt: InputLocation;
}

type PathKind = 'missing' | 'folder' | 'a regular file' | 'a special file' | 'a link to nothing';

function pathKind(path: string): PathKind {
  let stats: Stats;
  try {
    stats = statSync(path);
  } catch {
    try {
      lstatSync(path);
      return 'a link to nothing';
    } catch {
      return 'missing';
    }
  }
  if (stats.isDirectory()) return 'folder';
  return stats.isFile() ? 'a regular file' : 'a special file';
}

/** `outputFolder` is the --out option, already resolved; otherwise the config's folder is used. */
export function checkRunPaths(plan: RunPlan, outputFolder: string | undefined): RunPaths {
  const folder = outputFolder ?? plan.output.folder;
  const chosenAt: InputLocation =
    outputFolder !== undefined ? { field: '--out' } : { file: plan.configFile, field: 'output.folder', ...plan.output.folderAt };
  const idFolder = resolve(folder, plan.memo.id);
  const memoFolder = plan.memo.asOf === undefined ? idFolder : join(idFolder, plan.memo.asOf);
  const paths = { outputFolder: folder, idFolder, memoFolder, chosenAt };
  const problems: InputProblem[] = [];
  const folderKind = pathKind(folder);
  if (folderKind === 'missing') {
    let above = dirname(folder);
    while (pathKind(above) === 'missing' && dirname(above) !== above) above = dirname(above);
    const aboveKind = pathKind(above);
    if (aboveKind !== 'folder') problems.push(runMessages.outputUnderNonFolder(chosenAt, shownPath(folder), shownPath(above), aboveKind));
  } else if (folderKind !== 'folder') {
    problems.push(runMessages.outputNotAFolder(chosenAt, shownPath(folder), folderKind));
  } else {
    for (const path of new Set([idFolder, memoFolder])) {
      // A link at <memo id> or <as-of> could send the memo outside the output folder; only the
      // links publishing leaves, to a version beside them, are allowed (memoVersions.ts).
      if (kindOf(path) === 'link' && !isMemoLink(path)) {
        problems.push(runMessages.memoFolderLink(chosenAt, shownPath(path), readlinkSync(path)));
        break;
      }
      const kind = pathKind(path);
      if (kind !== 'missing' && kind !== 'folder') problems.push(runMessages.memoFolderTaken(chosenAt, shownPath(path), kind));
    }
  }
  const pseudo = pseudoFileSystem(folder);
  const unwritable = pseudo === null ? unwritableAt(folder) : null;
  if (pseudo !== null) problems.push(runMessages.outputOnPseudoFileSystem(chosenAt, shownPath(folder), pseudo));
  else if (unwritable !== null && WRITE_REFUSALS.has(unwritable)) problems.push(runMessages.outputUnwritable(chosenAt, shownPath(nearestExisting(folder)), unwritable));
  const templates = plan.output.templates;
  if (templates !== undefined) {
    const at = { file: plan.configFile, ...templates.at };
    const kind = pathKind(templates.folder);
    if (kind === 'missing') problems.push(runMessages.templatesMissing(at, shownPath(templates.folder)));
    else if (kind !== 'folder') problems.push(runMessages.templatesNotAFolder(at, shownPath(templates.folder), kind));
  }
  if (problems.length > 0) throw new InputError(problems);
  return paths;
}

/** File-system refusals while writing: the user's environment, not a fault of the program. */
const WRITE_REFUSALS = new Set(['EACCES', 'EPERM', 'EROFS', 'ENOSPC', 'EDQUOT', 'ENOENT', 'ENOTDIR', 'EEXIST', 'EISDIR', 'ENAMETOOLONG', 'ELOOP']);

/** The error to throw for a failure while writing the memo folder. */
export function writeFailure(error: unknown, paths: RunPaths): unknown {
  const code = error instanceof Error && 'code' in error ? String(error.code) : undefined;
  if (code === undefined || !WRITE_REFUSALS.has(code)) return error;
  return new InputError(runMessages.outputUnwritable(paths.chosenAt, shownPath(paths.outputFolder), code));
}
