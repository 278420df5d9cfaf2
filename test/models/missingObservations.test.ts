// Missing observations: the filter skips the update at a gap (deterministic model) or sums
// the differences across it (stochastic model, gapFilter.ts). Checked against the exact
// Gaussian likelihood of the observed values computed directly from their covariance matrix
// (another route to the same number; common practice).
import { CholeskyDecomposition, Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { createProfileLikelihood } from '../../src/models/profileLikelihood.js';
import { fitTrendModel, forecastTrendModel, trendDesign } from '../../src/models/trendModels.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { seededNormals } from '../evidence/seededNormals.js';

/** ARMA(1,1) autocovariances for σ² = 1 from 4000 ψ-weights. */
function armaAutocovariance(phi: number, theta: number, maxLag: number): number[] {
  const psi = [1];
  for (let j = 1; j < 4000; j++) psi.push(j === 1 ? phi + theta : phi * psi[j - 1]);
  return Array.from({ length: maxLag + 1 }, (_, lag) => psi.slice(0, psi.length - lag).reduce((sum, v, j) => sum + v * psi[j + lag], 0));
}

/** Profile log-likelihood of z ~ N(Gβ, σ²Σ), β by GLS and σ² by ML, computed densely. */
function denseProfileLoglik(z: number[], design: number[][], sigma: Matrix): number {
  const m = z.length;
  const chol = new CholeskyDecomposition(sigma);
  const x = new Matrix(design);
  const y = Matrix.columnVector(z);
  const sx = chol.solve(x);
  const beta = solve(x.transpose().mmul(sx), x.transpose().mmul(chol.solve(y)));
  const resid = y.sub(x.mmul(beta));
  const quad = resid.transpose().mmul(chol.solve(resid)).get(0, 0);
  let logDet = 0;
  const lower = chol.lowerTriangularMatrix;
  for (let i = 0; i < m; i++) logDet += 2 * Math.log(lower.get(i, i));
  return -0.5 * m * (Math.log((2 * Math.PI * quad) / m) + 1) - 0.5 * logDet;
}

function simulate(n: number, seed: number): Float64Array {
  const draw = seededNormals(seed);
  const w = new Float64Array(n);
  let eta = 0;
  let shock = 0;
  for (let t = 0; t < n; t++) {
    const next = draw();
    eta = 0.5 * eta + next + 0.3 * shock;
    shock = next;
    w[t] = (t === 0 ? 10 : w[t - 1]) + 0.2 + eta;
  }
  return w;
}

const MISSING = [5, 6, 13, 21];

describe('stochastic trend with missing levels', () => {
  const complete = simulate(30, 41);
  const gappy = complete.map((v, t) => (MISSING.includes(t) ? Number.NaN : v));

  it('has the exact likelihood of the observed level changes', () => {
    const design = trendDesign('stochastic', gappy);
    const likelihood = createProfileLikelihood(design.response, design.regressors, 1, 1, { accumulateGaps: true });
    const loglik = likelihood.atCoefficients([0.5], [0.3], true);
    // Observed changes Δ = A d, d the 29 differences ~ ARMA(1,1); Cov(Δ) = A Γ A'.
    const gamma = armaAutocovariance(0.5, 0.3, 30);
    const rows: number[][] = [];
    const changes: number[] = [];
    const spans: number[][] = [];
    let last = 0;
    for (let t = 1; t < 30; t++) {
      if (MISSING.includes(t)) continue;
      rows.push(Array.from({ length: 29 }, (_, j) => (j >= last && j < t ? 1 : 0)));
      changes.push(complete[t] - complete[last]);
      spans.push([t - last]);
      last = t;
    }
    const a = new Matrix(rows);
    const gammaMatrix = new Matrix(29, 29);
    for (let i = 0; i < 29; i++) for (let j = 0; j < 29; j++) gammaMatrix.set(i, j, gamma[Math.abs(i - j)]);
    const direct = denseProfileLoglik(changes, spans, a.mmul(gammaMatrix).mmul(a.transpose()));
    expectRelative(loglik, direct, 1e-9);
  });

  it('equals the differenced model when nothing is missing', () => {
    const design = trendDesign('stochastic', complete);
    const gapForm = createProfileLikelihood(design.response, design.regressors, 1, 1, { accumulateGaps: true });
    const plain = createProfileLikelihood(design.response, design.regressors, 1, 1);
    expectRelative(gapForm.atCoefficients([0.5], [0.3]), plain.atCoefficients([0.5], [0.3]), 1e-12);
  });

  it('fits, selects and forecasts from the last level', () => {
    const model = fitTrendModel('stochastic', gappy, 1, 1);
    expect(model.fit.nobs).toBe(29 - MISSING.length);
    const moments = forecastTrendModel(model, 3);
    expect(Number.isFinite(moments.mean[0]) && Number.isFinite(moments.seTotal[2])).toBe(true);
    expect(model.fit.residuals.filter(Number.isNaN)).toHaveLength(MISSING.length);
  });
});

describe('deterministic trend with missing observations', () => {
  it('has the exact likelihood of the observed values', () => {
    const draw = seededNormals(43);
    const n = 30;
    let eta = 0;
    let shock = 0;
    const y = Float64Array.from({ length: n }, (_, t) => {
      const next = draw();
      eta = 0.5 * eta + next + 0.3 * shock;
      shock = next;
      return MISSING.includes(t) ? Number.NaN : 5 + 0.1 * (t + 1) + eta;
    });
    const design = trendDesign('deterministic', y);
    const likelihood = createProfileLikelihood(design.response, design.regressors, 1, 1);
    const loglik = likelihood.atCoefficients([0.5], [0.3], true);
    const observed = Array.from({ length: n }, (_, t) => t).filter((t) => !MISSING.includes(t));
    const gamma = armaAutocovariance(0.5, 0.3, n);
    const sigma = new Matrix(observed.length, observed.length);
    observed.forEach((s, i) => observed.forEach((t, j) => sigma.set(i, j, gamma[Math.abs(s - t)])));
    const direct = denseProfileLoglik(observed.map((t) => y[t]), observed.map((t) => [1, t + 1]), sigma);
    expectRelative(loglik, direct, 1e-9);
  });
});
