// manifest.json is read back only when it is a regular file: a FIFO or a link to a device in
// its place is refused with the verify message, never waited on (our spec: src/run/readManifest.ts).
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/base/problem.js';
import { readManifest } from '../../src/run/readManifest.js';

const root = mkdtempSync(join(tmpdir(), 'tb-manifest-'));

afterAll(() => {
  rmSync(root, { recursive: true, force: true });
});

function refusal(file: string): string {
  try {
    readManifest(file, 'memo/manifest.json');
  } catch (error) {
    if (error instanceof InputError) return error.message;
    throw error;
  }
  throw new Error(`readManifest accepted ${file}`);
}

describe('readManifest', () => {
  it('refuses a FIFO and a link to /dev/zero as not a regular file of JSON', () => {
    execFileSync('mkfifo', [join(root, 'fifo.json')]);
    symlinkSync('/dev/zero', join(root, 'zero.json'));
    const expected = 'memo/manifest.json: manifest.json: is not a regular file of JSON; the manifest is not as a run writes it; rerun the memo to write a new one';
    expect(refusal(join(root, 'fifo.json'))).toBe(expected);
    expect(refusal(join(root, 'zero.json'))).toBe(expected);
  });
});
