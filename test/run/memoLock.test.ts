// One writer at a time on a memo folder (our spec: src/run/memoLock.ts): a second writer is
// refused while the first holds the lock, a lock left by a process that is gone is taken over,
// and nothing is left beside the folder afterwards.
import { existsSync, mkdtempSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/base/problem.js';
import { withMemoLock } from '../../src/run/memoLock.js';

describe('withMemoLock', () => {
  it('refuses a second writer while the first holds the lock, and leaves nothing behind', async () => {
    const parent = mkdtempSync(join(tmpdir(), 'tb-lock-'));
    const folder = join(parent, '2025-11');
    const inner = await withMemoLock(folder, async () => {
      expect(readdirSync(parent)).toEqual(['.lock-2025-11']);
      return withMemoLock(folder, async () => 'second').catch((error: unknown) => error);
    });
    expect(inner).toBeInstanceOf(InputError);
    expect((inner as InputError).problems[0]).toMatchObject({ code: 'run.memo-busy', file: folder });
    expect(readdirSync(parent)).toEqual([]);
  });

  it('takes over a lock whose process is gone, and takes none where the folder has no parent yet', async () => {
    const parent = mkdtempSync(join(tmpdir(), 'tb-lock-'));
    // A process id above Linux's pid_max (4194304, common practice) belongs to no process.
    writeFileSync(join(parent, '.lock-2025-11'), '99999999');
    expect(await withMemoLock(join(parent, '2025-11'), async () => 'written')).toBe('written');
    expect(readdirSync(parent)).toEqual([]);
    const missing = join(parent, 'no-such', '2025-11');
    expect(await withMemoLock(missing, async () => existsSync(join(parent, 'no-such')))).toBe(false);
  });
});
