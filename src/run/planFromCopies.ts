// A memo folder's config loaded again from the copy the folder carries, with each series' data
// file mapped to its copy, and the earlier record its revisions section read taken from its
// copy too: what `verify` reruns and `review` renders from, wherever the folder now lies.
// Relative paths other than the data files (output.templates) still resolve against the
// original config's folder, as the run resolved them; the data files never do.
import { dirname, resolve } from 'node:path';
import { InputError } from '../base/problem.js';
import { readInputFile } from '../base/readInputFile.js';
import { shownPath } from '../base/shownPath.js';
import { MAX_CONFIG_FILE_BYTES } from '../config/loadConfig.js';
import { configMessages } from '../config/messages.js';
import { parseConfig } from '../config/parseConfig.js';
import type { RunPlan } from '../config/runPlan.js';
import { readComparableDocument, type ComparableDocument } from './comparableDocument.js';
import type { EarlierRecord } from './findEarlierRecord.js';
import type { Manifest, ManifestInput } from './manifest.js';
import { verifyMessages } from './messages.js';

/** Where verify and review read an input: its copy when the manifest names one, else its original place. */
export function inputPlace(folder: string, input: ManifestInput): string {
  return resolve(folder, input.copy ?? input.from_output);
}

export function planFromCopies(folder: string, manifest: Manifest, manifestFile: string): RunPlan {
  const index = manifest.inputs.findIndex((input) => input.role === 'config');
  if (index < 0) throw new InputError(verifyMessages.badManifest(manifestFile, 'inputs', 'a list with one config'));
  const config = manifest.inputs[index];
  const file = shownPath(inputPlace(folder, config));
  const { text } = readInputFile(file, MAX_CONFIG_FILE_BYTES, configMessages);
  const plan = parseConfig(text, file, dirname(resolve(folder, config.from_output)));
  const series = plan.series.map((seriesPlan) => {
    const data = manifest.inputs.find((input) => input.role === 'data' && input.path === seriesPlan.fileAsWritten);
    if (data === undefined) throw new InputError(verifyMessages.badManifest(manifestFile, 'inputs', `a list naming the data file ${seriesPlan.fileAsWritten}`));
    return { ...seriesPlan, file: inputPlace(folder, data) };
  });
  return { ...plan, series };
}

/** The earlier records the memo read, from their copies, in the manifest's order (the revisions' first); empty when it read none. */
export function earlierFromCopies(folder: string, manifest: Manifest, manifestFile: string): EarlierRecord[] {
  return manifest.inputs.flatMap((input, index) => {
    if (input.role !== 'earlier-record') return [];
    const file = inputPlace(folder, input);
    const read: { document: ComparableDocument; sha256: string } | null = readComparableDocument(file);
    if (read === null) throw new InputError(verifyMessages.earlierRecordUnreadable(manifestFile, `inputs[${index}]`, input.copy ?? input.from_output));
    return [{ asOf: read.document.memo.as_of, file, ...read }];
  });
}

/** The earlier record the memo's revisions section read (the most recent); null when it read none. */
export function earlierFromCopy(folder: string, manifest: Manifest, manifestFile: string): EarlierRecord | null {
  return earlierFromCopies(folder, manifest, manifestFile)[0] ?? null;
}
