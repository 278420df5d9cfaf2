// The backtest's progress callback (our spec): it hears origins done of all, from 0 up to all,
// never backwards, and the record is the same with or without it and at any thread count.
import { describe, expect, it } from 'vitest';
import { runBacktest } from '../../src/backtest/runBacktest.js';
import { readSeriesCsv } from '../../src/data/readSeriesCsv.js';
import { settingsFor } from '../support/settings.js';

describe('runBacktest onProgress', () => {
  it('counts origins up to all of them and leaves the record unchanged', async () => {
    // Nile (test/fixtures/nile.csv, R datasets::Nile), 1871-1970; orders fixed, so each origin is two quick fits.
    const nile = readSeriesCsv(new URL('../fixtures/nile.csv', import.meta.url).pathname, { missing: 'error' });
    const settings = settingsFor({ backtest: { refit: 'reestimate', origins: 6, horizon: 3 } });
    const orders = { deterministic: { p: 1, q: 1 }, stochastic: { p: 0, q: 1 } };
    const heard: [number, number][] = [];
    const withProgress = await runBacktest(nile, settings, { orders, threads: 2, onProgress: (done, total) => heard.push([done, total]) });
    const without = await runBacktest(nile, settings, { orders, threads: 1 });
    expect(withProgress).toEqual(without);
    expect(heard[0]).toEqual([0, 6]);
    expect(heard[heard.length - 1]).toEqual([6, 6]);
    for (let i = 1; i < heard.length; i++) expect(heard[i][0]).toBeGreaterThanOrEqual(heard[i - 1][0]);
  });
});
