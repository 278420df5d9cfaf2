// A memo folder as it lies on disk, read for `review`, `verify` and a rerun over it: its
// manifest, the bytes of the outputs the manifest lists, the content digest of what is stored
// (the inputs' recorded digests and the stored record.json and forecasts.csv), its sign-off
// log and its supersession note.
import { existsSync } from 'node:fs';
import { MAX_RUN_DOCUMENT_BYTES, regularFileBytes } from '../base/readRegularFile.js';
import { join } from 'node:path';
import { shownPath } from '../base/shownPath.js';
import type { OutputFormat } from '../config/runPlan.js';
import type { Supersedes } from '../memo/reviewPart.js';
import { contentDigest } from './contentDigest.js';
import type { Manifest } from './manifest.js';
import { readManifest } from './readManifest.js';
import { readSignOffLog, type SignOffLog } from './signOffLog.js';
import { readSupersedes } from './supersedesFile.js';

export interface StoredMemo {
  /** Absolute. */
  folder: string;
  /** manifest.json as messages name it. */
  manifestFile: string;
  manifest: Manifest;
  /** The bytes of each output the manifest lists that is present. */
  stored: Map<string, Buffer>;
  /** Of the stored content (contentDigest.ts). */
  digest: string;
  log: SignOffLog;
  supersedes: Supersedes | null;
}

/** The memo folder at `folder`, or null when it holds no manifest.json. */
export function readStoredMemo(folder: string): StoredMemo | null {
  const file = join(folder, 'manifest.json');
  if (!existsSync(file)) return null;
  const manifestFile = join(shownPath(folder), 'manifest.json');
  const manifest = readManifest(file, manifestFile);
  const stored = new Map<string, Buffer>();
  for (const output of manifest.outputs) {
    const path = join(folder, output.file);
    // Only a regular file is read: a FIFO or a device in an output's place counts as missing.
    const bytes = regularFileBytes(path, MAX_RUN_DOCUMENT_BYTES);
    if (bytes !== null) stored.set(output.file, bytes);
  }
  return { folder, manifestFile, manifest, stored, digest: contentDigest(manifest.inputs, stored), log: readSignOffLog(folder), supersedes: readSupersedes(folder) };
}

/** The formats a memo folder was written in, read from its manifest's outputs. */
export function storedFormats(manifest: Manifest): OutputFormat[] {
  const byFile: Record<string, OutputFormat> = { 'memo.html': 'html', 'memo.pdf': 'pdf', 'record.json': 'json', 'forecasts.csv': 'csv', 'forecasts.xlsx': 'xlsx' };
  return manifest.outputs.flatMap((output) => (Object.hasOwn(byFile, output.file) ? [byFile[output.file]] : []));
}
