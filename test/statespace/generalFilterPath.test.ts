// The filter's general path, taken when the state dimension r = max(p, q + 1) exceeds the
// scalar fast path (AR order ≥ 5 or MA order ≥ 4): its Chandrasekhar recursion, its full
// covariance recursion and its column pass, checked for both trend models against the exact
// Gaussian likelihood computed densely from the ARMA autocovariance matrix (another route to
// the same number; common practice).
import { describe, expect, it } from 'vitest';
import { createProfileLikelihood } from '../../src/models/profileLikelihood.js';
import { trendDesign } from '../../src/models/trendModels.js';
import { SCALAR_STATE } from '../../src/statespace/filterRecursions.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { seededNormals } from '../evidence/seededNormals.js';
import { armaAutocovariance, covarianceAtTimes, denseProfileLoglik } from '../support/denseLikelihood.js';
import { type TrendModelKind } from '../../src/base/settings.js';

/** A real root ρ, or a complex pair of modulus `modulus` at angles ±`angle`. */
type Root = { real: number } | { modulus: number; angle: number };

/**
 * Coefficients c₁, c₂, … of Π (1 − z/ρ) over the roots: a lag polynomial with exactly these
 * roots, so stationarity and invertibility hold by construction.
 */
function lagPolynomial(roots: readonly Root[]): number[] {
  let poly = [1];
  for (const root of roots) {
    const factor = 'real' in root ? [1, -1 / root.real] : [1, (-2 * Math.cos(root.angle)) / root.modulus, 1 / root.modulus ** 2];
    const product = new Array<number>(poly.length + factor.length - 1).fill(0);
    poly.forEach((a, i) => factor.forEach((b, j) => (product[i + j] += a * b)));
    poly = product;
  }
  return poly.slice(1);
}

interface ArmaCase {
  p: number;
  q: number;
  ar: number[];
  ma: number[];
}

/** φ(z) = 1 − Σ φ_i z^i and θ(z) = 1 + Σ θ_j z^j with the given roots (moduli 1.25–2). */
function armaCase(arRoots: readonly Root[], maRoots: readonly Root[]): ArmaCase {
  const ar = lagPolynomial(arRoots).map((c) => -c);
  const ma = lagPolynomial(maRoots);
  return { p: ar.length, q: ma.length, ar, ma };
}

const CASES: readonly ArmaCase[] = [
  armaCase([{ real: 1.25 }, { modulus: 1.4, angle: 0.9 }, { modulus: 1.8, angle: 2.2 }], []),
  armaCase([{ real: 1.3 }], [{ modulus: 1.3, angle: 1.1 }, { modulus: 1.7, angle: 2.5 }]),
  armaCase(
    [{ modulus: 1.25, angle: 0.6 }, { modulus: 1.5, angle: 1.7 }, { real: 1.6 }, { real: -1.9 }],
    [{ modulus: 1.35, angle: 2.0 }, { real: -1.5 }, { real: 2 }],
  ),
];

/** n draws of η ~ ARMA(ar, ma) with N(0, 1) shocks, after a burn-in of 300. */
function simulateArma(ar: readonly number[], ma: readonly number[], n: number, seed: number): number[] {
  const draw = seededNormals(seed);
  const etas: number[] = [];
  const shocks: number[] = [];
  for (let t = 0; t < n + 300; t++) {
    const shock = draw();
    let eta = shock;
    ar.forEach((phi, i) => (eta += t > i ? phi * etas[t - 1 - i] : 0));
    ma.forEach((theta, j) => (eta += t > j ? theta * shocks[t - 1 - j] : 0));
    etas.push(eta);
    shocks.push(shock);
  }
  return etas.slice(300);
}

/** Levels from the model of `kind`: a line plus η, or a random walk with drift 0.2 driven by η. */
function simulateLevels(kind: TrendModelKind, arma: ArmaCase, n: number, seed: number): Float64Array {
  const eta = simulateArma(arma.ar, arma.ma, n, seed);
  if (kind === 'deterministic') return Float64Array.from(eta, (e, t) => 5 + 0.2 * (t + 1) + e);
  const levels = new Float64Array(n);
  for (let t = 0; t < n; t++) levels[t] = (t === 0 ? 10 : levels[t - 1] + 0.2) + eta[t];
  return levels;
}

/** The dense profile log-likelihood of the model's response (the levels or their changes). */
function denseLoglik(kind: TrendModelKind, levels: Float64Array, arma: ArmaCase): number {
  const design = trendDesign(kind, levels);
  const times = Array.from(design.response.keys()).filter((t) => !Number.isNaN(design.response[t]));
  const gamma = armaAutocovariance(arma.ar, arma.ma, design.response.length);
  const rows = times.map((t) => design.regressors.map((column) => column[t]));
  return denseProfileLoglik(times.map((t) => design.response[t]), rows, covarianceAtTimes(gamma, times));
}

const KINDS: readonly TrendModelKind[] = ['deterministic', 'stochastic'];

describe.each(KINDS)('%s trend, state dimension above the scalar fast path', (kind) => {
  it.each(CASES.map((arma, index) => ({ label: `ARMA(${arma.p},${arma.q})`, arma, seed: 71 + index })))(
    '$label: both filter routes give the dense likelihood',
    ({ arma, seed }) => {
      const levels = simulateLevels(kind, arma, 100, seed);
      const design = trendDesign(kind, levels);
      const likelihood = createProfileLikelihood(design.response, design.regressors, arma.p, arma.q);
      // r = max(p, q + 1) (Harvey 1989, §3.2) beyond the fast path, so the general path runs.
      expect(likelihood.workspace.r).toBeGreaterThan(SCALAR_STATE);
      // Another route to the same number (common practice): N(Xβ, σ²Γ) with Γ exact from
      // Brockwell & Davis (1991), §3.3, β by GLS and σ² = quadratic form / m.
      const dense = denseLoglik(kind, levels, arma);
      expectRelative(likelihood.atCoefficients(arma.ar, arma.ma), dense, 1e-12);
      expectRelative(likelihood.atCoefficients(arma.ar, arma.ma, true), dense, 1e-12);
    },
  );
});

describe('deterministic trend with missing observations, state dimension above four', () => {
  const MISSING = [17, 18, 40, 63];
  it.each(CASES.slice(0, 2).map((arma) => ({ label: `ARMA(${arma.p},${arma.q})`, arma })))(
    '$label: the filter gives the dense likelihood of the observed values',
    ({ arma }) => {
      const levels = simulateLevels('deterministic', arma, 90, 83).map((v, t) => (MISSING.includes(t) ? Number.NaN : v));
      const design = trendDesign('deterministic', levels);
      const likelihood = createProfileLikelihood(design.response, design.regressors, arma.p, arma.q);
      // r = max(p, q + 1) (Harvey 1989, §3.2) beyond the fast path, so the general path runs.
      expect(likelihood.workspace.r).toBeGreaterThan(SCALAR_STATE);
      // Another route to the same number (common practice): the observed values' N(Xβ, σ²Γ),
      // Γ exact from Brockwell & Davis (1991), §3.3, restricted to the observed times.
      expectRelative(likelihood.atCoefficients(arma.ar, arma.ma), denseLoglik('deterministic', levels, arma), 1e-12);
    },
  );
});

describe('exact ARMA autocovariances (Brockwell & Davis 1991, §3.3)', () => {
  it.each(CASES.map((arma) => ({ label: `ARMA(${arma.p},${arma.q})`, arma })))('$label: agree with the ψ-weight sums', ({ arma }) => {
    const exact = armaAutocovariance(arma.ar, arma.ma, 12);
    // Another route to the same numbers (Brockwell & Davis 1991, §3.3, first method):
    // γ(k) = Σ_j ψ_j ψ_{j+k}, the ψ-weights decaying like 1.25^{−j}, so 600 of them leave
    // a remainder far below double precision.
    const theta = [1, ...arma.ma];
    const psi: number[] = [];
    for (let j = 0; j < 600; j++) {
      let value = j < theta.length ? theta[j] : 0;
      arma.ar.forEach((phi, i) => (value += j > i ? phi * psi[j - 1 - i] : 0));
      psi.push(value);
    }
    exact.forEach((gamma, lag) => {
      let sum = 0;
      for (let j = 0; j + lag < psi.length; j++) sum += psi[j] * psi[j + lag];
      expectRelative(gamma, sum, 1e-12);
    });
  });
});
