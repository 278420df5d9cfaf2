// Residual checks against statsmodels 0.13.5 `ljung_box` on the residuals of the fits at the
// orders it selected (test/fixtures/<dataset>.json, keys `selected` and `ljung_box`: lags 10,
// df = lags − p − q), fitted at those orders here whether or not our search selects them.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { fitTrendModelAtOrder } from '../../src/models/trendModels.js';
import { residualChecks } from '../../src/evidence/residualChecks.js';
import { readSeriesValues, type ReferenceDataset } from './referenceFixtures.js';
import { expectRelative } from './expectRelative.js';

/** The conventional 5% level, the settings' built-in significance (common practice). */
const FIVE_PERCENT = 0.05;

interface LjungBoxReference {
  lags: number;
  model_df: number;
  stat: number;
  pvalue: number;
}

const FIXTURES = fileURLToPath(new URL('../fixtures/', import.meta.url));

describe.each(['lake-huron', 'nile', 'us-real-gdp'] as ReferenceDataset[])('Ljung-Box on the reference fits: %s', (dataset) => {
  const file = JSON.parse(readFileSync(`${FIXTURES}${dataset}.json`, 'utf8')) as {
    transform: string;
    selected: Record<'trend' | 'drift', { p: number; q: number }>;
    ljung_box: Record<'trend' | 'drift', LjungBoxReference>;
  };
  const values = readSeriesValues(dataset);
  const w = Float64Array.from(file.transform === 'log' ? values.map(Math.log) : values);
  it.each([
    ['deterministic', 'trend'],
    ['stochastic', 'drift'],
  ] as const)('%s model', (kind, refName) => {
    const model = fitTrendModelAtOrder(kind, w, file.selected[refName].p, file.selected[refName].q, { estimation: 'ml' });
    const checks = residualChecks(model.fit.residuals, model.fit.p, model.fit.q, FIVE_PERCENT);
    const reference = file.ljung_box[refName];
    expect(checks.ljung_box?.lags).toBe(reference.lags);
    expect(checks.ljung_box?.df).toBe(reference.lags - reference.model_df);
    // The two fits' parameters agree to ~1e-4, so Q agrees to a few parts in 1e4.
    expectRelative(checks.ljung_box?.stat ?? Number.NaN, reference.stat, 1e-3);
    expectRelative(checks.ljung_box?.p_value ?? Number.NaN, reference.pvalue, 1e-3);
    expect(checks.findings.find((f) => f.check === 'ljung_box')?.flagged).toBe(reference.pvalue < 0.05);
  });
});

describe('residual findings (common practice: a check that fails is flagged in words)', () => {
  it('flags autocorrelated residuals and passes white ones', () => {
    let state = 7;
    const uniform = (): number => {
      state = (state * 16807) % 2147483647;
      return state / 2147483647 - 0.5;
    };
    const white = Array.from({ length: 200 }, uniform);
    const smooth = white.map((_, t) => white.slice(Math.max(0, t - 4), t + 1).reduce((a, b) => a + b, 0));
    const flaggedWhite = residualChecks(white, 0, 0, FIVE_PERCENT).findings.find((f) => f.check === 'ljung_box');
    const flaggedSmooth = residualChecks(smooth, 0, 0, FIVE_PERCENT).findings.find((f) => f.check === 'ljung_box');
    expect(flaggedWhite?.flagged).toBe(false);
    expect(flaggedSmooth?.flagged).toBe(true);
    expect(flaggedSmooth?.text).toMatch(/still show a pattern/);
  });
});
