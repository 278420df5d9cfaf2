// Test helper: every run of the calling test file at the run date 2026-01-01 through
// SOURCE_DATE_EPOCH, restoring the environment afterwards.
import { afterAll, afterEach, beforeAll, beforeEach } from 'vitest';

/** SOURCE_DATE_EPOCH of 2026-01-01T00:00:00Z (common practice: date -u -d @1767225600). */
export const EPOCH_2026_01_01 = '1767225600';

/** Per test (`each`, the default) or once around the whole file (`all`); call it before other hooks. */
export function fixRunDate(scope: 'each' | 'all' = 'each'): void {
  const saved = process.env.SOURCE_DATE_EPOCH;
  const [before, after] = scope === 'each' ? [beforeEach, afterEach] : [beforeAll, afterAll];
  before(() => {
    process.env.SOURCE_DATE_EPOCH = EPOCH_2026_01_01;
  });
  after(() => {
    if (saved === undefined) delete process.env.SOURCE_DATE_EPOCH;
    else process.env.SOURCE_DATE_EPOCH = saved;
  });
}
