// The Nile flow series (test/fixtures/nile.csv, R datasets::Nile) has a well-documented drop
// in level around 1898-1899, when the first Aswan dam was begun (Cobb 1978, Biometrika 65;
// used throughout Durbin & Koopman 2012; the year is quoted from memory).
import { describe, expect, it } from 'vitest';
import { fitTrendModel } from '../../src/models/trendModels.js';
import { trendStability } from '../../src/evidence/trendStability.js';
import { readSeriesValues } from './referenceFixtures.js';

describe('break test on the Nile flow', () => {
  const w = Float64Array.from(readSeriesValues('nile'));
  const det = fitTrendModel('deterministic', w, 3, 3);
  const sto = fitTrendModel('stochastic', w, 3, 3);
  const stability = trendStability(w, { deterministic: det.fit, stochastic: sto.fit });

  it('finds the break in the trend line near 1899 and rejects stability at 5% with the REML errors', () => {
    const test = stability.break_test.deterministic;
    // break_index counts observations before the break; the series starts in 1871.
    const year = 1871 + test.break_index;
    expect(Math.abs(year - 1899)).toBeLessThanOrEqual(2);
    expect(test.reject['5']).toBe(true);
  });

  it('rejects at 1% with the exact-ML errors, whose smaller AR coefficient (0.37 against 0.40) makes the Wald statistic larger', () => {
    const ml = { deterministic: fitTrendModel('deterministic', w, 3, 3, { estimation: 'ml' }).fit, stochastic: fitTrendModel('stochastic', w, 3, 3, { estimation: 'ml' }).fit };
    const test = trendStability(w, ml).break_test.deterministic;
    expect(1871 + test.break_index).toBe(1899);
    expect(test.reject['1']).toBe(true);
  });

  it('ends the expanding windows at the full sample with its slope', () => {
    const last = stability.windows.deterministic[stability.windows.deterministic.length - 1];
    expect(last.end).toBe(100);
    expect(Math.abs(last.slope - det.coefficients.slope)).toBeLessThan(1e-6 * Math.abs(det.coefficients.slope));
  });
});
