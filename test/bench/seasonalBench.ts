// Seasonal benchmarks. Whole processes of the compiled tool (start-up included): `fit` on the
// Nottingham temperatures (monthly, n = 240; both models, seasonal and order search,
// evidence), the same with a 12-origin reselecting backtest, and a memo of four invented
// monthly series (n = 120 to 240) with the default backtest, HTML and PDF. Then the engine on
// the seasonal open datasets (test/fixtures/seasonal-models/): single fits with a seasonal
// ARMA factor (state dimension 13 to 16 on the filter's general path), the seasonal search
// for each model, and the search on a series with missing levels.
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { seededNormals } from '../evidence/seededNormals.js';
import { timeChild } from './childProcess.js';
import { fitRegressionArma } from '../../src/models/fitRegressionArma.js';
import { fitTrendModel, trendDesign, type SeasonalSearchSpec } from '../../src/models/trendModels.js';
import { median, timeRuns, type BenchRow } from './timing.js';

function readSeries(file: string, log: boolean, missing: number[] = []): Float64Array {
  const text = readFileSync(new URL(`../fixtures/seasonal-models/${file}`, import.meta.url), 'utf8');
  const values = text.trim().split('\n').slice(1).map((line) => Number(line.split(',')[1]));
  return Float64Array.from(values, (v, t) => (missing.includes(t + 1) ? Number.NaN : log ? Math.log(v) : v));
}

function spec(period: number, seasonalDifferencing: boolean): SeasonalSearchSpec {
  return { period, firstSeason: 0, seasonalDifferencing, maxHarmonics: period / 2, maxSeasonalP: 1, maxSeasonalQ: 1 };
}

/** Four invented monthly series (trend, two harmonics, AR(1) noise) and a config for their memo. */
function writeMonthlyMemo(root: string): string {
  const draw = seededNormals(20261202);
  mkdirSync(join(root, 'data'));
  const entries = [240, 192, 156, 120].map((n, s) => {
    let noise = 0;
    const lines = ['period,value'];
    for (let t = 0; t < n; t++) {
      noise = 0.5 * noise + draw();
      const month = t % 12;
      const value = 500 + 1.5 * t + 40 * Math.cos((2 * Math.PI * month) / 12) + 15 * Math.sin((4 * Math.PI * month) / 12) + 12 * noise;
      lines.push(`${2005 + Math.floor(t / 12)}-${String(month + 1).padStart(2, '0')},${value.toFixed(1)}`);
    }
    writeFileSync(join(root, 'data', `m${s}.csv`), `${lines.join('\n')}\n`);
    return `  - id: m${s}\n    file: data/m${s}.csv`;
  });
  writeFileSync(join(root, 'monthly.yaml'), `memo:\n  id: monthly-bench\n  title: Invented monthly memo\nseries:\n${entries.join('\n')}\noutput:\n  folder: out\n  formats: [html, pdf]\n`);
  return 'monthly.yaml';
}

export function seasonalBench(): BenchRow[] {
  execFileSync('npm', ['run', 'build'], { stdio: 'ignore' });
  const rows: BenchRow[] = [];
  const nottingham = resolve('test/fixtures/seasonal-models/nottingham-temperature.csv');
  const fit = median([0, 1, 2].map(() => timeChild(['fit', nottingham], process.cwd()).ms));
  rows.push({ name: 'fit, monthly n = 240 (Nottingham temperature), whole process', ms: fit, target: 2_000 });
  const backtest = timeChild(['fit', nottingham, '--origins', '12'], process.cwd());
  rows.push({ name: 'fit with a 12-origin reselecting backtest, monthly n = 240, whole process', ms: backtest.ms, target: 5_000, extra: { 'peak MB': backtest.peakMb } });
  const root = mkdtempSync(join(tmpdir(), 'tb-monthly-'));
  try {
    const memo = timeChild(['run', writeMonthlyMemo(root), '--quiet'], root);
    rows.push({ name: 'memo of 4 monthly series (n = 120..240, default backtest), HTML + PDF, whole process', ms: memo.ms, target: 30_000, extra: { 'peak MB': memo.peakMb } });
  } finally {
    rmSync(root, { recursive: true, force: true });
  }
  const temperature = readSeries('nottingham-temperature.csv', false);
  const deaths = readSeries('us-accidental-deaths.csv', false);
  const gas = readSeries('uk-gas.csv', true);
  for (const [p, q, P, Q] of [[1, 0, 1, 1], [1, 1, 1, 1], [3, 3, 1, 1]]) {
    const design = trendDesign('deterministic', temperature, { period: 12, firstSeason: 0, harmonics: 2, seasonalDifferencing: false });
    const ms = median(timeRuns(() => fitRegressionArma(design.response, design.regressors, p, q, { seasonal: { period: 12, P, Q } }), 3));
    rows.push({ name: `one fit (${p},${q})(${P},${Q})_12 with 2 harmonic pairs, n = 240`, ms });
  }
  const searches: [string, Float64Array, number][] = [
    ['monthly n = 240 (Nottingham temperature)', temperature, 12],
    ['monthly n = 72 (US accidental deaths)', deaths, 12],
    ['quarterly n = 108 (UK gas, log)', gas, 4],
  ];
  for (const [label, w, period] of searches) {
    for (const [model, kind, differencing] of [
      ['deterministic', 'deterministic', false],
      ['stochastic, first differences', 'stochastic', false],
      ['stochastic, seasonal differences', 'stochastic', true],
    ] as const) {
      rows.push({ name: `seasonal search, ${model}, ${label}`, ms: median(timeRuns(() => fitTrendModel(kind, w, 3, 3, { seasonal: spec(period, differencing) }), 2)) });
    }
  }
  const gaps = readSeries('us-accidental-deaths.csv', false, [4, 30, 31, 43, 66, 70, 71]);
  for (const differencing of [false, true]) {
    const name = `seasonal search, stochastic, ${differencing ? 'seasonal' : 'first'} differences, deaths with 7 missing levels`;
    rows.push({ name, ms: median(timeRuns(() => fitTrendModel('stochastic', gaps, 3, 3, { seasonal: spec(12, differencing) }), 2)) });
  }
  return rows;
}
