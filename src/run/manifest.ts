// manifest.json: SHA-256 of every input and output of a run, so `verify` and a reviewer can
// check that nothing changed since the memo was issued. Each input is located three times: as
// the config wrote it, relative to the memo folder (`from_output`, the original), and as the
// copy the memo folder carries (`copy`, under inputs/), which is what verify reruns from, so an
// archived folder verifies wherever it lies. No machine path appears in the output.
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
  /**
   * The copy inside the memo folder (`inputs/data/lake-huron.csv`), relative to it, with forward
   * slashes; byte for byte the original. Absent in manifests written before folders carried
   * their inputs.
   */
  copy?: string;
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

/** The digest a run records for an input: of the bytes, and for the config of its text, as the config stage hashes it. */
export function inputDigest(role: InputRole, bytes: Uint8Array): string {
  if (role !== 'config') return sha256(bytes);
  try {
    return sha256(new TextDecoder('utf-8', { fatal: true }).decode(bytes));
  } catch {
    return sha256(bytes);
  }
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
