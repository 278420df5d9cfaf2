// The adjoint gradient of the profile and restricted log-likelihoods (src/statespace/
// filterAdjoint.ts, profileLikelihood.ts) against central differences of the likelihood itself
// (the usual gradient check; common practice), on the Nottingham temperatures (monthly,
// test/fixtures/seasonal-models/, provenance in test/fixtures/README.md) with harmonic columns
// and seasonal factors, and on the Lake Huron levels without them, at points away from any
// optimum.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Estimation, TrendModelKind } from '../../src/base/settings.js';
import { olsFit } from '../../src/models/fitRegressionArma.js';
import { createProfileLikelihood } from '../../src/models/profileLikelihood.js';
import { trendDesign } from '../../src/models/trendDesign.js';

const text = readFileSync(new URL('../fixtures/seasonal-models/nottingham-temperature.csv', import.meta.url), 'utf8');
const w = Float64Array.from(text.trim().split('\n').slice(1), (line) => Number(line.split(',')[1]));

const CASES: [TrendModelKind, number, number, number, number, number, Estimation][] = [
  ['stochastic', 4, 3, 3, 1, 1, 'ml'],
  ['deterministic', 6, 1, 1, 1, 1, 'reml'],
  ['deterministic', 2, 2, 0, 1, 0, 'ml'],
  ['stochastic', 0, 1, 1, 0, 1, 'reml'],
  ['deterministic', 3, 2, 1, 0, 0, 'reml'],
];

describe('the adjoint gradient', () => {
  it.each(CASES)('%s model, %i harmonic pairs, (%i,%i)(%i,%i)12, %s: matches central differences', (kind, harmonics, p, q, P, Q, estimation) => {
    const design = trendDesign(kind, w, { period: 12, firstSeason: 0, harmonics, seasonalDifferencing: false });
    const likelihood = createProfileLikelihood(olsFit(design.response, design.regressors).residuals, design.regressors, p, q, { seasonal: { period: 12, P, Q }, estimation });
    const count = p + q + P + Q;
    const x = Float64Array.from({ length: count }, (_, i) => 0.3 * Math.sin(i + 1));
    likelihood.atUnconstrained(x);
    const gradient = new Float64Array(count);
    expect(likelihood.gradientAtUnconstrained(x, gradient)).toBe(true);
    for (let j = 0; j < count; j++) {
      const h = 1e-5;
      const up = Float64Array.from(x);
      const down = Float64Array.from(x);
      up[j] += h;
      down[j] -= h;
      const central = (likelihood.atUnconstrained(up) - likelihood.atUnconstrained(down)) / (2 * h);
      // Forward differences of the data-free part leave an error of order 1e-7 relative; central ones of the whole, 1e-10.
      expect(Math.abs(gradient[j] - central)).toBeLessThan(1e-5 * Math.max(1, Math.abs(central)));
    }
  });

  // The backward pass on scalars (state dimension ≤ 4, at most three columns), on the Lake Huron
  // levels (test/fixtures/lake-huron.csv, provenance in test/fixtures/README.md).
  const huron = Float64Array.from(readFileSync(new URL('../fixtures/lake-huron.csv', import.meta.url), 'utf8').trim().split('\n').slice(1), (line) => Number(line.split(',')[1]));
  const PLAIN: [TrendModelKind, number, number, Estimation][] = [
    ['deterministic', 1, 0, 'ml'],
    ['deterministic', 2, 1, 'reml'],
    ['deterministic', 3, 3, 'ml'],
    ['stochastic', 0, 2, 'ml'],
    ['stochastic', 1, 2, 'reml'],
    ['stochastic', 3, 0, 'ml'],
  ];
  it.each(PLAIN)('%s model on Lake Huron, (%i,%i), %s: the scalar pass matches central differences', (kind, p, q, estimation) => {
    const design = trendDesign(kind, huron);
    const likelihood = createProfileLikelihood(olsFit(design.response, design.regressors).residuals, design.regressors, p, q, { estimation });
    const x = Float64Array.from({ length: p + q }, (_, i) => 0.3 * Math.sin(i + 1));
    likelihood.atUnconstrained(x);
    const gradient = new Float64Array(p + q);
    expect(likelihood.gradientAtUnconstrained(x, gradient)).toBe(true);
    for (let j = 0; j < p + q; j++) {
      const up = Float64Array.from(x);
      const down = Float64Array.from(x);
      up[j] += 1e-5;
      down[j] -= 1e-5;
      const central = (likelihood.atUnconstrained(up) - likelihood.atUnconstrained(down)) / 2e-5;
      expect(Math.abs(gradient[j] - central)).toBeLessThan(1e-5 * Math.max(1, Math.abs(central)));
    }
  });

  it('declines where it does not apply: a series with missing values', () => {
    const gappy = huron.slice();
    gappy[40] = Number.NaN;
    const design = trendDesign('deterministic', gappy);
    const likelihood = createProfileLikelihood(olsFit(design.response, design.regressors).residuals, design.regressors, 1, 1);
    const x = Float64Array.from([0.2, -0.1]);
    likelihood.atUnconstrained(x);
    expect(likelihood.gradientAtUnconstrained(x, new Float64Array(2))).toBe(false);
  });

  // The gain recursion's adjoint reads the per-time states the generic run keeps (state
  // dimension above four); a run of the full covariance recursion in between leaves them stale,
  // and the gradient must not read them then.
  it.each([
    ['seasonal, state dimension 14', 12, 1, 1, 1, 1],
    ['plain, state dimension 4', 1, 3, 2, 0, 0],
  ])('reads the gain states of the run it differentiates, whatever ran in between: %s', (_label, period, p, q, P, Q) => {
    const series = period === 12 ? w : huron;
    const design = period === 12 ? trendDesign('deterministic', series, { period: 12, firstSeason: 0, harmonics: 1, seasonalDifferencing: false }) : trendDesign('deterministic', series);
    const likelihood = createProfileLikelihood(olsFit(design.response, design.regressors).residuals, design.regressors, p, q, P + Q > 0 ? { seasonal: { period, P, Q } } : {});
    const count = p + q + P + Q;
    const x = Float64Array.from({ length: count }, (_, i) => 0.3 * Math.sin(i + 1));
    const elsewhere = Float64Array.from({ length: count }, (_, i) => -0.2 * Math.cos(i + 1));
    const direct = new Float64Array(count);
    likelihood.atUnconstrained(x);
    expect(likelihood.gradientAtUnconstrained(x, direct)).toBe(true);
    likelihood.atUnconstrained(elsewhere);
    const { ar, ma } = likelihood.coefficientsOf(x);
    likelihood.atCoefficients(ar, ma, true);
    expect(likelihood.workspace.gainStates?.current ?? false).toBe(false);
    const again = new Float64Array(count);
    expect(likelihood.gradientAtUnconstrained(x, again)).toBe(true);
    expect(Array.from(again)).toEqual(Array.from(direct));
  });

  // After the scalar run (state dimension ≤ 4) the generic run records the gain states; its sums
  // round differently, so on the convergence threshold it could settle a step apart from the run.
  // The gradient then declines (BFGS differences the likelihood) rather than read states that do
  // not reach the run's steady point. The mismatch is made here by moving the run's steady point.
  it('declines when the recorded gain states settle at another step than the run', () => {
    const design = trendDesign('deterministic', huron);
    const likelihood = createProfileLikelihood(olsFit(design.response, design.regressors).residuals, design.regressors, 1, 2);
    const x = Float64Array.from([0.4, 0.2, -0.1]);
    likelihood.atUnconstrained(x);
    const { workspace } = likelihood;
    expect(workspace.steadyFrom).toBeLessThan(workspace.n);
    workspace.steadyFrom += 1;
    expect(likelihood.gradientAtUnconstrained(x, new Float64Array(3))).toBe(false);
    expect(workspace.gainStates?.current).toBe(false);
  });
});
