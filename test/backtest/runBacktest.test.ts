// The backtest run end to end on the Nile series (test/fixtures/nile.csv, R datasets::Nile):
// worker threads, the absence of look-ahead, origin cutting, the fixed policy and bad options.
// Small orders, origins and horizons keep each run short; the checks do not depend on them.
import { describe, expect, it } from 'vitest';
import { backtestNotes } from '../../src/backtest/messages.js';
import { runBacktest } from '../../src/backtest/runBacktest.js';
import type { BacktestRecord } from '../../src/backtest/backtestRecord.js';
import { readSeriesCsv } from '../../src/data/readSeriesCsv.js';
import { InputError } from '../../src/base/problem.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { settingsFor } from '../support/settings.js';

const nile = readSeriesCsv(new URL('../fixtures/nile.csv', import.meta.url).pathname, { missing: 'error' });
const firstValues = (count: number): Float64Array => nile.values.slice(0, count);

/** An origin's forecasts without the actuals, which a change of later data moves by design. */
function forecastsAt(record: BacktestRecord, origin: number): unknown[] {
  return record.forecasts.filter((f) => f.origin === origin).map(({ model, h, point, intervals, model_scale }) => ({ model, h, point, intervals, model_scale }));
}

describe('runBacktest', () => {
  it('gives the same record on one thread and on two worker threads', async () => {
    const settings = settingsFor({ max_p: 1, max_q: 1, backtest: { refit: 'reselect', origins: 4, horizon: 3 } });
    const series = { values: firstValues(60), periods: nile.periods.slice(0, 60) };
    const inline = await runBacktest(series, settings, { threads: 1 });
    const pooled = await runBacktest(series, settings, { threads: 2 });
    expect(pooled).toStrictEqual(inline);
    expect(inline.origins.map((o) => [o.length, o.period])).toEqual([
      [54, '1924'],
      [55, '1925'],
      [56, '1926'],
      [57, '1927'],
    ]);
  });

  it('does not let data after an origin change that origin’s forecasts', async () => {
    const settings = settingsFor({ max_p: 1, max_q: 1, backtest: { refit: 'reselect', origins: 3, horizon: 3 } });
    const values = firstValues(50);
    const changed = values.map((v, i) => (i >= 45 ? v * 1.5 + 200 : v));
    const before = await runBacktest(values, settings, { threads: 1 });
    const after = await runBacktest(changed, settings, { threads: 1 });
    expect(before.origins[0].length).toBe(45);
    expect(after.origins[0]).toStrictEqual(before.origins[0]);
    expect(forecastsAt(after, 45)).toStrictEqual(forecastsAt(before, 45));
    // The next origin trains on a changed value, so its forecasts must move.
    expect(forecastsAt(after, 46)).not.toStrictEqual(forecastsAt(before, 46));
  });

  it('cuts origins at the minimum training length and says so', async () => {
    // max_p = max_q = 2: the deterministic model has 2 + 2 + 2 + 1 = 7 parameters, so the
    // minimum is max(20, 21) = 21, and n = 30, B = 3 leaves 30 − 3 − 21 + 1 = 7 origins.
    const record = await runBacktest(firstValues(30), settingsFor({ max_p: 2, max_q: 2, backtest: { horizon: 3 } }), { threads: 1 });
    expect(record.settings).toMatchObject({ origins: 7, requested_origins: 20, min_training_length: 21, orders: null });
    expect(record.origins.map((o) => o.length)).toEqual([21, 22, 23, 24, 25, 26, 27]);
    expect(record.notes).toEqual([backtestNotes.originsCut(20, 7, 21)]);
    expect(record.per_horizon.naive.map((row) => row.n)).toEqual([7, 7, 7]);
  });

  it('holds full-sample parameters fixed, the same in sliding and expanding windows for AR errors', async () => {
    // With AR(1) errors and known parameters the filtered state at the origin depends on the
    // last observation alone (Harvey 1989, §3.4), so a sliding window must forecast exactly
    // as the expanding one once its trend is moved to the window's time index.
    const run = { orders: { deterministic: { p: 1, q: 0 }, stochastic: { p: 1, q: 0 } }, threads: 1 };
    const expanding = await runBacktest(nile, settingsFor({ backtest: { refit: 'fixed', origins: 5, horizon: 4 } }), run);
    const sliding = await runBacktest(nile, settingsFor({ backtest: { refit: 'fixed', origins: 5, horizon: 4, window: 'sliding' } }), run);
    expect(sliding.origins.map((o) => o.training_length)).toEqual([92, 92, 92, 92, 92]);
    expect(expanding.origins[0].models.deterministic).toEqual({ p: 1, q: 0, loglik: null, converged: true });
    expect(expanding.notes).toContain(backtestNotes.lookAhead('fixed'));
    const trendRows = (record: BacktestRecord) => record.forecasts.filter((f) => f.model !== 'naive');
    trendRows(sliding).forEach((row, i) => expectRelative(row.model_scale.mean, trendRows(expanding)[i].model_scale.mean, 1e-9));
  });

  it('reports every bad argument in one error', async () => {
    // The settings were checked when they were resolved; what the caller adds is checked here.
    const run = { orders: { deterministic: { p: -1, q: 0 }, stochastic: { p: 0, q: 1.5 } }, threads: 0 };
    const error = await runBacktest(firstValues(60), settingsFor({ backtest: { refit: 'reestimate' } }), run).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).problems.map((p) => p.field)).toEqual(['orders.deterministic.p', 'orders.stochastic.q', 'threads']);
  });

  it('refuses a series too short to score any origin, and orders under reselect', async () => {
    // max_p = max_q = 1 leave the built-in shortest training window at 20.
    const small = settingsFor({ max_p: 1, max_q: 1, backtest: { horizon: 5 } });
    await expect(runBacktest(firstValues(24), small)).rejects.toThrow(/has 24 observations; a backtest at horizon 5 needs at least 25/);
    await expect(runBacktest(firstValues(60), settingsFor(), { orders: { deterministic: { p: 1, q: 0 }, stochastic: { p: 0, q: 1 } } })).rejects.toThrow(
      /reselect policy chooses the orders/,
    );
  });
});
