// Missing observations: the filter skips the update at a gap (deterministic model) or sums
// the differences across it (stochastic model, gapFilter.ts). Checked against the exact
// Gaussian likelihood of the observed values computed directly from their covariance matrix
// (another route to the same number; common practice).
import { Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { createProfileLikelihood } from '../../src/models/profileLikelihood.js';
import { fitTrendModel, forecastTrendModel, trendDesign } from '../../src/models/trendModels.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { seededNormals } from '../evidence/seededNormals.js';
import { armaAutocovariance, covarianceAtTimes, denseProfileLoglik } from '../support/denseLikelihood.js';

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
    const gamma = armaAutocovariance([0.5], [0.3], 30);
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
    const gammaMatrix = covarianceAtTimes(gamma, Array.from({ length: 29 }, (_, t) => t));
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
    const gamma = armaAutocovariance([0.5], [0.3], n);
    const sigma = covarianceAtTimes(gamma, observed);
    const direct = denseProfileLoglik(observed.map((t) => y[t]), observed.map((t) => [1, t + 1]), sigma);
    expectRelative(loglik, direct, 1e-9);
  });
});
