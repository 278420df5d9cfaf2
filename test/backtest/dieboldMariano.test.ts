import { describe, expect, it } from 'vitest';
import { dieboldMariano, hlnFactor } from '../../src/backtest/dieboldMariano.js';
import { comparisonReasons } from '../../src/backtest/messages.js';
import { expectRelative } from '../evidence/expectRelative.js';
import { scoreReference } from './scoreReference.js';

describe('hlnFactor', () => {
  it('is sqrt((n + 1 − 2h + h(h−1)/n)/n) (Harvey, Leybourne & Newbold 1997)', () => {
    // The three values given with the issue, from the formula.
    expectRelative(hlnFactor(20, 1), 0.9746794345, 1e-9);
    expectRelative(hlnFactor(20, 4), 0.8246211251, 1e-9);
    expectRelative(hlnFactor(100, 2), 0.9849873096, 1e-9);
  });
});

describe('dieboldMariano', () => {
  it('matches the scipy computation on persistent loss differences at h = 1, 2, 3', () => {
    // test/fixtures/backtest/scoreReference.json: numpy 1.24.2 and scipy 1.10.1 stats.t.sf.
    const { differences, tests } = scoreReference.diebold_mariano.persistent;
    for (const expected of tests) {
      const result = dieboldMariano(differences, expected.h);
      expect(result.reason).toBeNull();
      expectRelative(result.statistic ?? Number.NaN, expected.statistic ?? Number.NaN, 1e-12);
      expectRelative(result.pValue ?? Number.NaN, expected.p_value ?? Number.NaN, 1e-9);
    }
  });

  it('is not available, with its reason, when the long-run variance is not positive', () => {
    // Same file: the alternating sequence has a negative long-run variance at h = 2 and 3.
    const { differences, tests } = scoreReference.diebold_mariano.alternating;
    expectRelative(dieboldMariano(differences, 1).statistic ?? Number.NaN, tests[0].statistic ?? Number.NaN, 1e-12);
    for (const expected of tests.slice(1)) {
      expect(expected.long_run_variance).toBeLessThan(0);
      const result = dieboldMariano(differences, expected.h);
      expect(result).toMatchObject({ statistic: null, pValue: null, reason: comparisonReasons.varianceNotPositive });
    }
    // Identical losses: every difference 0, so the variance is 0 (common practice).
    expect(dieboldMariano([0, 0, 0, 0], 1).reason).toBe(comparisonReasons.varianceNotPositive);
  });

  it('is not available for one origin, more lags than origins, or a correction that is not positive', () => {
    expect(dieboldMariano([1.5], 1).reason).toBe(comparisonReasons.tooFewOrigins);
    expect(dieboldMariano([1, 2, 3], 4).reason).toBe(comparisonReasons.tooFewForLags);
    // n = 2, h = 2: n + 1 − 2h + h(h − 1)/n = 0.
    expect(dieboldMariano([1, 2], 2).reason).toBe(comparisonReasons.correctionNotPositive);
  });
});
