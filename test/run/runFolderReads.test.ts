// Files of a memo folder and a reviewer's key file are read only as regular files: a FIFO or a
// link to /dev/zero in their place is treated as absent (sign-off log, supersession note) or
// refused (private key), never opened blocking (our spec). Opened blocking, these would hang.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/base/problem.js';
import { readPrivateKey } from '../../src/run/reviewKeys.js';
import { readSignOffLog, SIGN_OFF_LOG } from '../../src/run/signOffLog.js';
import { readSupersedes, SUPERSEDES_FILE } from '../../src/run/supersedesFile.js';

const root = mkdtempSync(join(tmpdir(), 'tb-folder-reads-'));

afterAll(() => {
  rmSync(root, { recursive: true, force: true });
});

describe('memo folder files that are not regular files', () => {
  it('reads a FIFO sign-off log as no log and a linked /dev/zero note as no note', () => {
    execFileSync('mkfifo', [join(root, SIGN_OFF_LOG)]);
    symlinkSync('/dev/zero', join(root, SUPERSEDES_FILE));
    expect(readSignOffLog(root)).toEqual({ entries: [], unreadable: [], text: '' });
    expect(readSupersedes(root)).toBeNull();
  });

  it('refuses a FIFO or /dev/zero named as the private key', () => {
    execFileSync('mkfifo', [join(root, 'key.pem')]);
    for (const file of [join(root, 'key.pem'), '/dev/zero']) expect(() => readPrivateKey(file)).toThrow(InputError);
  });
});
