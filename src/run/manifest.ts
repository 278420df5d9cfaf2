// manifest.json: SHA-256 of every input and output of a run, so `verify` and a reviewer can
// check that nothing changed since the memo was issued.
import { createHash } from 'node:crypto';
import type { OutputFile } from './writeOutputFolder.js';

export interface ManifestInput {
  role: 'config' | 'data';
  /** The path as the config wrote it (relative to the config), never a machine path. */
  path: string;
  sha256: string;
}

export interface Manifest {
  schema: 'trendbrief.manifest/1';
  tool: { name: string; version: string };
  run_date: string;
  command: string;
  inputs: ManifestInput[];
  outputs: { file: string; sha256: string; bytes: number }[];
}

export function sha256(content: string | Uint8Array): string {
  return createHash('sha256').update(content).digest('hex');
}

export function buildManifest(base: Omit<Manifest, 'schema' | 'outputs'>, files: readonly OutputFile[]): Manifest {
  return {
    schema: 'trendbrief.manifest/1',
    ...base,
    outputs: files.map((file) => ({
      file: file.name,
      sha256: sha256(file.content),
      bytes: typeof file.content === 'string' ? Buffer.byteLength(file.content) : file.content.byteLength,
    })),
  };
}
