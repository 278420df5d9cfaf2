// Trend stability of models with a seasonal part: the expanding windows against statsmodels'
// SARIMAX fitted to the same windows (test/fixtures/seasonal-stability/, the script and calls
// there, provenance in test/fixtures/README.md), the break test's whitening at the expanded
// seasonal ARMA against GLS computed densely, and the break test on seeded seasonal series
// with and without a break.
import { readFileSync } from 'node:fs';
import { CholeskyDecomposition, Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { seasonalExpandingEstimates, seasonalWindowFit } from '../../src/evidence/expandingWindows.js';
import { trendBreakScan, trendBreakTest } from '../../src/evidence/trendBreakTest.js';
import { seasonalTrendStability } from '../../src/evidence/trendStability.js';
import { fitRegressionArma, type RegressionArmaFit } from '../../src/models/fitRegressionArma.js';
import { fitTrendModelAtOrder, trendDesign, type DesignSeasonality, type TrendDesign, type TrendModelFit } from '../../src/models/trendModels.js';
import type { TrendModelKind } from '../../src/base/settings.js';
import { armaAutocovariance, covarianceAtTimes } from '../support/denseLikelihood.js';
import { STABILITY_CASES, stabilityCaseId, type StabilityCase } from '../fixtures/seasonal-stability/stabilityCases.js';
import { expectRelative } from './expectRelative.js';
import { seededNormals } from './seededNormals.js';

interface ReferenceWindow {
  end: number;
  fit: { loglik: number; estimate: number; by_start: Record<string, { loglik: number; estimate: number } | string> };
  gls: { estimate: number; se: number; sigma2: number; m: number; beta_gap: number };
}
const reference = JSON.parse(readFileSync(new URL('../fixtures/seasonal-stability/windows-reference.json', import.meta.url), 'utf8')) as {
  source: string;
  cases: { id: string; windows: ReferenceWindow[] }[];
};

function seriesOf(c: StabilityCase): Float64Array {
  const text = readFileSync(new URL(`../fixtures/seasonal-models/${c.data}`, import.meta.url), 'utf8');
  const values = text.trim().split('\n').slice(1).map((line) => Number(line.split(',')[1]));
  return Float64Array.from(values, (v) => (c.transform === 'log' ? Math.log(v) : v));
}

describe('expanding windows of seasonal models against statsmodels 0.13.5 SARIMAX on the same windows', () => {
  it.each(STABILITY_CASES.map((c) => ({ id: stabilityCaseId(c), c })))('$id', ({ id, c }) => {
    const w = seriesOf(c);
    const model = fitTrendModelAtOrder(c.kind, w, c.p, c.q, {
      estimation: 'ml',
      seasonal: { period: c.period, firstSeason: 0, seasonalDifferencing: c.seasonalDifferencing, harmonics: c.harmonics, P: c.P, Q: c.Q },
    });
    const windows = seasonalExpandingEstimates(c.kind, w, c.ends, model);
    const expected = reference.cases.find((entry) => entry.id === id);
    if (expected === undefined) throw new Error(`no reference for ${id}`);
    c.ends.forEach((end, i) => {
      const ref = expected.windows[i];
      expect(ref.end).toBe(end);
      const { design, fit } = seasonalWindowFit(c.kind, w, end, model);
      // The window's design is the model's on its first `end` observations: same columns, same
      // calendar positions (the window starts where the series does).
      model.design.regressors.forEach((column, j) => expect(Array.from(design.regressors[j])).toEqual(Array.from(column.subarray(0, design.response.length))));
      // statsmodels' best over its default start, zero ARMA parameters and ours, polished; ours
      // is at least as high as anything its own starts reach (by 1.28 on UK gas's seasonal
      // differences at 44 quarters, where both of its starts stop at a lower maximum).
      expect(Math.abs(fit.loglik - ref.fit.loglik)).toBeLessThan(1e-6);
      for (const start of ['default', 'zero-arma']) {
        const own = ref.fit.by_start[start];
        if (typeof own === 'string') throw new Error(`${id} ${end}: statsmodels' ${start} start failed: ${own}`);
        expect(fit.loglik).toBeGreaterThan(own.loglik - 1e-6);
        // Where its own start reaches the same maximum the trend coefficient agrees to its
        // optimiser's tolerance (at most 1.6e-4 standard errors measured).
        if (own.loglik > fit.loglik - 1e-5) expect(Math.abs(windows[i].estimate - own.estimate)).toBeLessThan(1e-3 * ref.gls.se);
      }
      expect(Math.abs(windows[i].estimate - ref.fit.estimate)).toBeLessThan(1e-3 * ref.gls.se);
      // The standard error is the GLS one given the ARMA parameters, σ²(X'Ω⁻¹X)⁻¹ with Ω dense
      // from statsmodels' arma_acovf of the expanded polynomials.
      expectRelative(windows[i].se, ref.gls.se, 1e-5);
      expect(ref.gls.beta_gap).toBeLessThan(1e-8);
    });
  });
});

/** Wald statistics at each break date by GLS with a dense covariance matrix (common practice: the Wald statistic as the drop in the GLS sum of squares). */
function denseWald(design: TrendDesign, fit: RegressionArmaFit, breakColumns: (date: number) => number[][], dates: number[]): number[] {
  const y = Array.from(design.response);
  const m = y.length;
  const gamma = armaAutocovariance(Array.from(fit.ar), Array.from(fit.ma), m);
  const chol = new CholeskyDecomposition(covarianceAtTimes(gamma, Array.from({ length: m }, (_, t) => t)));
  const ssr = (columns: number[][]): number => {
    const x = new Matrix(Array.from({ length: m }, (_, t) => columns.map((column) => column[t])));
    const sx = chol.solve(x);
    const sy = chol.solve(Matrix.columnVector(y));
    const gram = x.transpose().mmul(sx);
    const beta = solve(gram, x.transpose().mmul(sy));
    const resid = Matrix.columnVector(y).sub(x.mmul(beta));
    return resid.transpose().mmul(chol.solve(resid)).get(0, 0);
  };
  const base = design.regressors.map((column) => Array.from(column));
  const restricted = ssr(base);
  return dates.map((date) => {
    const extra = breakColumns(date);
    const unrestricted = ssr([...base, ...extra]);
    return (restricted - unrestricted) / (unrestricted / (m - base.length - extra.length));
  });
}

/** u_t with (1 − φB)(1 − ΦB^s)u_t = ε_t, after a burn-in of 20 years. */
function seasonalArErrors(normal: () => number, n: number, phi: number, seasonalPhi: number, period: number, sigma: number): Float64Array {
  const burn = 20 * period;
  const u = new Float64Array(n + burn);
  for (let t = 0; t < u.length; t++) {
    const at = (lag: number): number => (t - lag >= 0 ? u[t - lag] : 0);
    u[t] = phi * at(1) + seasonalPhi * at(period) - phi * seasonalPhi * at(period + 1) + sigma * normal();
  }
  return u.subarray(burn);
}

const MONTHLY = (harmonics: number, seasonalDifferencing = false): DesignSeasonality => ({ period: 12, firstSeason: 0, harmonics, seasonalDifferencing });
/** A fixed pattern of two harmonic pairs (our choice of amplitudes), at position m in the year. */
const pattern = (m: number): number => 3 * Math.cos((2 * Math.PI * m) / 12) + Math.sin((2 * Math.PI * m) / 12) + 0.5 * Math.cos((4 * Math.PI * m) / 12);

describe('the break scan whitens at the expanded seasonal ARMA (state dimension 13, the filter\u2019s general path)', () => {
  const normal = seededNormals(61);
  const u = seasonalArErrors(normal, 96, 0.4, 0.5, 12, 1);
  const w = u.map((error, i) => 20 + 0.05 * (i + 1) + pattern(i) + error);
  const cases: { kind: TrendModelKind; seasonality: DesignSeasonality }[] = [
    { kind: 'deterministic', seasonality: MONTHLY(2) },
    { kind: 'stochastic', seasonality: MONTHLY(2) },
    { kind: 'stochastic', seasonality: MONTHLY(0, true) },
  ];
  it.each(cases.map((c) => ({ ...c, label: `${c.kind}${c.seasonality.seasonalDifferencing ? ', seasonal differences' : ', two harmonic pairs'}` })))(
    '$label: every date\u2019s Wald statistic equals dense GLS with the same (1,0)(1,1)12 errors',
    ({ kind, seasonality }) => {
      const design = trendDesign(kind, w, seasonality);
      const fit = fitRegressionArma(design.response, design.regressors, 1, 0, { seasonal: { period: 12, P: 1, Q: 1 } });
      expect(fit.ar.length).toBe(13);
      const scan = trendBreakScan(kind, design, fit);
      const dates = Array.from(scan.wald, (_, i) => scan.first + i);
      const m = design.response.length;
      const breaks = (date: number): number[][] =>
        kind === 'deterministic'
          ? [Array.from({ length: m }, (_, i) => (i >= date ? 1 : 0)), Array.from({ length: m }, (_, i) => (i >= date ? i + 1 - date : 0))]
          : [Array.from({ length: m }, (_, i) => (i >= date ? 1 : 0))];
      const dense = denseWald(design, fit, breaks, dates);
      scan.wald.forEach((wald, i) => expectRelative(wald, dense[i], 1e-7));
    },
  );
});

/** The model at a fixed seasonal part and order, estimated by REML as the analysis does. */
function fixedModel(kind: TrendModelKind, w: Float64Array, seasonality: DesignSeasonality, p: number, P: number, Q: number): TrendModelFit {
  return fitTrendModelAtOrder(kind, w, p, 0, { seasonal: { ...seasonality, P, Q } });
}

describe('break tests on seeded monthly series with a seasonal pattern and seasonal AR errors, n = 240', () => {
  // w_t = 10 + 0.02t + 0.05·max(0, t − 144) + S(t) + u_t, (1 − 0.5B)(1 − 0.4B^12)u_t = 0.5ε_t:
  // the slope rises from 0.02 to 0.07 a month after month 144 (of 240).
  const trendSeries = (seed: number, slopeChange: number): Float64Array => {
    const u = seasonalArErrors(seededNormals(seed), 240, 0.5, 0.4, 12, 0.5);
    return u.map((error, i) => 10 + 0.02 * (i + 1) + slopeChange * Math.max(0, i + 1 - 144) + pattern(i) + error);
  };
  // w_t = w_{t−12} + 12c_t + η_t with (1 − 0.3B)η_t = ε_t: the drift c rises from 0.02 to 0.12 a
  // month after month 144; a seasonal random walk with drift, so seasonal differences fit it.
  const walkSeries = (seed: number, driftChange: number): Float64Array => {
    const normal = seededNormals(seed);
    const w = new Float64Array(240);
    let eta = 0;
    for (let t = 0; t < 240; t++) {
      eta = 0.3 * eta + normal();
      w[t] = t < 12 ? 10 + pattern(t) + eta : w[t - 12] + 12 * (0.02 + (t + 1 > 144 ? driftChange : 0)) + eta;
    }
    return w;
  };

  it('deterministic trend with two harmonic pairs, (1,0)(1,0)12: a slope break is rejected at 1% and placed within a year of month 145', () => {
    const model = fixedModel('deterministic', trendSeries(71, 0.05), MONTHLY(2), 1, 1, 0);
    const test = trendBreakTest('deterministic', model.design, model.fit);
    expect(test.reject['1']).toBe(true);
    expect(Math.abs(test.break_index - 144)).toBeLessThanOrEqual(12);
    expect(test.method).toBe("sup-Wald for a break in the level and slope with the seasonal pattern's 4 harmonic terms held constant across it, GLS-whitened, 15% trimming");
  });

  it('the same series without the break: no rejection at 5%', () => {
    const model = fixedModel('deterministic', trendSeries(72, 0), MONTHLY(2), 1, 1, 0);
    const test = trendBreakTest('deterministic', model.design, model.fit);
    expect(test.reject['5']).toBe(false);
  });

  it('stochastic trend on seasonal differences, (1,0): a drift shift is rejected at 1% and dated in levels, within a year of month 145', () => {
    const model = fixedModel('stochastic', walkSeries(73, 0.1), MONTHLY(0, true), 1, 0, 0);
    const test = trendBreakTest('stochastic', model.design, model.fit);
    const scan = trendBreakScan('stochastic', model.design, model.fit);
    expect(test.reject['1']).toBe(true);
    // A regime of τ seasonal differences reaches the levels up to position τ + 11.
    expect(test.break_index).toBe(scan.date + 12);
    expect(Math.abs(test.break_index - 144)).toBeLessThanOrEqual(12);
    expect(test.method).toBe('sup-Wald for a break in the drift on the differences over a year, GLS-whitened, 15% trimming');
  });

  it('the same walk without the shift: no rejection at 5%', () => {
    const model = fixedModel('stochastic', walkSeries(74, 0), MONTHLY(0, true), 1, 0, 0);
    expect(trendBreakTest('stochastic', model.design, model.fit).reject['5']).toBe(false);
  });
});

describe('seasonalTrendStability as one record', () => {
  const u = seasonalArErrors(seededNormals(81), 120, 0.5, 0.4, 12, 0.5);
  const w = u.map((error, i) => 10 + 0.02 * (i + 1) + pattern(i) + error);
  const models = {
    deterministic: fixedModel('deterministic', w, MONTHLY(2), 1, 1, 0),
    stochastic: fixedModel('stochastic', w, MONTHLY(2), 1, 1, 0),
  };
  const record = seasonalTrendStability(w, models);

  it('keeps the plain record\u2019s keys and schedule, and its full-sample window is the model\u2019s own fit', () => {
    expect(Object.keys(record)).toEqual(['windows', 'break_test']);
    // 40% of 120 is 48; (120 − 48) / 39 rounds up to a step of 2.
    expect(record.windows.min_window).toBe(48);
    expect(record.windows.step).toBe(2);
    expect(record.windows.deterministic.at(-1)).toEqual({ end: 120, slope: models.deterministic.coefficients.slope, se: models.deterministic.stderr.regression.slope });
    expect(record.windows.stochastic.at(-1)).toEqual({ end: 120, drift: models.stochastic.coefficients.drift, se: models.stochastic.stderr.regression.drift });
  });

  it('estimates each window as the model was (REML here), at its orders (1,0)(1,0)12', () => {
    const window = record.windows.deterministic[3];
    const { fit } = seasonalWindowFit('deterministic', w, window.end, models.deterministic);
    expect(fit.estimation).toBe('reml');
    expect(fit.order).toMatchObject({ p: 1, q: 0, P: 1, Q: 0 });
    expect(window.slope).toBe(fit.beta[1]);
  });

  it('refuses a model fitted to another series', () => {
    expect(() => seasonalTrendStability(w.subarray(0, 100), models)).toThrow(/seasonalTrendStability needs the deterministic model fitted to the whole series/);
  });
});
