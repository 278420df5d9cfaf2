// Log and Box-Cox transforms (Box & Cox 1964): w = (y^λ − 1)/λ, λ ≠ 0, and log y at λ = 0.
// Reference values from scipy in test/fixtures/transforms/ (provenance in test/fixtures/README.md).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { biasAdjustedMean, inverseTransform, transformValue } from '../../src/base/transform.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { type Transform } from '../../src/base/settings.js';

interface TransformReference {
  lognormal: { mu: number; sigma: number; mean: number; ppf: Record<string, number> }[];
  box_cox_mean: { lambda: number; mu: number; sigma: number; mean: number }[];
}

const REFERENCE = JSON.parse(
  readFileSync(new URL('../fixtures/transforms/transformReference.json', import.meta.url), 'utf8'),
) as TransformReference;

/** Standard normal quantiles Φ⁻¹(p): scipy 1.10.1 `scipy.stats.norm.ppf`. */
const Z: Record<string, number> = {
  '0.025': -1.959963984540054,
  '0.1': -1.2815515655446004,
  '0.9': 1.2815515655446004,
  '0.975': 1.959963984540054,
};

const LOG: Transform = { kind: 'log' };
const boxCox = (lambda: number): Transform => ({ kind: 'box-cox', lambda });
const LAMBDAS = [-1, -0.5, 0.25, 0.5, 1, 2];

describe('forward and inverse transforms', () => {
  it.each([LOG, ...LAMBDAS.map(boxCox)])('round-trips y → w → y for %o', (spec) => {
    for (const y of [0.01, 0.5, 1, 7.3, 1234.5]) {
      expectRelative(inverseTransform(spec, transformValue(spec, y)), y, 1e-12);
    }
  });

  it('matches the definition at hand-computed points', () => {
    // (y^λ − 1)/λ by hand (Box & Cox 1964, eq. 1).
    expect(transformValue(boxCox(0.5), 4)).toBe(2);
    expect(transformValue(boxCox(2), 3)).toBe(4);
    expect(transformValue(boxCox(-1), 2)).toBe(0.5);
    expect(transformValue(boxCox(1), 5)).toBe(4);
    expect(transformValue(boxCox(0), 10)).toBe(Math.log(10));
    expect(transformValue({ kind: 'none' }, 10)).toBe(10);
  });

  it('approaches log y as λ → 0, with the first-order term λ(log y)²/2', () => {
    // (y^λ − 1)/λ = log y + λ(log y)²/2 + O(λ²) (Taylor expansion of e^{λ log y}, common practice).
    for (const y of [0.2, 3, 50]) {
      const log = Math.log(y);
      for (const lambda of [1e-3, 1e-4, -1e-4]) {
        // The next term, λ²(log y)³/6, is below 2e-3 of the first-order term at these λ and y.
        expectRelative(transformValue(boxCox(lambda), y) - log, (lambda * log * log) / 2, 2e-3);
        expectRelative(inverseTransform(boxCox(lambda), log), y, Math.abs(lambda) * log * log);
      }
    }
  });

  it('returns 0 for the inverse below the image of a positive λ', () => {
    // For λ > 0 the image of (0, ∞) is w > −1/λ, and y → 0 as w → −1/λ (Box & Cox 1964).
    expect(inverseTransform(boxCox(0.5), -2)).toBe(0);
    expect(inverseTransform(boxCox(0.5), -2.1)).toBe(0);
    expect(inverseTransform(boxCox(2), -0.75)).toBe(0);
    expect(inverseTransform(boxCox(1), -40)).toBe(0);
    expectRelative(inverseTransform(boxCox(0.5), -1.999), 2.5e-7, 1e-9);
  });

  it('returns +∞ for the inverse above the image of a negative λ', () => {
    // For λ < 0 the image of (0, ∞) is w < 1/|λ|, and y → ∞ as w → 1/|λ| (Box & Cox 1964).
    expect(inverseTransform(boxCox(-0.5), 2.01)).toBe(Number.POSITIVE_INFINITY);
    expectRelative(inverseTransform(boxCox(-0.5), 1.9999), 4.0e8, 1e-3);
  });
});

describe('back-transformed forecasts', () => {
  it.each(REFERENCE.lognormal)('log: point mean and quantiles of the log-normal, μ = $mu, σ = $sigma', ({ mu, sigma, mean, ppf }) => {
    // Log-normal mean exp(μ + σ²/2) (common practice) against scipy's lognorm.mean.
    expectRelative(biasAdjustedMean(LOG, mu, sigma), mean, 1e-13);
    expectRelative(biasAdjustedMean(LOG, mu, sigma), Math.exp(mu + (sigma * sigma) / 2), 1e-15);
    // Quantiles map through a monotone transform: exp(μ + zσ) is the lognorm.ppf quantile.
    for (const [p, quantile] of Object.entries(ppf)) expectRelative(inverseTransform(LOG, mu + Z[p] * sigma), quantile, 1e-13);
  });

  // For λ = 1/2 the inverse (1 + w/2)² is quadratic, so the second-order expansion
  // g(μ) + g''(μ)σ²/2 is the exact mean; the reference integral also counts the region
  // w < −2 where the inverse is 0, whose mass is below 1e-24 at these μ, σ (more than 10σ away).
  // What is left is quad's own error (≤ 1e-12 relative), hence 1e-11.
  it.each(REFERENCE.box_cox_mean.filter((row) => row.lambda === 0.5))(
    'Box-Cox λ = 0.5: bias-adjusted mean equals the integral, μ = $mu, σ = $sigma',
    ({ lambda, mu, sigma, mean }) => {
      expectRelative(biasAdjustedMean(boxCox(lambda), mu, sigma), mean, 1e-11);
    },
  );

  // For λ = 1/4 the inverse (1 + w/4)⁴ is quartic: the second-order mean misses exactly the
  // fourth-order term g''''σ⁴·E[(W − μ)⁴]/(4!σ⁴) = (1·¾·½·¼)·3σ⁴/24 = 0.01171875σ⁴.
  it.each(REFERENCE.box_cox_mean.filter((row) => row.lambda === 0.25))(
    'Box-Cox λ = 0.25: the mean is second-order accurate, missing only the σ⁴ term, μ = $mu, σ = $sigma',
    ({ lambda, mu, sigma, mean }) => {
      const approximation = biasAdjustedMean(boxCox(lambda), mu, sigma);
      expectRelative(mean - approximation, 0.01171875 * sigma ** 4, 1e-9);
    },
  );

  it.each([LOG, boxCox(0.25), boxCox(0.5), boxCox(1), boxCox(2)])('keeps interval quantiles in order for %o', (spec) => {
    // From −0.45, inside the image w > −1/λ of every λ here (the largest is 2).
    const w = Array.from({ length: 401 }, (_, i) => -0.45 + i * 0.05);
    const y = w.map((value) => inverseTransform(spec, value));
    // Monotone increasing on the image, so lower and upper quantiles stay lower and upper (common practice).
    for (let i = 1; i < y.length; i++) expect(y[i]).toBeGreaterThan(y[i - 1]);
  });

  it('leaves the point as the model-scale mean without a transform', () => {
    expect(biasAdjustedMean({ kind: 'none' }, 12.5, 3)).toBe(12.5);
    expect(inverseTransform({ kind: 'none' }, -4)).toBe(-4);
  });
});
