// Seasonal engine benchmarks on the seasonal open datasets (test/fixtures/seasonal-models/):
// single fits with a seasonal ARMA factor (state dimension 13 to 16 on the filter's general
// path), the seasonal search for each model, and the search on a series with missing levels.
import { readFileSync } from 'node:fs';
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

export function seasonalBench(): BenchRow[] {
  const rows: BenchRow[] = [];
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
