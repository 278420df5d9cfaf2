// The forecast for the next full calendar year (src/analysis/nextYear.ts): which periods it
// covers, when the horizon is too short for it, the exact figure without a transform, and the
// simulated one with a log transform against the log-normal sum's exact moments and a
// 10,000,000-draw numpy reference (test/fixtures/forecast-covariance/, provenance in
// test/fixtures/README.md).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { nextYear, yearFigure, YEAR_DRAWS, type FigureSettings, type PeriodForecast } from '../../src/analysis/nextYear.js';
import type { Frequency } from '../../src/base/period.js';
import { biasAdjustedMean } from '../../src/base/transform.js';
import { jointForecastCovariance } from '../../src/models/jointForecast.js';
import { fitTrendModelAtOrder, forecastTrendModel, type TrendModelFit } from '../../src/models/trendModels.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { settingsFor } from '../support/settings.js';

interface LognormalCase {
  id: string;
  mu: number[];
  sigma: number[][];
  mean: number;
  sd: number;
  quantiles: Record<string, number>;
}
const fixture = (path: string): string => readFileSync(new URL(`../fixtures/forecast-covariance/${path}`, import.meta.url), 'utf8');
const lognormal = JSON.parse(fixture('lognormal-sums.json')) as { cases: LognormalCase[] };
const covariances = JSON.parse(fixture('statsmodels-covariance.json')) as { cases: { id: string; dense: { total: number[][] } | null }[] };

/** Normal quantiles z(0.975) and z(0.9): scipy 1.10.1 norm.ppf. */
const Z95 = 1.959963984540054;
const Z80 = 1.2815515655446004;

const lakeHuron = Float64Array.from(
  readFileSync(new URL('../fixtures/lake-huron.csv', import.meta.url), 'utf8')
    .trim()
    .split('\n')
    .slice(1)
    .map((line) => Number(line.split(',')[1])),
);
const fitted = { deterministic: fitTrendModelAtOrder('deterministic', lakeHuron, 1, 0), stochastic: fitTrendModelAtOrder('stochastic', lakeHuron, 0, 1) };

function rowsOf(model: TrendModelFit, horizon: number): PeriodForecast[] {
  const moments = forecastTrendModel(model, horizon);
  return Array.from(moments.mean, (mean) => ({ point: mean, model_scale: { mean } }));
}

/** Lake Huron's levels read as a monthly or quarterly series ending at `last` (the window depends on the calendar only). */
function yearAfter(last: string, frequency: Frequency, horizon: number, written: Parameters<typeof settingsFor>[0] = {}) {
  const settings = settingsFor({ horizon, ...written }, frequency);
  return nextYear({ frequency, last }, settings, fitted, { deterministic: rowsOf(fitted.deterministic, horizon), stochastic: rowsOf(fitted.stochastic, horizon) });
}

describe('which year, and when there is none', () => {
  it('is the calendar year after the last observation: January to December, or Q1 to Q4', () => {
    // Data to December 2024: 2025 is h = 1..12; to May 2024: 2025 is h = 8..19 (the rest of 2024 is not a full year).
    expect(yearAfter('2024-12', 'monthly', 24)).toMatchObject({ year: '2025', first_period: '2025-01', last_period: '2025-12', first_h: 1, last_h: 12, available: true });
    expect(yearAfter('2024-05', 'monthly', 24)).toMatchObject({ year: '2025', first_period: '2025-01', last_period: '2025-12', first_h: 8, last_h: 19, available: true });
    expect(yearAfter('2024-Q2', 'quarterly', 12)).toMatchObject({ year: '2025', first_period: '2025-Q1', last_period: '2025-Q4', first_h: 3, last_h: 6, periods: 4 });
  });

  it('gives no figure when the horizon ends inside the year, and says where it ends', () => {
    expect(yearAfter('2024-05', 'monthly', 19)?.available).toBe(true);
    expect(yearAfter('2024-05', 'monthly', 18)).toMatchObject({ available: false, horizon_end: '2025-11', method: null, deterministic: null, stochastic: null });
  });

  it('gives an annual series none: its forecasts are years already', () => {
    expect(yearAfter("2024", "annual", 10)).toBeNull();
  });
});

describe('without a transform: exact', () => {
  it("is the periods' forecasts added up, with the variance of their sum from the joint covariance", () => {
    const year = yearAfter('2024-05', 'monthly', 24, { year_figure: 'total' });
    for (const kind of ['deterministic', 'stochastic'] as const) {
      const figure = year?.[kind];
      if (figure === null || figure === undefined) throw new Error('no figure');
      const rows = rowsOf(fitted[kind], 24).slice(7, 19);
      // The sum of jointly Gaussian forecasts is Gaussian with mean Σμ and variance 1'Σ1 (common practice).
      expectRelative(figure.point, rows.reduce((sum, row) => sum + row.point, 0), 1e-14);
      const { total } = jointForecastCovariance(fitted[kind], { first: 8, last: 19 });
      expectRelative(figure.sd, Math.sqrt(total.reduce((sum, value) => sum + value, 0)), 1e-14);
      expectRelative(figure.intervals['95'][1], figure.point + Z95 * figure.sd, 1e-14);
      expectRelative(figure.intervals['80'][0], figure.point - Z80 * figure.sd, 1e-14);
      // The errors of neighbouring months share their shocks: the joint sd is well above the independent one.
      expect(figure.sd).toBeGreaterThan(1.5 * figure.sd_if_independent);
      expect(figure.simulation_error).toBeNull();
    }
  });

  it('is the total divided by the periods as an average', () => {
    const total = yearAfter('2024-12', 'monthly', 24, { year_figure: 'total' })?.stochastic;
    const average = yearAfter('2024-12', 'monthly', 24, { year_figure: 'average' })?.stochastic;
    expectRelative(average?.point ?? Number.NaN, (total?.point ?? Number.NaN) / 12, 1e-14);
    expectRelative(average?.intervals['95'][0] ?? Number.NaN, (total?.intervals['95'][0] ?? Number.NaN) / 12, 1e-14);
  });

  it('reads the covariance the intervals read: the process part alone without coefficient uncertainty', () => {
    const withCoefficients = yearAfter('2024-12', 'monthly', 12)?.deterministic?.sd ?? Number.NaN;
    const without = yearAfter('2024-12', 'monthly', 12, { coefficient_uncertainty: false })?.deterministic?.sd ?? Number.NaN;
    const { process } = jointForecastCovariance(fitted.deterministic, { first: 1, last: 12 });
    expectRelative(without, Math.sqrt(process.reduce((sum, value) => sum + value, 0)) / 12, 1e-14);
    expect(withCoefficients).toBeGreaterThan(without);
  });

  it('matches the sum over the reference covariance of a seasonal model (statsmodels 0.13.5, dense conditional)', () => {
    const reference = covariances.cases.find((c) => c.id === 'nottingham-temperature-det-k2-10-11')?.dense?.total ?? [];
    const block = reference.slice(0, 12).map((row) => row.slice(0, 12));
    const figure = yearFigure({ means: Array(12).fill(50), points: Array(12).fill(50), covariance: Float64Array.from(block.flat()) }, figureSettings('none', 'median', 'average'));
    expectRelative(figure.sd, Math.sqrt(block.flat().reduce((sum, value) => sum + value, 0)) / 12, 1e-14);
    expect(figure.point).toBe(50);
  });
});

function figureSettings(transform: 'none' | 'log', point: 'median' | 'mean', figure: 'total' | 'average'): FigureSettings {
  return { transform: { kind: transform }, point, levels: [80, 95], year_figure: figure };
}

describe.each(lognormal.cases)('with a log transform: simulated ($id)', (c) => {
  const s = c.mu.length;
  const covariance = Float64Array.from(c.sigma.flat());
  const medians = c.mu.map(Math.exp);
  const figure = yearFigure({ means: c.mu, points: medians, covariance }, figureSettings('log', 'median', 'total'));
  // Four standard errors of a 2.5% quantile from YEAR_DRAWS = 20,000 draws of a near-normal sum,
  // √(0.025·0.975/20000)/φ(1.96) = 0.019 standard deviations (common practice).
  const tolerance = 4 * 0.019 * c.sd;

  it('has the interval and median of the sum of log-normal periods (numpy, 10,000,000 draws)', () => {
    expect(YEAR_DRAWS).toBe(20_000);
    expect(Math.abs(figure.intervals['95'][0] - c.quantiles['0.025'])).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(figure.intervals['95'][1] - c.quantiles['0.975'])).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(figure.intervals['80'][0] - c.quantiles['0.1'])).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(figure.intervals['80'][1] - c.quantiles['0.9'])).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(figure.point - c.quantiles['0.5'])).toBeLessThanOrEqual(tolerance);
    // The median of the sum is not the sum of the medians (the log-normal's right skew adds up).
    expect(figure.from_points).toBeCloseTo(medians.reduce((sum, value) => sum + value, 0), 9);
    expect(figure.point).toBeGreaterThan(figure.from_points);
  });

  it('bounds its own Monte Carlo error by the order statistics, and the reference lies within those bounds', () => {
    // Over 30 seeds the 95% ends moved by 0.7–1.4% of the half-width (one standard deviation;
    // test/fixtures/README.md), so 95% margins of about 1.5–3% are expected.
    const error = figure.simulation_error ?? Number.NaN;
    expect(error).toBeGreaterThan(0.005);
    expect(error).toBeLessThan(0.05);
    for (const [level, low, high] of [
      ['95', '0.025', '0.975'],
      ['80', '0.1', '0.9'],
    ] as const) {
      const [ours0, ours1] = figure.intervals[level];
      const margin = (error * (ours1 - ours0)) / 2;
      expect(Math.abs(ours0 - c.quantiles[low])).toBeLessThanOrEqual(margin);
      expect(Math.abs(ours1 - c.quantiles[high])).toBeLessThanOrEqual(margin);
    }
  });

  it("has the sum's exact standard deviation within the draws' error, and uses the correlations", () => {
    // The sample sd of 20,000 draws is within 3% of the exact one (its relative standard error is about 0.5%).
    expectRelative(figure.sd, c.sd, 0.03);
    // Independent periods: Var = Σ_h (e^{Σ_hh} − 1) e^{2μ_h + Σ_hh} (log-normal variance, common practice).
    const independent = Math.sqrt(c.mu.reduce((sum, mu, h) => sum + (Math.exp(c.sigma[h][h]) - 1) * Math.exp(2 * mu + c.sigma[h][h]), 0));
    expectRelative(figure.sd_if_independent, independent, 0.03);
  });

  it("is the sum of the periods' means as a mean: exact for the log", () => {
    const means = c.mu.map((mu, h) => biasAdjustedMean({ kind: 'log' }, mu, Math.sqrt(c.sigma[h][h])));
    const asMean = yearFigure({ means: c.mu, points: means, covariance }, figureSettings('log', 'mean', 'total'));
    // E Σ exp(X_h) = Σ exp(μ_h + Σ_hh/2) (the script's exact mean).
    expectRelative(asMean.point, c.mean, 1e-12);
    const average = yearFigure({ means: c.mu, points: means, covariance }, figureSettings('log', 'mean', 'average'));
    expectRelative(average.point, c.mean / s, 1e-12);
    expectRelative(average.intervals['95'][1], asMean.intervals['95'][1] / s, 1e-12);
  });

  it('gives the same figures on every run (a fixed seed)', () => {
    const again = yearFigure({ means: c.mu, points: medians, covariance }, figureSettings('log', 'median', 'total'));
    expect(again).toEqual(figure);
  });
});
