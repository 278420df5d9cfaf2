// Backtests on a series with missing values (our spec): origins whose last training value is
// missing are left out with a note, missing actuals are not scored, the rest runs as usual.
import { describe, expect, it } from 'vitest';
import { runBacktest } from '../../src/backtest/runBacktest.js';
import { readSeriesValues } from '../evidence/referenceFixtures.js';
import { settingsFor } from '../support/settings.js';

describe('backtest with gaps', () => {
  const values = readSeriesValues('lake-huron').map((v, i) => (i === 90 || i === 94 ? Number.NaN : v));

  it('skips the origin after a gap and the missing actuals', async () => {
    const record = await runBacktest(values, settingsFor({ max_p: 1, max_q: 1, backtest: { refit: 'reestimate', origins: 6, horizon: 2 } }), { threads: 1 });
    // Origins end at 91..96 observations; the one ending at 91 (index 90) and at 95 (index 94)
    // start from a missing value.
    expect(record.origins.map((origin) => origin.length)).toEqual([92, 93, 94, 96]);
    expect(record.notes.join(' ')).toMatch(/2 origins were left out/);
    // h = 1 targets indices 92, 93, 94, 96: index 94 is missing, so three are scored.
    expect(record.per_horizon.deterministic[0].n).toBe(3);
    expect(record.per_horizon.naive[0].n).toBe(3);
    expect(record.per_horizon.stochastic[0].mae).not.toBeNull();
  });
});
