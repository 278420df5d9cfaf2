// Facts about the two trend models that hold exactly, a published worked example, and
// checks of the filter against a direct computation by another route.
import { describe, expect, it } from 'vitest';
import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { fitRegressionArma } from '../../src/models/fitRegressionArma.js';
import { fitTrendModelAtOrder, forecastTrendModel } from '../../src/models/trendModels.js';
import { createProfileLikelihood } from '../../src/models/profileLikelihood.js';
import { firstColumnScratchSize, stationaryFirstColumn, toStateSpace } from '../../src/statespace/armaStateSpace.js';
import { constrainAr, constrainMa, unconstrainAr, unconstrainMa, isStationary } from '../../src/models/constraints.js';
import { smallestMaRootModulus, smallestRootModulus } from '../../src/linalg/rootModulus.js';
import { readSeriesValues } from '../evidence/referenceFixtures.js';
import { seededNormals } from '../evidence/seededNormals.js';
import { simulateTrendArma as simulate } from '../support/simulateTrendArma.js';
import { expectRelative } from '../evidence/expectRelative.js';

describe('Brockwell & Davis (2016), Example 6.6.2, Table 6.3: Lake Huron, trend + AR(2)', () => {
  it('reproduces the published GLS estimates', () => {
    const level = Float64Array.from(readSeriesValues('lake-huron'), (v) => v - 570);
    const n = level.length;
    const fit = fitRegressionArma(level, [new Float64Array(n).fill(1), Float64Array.from({ length: n }, (_, i) => i + 1)], 2, 0);
    // Published to the digits shown: β = (10.091, −0.0216), φ = (1.005, −0.291).
    expect(fit.beta[0]).toBeCloseTo(10.091, 2);
    expect(fit.beta[1]).toBeCloseTo(-0.0216, 3);
    expect(fit.ar[0]).toBeCloseTo(1.005, 2);
    expect(fit.ar[1]).toBeCloseTo(-0.291, 2);
    // σ² = 0.4571 in the book; exact ML gives 0.4566 (shared reference README), loglik −101.198.
    expectRelative(fit.sigma2, 0.4566, 5e-4);
    expectRelative(fit.loglik, -101.198, 1e-5);
  });
});

describe('random walk with drift, p = q = 0 (textbook algebra, e.g. Hamilton 1994 ch. 15)', () => {
  const draw = seededNormals(11);
  const y = new Float64Array(60);
  y[0] = 100;
  for (let t = 1; t < y.length; t++) y[t] = y[t - 1] + 0.4 + 1.5 * draw();
  const model = fitTrendModelAtOrder('stochastic', y, 0, 0);

  it('estimates the drift as (y_n − y_1)/(n − 1)', () => {
    expectRelative(model.coefficients.drift, (y[59] - y[0]) / 59, 1e-12);
  });

  it('has se_process = σ√h and level forecasts y_n + h·drift', () => {
    const moments = forecastTrendModel(model, 12);
    const sigma = Math.sqrt(model.fit.sigma2);
    for (let h = 1; h <= 12; h++) {
      expectRelative(moments.seProcess[h - 1], sigma * Math.sqrt(h), 1e-12);
      expectRelative(moments.mean[h - 1], y[59] + h * model.coefficients.drift, 1e-12);
    }
  });

  it('adds h²·Var(drift) for coefficient uncertainty', () => {
    const moments = forecastTrendModel(model, 5);
    const driftVariance = model.stderr.regression.drift ** 2;
    for (let h = 1; h <= 5; h++) {
      expectRelative(moments.seTotal[h - 1] ** 2, moments.seProcess[h - 1] ** 2 + h * h * driftVariance, 1e-10);
    }
  });
});

describe('deterministic trend with AR(1) errors (textbook algebra)', () => {
  const y = simulate({ n: 150, seed: 5, phi: 0.7, theta: 0 });
  const model = fitTrendModelAtOrder('deterministic', y, 1, 0);
  const phi = model.fit.ar[0];

  it('has se_process² = σ²(1 − φ^{2h})/(1 − φ²)', () => {
    const moments = forecastTrendModel(model, 20);
    for (let h = 1; h <= 20; h++) {
      const expected = (model.fit.sigma2 * (1 - phi ** (2 * h))) / (1 - phi * phi);
      expectRelative(moments.seProcess[h - 1] ** 2, expected, 1e-10);
    }
  });

  it('keeps the deterministic se bounded while the stochastic one grows like √h', () => {
    const deterministic = forecastTrendModel(model, 400);
    const bound = Math.sqrt(model.fit.sigma2 / (1 - phi * phi));
    expect(deterministic.seProcess[399]).toBeLessThanOrEqual(bound * (1 + 1e-12));
    expectRelative(deterministic.seProcess[399], bound, 1e-9);
    const stochastic = forecastTrendModel(fitTrendModelAtOrder('stochastic', y, 1, 0), 400);
    // For ARIMA(1,1,0), se_h/√h → σ/(1 − φ) (common practice: the long-run variance).
    const ratio = (h: number): number => stochastic.seProcess[h - 1] / Math.sqrt(h);
    expect(Math.abs(ratio(400) - ratio(200)) / ratio(400)).toBeLessThan(0.02);
    expect(stochastic.seProcess[399] / deterministic.seProcess[399]).toBeGreaterThan(5);
  });
});

describe('the filter against a direct Gaussian likelihood (common practice)', () => {
  it('equals the log-density of N(Xβ, σ²Γ) with Γ from truncated ψ-weights', () => {
    const n = 40;
    const y = simulate({ n, seed: 17, phi: 0.5, theta: 0.4 });
    const ar = [0.5];
    const ma = [0.4];
    const x = [new Float64Array(n).fill(1), Float64Array.from({ length: n }, (_, i) => i + 1)];
    const likelihood = createProfileLikelihood(y, x, 1, 1);
    const loglik = likelihood.atCoefficients(ar, ma);
    const beta = Array.from(likelihood.workspace.gramRhs);
    // Autocovariances from 5000 ψ-weights (ψ_j = (φ + θ)φ^{j−1}), then the dense density.
    const psi = [1];
    for (let j = 1; j < 5000; j++) psi.push(j === 1 ? ar[0] + ma[0] : ar[0] * psi[j - 1]);
    const gamma = (lag: number): number => psi.slice(0, psi.length - lag).reduce((sum, v, j) => sum + v * psi[j + lag], 0);
    const resid = Array.from(y, (v, t) => v - beta[0] - beta[1] * (t + 1));
    const cov = new Matrix(n, n);
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) cov.set(i, j, gamma(Math.abs(i - j)));
    const chol = new CholeskyDecomposition(cov);
    const solved = chol.solve(Matrix.columnVector(resid));
    const quad = resid.reduce((sum, v, i) => sum + v * solved.get(i, 0), 0);
    const sigma2 = quad / n;
    let logDet = 0;
    const lower = chol.lowerTriangularMatrix;
    for (let i = 0; i < n; i++) logDet += 2 * Math.log(lower.get(i, i));
    const direct = -0.5 * n * Math.log(2 * Math.PI * sigma2) - 0.5 * logDet - 0.5 * n;
    expectRelative(loglik, direct, 1e-10);
  });

  it('solves the Lyapunov equation: P = Σ_j T^j R R′ T′^j', () => {
    const space = toStateSpace([0.6, -0.2, 0.1], [0.5, 0.3]);
    const r = space.r;
    let term = Matrix.columnVector(Array.from(space.rvec)).mmul(Matrix.rowVector(Array.from(space.rvec)));
    const t = Matrix.zeros(r, r);
    for (let i = 0; i < r; i++) {
      t.set(i, 0, space.phi[i]);
      if (i + 1 < r) t.set(i, i + 1, 1);
    }
    let sum = Matrix.zeros(r, r);
    for (let j = 0; j < 400; j++) {
      sum = sum.add(term);
      term = t.mmul(term).mmul(t.transpose());
    }
    for (let i = 0; i < r * r; i++) expectRelative(space.p0[i], sum.get(Math.floor(i / r), i % r), 1e-10);
  });
});

describe('simulated ARMA series (seeded)', () => {
  const y = simulate({ n: 2000, seed: 3, phi: 0.6, theta: 0.3 });
  const x = [new Float64Array(2000).fill(1), Float64Array.from({ length: 2000 }, (_, i) => i + 1)];
  const fit = fitRegressionArma(y, x, 1, 1);

  it('estimates near the truth on a long series', () => {
    // Tolerances ≈ 3 asymptotic standard errors at n = 2000 (common practice).
    expect(Math.abs(fit.ar[0] - 0.6)).toBeLessThan(0.07);
    expect(Math.abs(fit.ma[0] - 0.3)).toBeLessThan(0.08);
    expect(Math.abs(fit.beta[1] - 0.2)).toBeLessThan(0.005);
    expect(Math.abs(fit.sigma2 - 1)).toBeLessThan(0.1);
    expect(fit.converged).toBe(true);
  });

  it('reaches a log-likelihood at least that at the true parameters', () => {
    const likelihood = createProfileLikelihood(y, x, 1, 1);
    expect(fit.loglik).toBeGreaterThanOrEqual(likelihood.atCoefficients([0.6], [0.3]));
  });
});

describe('partial-autocorrelation map (Jones 1980; Monahan 1984)', () => {
  it('maps any real vector to a stationary AR and an invertible MA, and back', () => {
    const draw = seededNormals(21);
    for (let trial = 0; trial < 200; trial++) {
      const order = 1 + (trial % 4);
      const x = Float64Array.from({ length: order }, () => 2 * draw());
      const ar = new Float64Array(order);
      const ma = new Float64Array(order);
      const work = new Float64Array(order);
      constrainAr(x, 0, order, ar, work);
      constrainMa(x, 0, order, ma, work);
      expect(isStationary(ar)).toBe(true);
      const backAr = unconstrainAr(ar);
      const backMa = unconstrainMa(ma);
      if (backAr === undefined || backMa === undefined) throw new Error('round trip left the region');
      for (let i = 0; i < order; i++) {
        expect(Math.abs(backAr[i] - x[i])).toBeLessThan(1e-8 * Math.max(1, Math.abs(x[i]) ** 3));
        expect(Math.abs(backMa[i] - x[i])).toBeLessThan(1e-8 * Math.max(1, Math.abs(x[i]) ** 3));
      }
    }
  });

  it('rejects a non-stationary polynomial (common practice: 1 − 1.2B has its root inside the circle)', () => {
    expect(isStationary([1.2])).toBe(false);
    expect(isStationary([0.5, 0.6])).toBe(false);
    expect(isStationary([0.5, 0.3])).toBe(true);
  });
});

describe('root moduli (common practice: roots of 1 − φz are 1/φ)', () => {
  it('finds the smallest root modulus of AR and MA polynomials', () => {
    expectRelative(smallestRootModulus([0.5]) ?? 0, 2, 1e-12);
    // 1 − 0.5z − 0.06z² = (1 − 0.6z)(1 + 0.1z): roots 1/0.6 and −10.
    expectRelative(smallestRootModulus([0.5, 0.06]) ?? 0, 1 / 0.6, 1e-10);
    // 1 + 0.25z²: roots ±2i.
    expectRelative(smallestMaRootModulus([0, 0.25]) ?? 0, 2, 1e-10);
    expect(smallestRootModulus([])).toBeNull();
  });
});

describe('first column of the stationary covariance (Brockwell & Davis 1991, §3.3)', () => {
  it('equals the first column of the full Lyapunov solution', () => {
    const cases: [number[], number[]][] = [
      [[0.6, -0.2, 0.1], [0.5, 0.3]],
      [[], [0.4, 0.2, 0.1]],
      [[0.3, 0.2], [0.5, -0.3, 0.2]],
      [[0.9], [0.5]],
    ];
    for (const [ar, ma] of cases) {
      const space = toStateSpace(ar, ma);
      const out = new Float64Array(space.r * space.r);
      expect(stationaryFirstColumn(space.phi, space.rvec, ar.length, space.r, out, new Float64Array(firstColumnScratchSize(ar.length, space.r)))).toBe(true);
      for (let i = 0; i < space.r; i++) expectRelative(out[i * space.r], space.p0[i * space.r], 1e-12);
    }
  });
});
