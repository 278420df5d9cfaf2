// The content digest of a memo: what a reviewer's sign-off is bound to. It covers what the
// memo says, not how it is shown: the digest of every input (config, data files, an earlier
// record) and the bytes of record.json and forecasts.csv. memo.html and memo.pdf (the
// rendering, which changes when a sign-off is recorded), the sign-off log itself and the
// manifest are outside it. Any change to an input or a number gives another digest, which
// voids every sign-off given before it.
import { sha256, type ManifestInput } from './manifest.js';

/** The files whose bytes the digest covers, in this order; one a run's formats leave out is absent from it. */
export const CONTENT_FILES = ['record.json', 'forecasts.csv'] as const;

const HEADER = 'trendbrief content digest 1';

/**
 * SHA-256 (lowercase hex) of this UTF-8 text, one line each, ending in a line feed:
 *
 *   trendbrief content digest 1
 *   input <role> <path as a JSON string> <SHA-256 the manifest records>     (every input, in manifest order)
 *   output <file> <SHA-256 of its bytes>                                   (record.json, then forecasts.csv, when written)
 *
 * `contents` maps a content file's name to its bytes; other names are ignored.
 */
export function contentDigest(inputs: readonly Pick<ManifestInput, 'role' | 'path' | 'sha256'>[], contents: ReadonlyMap<string, string | Uint8Array>): string {
  const lines = [HEADER, ...inputs.map((input) => `input ${input.role} ${JSON.stringify(input.path)} ${input.sha256}`)];
  for (const file of CONTENT_FILES) {
    const content = contents.get(file);
    if (content !== undefined) lines.push(`output ${file} ${sha256(content)}`);
  }
  return sha256(`${lines.join('\n')}\n`);
}
