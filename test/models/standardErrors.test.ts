// ARMA standard errors: from the observed information where the Hessian can be had, from the
// outer product of the scores where it cannot (src/models/standardErrors.ts). Lake Huron
// (test/fixtures/lake-huron.csv, R datasets::LakeHuron) on [1, t] with AR errors.
import { describe, expect, it } from 'vitest';
import { olsFit } from '../../src/models/fitRegressionArma.js';
import { createProfileLikelihood } from '../../src/models/profileLikelihood.js';
import { armaStandardErrors, observedInformationErrors, outerProductErrors } from '../../src/models/standardErrors.js';
import { fitTrendModelAtOrder, trendDesign } from '../../src/models/trendModels.js';
import { readSeriesValues } from '../evidence/referenceFixtures.js';

const lake = Float64Array.from(readSeriesValues('lake-huron'));

function likelihoodFor(p: number, q: number) {
  const design = trendDesign('deterministic', lake);
  return createProfileLikelihood(olsFit(design.response, design.regressors).residuals, design.regressors, p, q);
}

describe('armaStandardErrors', () => {
  it('uses the observed information at a regular optimum, and the outer product agrees with it there', () => {
    const model = fitTrendModelAtOrder('deterministic', lake, 2, 0, { estimation: 'ml' });
    expect(model.stderr.method).toBe('observed-information');
    const likelihood = likelihoodFor(2, 0);
    const hessian = observedInformationErrors(likelihood, model.fit.ar);
    const scores = outerProductErrors(likelihood, model.fit.ar);
    hessian.forEach((se, i) => expect(se).toBeCloseTo(model.stderr.ar[i], 12));
    // Both estimate the same information (Berndt, Hall, Hall & Hausman 1974): asymptotically
    // equal, and in a sample of 98 within a quarter of each other (common practice).
    scores.forEach((se, i) => expect(Math.abs(se / hessian[i] - 1)).toBeLessThan(0.25));
  });

  it('falls back to the outer product when a Hessian step leaves the stationary region', () => {
    // φ = 0.99995 with a step of 1e-4: φ + step is not stationary, so the second difference
    // cannot be formed; the scores take the step that stays inside.
    const result = armaStandardErrors(likelihoodFor(1, 0), Float64Array.of(0.99995));
    expect(result.method).toBe('outer-product');
    expect(result.values[0]).toBeGreaterThan(0);
  });

  it('reports no method without ARMA terms', () => {
    expect(armaStandardErrors(likelihoodFor(0, 0), new Float64Array(0))).toEqual({ values: new Float64Array(0), method: null });
  });
});
