// The seasonal parts of the engine checked by exact algebra and by the dense Gaussian
// likelihood (another route to the numbers the filter gives; common practice): the product of
// the seasonal factors, the likelihoods of a seasonal model (exact ML and REML, with and
// without missing values, and seasonal differences across gaps), the harmonic regressors, the
// admissibility of seasonal factors, and the forecasts of a seasonal random walk with drift.
import { readFileSync } from 'node:fs';
import { Matrix, CholeskyDecomposition, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { ols } from '../../src/linalg/ols.js';
import { admissibility } from '../../src/models/admissibility.js';
import { olsFit } from '../../src/models/fitRegressionArma.js';
import { harmonicColumns, harmonicNames, harmonicRow, seasonalPattern } from '../../src/models/harmonics.js';
import { createProfileLikelihood } from '../../src/models/profileLikelihood.js';
import { unconstrainAr, unconstrainMa } from '../../src/models/constraints.js';
import { constrainFactors, emptyFactors, expandedCoefficients, packFactors, type SeasonalArmaOrder } from '../../src/models/seasonalArma.js';
import { designWorkspace, filterDesign, fitTrendModelAtOrder, forecastDesign, trendDesign } from '../../src/models/trendModels.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { seededNormals } from '../evidence/seededNormals.js';
import { armaAutocovariance } from '../support/denseLikelihood.js';

const f64 = (values: number[]): Float64Array => Float64Array.from(values);

/** Seeded monthly series: a trend, a fixed pattern and seasonal ARMA(1,0)(1,1)_12 noise. */
function seasonalSeries(n: number, seed: number): Float64Array {
  const draw = seededNormals(seed);
  const { ar, ma } = expandedCoefficients({ ar: f64([0.4]), ma: f64([]), seasonalAr: f64([0.5]), seasonalMa: f64([-0.4]) }, { p: 1, q: 0, P: 1, Q: 1, period: 12 });
  const eta: number[] = [];
  const shocks: number[] = [];
  const out = new Float64Array(n);
  for (let t = -300; t < n; t++) {
    const shock = draw();
    let value = shock;
    ar.forEach((a, i) => (value += a * (eta[eta.length - 1 - i] ?? 0)));
    ma.forEach((m, j) => (value += m * (shocks[shocks.length - 1 - j] ?? 0)));
    eta.push(value);
    shocks.push(shock);
    if (t >= 0) out[t] = 20 + 0.05 * (t + 1) + 4 * Math.cos((2 * Math.PI * t) / 12) + value;
  }
  return out;
}

/**
 * The dense log-likelihood of observed sums z_A = Σ_{i∈A} x_i of a stationary series x with
 * autocovariances γ (σ² = 1) and regressors summed alike, β by GLS: the full one, σ² = SSR/m,
 * or the restricted one, −½[(m − k)(log 2π + 1 + log σ̂²) + log det Σ + log det X'Σ⁻¹X] with
 * σ̂² = SSR/(m − k) (Harvey 1989, §3.4; the form kalmanFilter.ts documents).
 */
function denseLoglik(sets: number[][], values: number[], design: number[][], gamma: number[], restricted: boolean): number {
  const m = sets.length;
  const sigma = new Matrix(m, m);
  sets.forEach((a, i) => sets.forEach((b, j) => sigma.set(i, j, a.reduce((sum, s) => sum + b.reduce((inner, t) => inner + gamma[Math.abs(s - t)], 0), 0))));
  const chol = new CholeskyDecomposition(sigma);
  const x = new Matrix(design);
  const y = Matrix.columnVector(values);
  const oneSided = x.transpose().mmul(chol.solve(x));
  const gram = oneSided.add(oneSided.transpose()).mul(0.5);
  const beta = solve(gram, x.transpose().mmul(chol.solve(y)));
  const resid = y.sub(x.mmul(beta));
  const ssr = resid.transpose().mmul(chol.solve(resid)).get(0, 0);
  let logDet = 0;
  for (let i = 0; i < m; i++) logDet += 2 * Math.log(chol.lowerTriangularMatrix.get(i, i));
  const k = design[0].length;
  if (!restricted) return -0.5 * m * (Math.log((2 * Math.PI * ssr) / m) + 1) - 0.5 * logDet;
  const gramChol = new CholeskyDecomposition(gram);
  let logDetGram = 0;
  for (let i = 0; i < k; i++) logDetGram += 2 * Math.log(gramChol.lowerTriangularMatrix.get(i, i));
  return -0.5 * (m - k) * (Math.log((2 * Math.PI * ssr) / (m - k)) + 1) - 0.5 * logDet - 0.5 * logDetGram;
}

describe('seasonal ARMA factors', () => {
  it('multiply out as the polynomials do', () => {
    // (1 − 0.5B)(1 − 0.8B⁴) = 1 − 0.5B − 0.8B⁴ + 0.4B⁵, and (1 + 0.3B)(1 − 0.6B⁴) = 1 + 0.3B − 0.6B⁴ − 0.18B⁵ (by hand).
    const { ar, ma } = expandedCoefficients({ ar: f64([0.5]), ma: f64([0.3]), seasonalAr: f64([0.8]), seasonalMa: f64([-0.6]) }, { p: 1, q: 1, P: 1, Q: 1, period: 4 });
    expect(Array.from(ar)).toEqual([0.5, 0, 0, 0.8, -0.4]);
    expect(Array.from(ma).map((v) => Number(v.toFixed(15)))).toEqual([0.3, 0, 0, -0.6, -0.18]);
  });

  it('map the reals to stationary and invertible factors and back', () => {
    const order: SeasonalArmaOrder = { p: 2, q: 1, P: 1, Q: 1, period: 12 };
    const x = f64([0.7, -1.3, 2.1, 0.4, -0.9]);
    const factors = emptyFactors(order);
    constrainFactors(x, order, factors, new Float64Array(2));
    // Each factor maps back to its own parameters (constraints.ts inverts the Durbin-Levinson map).
    const back = [unconstrainAr(factors.ar), unconstrainMa(factors.ma), unconstrainAr(factors.seasonalAr), unconstrainMa(factors.seasonalMa)].flatMap((part) => Array.from(part ?? []));
    expect(back).toHaveLength(5);
    back.forEach((value, i) => expectRelative(value, x[i], 1e-12));
    // Layout (φ₁, φ₂, θ₁, Φ, Θ); a factor of order 1 is its partial autocorrelation x/√(1 + x²) (constraints.ts).
    expectRelative(factors.seasonalAr[0], 0.4 / Math.sqrt(1 + 0.4 ** 2), 1e-15);
    expectRelative(factors.seasonalMa[0], 0.9 / Math.sqrt(1 + 0.9 ** 2), 1e-15);
    expect(Array.from(packFactors(factors)).length).toBe(5);
  });
});

describe('likelihoods of a seasonal model against the dense Gaussian likelihood', () => {
  const n = 72;
  const w = seasonalSeries(n, 7);
  const seasonality = { period: 12, firstSeason: 0, harmonics: 2, seasonalDifferencing: false };
  const order: SeasonalArmaOrder = { p: 1, q: 0, P: 1, Q: 1, period: 12 };
  const factors = { ar: f64([0.35]), ma: f64([]), seasonalAr: f64([0.45]), seasonalMa: f64([-0.3]) };
  const { ar, ma } = expandedCoefficients(factors, order);
  const gamma = armaAutocovariance(Array.from(ar), Array.from(ma), n);

  it.each([
    ['exact ML', 'ml'],
    ['REML', 'reml'],
  ] as const)('deterministic trend with harmonics, %s, complete and with missing values', (_, estimation) => {
    for (const missing of [[], [5, 6, 30, 61]]) {
      const series = w.map((v, t) => (missing.includes(t) ? Number.NaN : v));
      const design = trendDesign('deterministic', series, seasonality);
      const residuals = olsFit(design.response, design.regressors).residuals;
      const likelihood = createProfileLikelihood(residuals, design.regressors, 1, 0, { seasonal: { period: 12, P: 1, Q: 1 }, estimation, ...designWorkspace(design) });
      const observed = Array.from({ length: n }, (_, t) => t).filter((t) => !missing.includes(t));
      const dense = denseLoglik(
        observed.map((t) => [t]),
        observed.map((t) => residuals[t]),
        observed.map((t) => design.regressors.map((column) => column[t])),
        gamma,
        estimation === 'reml',
      );
      expectRelative(likelihood.atParameters(packFactors(factors)), dense, 1e-11);
    }
  });

  it('seasonal differences across gaps: the observed changes are sums of seasonal differences', () => {
    const s = 12;
    // Level 2 (0-based) has no earlier level of its season, so its season starts at level 14;
    // levels 30, 31 and 66 are missing, so the changes spanning them are sums of two.
    const missing = [2, 30, 31, 66];
    const series = w.map((v, t) => (missing.includes(t) ? Number.NaN : v));
    const design = trendDesign('stochastic', series, { ...seasonality, harmonics: 0, seasonalDifferencing: true });
    const likelihood = createProfileLikelihood(design.response, design.regressors, 1, 0, { seasonal: { period: 12, P: 1, Q: 1 }, ...designWorkspace(design) });
    const sets: number[][] = [];
    const values: number[] = [];
    for (let t = s; t < n; t++) {
      if (missing.includes(t)) continue;
      let previous = t - s;
      while (previous >= 0 && missing.includes(previous)) previous -= s;
      if (previous < 0) continue;
      // z at position j is w_{j+s} − w_j: the change since `previous` sums positions previous..t − s, step s.
      const positions: number[] = [];
      for (let j = previous; j <= t - s; j += s) positions.push(j);
      sets.push(positions);
      values.push(series[t] - series[previous]);
    }
    const dense = denseLoglik(sets, values, sets.map((set) => [s * set.length]), gamma, false);
    expect(sets).toHaveLength(n - s - 4);
    expectRelative(likelihood.atParameters(packFactors(factors)), dense, 1e-11);
  });
});

describe('harmonic regressors', () => {
  it('with s/2 pairs span the seasonal dummies, and describe a pattern that sums to zero', () => {
    const w = seasonalSeries(48, 3);
    const columns = harmonicColumns(12, 6, 0, 48);
    expect(columns).toHaveLength(11);
    expect(harmonicNames(4, 2)).toEqual(['cos1', 'sin1', 'cos2']);
    const ones = new Float64Array(48).fill(1);
    const dummies = Array.from({ length: 11 }, (_, month) => Float64Array.from({ length: 48 }, (_, t) => (t % 12 === month ? 1 : 0)));
    // Same column space, so the same fitted values (common practice: Fourier terms at K = s/2 are a reparametrisation of the dummies).
    const byHarmonics = ols(w, [ones, ...columns]);
    const byDummies = ols(w, [ones, ...dummies]);
    byHarmonics.residuals.forEach((value, t) => expect(Math.abs(value - byDummies.residuals[t])).toBeLessThan(1e-10));
    const pattern = seasonalPattern(12, 6, byHarmonics.coefficients.subarray(1));
    expect(Math.abs(pattern.reduce((a, b) => a + b, 0))).toBeLessThan(1e-10);
    // The pattern is each month's mean less the overall mean (balanced design, four of each month).
    const mean = w.reduce((a, b) => a + b, 0) / 48;
    pattern.forEach((value, month) => {
      const monthMean = [0, 1, 2, 3].reduce((sum, year) => sum + w[year * 12 + month], 0) / 4;
      expect(Math.abs(value - (monthMean - mean))).toBeLessThan(1e-10);
    });
  });

  it('are anchored to the calendar: a window that starts in March takes March\'s row', () => {
    expect(harmonicColumns(12, 1, 2, 3).map((column) => Array.from(column))).toEqual([
      [harmonicRow(12, 1, 2)[0], harmonicRow(12, 1, 3)[0], harmonicRow(12, 1, 4)[0]],
      [harmonicRow(12, 1, 2)[1], harmonicRow(12, 1, 3)[1], harmonicRow(12, 1, 4)[1]],
    ]);
    // cos(2π·2/12) = 1/2, sin(2π·2/12) = √3/2; at k = s/2 the cosine is (−1)^m exactly.
    expectRelative(harmonicRow(12, 1, 2)[0], 0.5, 1e-15);
    expectRelative(harmonicRow(12, 1, 2)[1], Math.sqrt(3) / 2, 1e-15);
    expect(harmonicRow(4, 2, 3)[2]).toBe(-1);
  });
});

describe('harmonic fits anchored to the calendar', () => {
  it('give a window that starts in April the pattern of the whole series, month by month', () => {
    // US accidental deaths (test/fixtures/seasonal-models/, R datasets::USAccDeaths), deterministic
    // trend with 5 harmonic pairs and AR(1) errors, fitted to 1973-01..1978-12 and to 1973-04..1978-12.
    const text = readFileSync(new URL('../fixtures/seasonal-models/us-accidental-deaths.csv', import.meta.url), 'utf8');
    const deaths = Float64Array.from(text.trim().split('\n').slice(1).map((line) => Number(line.split(',')[1])));
    const fit = (w: Float64Array, firstSeason: number) =>
      fitTrendModelAtOrder('deterministic', w, 1, 0, { estimation: 'ml', seasonal: { period: 12, firstSeason, harmonics: 5, P: 0, Q: 0, seasonalDifferencing: false } }).seasonal?.pattern ?? [];
    const whole = fit(deaths, 0);
    const fromApril = fit(deaths.subarray(3), 3);
    const misread = fit(deaths.subarray(3), 0);
    // The pattern's range is 3,150 deaths (measured); three months fewer moved each month's effect by 37, under 5% of it.
    const largest = (a: number[], b: number[]): number => Math.max(...a.map((v, m) => Math.abs(v - b[m])));
    expect(largest(whole, fromApril)).toBeLessThan(140);
    // Read as if it started in January, the same window's pattern comes out three months out of place.
    expect(largest(whole, misread)).toBeGreaterThan(1000);
  });
});

describe('admissibility of seasonal factors', () => {
  const order = (P: number, Q: number): SeasonalArmaOrder => ({ p: 1, q: 1, P, Q, period: 12 });
  const fit = (seasonalAr: number[], seasonalMa: number[], ar = [0.3], ma = [0.2]) => {
    const factors = { ar: f64(ar), ma: f64(ma), seasonalAr: f64(seasonalAr), seasonalMa: f64(seasonalMa) };
    const o = order(seasonalAr.length, seasonalMa.length);
    return { ...expandedCoefficients(factors, o), converged: true, order: o, factors };
  };

  it('judges a seasonal factor in B^s, as an AR(1) coefficient would be judged', () => {
    // Φ = 0.95: its expanded roots have modulus 0.95^(−1/12) = 1.0043, inside the 1.01 margin; Φ itself is not.
    expect(admissibility(fit([0.95], []), false)).toEqual({ admissible: true, reason: null });
    expect(admissibility(fit([0.995], []), false)).toEqual({ admissible: false, reason: 'ar-unit-root' });
    expect(admissibility(fit([], [-0.995]), false)).toEqual({ admissible: false, reason: 'ma-unit-root' });
  });

  it('a seasonal MA factor near 1 − B^s undoes the differencing in the stochastic model', () => {
    expect(admissibility(fit([], [-0.95]), true)).toEqual({ admissible: false, reason: 'undoes-differencing' });
    expect(admissibility(fit([], [-0.95]), false)).toEqual({ admissible: true, reason: null });
  });

  it('finds cancelling factors within and across lags', () => {
    expect(admissibility(fit([0.5], [-0.45]), false)).toEqual({ admissible: false, reason: 'cancelling-factors' });
    // A nonseasonal MA root at 0.95 (inverse) against the seasonal AR's twelfth roots of 0.55, whose real one is 0.9514.
    expect(admissibility(fit([0.55], [], [0.3], [-0.95]), false)).toEqual({ admissible: false, reason: 'cancelling-factors' });
    expect(admissibility(fit([0.55], [], [0.3], [-0.5]), false)).toEqual({ admissible: true, reason: null });
  });
});

describe('forecasts on seasonal differences', () => {
  it('of a seasonal random walk with drift: last year\'s level plus the drift, the variance growing by year', () => {
    // (1 − B^s) w = s·c + ε (no ARMA): w_{n+h} = w_{n+h−sm} + m·s·c with m = ⌈h/s⌉, Var = m·σ²
    // (exact algebra, common practice), plus the drift's share g'Var(ĉ)g with g = m·s.
    const s = 4;
    const w = Float64Array.from({ length: 40 }, (_, t) => 10 + 0.3 * t + [2, -1, 0.5, -1.5][t % s] + Math.sin(t));
    const design = trendDesign('stochastic', w, { period: s, firstSeason: 0, harmonics: 0, seasonalDifferencing: true });
    const filtered = filterDesign(design, [], []);
    const beta = [0.31];
    const covBeta = [0.0004];
    const sigma2 = 0.8;
    const moments = forecastDesign(design, { ar: [], ma: [], beta, covBeta, sigma2, ...filtered }, 10);
    for (let h = 1; h <= 10; h++) {
      const m = Math.ceil(h / s);
      const base = w[40 - s + ((h - 1) % s)];
      expectRelative(moments.mean[h - 1], base + m * s * beta[0], 1e-14);
      expectRelative(moments.seProcess[h - 1], Math.sqrt(m * sigma2), 1e-14);
      expectRelative(moments.seTotal[h - 1], Math.sqrt(m * sigma2 + (m * s) ** 2 * covBeta[0]), 1e-14);
    }
  });
});
