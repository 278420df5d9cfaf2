// The summary block read from a backtest record (wording: src/backtest/messages.ts; numbers
// are the record's own, so the check is that each one lands in its place).
import { beforeAll, describe, expect, it } from 'vitest';
import { backtestNotes, comparisonReasons } from '../../src/backtest/messages.js';
import { describeRefit, formatBacktest } from '../../src/cli/formatBacktest.js';
import { settingsFor } from '../support/settings.js';
import { runBacktest } from '../../src/backtest/runBacktest.js';
import type { BacktestRecord } from '../../src/backtest/backtestRecord.js';
import { readSeriesCsv } from '../../src/data/readSeriesCsv.js';

describe('formatBacktest', () => {
  let record: BacktestRecord;
  let lines: string[];
  beforeAll(async () => {
    // Nile (test/fixtures/nile.csv, R datasets::Nile), 1871-1970.
    const nile = readSeriesCsv(new URL('../fixtures/nile.csv', import.meta.url).pathname, { missing: 'error' });
    record = await runBacktest(nile, settingsFor({ backtest: { refit: 'fixed', origins: 6, horizon: 3 } }), {
      orders: { deterministic: { p: 1, q: 1 }, stochastic: { p: 0, q: 1 } },
      threads: 1,
    });
    lines = formatBacktest(record);
  });

  it('states the origins by period, the horizons, the refit policy and the notes', () => {
    // Origins 92..97 end at 1962..1967.
    expect(lines[0]).toBe('Backtest: 6 origins (1962 to 1967), horizons 1 to 3, expanding window, step 1');
    expect(lines[1]).toContain(describeRefit('fixed'));
    expect(lines).toContain(`  Note: ${backtestNotes.lookAhead('fixed')}`);
  });

  it('prints one accuracy row per horizon and method, with the record’s figures', () => {
    const header = lines.find((line) => line.includes('MAE')) ?? '';
    expect(header.split(/\s{2,}/).map((cell) => cell.trim())).toEqual(
      expect.arrayContaining(['h', 'method', 'MAE', 'RMSE', 'MASE', 'MAPE %', 'cover 80%', 'cover 95%', 'IS 80%', 'IS 95%', 'CRPS']),
    );
    const start = lines.indexOf(header);
    const rows = lines.slice(start + 1, start + 10).map((line) => line.trim().split(/\s{2,}/));
    expect(rows.map((cells) => `${cells[0]} ${cells[1]}`)).toEqual(
      [1, 2, 3].flatMap((h) => [`${h} deterministic`, `${h} stochastic`, `${h} no change`]),
    );
    const naiveAtTwo = record.per_horizon.naive[1];
    expect(Number(rows[5][2])).toBe(Number((naiveAtTwo.mae ?? Number.NaN).toPrecision(4)));
  });

  it('prints the comparison per horizon, and why a test is not available', () => {
    const altered: BacktestRecord = {
      ...record,
      comparison: record.comparison.map((row) =>
        row.h === 3 && row.loss === 'squared_error' ? { ...row, statistic: null, p_value: null, available: false, reason: comparisonReasons.varianceNotPositive } : row,
      ),
    };
    const text = formatBacktest(altered);
    const first = record.comparison.find((row) => row.h === 1 && row.loss === 'squared_error');
    expect(text.some((line) => line.includes(`p = ${first?.p_value?.toFixed(3)}, ${first?.better} lower`))).toBe(true);
    expect(text).toContain(`  Not available at h = 3 (squared error): ${comparisonReasons.varianceNotPositive}`);
  });
});
