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
    expect(lines[0]).toBe('Backtest: 6 origins (1962 to 1967), 1 to 3 steps ahead, expanding window');
    const text = lines.join(' ').replace(/\s+/g, ' ');
    expect(text).toContain(describeRefit('fixed'));
    expect(text).toContain(`Note: ${backtestNotes.lookAhead('fixed')}`);
  });

  it('prints one accuracy row per horizon, the three methods side by side, with the record’s figures', () => {
    const head = lines.findIndex((line) => /^\s+h\s+Det\./.test(line));
    expect(lines[head - 1].trim().split(/\s{2,}/)).toEqual(['RMSE', '95% interval score', '80% cover', '95% cover']);
    expect(lines[head].trim().split(/\s+/)).toEqual(['h', 'Det.', 'Stoch.', 'Bench.', 'Det.', 'Stoch.', 'Bench.', 'Det.', 'Stoch.', 'Det.', 'Stoch.']);
    const rows = lines.slice(head + 1, head + 4).map((line) => line.trim().split(/\s+/));
    expect(rows.map((cells) => cells[0])).toEqual(['1', '2', '3']);
    // RMSE of the no-change benchmark at h = 2 and coverage as whole percentages; decimals
    // show the smallest RMSE to three significant digits (the memo's decimalsForScale).
    const rmse = record.per_horizon.naive[1].rmse ?? Number.NaN;
    const smallest = Math.min(...(['deterministic', 'stochastic', 'naive'] as const).flatMap((m) => record.per_horizon[m].map((s) => s.rmse ?? Infinity)));
    const decimals = Math.min(6, Math.max(0, 2 - Math.floor(Math.log10(smallest))));
    expect(rows[1][3].replace(/,/g, '')).toBe(rmse.toFixed(decimals));
    expect(rows[1][7]).toBe(`${Math.round((record.per_horizon.deterministic[1].coverage['80'] ?? Number.NaN) * 100)}%`);
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
    const head = text.findIndex((line) => /^\s+h\s+p-value\s+lower for/.test(line));
    const p = first?.p_value ?? Number.NaN;
    expect(text[head + 1].trim().split(/\s{2,}/).slice(0, 3)).toEqual(['1', p < 0.001 ? '< 0.001' : p.toFixed(3), `${first?.better}${p < 0.05 ? ' *' : ''}`]);
    expect(text[head + 3].trim().split(/\s{2,}/)[1]).toBe('\u2014');
    expect(text.join(' ').replace(/\s+/g, ' ')).toContain(`\u2014 no test at h = 3 (Squared error: ${comparisonReasons.varianceNotPositive}).`);
  });
});
