// The backtest at a seasonal period, end to end on three open seasonal datasets (test/fixtures/
// seasonal/, R 4.2.2 datasets nottem, USAccDeaths, UKgas), against the seasonal naive and
// no-change scores computed from the definitions with numpy 1.24.2, pandas 1.5.3 and scipy
// 1.10.1 on the same fixed origins (test/fixtures/backtest/seasonalNaiveReference.json and the
// script beside it). MASE is Hyndman & Koehler (2006), §3.4, with the seasonal naive's
// in-sample mean absolute error as the scale. The trend models run under `fixed` with small
// orders, which keeps the runs short; the yardsticks do not depend on them.
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { backtestNotes } from '../../src/backtest/messages.js';
import { runBacktest } from '../../src/backtest/runBacktest.js';
import type { BacktestRecord, HorizonScores } from '../../src/backtest/backtestRecord.js';
import { InputError } from '../../src/base/problem.js';
import type { WrittenSettings } from '../../src/config/resolveSettings.js';
import { readSeriesCsv } from '../../src/data/readSeriesCsv.js';
import type { Series } from '../../src/base/series.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { settingsFor } from '../support/settings.js';

type Method = 'seasonal_naive' | 'naive';
interface ReferenceScores {
  h: number;
  n: number;
  mae: number;
  rmse: number;
  mape: number;
  mase: number;
  coverage: Record<string, number>;
  width: Record<string, number>;
  interval_score: Record<string, number>;
  crps: number;
}
interface ReferenceCase {
  name: string;
  file: string;
  period: number;
  transform: 'none' | 'log';
  horizon: number;
  window: 'expanding' | 'sliding';
  levels: number[];
  origins: { length: number; start: number; period: string; mase_scale: number }[];
  forecasts: { origin: number; method: Method; h: number; period: string; actual: number; mean: number; se: number; point: number }[];
  per_horizon: Record<Method, ReferenceScores[]>;
}

const reference = JSON.parse(readFileSync(new URL('../fixtures/backtest/seasonalNaiveReference.json', import.meta.url), 'utf8')) as { cases: ReferenceCase[] };
const referenceCase = (name: string): ReferenceCase => {
  const found = reference.cases.find((c) => c.name === name);
  if (found === undefined) throw new Error(`no reference case ${name}`);
  return found;
};
const readSeasonal = (file: string): Series => readSeriesCsv(new URL(`../fixtures/seasonal/${file}`, import.meta.url).pathname, { missing: 'error' });
const ORDERS = { deterministic: { p: 1, q: 0 }, stochastic: { p: 0, q: 1 } };
/** Agreement with the reference: sums taken in another order differ in the last bits only. */
const TOLERANCE = 1e-10;

/** The written settings each case's origins come from: the requested origins, horizon and window. */
const WRITTEN: Record<string, WrittenSettings> = {
  // n = 240, B = 12, K = 24: training lengths 205..228.
  nottingham: { backtest: { refit: 'fixed', origins: 24, horizon: 12 } },
  // n = 72, B = 6: 6 origins asked for, 12 planned (one per month), lengths 55..66, sliding.
  'accidental-deaths': { backtest: { refit: 'fixed', origins: 6, horizon: 6, window: 'sliding' } },
  // n = 108, B = 8, K = 20: training lengths 81..100, log scale.
  'uk-gas': { transform: 'log', backtest: { refit: 'fixed', origins: 20, horizon: 8 } },
};

function expectScores(ours: HorizonScores | undefined, expected: ReferenceScores, levels: readonly number[]): void {
  expect(ours?.h).toBe(expected.h);
  expect(ours?.n).toBe(expected.n);
  for (const key of ['mae', 'rmse', 'mape', 'mase', 'crps'] as const) expectRelative(ours?.[key] ?? Number.NaN, expected[key], TOLERANCE);
  for (const key of levels.map(String)) {
    // Coverage is a share of counts: exact.
    expect(ours?.coverage[key]).toBe(expected.coverage[key]);
    expectRelative(ours?.width[key] ?? Number.NaN, expected.width[key], TOLERANCE);
    expectRelative(ours?.interval_score[key] ?? Number.NaN, expected.interval_score[key], TOLERANCE);
  }
}

describe.each(reference.cases.map((c) => c.name))('seasonal backtest of %s against numpy/pandas/scipy', (name) => {
  const expected = referenceCase(name);
  let record: BacktestRecord;
  beforeAll(async () => {
    const settings = settingsFor({ max_p: 1, max_q: 1, levels: expected.levels, ...WRITTEN[name] });
    record = await runBacktest(readSeasonal(expected.file), settings, { orders: ORDERS, threads: 1, period: expected.period });
  });

  it('plans the reference origins, names the seasonal benchmark and scale, and reaches every season', () => {
    expect(record.origins.map((o) => [o.length, o.length - o.training_length, o.period])).toEqual(expected.origins.map((o) => [o.length, o.start, o.period]));
    expect(record.settings).toMatchObject({ period: expected.period, benchmark: 'seasonal_naive', mase_scaling: 'seasonal_naive', seasons_covered: expected.period });
    expect(record.notes.some((note) => note.startsWith('The origins end in only'))).toBe(false);
  });

  it('takes each origin’s MASE scale from its in-sample seasonal naive error', () => {
    record.origins.forEach((origin, i) => expectRelative(origin.mase_scale ?? Number.NaN, expected.origins[i].mase_scale, TOLERANCE));
  });

  it('forecasts as the reference does, seasonal naive and no change alike', () => {
    let compared = 0;
    for (const row of expected.forecasts) {
      const ours = record.forecasts.find((f) => f.origin === row.origin && f.model === row.method && f.h === row.h);
      expect(ours?.period).toBe(row.period);
      expect(ours?.actual).toBe(row.actual);
      expectRelative(ours?.model_scale.mean ?? Number.NaN, row.mean, TOLERANCE);
      expectRelative(ours?.model_scale.se ?? Number.NaN, row.se, TOLERANCE);
      expectRelative(ours?.point ?? Number.NaN, row.point, TOLERANCE);
      compared++;
    }
    expect(compared).toBe(2 * expected.origins.length * expected.horizon);
  });

  it('scores the seasonal naive and the no-change forecasts per horizon as the reference does', () => {
    for (const method of ['seasonal_naive', 'naive'] as const) {
      const ours = record.per_horizon[method];
      expect(ours).toHaveLength(expected.horizon);
      expected.per_horizon[method].forEach((row, i) => expectScores(ours?.[i], row, expected.levels));
    }
  });

  it('scales the trend models’ MASE by the same seasonal scale', () => {
    // MASE = mean over origins of |error| / the origin's scale (Hyndman & Koehler 2006, §3.4),
    // from our own forecast rows and the reference scales.
    const scaleOf = new Map(expected.origins.map((o) => [o.length, o.mase_scale]));
    for (const kind of ['deterministic', 'stochastic'] as const) {
      record.per_horizon[kind].forEach((row) => {
        const errors = record.forecasts.filter((f) => f.model === kind && f.h === row.h).map((f) => Math.abs(f.actual - f.point) / (scaleOf.get(f.origin) ?? Number.NaN));
        expectRelative(row.mase ?? Number.NaN, errors.reduce((sum, e) => sum + e, 0) / errors.length, TOLERANCE);
      });
    }
  });
});

describe('seasonal origins the series cannot all give', () => {
  const deaths = readSeasonal('us-accidental-deaths.csv');

  it('says when the asked origins were raised, and when the series is too short for every season', async () => {
    // n = 72, B = 6, shortest window 60: 7 origins (lengths 60..66), 7 of the 12 months.
    const settings = settingsFor({ max_p: 1, max_q: 1, backtest: { refit: 'fixed', origins: 4, horizon: 6, min_train: 60 } });
    const record = await runBacktest(deaths, settings, { orders: ORDERS, threads: 1, period: 12 });
    expect(record.origins.map((o) => o.length)).toEqual([60, 61, 62, 63, 64, 65, 66]);
    expect(record.settings).toMatchObject({ origins: 7, requested_origins: 4, seasons_covered: 7 });
    expect(record.notes).toContain(backtestNotes.originsRaised(4, 7, 12));
    expect(record.notes).toContain(backtestNotes.seasonsMissed(7, 12));
    expect(backtestNotes.seasonsMissed(7, 12)).toMatch(/only 7 of the 12 seasons, so 5 seasons are never forecast from/);
  });

  it('says when a missing value leaves a season without an origin', async () => {
    // Twelve origins, lengths 55..66; the one at 60 ends on a missing value, so its month goes.
    const values = deaths.values.map((v, i) => (i === 59 ? Number.NaN : v));
    const settings = settingsFor({ max_p: 1, max_q: 1, missing: 'allow', backtest: { refit: 'fixed', origins: 12, horizon: 6 } });
    const record = await runBacktest({ values, periods: deaths.periods }, settings, { orders: ORDERS, threads: 1, period: 12 });
    expect(record.origins).toHaveLength(11);
    expect(record.settings.seasons_covered).toBe(11);
    expect(record.notes).toEqual([backtestNotes.lookAhead('fixed'), backtestNotes.missingOrigins(1), backtestNotes.seasonsMissed(11, 12)]);
    // The missing actual is left out alike: at h = 1 the origin of length 59 would score it.
    expect(record.per_horizon.seasonal_naive?.[0].n).toBe(10);
    expect(record.per_horizon.naive[0].n).toBe(10);
  });
});

describe('training windows too short for the seasonal part', () => {
  const deaths = readSeasonal('us-accidental-deaths.csv');

  it('refuses them as bad settings before any window is fitted', async () => {
    // Seasonal differences lose a whole cycle: the stochastic model at (1, 0) with its drift
    // needs 1 + 1 + 1 (σ²) + 2 (AICc) + 12 = 17 observations (minimumObservations), more than 15.
    const settings = settingsFor({ max_p: 1, max_q: 0, backtest: { refit: 'reselect', origins: 4, horizon: 3, min_train: 15 } });
    const spec = { period: 12, firstSeason: 0, seasonalDifferencing: true, maxHarmonics: 0, maxSeasonalP: 0, maxSeasonalQ: 0 };
    const error = await runBacktest(deaths, settings, { threads: 1, period: 12, seasonal: { deterministic: { ...spec, seasonalDifferencing: false }, stochastic: spec } }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).problems).toEqual([expect.objectContaining({ code: 'backtest.training-too-short', field: 'backtest.min_train', message: expect.stringContaining('15 observations') })]);
    expect((error as InputError).problems[0].hint).toBe('give at least 17, or lower max_p and max_q');
  });
});

describe('a fixed seasonal pattern in a window that misses a season', () => {
  it('is refused as a setting, naming the window, before any window is fitted', async () => {
    // US accidental deaths with every February of the first four years removed: the first
    // training windows never see a February, so twelve months of fixed pattern are not
    // identified there (common practice: a seasonal dummy set needs each season observed).
    const deaths = readSeasonal('us-accidental-deaths.csv');
    const values = deaths.values.map((v, t) => (t % 12 === 1 && t < 48 ? Number.NaN : v));
    const settings = settingsFor({ max_p: 1, max_q: 0, backtest: { refit: 'reestimate', origins: 30, horizon: 3, min_train: 36 } });
    const part = { period: 12, firstSeason: 0, seasonalDifferencing: false, harmonics: 6, P: 0, Q: 0 };
    const run = { orders: ORDERS, threads: 1, period: 12, seasonal: { deterministic: part, stochastic: part } };
    const error = await runBacktest({ values, periods: deaths.periods }, settings, run).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).problems).toEqual([expect.objectContaining({ code: 'backtest.season-unseen', field: 'backtest.min_train' })]);
    expect((error as InputError).problems[0].message).toMatch(/^the training window ending 1976-04 has a season with no observed value/);
  });
});

describe('the seasonal period at 1 and refused values', () => {
  const nile = readSeriesCsv(new URL('../fixtures/nile.csv', import.meta.url).pathname, { missing: 'error' });

  it('at period 1 scores no seasonal naive forecast and names the no-change benchmark and scale', async () => {
    const settings = settingsFor({ max_p: 1, max_q: 1, backtest: { refit: 'fixed', origins: 3, horizon: 2 } });
    const plain = await runBacktest(nile, settings, { orders: ORDERS, threads: 1 });
    const explicit = await runBacktest(nile, settings, { orders: ORDERS, threads: 1, period: 1 });
    expect(explicit).toStrictEqual(plain);
    expect(Object.keys(plain.per_horizon)).toEqual(['deterministic', 'stochastic', 'naive']);
    expect(plain.forecasts.some((f) => f.model === 'seasonal_naive')).toBe(false);
    expect(plain.settings).toMatchObject({ period: 1, benchmark: 'naive', mase_scaling: 'naive', seasons_covered: 1 });
  });

  it('refuses a period that is not a whole number from 1, and a shortest window without a full cycle', async () => {
    const settings = settingsFor({ max_p: 0, max_q: 0, backtest: { origins: 3, horizon: 2 } });
    const error = await runBacktest(nile, settings, { threads: 1, period: 2.5 }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).problems.map((p) => [p.field, p.code])).toEqual([['period', 'backtest.bad-value']]);
    // min_train 10 holds no change twelve periods long.
    const short = settingsFor({ max_p: 0, max_q: 0, backtest: { origins: 3, horizon: 2, min_train: 10 } });
    const tooShort = await runBacktest(nile, short, { threads: 1, period: 12 }).catch((e: unknown) => e);
    expect(tooShort).toBeInstanceOf(InputError);
    expect((tooShort as InputError).problems.map((p) => [p.field, p.code])).toEqual([['backtest.min_train', 'backtest.training-too-short']]);
    expect((tooShort as InputError).message).toMatch(/at period 12 need at least 13/);
  });
});
