// manifest.json: SHA-256 of every input and output of a run, so `verify` and a reviewer can
// check that nothing changed since the memo was issued. Each input is located twice: as the
// config wrote it, and relative to the memo folder (`from_output`), which is how verify finds
// it again without a machine path in the output.
import { createHash } from 'node:crypto';
import { relative, sep } from 'node:path';
import type { OutputFile } from './writeOutputFolder.js';

export const MANIFEST_SCHEMA = 'trendbrief.manifest/1';

/** The previous as-of memo's record.json, read for the revisions section, is an input too. */
export type InputRole = 'config' | 'data' | 'earlier-record';

export interface ManifestInput {
  role: InputRole;
  /**
   * The path as the config wrote it (relative to the config); for the earlier record, relative
   * to the memo id's folder (`2024-11/record.json`). Never a machine path.
   */
  path: string;
  /** The same file relative to the memo folder, with forward slashes. */
  from_output: string;
  /** Of the file's bytes; for the config, of its text (a byte-order mark is not part of it). */
  sha256: string;
}

export interface ManifestOutput {
  file: string;
  sha256: string;
  bytes: number;
}

export interface Manifest {
  schema: typeof MANIFEST_SCHEMA;
  tool: { name: string; version: string };
  run_date: string;
  command: string;
  inputs: ManifestInput[];
  outputs: ManifestOutput[];
}

export function sha256(content: string | Uint8Array): string {
  return createHash('sha256').update(content).digest('hex');
}

/** `to` relative to the folder `from`, with forward slashes whatever the system. */
export function posixRelative(from: string, to: string): string {
  return relative(from, to).split(sep).join('/') || '.';
}

export function buildManifest(base: Omit<Manifest, 'schema' | 'outputs'>, files: readonly OutputFile[]): Manifest {
  return {
    schema: MANIFEST_SCHEMA,
    ...base,
    outputs: files.map((file) => ({
      file: file.name,
      sha256: sha256(file.content),
      bytes: typeof file.content === 'string' ? Buffer.byteLength(file.content) : file.content.byteLength,
    })),
  };
}

export function manifestText(manifest: Manifest): string {
  return `${JSON.stringify(manifest, null, 2)}\n`;
}
