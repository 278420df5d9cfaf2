// The rolling-origin backtest of Lake Huron against statsmodels 0.13.5 (test/fixtures/backtest/
// lake-huron-backtest.json): orders fixed at trend (1,1) and drift (1,2), parameters
// re-estimated at each of K = 20 origins, B = 5, intervals from the ARMA variance alone as
// in the reference. Where statsmodels' default fit stopped short of the optimum, its restart
// from there (lake-huron-restart.json, same library) is the reference instead.
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { runBacktest } from '../../src/backtest/runBacktest.js';
import type { BacktestRecord } from '../../src/backtest/backtestRecord.js';
import { readSeriesCsv } from '../../src/data/readSeriesCsv.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { settingsFor } from '../support/settings.js';

type Kind = 'deterministic' | 'stochastic';
interface ReferenceFit {
  mean: number;
  se: number;
  loglik: number;
}
interface Reference {
  rows: ({ origin_length: number; h: number; actual: number } & Record<Kind, ReferenceFit>)[];
  per_horizon: Record<Kind, { h: number; n: number; mae: number; rmse: number; coverage95: number }[]>;
}
interface Restart {
  rows: { origin_length: number; model: Kind; loglik_default: number; loglik: number; mean: number[] }[];
}

const fixture = (name: string): unknown => JSON.parse(readFileSync(new URL(`../fixtures/backtest/${name}`, import.meta.url), 'utf8'));
const reference = fixture('lake-huron-backtest.json') as Reference;
const restart = fixture('lake-huron-restart.json') as Restart;
const KINDS: Kind[] = ['deterministic', 'stochastic'];

describe('Lake Huron backtest with orders fixed (statsmodels 0.13.5 reference)', () => {
  let record: BacktestRecord;
  beforeAll(async () => {
    const series = readSeriesCsv(new URL('../fixtures/lake-huron.csv', import.meta.url).pathname, { missing: 'error' });
    record = await runBacktest(series, settingsFor({ coefficient_uncertainty: false, estimation: 'ml', backtest: { refit: 'reestimate', origins: 20, horizon: 5 } }), {
      orders: { deterministic: { p: 1, q: 1 }, stochastic: { p: 1, q: 2 } },
      threads: 1,
    });
  });

  it('scores the same origins and actuals', () => {
    expect(record.origins.map((o) => o.length)).toEqual(Array.from({ length: 20 }, (_, i) => 74 + i));
    for (const row of reference.rows) {
      const ours = record.forecasts.find((f) => f.origin === row.origin_length && f.model === 'deterministic' && f.h === row.h);
      expect(ours?.actual).toBe(row.actual);
    }
  });

  it('matches MAE and RMSE per horizon within 2%, and the 95% coverage', () => {
    for (const kind of KINDS) {
      for (const expected of reference.per_horizon[kind]) {
        const ours = record.per_horizon[kind][expected.h - 1];
        expect(ours.n).toBe(expected.n);
        expectRelative(ours.mae ?? Number.NaN, expected.mae, 0.02);
        expectRelative(ours.rmse ?? Number.NaN, expected.rmse, 0.02);
        expect(ours.coverage['95']).toBe(expected.coverage95);
      }
    }
  });

  it('matches every forecast mean within 1e-3 where both fits reach the same log-likelihood', () => {
    let compared = 0;
    for (const row of reference.rows) {
      for (const kind of KINDS) {
        const redone = restart.rows.find((r) => r.origin_length === row.origin_length && r.model === kind);
        const expected = redone === undefined ? { mean: row[kind].mean, loglik: row[kind].loglik } : { mean: redone.mean[row.h - 1], loglik: redone.loglik };
        const origin = record.origins.find((o) => o.length === row.origin_length);
        const ours = record.forecasts.find((f) => f.origin === row.origin_length && f.model === kind && f.h === row.h);
        const loglik = origin?.models[kind].loglik ?? Number.NaN;
        expect(Math.abs(loglik - expected.loglik)).toBeLessThan(1e-3);
        expect(Math.abs((ours?.model_scale.mean ?? Number.NaN) - expected.mean)).toBeLessThan(1e-3);
        compared++;
      }
    }
    expect(compared).toBe(200);
  });

  it('reaches at least the restarted optimum where the default reference fit stopped short', () => {
    for (const row of restart.rows) {
      const ours = record.origins.find((o) => o.length === row.origin_length)?.models[row.model].loglik ?? Number.NaN;
      expect(row.loglik).toBeGreaterThan(row.loglik_default);
      expect(ours).toBeGreaterThan(row.loglik - 1e-5);
    }
  });
});
