// The four readings of KPSS-trend against ADF-trend (common practice: opposite nulls, see
// Kwiatkowski et al. 1992, §1), on constructed p-values and on the reference datasets.
import { describe, expect, it } from 'vitest';
import { adfTest } from '../../src/evidence/adfTest.js';
import { kpssTest } from '../../src/evidence/kpssTest.js';
import { trendVerdict } from '../../src/evidence/trendVerdict.js';
import { readSeriesValues } from './referenceFixtures.js';

/** The conventional 5% level, the settings' built-in significance (common practice). */
const FIVE_PERCENT = 0.05;

const kpss = (p_value: number, p_bound?: 'below' | 'above') => ({ p_value, p_bound, regression: 'trend' as const });
const adf = (p_value: number) => ({ p_value, regression: 'trend' as const });

describe('trendVerdict', () => {
  it('deterministic when KPSS does not reject and ADF rejects', () => {
    const reading = trendVerdict(kpss(0.1, 'above'), adf(0.003), FIVE_PERCENT);
    expect(reading).toMatchObject({ verdict: 'deterministic', kpss_rejects: false, adf_rejects: true, significance: 0.05 });
    expect(reading.summary).toContain('p above 0.10');
    expect(reading.summary).toContain('p = 0.003');
    expect(reading.summary).toContain('5% level');
  });

  it('stochastic when KPSS rejects and ADF does not', () => {
    const reading = trendVerdict(kpss(0.01, 'below'), adf(0.389), FIVE_PERCENT);
    expect(reading).toMatchObject({ verdict: 'stochastic', kpss_rejects: true, adf_rejects: false });
    expect(reading.summary).toContain('p below 0.01');
    expect(reading.summary).toContain('p = 0.389');
  });

  it('conflicting when both reject', () => {
    const reading = trendVerdict(kpss(0.032), adf(0.0052), FIVE_PERCENT);
    expect(reading.verdict).toBe('conflicting');
    expect(reading.summary).toContain('p = 0.032');
  });

  it('inconclusive when neither rejects', () => {
    const reading = trendVerdict(kpss(0.068), adf(0.097), 0.05);
    expect(reading.verdict).toBe('inconclusive');
    expect(reading.summary).toContain('p = 0.068');
  });

  it('reads a p-value against the chosen significance level', () => {
    expect(trendVerdict(kpss(0.068), adf(0.097), 0.1).verdict).toBe('conflicting');
    expect(trendVerdict(kpss(0.02), adf(0.0005), 0.01)).toMatchObject({ verdict: 'deterministic' });
    expect(trendVerdict(kpss(0.02), adf(0.0005), 0.01).summary).toContain('p below 0.001');
    expect(trendVerdict(kpss(0.02), adf(0.0005), 0.025).summary).toContain('2.5% level');
  });

  it('refuses a level that KPSS Table 1 cannot decide, or the wrong regressions', () => {
    expect(() => trendVerdict(kpss(0.1, 'above'), adf(0.01), 0.2)).toThrow(
      'trendVerdict needs a significance level from 0.01 to 0.10',
    );
    expect(() => trendVerdict({ ...kpss(0.05), regression: 'level' }, adf(0.01), FIVE_PERCENT)).toThrow(
      "trendVerdict needs the KPSS test with regression 'trend'",
    );
    expect(() => trendVerdict(kpss(0.05), { p_value: 0.01, regression: 'constant' }, FIVE_PERCENT)).toThrow(
      "trendVerdict needs the ADF test with regression 'trend'",
    );
  });
});

describe('trendVerdict on the reference datasets (default tests)', () => {
  // p-values behind these verdicts are the statsmodels 0.13.5 values checked in
  // unitRootReference.test.ts: Lake Huron KPSS-trend auto p = 0.0321, ADF-trend AIC p = 0.0052;
  // log US real GDP KPSS-trend auto p = 0.0132, ADF-trend AIC p = 0.389.
  it('Lake Huron: both tests reject, so the reading is conflicting', () => {
    const y = readSeriesValues('lake-huron');
    expect(trendVerdict(kpssTest(y), adfTest(y), FIVE_PERCENT).verdict).toBe('conflicting');
  });

  it('log US real GDP: stochastic', () => {
    const y = readSeriesValues('us-real-gdp').map(Math.log);
    expect(trendVerdict(kpssTest(y), adfTest(y), FIVE_PERCENT).verdict).toBe('stochastic');
  });
});
