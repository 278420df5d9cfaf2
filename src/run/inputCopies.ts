// The copies of a run's inputs that make a memo folder self-contained: every manifest input
// (the config, the data files, an earlier record read for the revisions) is copied byte for
// byte under inputs/<role>/ with its own file name, so an archived folder can be verified,
// reviewed and rerun with nothing outside it. Copying is generic: whatever role an input has,
// it is copied the same way.
import { basename, resolve } from 'node:path';
import { InputError } from '../base/problem.js';
import { MAX_RUN_DOCUMENT_BYTES, readRegularFile } from '../base/readRegularFile.js';
import { shownPath } from '../base/shownPath.js';
import { inputDigest, type ManifestInput } from './manifest.js';
import { copyMessages } from './messages.js';
import type { OutputFile } from './writeOutputFolder.js';

/** The memo folder's subfolder that holds the copies. */
export const INPUTS_FOLDER = 'inputs';

/**
 * The inputs with the name of their copy: `inputs/<role>/<file name>`, one copy per original
 * (two series reading one file share it), a second original of the same name numbered
 * (`lake-huron-2.csv`).
 */
export function withCopyNames(inputs: readonly ManifestInput[]): ManifestInput[] {
  const bySource = new Map<string, string>();
  const taken = new Set<string>();
  return inputs.map((input) => {
    const source = `${input.role}\u0000${input.from_output}`;
    let copy = bySource.get(source);
    if (copy === undefined) {
      const name = basename(input.path.replaceAll('\\', '/'));
      const dot = name.lastIndexOf('.');
      const [stem, extension] = dot > 0 ? [name.slice(0, dot), name.slice(dot)] : [name, ''];
      copy = `${INPUTS_FOLDER}/${input.role}/${name}`;
      for (let n = 2; taken.has(copy); n++) copy = `${INPUTS_FOLDER}/${input.role}/${stem}-${n}${extension}`;
      taken.add(copy);
      bySource.set(source, copy);
    }
    return { ...input, copy };
  });
}

/**
 * The copies as output files, read from `from` (the memo folder the places are relative to)
 * at each input's original place, or at its copy when `at` is 'copy'. A file whose digest is
 * no longer the one recorded (changed while the run analysed it, or a tampered copy) is refused.
 */
export function inputCopyFiles(from: string, inputs: readonly ManifestInput[], at: 'original' | 'copy'): OutputFile[] {
  const files = new Map<string, OutputFile>();
  for (const input of inputs) {
    if (input.copy === undefined || files.has(input.copy)) continue;
    const path = resolve(from, at === 'copy' ? input.copy : input.from_output);
    // Only a regular file is read: a FIFO or a device put in an input's place never makes the run wait.
    const read = readRegularFile(path, MAX_RUN_DOCUMENT_BYTES);
    if (read.fault !== undefined) throw new InputError(copyMessages.unreadable(shownPath(path), input.role));
    const { bytes } = read;
    if (inputDigest(input.role, bytes) !== input.sha256) throw new InputError(copyMessages.changed(shownPath(path), input.role, input.sha256));
    files.set(input.copy, { name: input.copy, content: bytes });
  }
  return [...files.values()];
}
