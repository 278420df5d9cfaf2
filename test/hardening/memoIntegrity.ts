// What a reader may find in an output folder after a run was killed: the earlier memo exactly
// as it was, or a complete new one whose manifest lists every file with its hash; never a
// half-written folder under the memo's name (its input copies included).
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { inputDigest, sha256 } from '../../src/run/manifest.js';

interface ManifestOutputs {
  inputs: { role: 'config' | 'data' | 'earlier-record'; sha256: string; copy?: string }[];
  outputs: { file: string; sha256: string; bytes: number }[];
}

/** Problems with `folder` as a complete memo: files missing, extra or not matching the manifest. */
export function manifestMismatches(folder: string): string[] {
  const manifestFile = join(folder, 'manifest.json');
  if (!existsSync(manifestFile)) return ['no manifest.json'];
  let manifest: ManifestOutputs;
  try {
    manifest = JSON.parse(readFileSync(manifestFile, 'utf8')) as ManifestOutputs;
  } catch {
    return ['manifest.json is not JSON'];
  }
  const listed = manifest.outputs.map((output) => output.file);
  // The copies of the inputs under inputs/ are checked against the manifest's inputs below.
  const present = readdirSync(folder).filter((file) => file !== 'manifest.json' && file !== 'inputs');
  const mismatches = [
    ...present.filter((file) => !listed.includes(file)).map((file) => `${file} is not in the manifest`),
    ...listed.filter((file) => !present.includes(file)).map((file) => `${file} is missing`),
  ];
  for (const output of manifest.outputs) {
    if (!present.includes(output.file)) continue;
    const content = readFileSync(join(folder, output.file));
    if (sha256(content) !== output.sha256 || content.byteLength !== output.bytes) mismatches.push(`${output.file} does not match its hash`);
  }
  for (const input of manifest.inputs) {
    if (input.copy === undefined) continue;
    const copy = join(folder, input.copy);
    if (!existsSync(copy)) mismatches.push(`${input.copy} is missing`);
    else if (inputDigest(input.role, readFileSync(copy)) !== input.sha256) mismatches.push(`${input.copy} does not match its input's hash`);
  }
  return mismatches;
}
