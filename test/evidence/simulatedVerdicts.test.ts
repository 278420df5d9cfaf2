// The trend verdict on simulated series, 200 replications each with a fixed seed, n = 200.
// Aim: the right verdict in at least 90% of replications. Measured here: 90.0% (180/200)
// deterministic for the trend-stationary AR(1), and 85.5% (171/200) stochastic for the random
// walk with drift, so the 90% aim is missed for the random walk and only just met for the AR(1).
// That is a property of the two tests at n = 200, not of this code: statsmodels 0.13.5 gives
// 91.0% and 79.2% over 10000 replications (test/fixtures/evidence/verdictRates.py). The
// assertions check that our rates agree with those reference rates and that the right
// verdict is the most frequent one. Slope and drift do not affect either test (both regress
// on a trend), so the processes have no free setting to tune.
import { describe, expect, it } from 'vitest';
import { adfTest } from '../../src/evidence/adfTest.js';
import { kpssTest } from '../../src/evidence/kpssTest.js';
import { trendVerdict } from '../../src/evidence/trendVerdict.js';
import type { TrendVerdictKind } from '../../src/evidence/types.js';
import { seededNormals } from './seededNormals.js';
import { randomWalkWithDrift, trendStationaryAr1 } from './simulatedSeries.js';

/** The conventional 5% level, the settings' built-in significance (common practice). */
const FIVE_PERCENT = 0.05;

const REPLICATIONS = 200;
const N = 200;

function verdictCounts(draw: () => Float64Array): Record<TrendVerdictKind, number> {
  const counts: Record<TrendVerdictKind, number> = { deterministic: 0, stochastic: 0, conflicting: 0, inconclusive: 0 };
  for (let r = 0; r < REPLICATIONS; r++) {
    const y = draw();
    counts[trendVerdict(kpssTest(y), adfTest(y), FIVE_PERCENT).verdict] += 1;
  }
  return counts;
}

/** Three standard errors of the difference between our rate and the reference Monte Carlo rate. */
function allowedGap(referenceRate: number, referenceReplications: number): number {
  const variance = referenceRate * (1 - referenceRate);
  return 3 * Math.sqrt(variance / REPLICATIONS + variance / referenceReplications);
}

function mostFrequent(counts: Record<TrendVerdictKind, number>): TrendVerdictKind {
  const kinds = Object.keys(counts) as TrendVerdictKind[];
  return kinds.reduce((best, kind) => (counts[kind] > counts[best] ? kind : best));
}

describe('trend verdict on simulated series (200 replications, n = 200)', () => {
  it('trend-stationary AR(1), phi = 0.5: deterministic as often as statsmodels finds', () => {
    const normal = seededNormals(1);
    const counts = verdictCounts(() => trendStationaryAr1(normal, N, { intercept: 10, slope: 0.05, phi: 0.5, sigma: 1 }));
    const rate = counts.deterministic / REPLICATIONS;
    expect(mostFrequent(counts)).toBe('deterministic');
    // statsmodels 0.13.5, 10000 replications (verdictRates.py): 0.9102.
    expect(Math.abs(rate - 0.9102)).toBeLessThanOrEqual(allowedGap(0.9102, 10000));
  });

  it('random walk with drift: stochastic as often as statsmodels finds', () => {
    const normal = seededNormals(2);
    const counts = verdictCounts(() => randomWalkWithDrift(normal, N, { start: 10, drift: 0.05, sigma: 1 }));
    const rate = counts.stochastic / REPLICATIONS;
    expect(mostFrequent(counts)).toBe('stochastic');
    // statsmodels 0.13.5, 10000 replications (verdictRates.py): 0.7918.
    expect(Math.abs(rate - 0.7918)).toBeLessThanOrEqual(allowedGap(0.7918, 10000));
  });
});
