// What a reader may find in an output folder after a run was killed: the earlier memo exactly
// as it was, or a complete new one whose manifest lists every file with its hash; never a
// half-written folder under the memo's name.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { sha256 } from '../../src/run/manifest.js';

interface ManifestOutputs {
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
  const present = readdirSync(folder).filter((file) => file !== 'manifest.json');
  const mismatches = [
    ...present.filter((file) => !listed.includes(file)).map((file) => `${file} is not in the manifest`),
    ...listed.filter((file) => !present.includes(file)).map((file) => `${file} is missing`),
  ];
  for (const output of manifest.outputs) {
    if (!present.includes(output.file)) continue;
    const content = readFileSync(join(folder, output.file));
    if (sha256(content) !== output.sha256 || content.byteLength !== output.bytes) mismatches.push(`${output.file} does not match its hash`);
  }
  return mismatches;
}
