// A file that is not a series (a key list named by mistake) is refused without its content
// reaching the terminal: every cell or column name a message quotes is cut to 40 characters
// (our spec: src/base/quotedCell.ts).
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/base/problem.js';
import { readSeriesCsv } from '../../src/data/readSeriesCsv.js';

const root = mkdtempSync(join(tmpdir(), 'tb-echo-'));

afterAll(() => {
  rmSync(root, { recursive: true, force: true });
});

/** Invented secrets, each longer than the 40 characters a message may quote. */
const SECRETS = ['gate_token_7c1e9a44b2d06f5e81c3a9d2e4f60b17a5c8e3d9', 'pin_4417_c0ffee_5e81c3a9d2e4f60b17a5c8e3d9f2b41c6e0a7d5f8', 'berth_key_a7d5f8b3c9e2a1_7c1e9a44b2d06f5e81c3a9d2e4'];

function messagesFor(text: string): string {
  const file = join(root, 'keys.csv');
  writeFileSync(file, text);
  try {
    readSeriesCsv(file, { missing: 'error', minObservations: 10 });
  } catch (error) {
    if (error instanceof InputError) return error.message;
    throw error;
  }
  throw new Error('the file was accepted as a series');
}

describe('content of a file that is not a series', () => {
  it('is quoted at most 40 characters at a time, in cells and in column names', () => {
    const shapes = [
      `${SECRETS[0]}\n${SECRETS[1]}\n`, // one column
      `name,${SECRETS[0]}\n${SECRETS[1]},${SECRETS[2]}\n`, // a long column name, bad period and value
      `${SECRETS[1]},${SECRETS[2]}\n2001,1\n`, // long names as the fields of a too-short series
    ];
    for (const text of shapes) {
      const messages = messagesFor(text);
      expect(messages).toContain('...');
      // No secret appears beyond its first 37 characters.
      for (const secret of SECRETS) expect(messages).not.toContain(secret.slice(0, 38));
    }
  });
});
