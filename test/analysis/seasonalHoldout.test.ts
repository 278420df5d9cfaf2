// Hold-out accuracy of the seasonal analysis on three open seasonal datasets (test/fixtures/
// seasonal/: R 4.2.2 datasets nottem, USAccDeaths, UKgas, the last on the log scale): the last
// two years (24 months, 8 quarters) are held out, the normal analysis runs on the rest at the
// default settings (UK gas with `transform: log`), and its forecasts over the held-out span are
// scored beside two yardsticks:
// - the seasonal naive forecast with its seasonal random walk intervals (src/backtest/
//   naiveForecast.ts), checked against the same forecast written out in numpy;
// - the airline model SARIMA(0,1,1)(0,1,1)s fitted by exact ML in statsmodels 0.13.5's SARIMAX
//   at its default options (test/fixtures/seasonal-holdout/holdout-reference.json, written by
//   holdoutReference.py beside it; the call and the library's version are in the file).
// MASE is Hyndman & Koehler (2006), Int. J. Forecasting 22, §3.4, on the data's scale, scaled by
// the training part's in-sample seasonal naive mean absolute error; coverage is the share of
// held-out values inside the 80% and 95% intervals.
//
// Our own figures below are values we measured on 2026-12-02 (commit 5fee8af; the faster
// seasonal starts of 40bfa14 moved them by less than 1e-6), not a published or reference
// result: a regression guard, so that a change to the engine or the search that moves them by
// more than their third decimal is noticed. The analysis runs without its
// backtest, which hold-out accuracy does not need (the full analysis of Nottingham's 216 training
// months takes over three minutes with it). The recommendation needs the backtest, so the
// recommended model was measured once with the full analysis at the default settings
// (prefer-stochastic): the stochastic trend on all three, each time by the policy's default.
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { analyseSeries } from '../../src/analysis/analyseSeries.js';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { inSampleNaiveMae, naiveForecast } from '../../src/backtest/naiveForecast.js';
import type { TrendModelKind } from '../../src/base/settings.js';
import { backTransformForecast, type IntervalsByLevel } from '../../src/base/transform.js';
import type { WrittenSettings } from '../../src/config/resolveSettings.js';
import { parseSeriesCsv } from '../../src/data/parseSeriesCsv.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { settingsFor } from '../support/settings.js';

const LEVELS = [80, 95] as const;

interface ReferenceForecast {
  mean: number[];
  se: number[];
  point: number[];
  mase: number;
  mase_model_scale: number;
  coverage: Record<string, number>;
  intervals: Record<string, { lower: number[]; upper: number[]; inside: number }>;
}
interface ReferenceCase {
  name: string;
  period: number;
  transform: 'none' | 'log';
  train: { n: number; first: string; last: string };
  held_out: { n: number; first: string; last: string; actual: number[]; actual_model_scale: number[] };
  mase_scale: number;
  seasonal_naive: ReferenceForecast & { sigma: number };
  airline: ReferenceForecast & { call: string; converged: boolean; llf: number; restart: { llf: number; largest_parameter_change: number } };
}
const reference = JSON.parse(readFileSync(new URL('../fixtures/seasonal-holdout/holdout-reference.json', import.meta.url), 'utf8')) as {
  library: { statsmodels: string };
  levels: number[];
  cases: ReferenceCase[];
};

interface Scores {
  mase: number;
  /** Held-out values inside each level's interval. */
  inside: Record<string, number>;
}

/** Counts of held-out values inside an interval, as measured: coverage is exact. */
type Inside = Record<(typeof LEVELS)[number], number>;

interface Case {
  /** The file in test/fixtures/seasonal/ and the reference's case name. */
  name: string;
  written: WrittenSettings;
  /** The recommended model, measured with the full analysis (see the header). */
  recommended: TrendModelKind;
  /** The seasonal part the recommended model's search chose (our measurement). */
  part: { harmonics: number; P: number; Q: number; seasonal_differences: boolean; p: number; q: number };
  /** Our measured hold-out figures (2026-12-02): a regression guard, not a reference value. */
  ours: Record<TrendModelKind, { mase: number; inside: Inside }>;
  /** The airline model's figures as committed from statsmodels 0.13.5 (holdout-reference.json). */
  airline: { mase: number; inside: Inside };
  /** The seasonal naive's figures, as numpy computed them (holdout-reference.json). */
  naive: { mase: number; inside: Inside };
  /** How the MASEs compare, as measured: where ours is worse it is said too, so a change that closes a gap is noticed. */
  comparisons: [Forecaster, '<' | '>', Forecaster][];
}

/** Whose hold-out forecasts: ours (the recommended model, or each model), the reference SARIMA, the seasonal naive. */
type Forecaster = 'recommended' | TrendModelKind | 'airline' | 'naive';

const CASES: Case[] = [
  {
    name: 'nottingham-temperature',
    written: {},
    recommended: 'stochastic',
    part: { harmonics: 4, P: 1, Q: 1, seasonal_differences: false, p: 0, q: 1 },
    ours: { deterministic: { mase: 0.5754, inside: { 80: 19, 95: 22 } }, stochastic: { mase: 0.6258, inside: { 80: 20, 95: 22 } } },
    airline: { mase: 0.6112, inside: { 80: 21, 95: 22 } },
    naive: { mase: 0.7007, inside: { 80: 22, 95: 23 } },
    comparisons: [
      ['recommended', '<', 'naive'],
      ['recommended', '>', 'airline'],
      ['deterministic', '<', 'airline'],
    ],
  },
  {
    name: 'us-accidental-deaths',
    written: {},
    recommended: 'stochastic',
    part: { harmonics: 5, P: 0, Q: 0, seasonal_differences: false, p: 0, q: 1 },
    ours: { deterministic: { mase: 1.5601, inside: { 80: 9, 95: 14 } }, stochastic: { mase: 0.8785, inside: { 80: 24, 95: 24 } } },
    airline: { mase: 0.4972, inside: { 80: 24, 95: 24 } },
    naive: { mase: 0.7022, inside: { 80: 24, 95: 24 } },
    // The drift estimated from 1973–76 (−26 deaths a month) is extrapolated into a rising
    // 1977–78; the contributor guide, "Seasonal accuracy on held-out data", has the numbers.
    comparisons: [
      ['recommended', '>', 'naive'],
      ['recommended', '>', 'airline'],
      ['deterministic', '>', 'recommended'],
    ],
  },
  {
    name: 'uk-gas',
    written: { transform: 'log' },
    recommended: 'stochastic',
    part: { harmonics: 0, P: 1, Q: 0, seasonal_differences: true, p: 1, q: 3 },
    ours: { deterministic: { mase: 1.5814, inside: { 80: 7, 95: 8 } }, stochastic: { mase: 2.329, inside: { 80: 6, 95: 7 } } },
    airline: { mase: 2.1562, inside: { 80: 6, 95: 7 } },
    naive: { mase: 3.6271, inside: { 80: 5, 95: 7 } },
    comparisons: [
      ['recommended', '<', 'naive'],
      ['recommended', '>', 'airline'],
      ['deterministic', '<', 'airline'],
    ],
  },
];

/** Our figures are asserted to three decimals: the engine's optimiser tolerance moves them far less. */
const MEASURED = 5e-4;
/** Our arithmetic against numpy's on the same numbers: sums in another order differ in the last bits. */
const SAME_NUMBERS = 1e-12;

function referenceCase(name: string): ReferenceCase {
  const found = reference.cases.find((c) => c.name === name);
  if (found === undefined) throw new Error(`no reference case ${name}`);
  return found;
}

/** MASE and the held-out values inside each interval, from points and intervals on the data's scale. */
function holdoutScores(points: readonly number[], intervals: readonly IntervalsByLevel[], actual: readonly number[], scale: number): Scores {
  let absolute = 0;
  const inside: Record<string, number> = Object.fromEntries(LEVELS.map((level) => [String(level), 0]));
  actual.forEach((value, i) => {
    absolute += Math.abs(value - points[i]);
    for (const level of LEVELS) {
      const [lower, upper] = intervals[i][String(level)];
      if (value >= lower && value <= upper) inside[String(level)]++;
    }
  });
  return { mase: absolute / actual.length / scale, inside };
}

function expectInside(scores: Scores, expected: Inside): void {
  expect(scores.inside).toEqual({ 80: expected[80], 95: expected[95] });
}

describe.each(CASES)('hold-out accuracy on $name (last two years held out)', (c) => {
  const expected = referenceCase(c.name);
  const lines = readFileSync(new URL(`../fixtures/seasonal/${c.name}.csv`, import.meta.url), 'utf8').trimEnd().split('\n');
  const held = expected.held_out.n;
  const heldLines = lines.slice(lines.length - held);
  const actual = heldLines.map((line) => Number(line.split(',')[1]));
  // The defaults that depend on the series (the horizon, the backtest's) need its frequency and length.
  const settings = settingsFor(c.written, expected.period === 12 ? 'monthly' : 'quarterly', expected.train.n);
  const training = parseSeriesCsv(`${lines.slice(0, lines.length - held).join('\n')}\n`, `${c.name}.csv`, { missing: 'error', transform: settings.transform });
  const scale = inSampleNaiveMae(training.values, expected.period);
  const scoresOf = (forecast: Pick<ReferenceForecast, 'mean' | 'se'>): Scores => {
    const rows = forecast.mean.map((mean, i) => backTransformForecast(settings.transform, 'median', LEVELS, mean, forecast.se[i]));
    return holdoutScores(
      rows.map((row) => row.point),
      rows.map((row) => row.intervals),
      actual,
      scale,
    );
  };
  let record: AnalysisRecord;
  beforeAll(async () => {
    record = await analyseSeries(training, settings, { id: c.name, title: c.name, file: `${c.name}.csv` }, { backtest: false });
  });

  it('splits the data as the reference did and takes its MASE scale from the training part', () => {
    expect([training.n, training.first, training.last, training.frequency]).toEqual([expected.train.n, expected.train.first, expected.train.last, expected.period === 12 ? 'monthly' : 'quarterly']);
    // The memo's horizon reaches over the held-out span.
    expect(settings.horizon).toBeGreaterThanOrEqual(held);
    expect([heldLines[0].split(',')[0], heldLines[held - 1].split(',')[0]]).toEqual([expected.held_out.first, expected.held_out.last]);
    expect(actual).toEqual(expected.held_out.actual);
    // numpy's mean of |y_t − y_{t−s}| over the training part.
    expectRelative(scale, expected.mase_scale, SAME_NUMBERS);
  });

  it('scores the reference SARIMA(0,1,1)(0,1,1)s as committed from statsmodels', () => {
    const { airline } = expected;
    expect(reference.library.statsmodels).toBe('0.13.5+dfsg');
    expect(airline.call).toContain(`seasonal_order=(0, 1, 1, ${expected.period})`);
    // The default fit had converged: refitting from its optimum moves the log-likelihood by < 1e-6.
    expect(airline.converged).toBe(true);
    expect(Math.abs(airline.restart.llf - airline.llf)).toBeLessThan(1e-6);
    // Our scoring of its forecasts (mean ∓ z·se on the model scale, back-transformed) agrees with the script's.
    const ours = scoresOf(airline);
    expectRelative(ours.mase, airline.mase, SAME_NUMBERS);
    for (const level of LEVELS) expect(ours.inside[String(level)]).toBe(airline.intervals[String(level)].inside);
    // The committed figures (statsmodels 0.13.5, holdout-reference.json).
    expect(airline.mase).toBeCloseTo(c.airline.mase, 3);
    expectInside(ours, c.airline.inside);
    for (const level of LEVELS) expect(airline.coverage[String(level)]).toBe(c.airline.inside[level] / held);
  });

  it('forecasts the seasonal naive as numpy does, and scores it alike', () => {
    const naive = naiveForecast(Float64Array.from(training.values, (y) => (settings.transform.kind === 'log' ? Math.log(y) : y)), held, expected.period);
    naive.mean.forEach((mean, i) => expectRelative(mean, expected.seasonal_naive.mean[i], SAME_NUMBERS));
    naive.se.forEach((se, i) => expectRelative(se, expected.seasonal_naive.se[i], SAME_NUMBERS));
    const scores = scoresOf(naive);
    expectRelative(scores.mase, expected.seasonal_naive.mase, SAME_NUMBERS);
    expect(scores.mase).toBeCloseTo(c.naive.mase, 3);
    expectInside(scores, c.naive.inside);
  });

  it('chooses the seasonal part we measured for the recommended model', () => {
    const model = record.models[c.recommended];
    const { seasonal } = model;
    expect({ harmonics: seasonal?.harmonics, P: seasonal?.P, Q: seasonal?.Q, seasonal_differences: seasonal?.seasonal_differences, p: model.p, q: model.q }).toEqual(c.part);
  });

  const oursScores = (kind: TrendModelKind): Scores => {
    const rows = record.forecasts[kind].slice(0, held);
    expect(rows.map((row) => row.period)).toEqual(heldLines.map((line) => line.split(',')[0]));
    return holdoutScores(
      rows.map((row) => row.point),
      rows.map((row) => row.intervals),
      actual,
      scale,
    );
  };

  it.each(['deterministic', 'stochastic'] as const)('keeps the %s trend’s hold-out MASE and coverage we measured', (kind) => {
    const scores = oursScores(kind);
    expect(Math.abs(scores.mase - c.ours[kind].mase)).toBeLessThanOrEqual(MEASURED);
    expectInside(scores, c.ours[kind].inside);
  });

  it(`compares with the yardsticks as measured: ${c.comparisons.map((x) => x.join(' ')).join(', ')}`, () => {
    const mase = (who: Forecaster): number => {
      if (who === 'airline') return expected.airline.mase;
      if (who === 'naive') return expected.seasonal_naive.mase;
      return oursScores(who === 'recommended' ? c.recommended : who).mase;
    };
    for (const [left, relation, right] of c.comparisons) {
      if (relation === '<') expect(mase(left), `${left} < ${right}`).toBeLessThan(mase(right));
      else expect(mase(left), `${left} > ${right}`).toBeGreaterThan(mase(right));
    }
    // The recommended model's 95% intervals hold as many held-out values as the reference SARIMA's.
    expect(oursScores(c.recommended).inside['95']).toBeGreaterThanOrEqual(expected.airline.intervals['95'].inside);
  });
});
