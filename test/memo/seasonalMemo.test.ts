// A seasonal series through the whole analysis and into the memo's words: the seasonal plan in
// the record, each model's seasonal part, the seasonal evidence in the evidence section, and the
// seasonally adjusted and annual cases that keep no seasonal part. Data: UK gas consumption,
// quarterly 1960-Q1 to 1986-Q4 (R datasets::UKgas, test/fixtures/seasonal/README provenance in
// test/fixtures/README.md), on the log scale; Lake Huron, annual.
import { beforeAll, describe, expect, it } from 'vitest';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { evidenceView } from '../../src/memo/view/evidenceView.js';
import { modelView } from '../../src/memo/view/modelsView.js';
import { backtestView } from '../../src/memo/view/backtestView.js';
import { stabilityView } from '../../src/memo/view/stabilityView.js';
import { formatBacktest } from '../../src/cli/formatBacktest.js';
import { formatEvidence } from '../../src/cli/formatEvidence.js';
import { fitRecord } from '../support/runCli.js';

const UK_GAS = 'test/fixtures/seasonal/uk-gas.csv';

describe('a quarterly seasonal series', () => {
  let record: AnalysisRecord;
  beforeAll(async () => {
    record = await fitRecord(UK_GAS, ['--transform', 'log', '--max-p', '1', '--max-q', '1']);
  }, 60_000);

  it('plans a seasonal part from the data, with seasonal differences for the stochastic model', () => {
    // The Canova-Hansen test on the log differences rejects a stable pattern (p ≈ 4e-5; the
    // statistic checked against an independent numpy implementation in
    // test/fixtures/seasonal/canova-hansen-reference.json), so the seasonal differences follow.
    expect(record.seasonal).toEqual({ period: 4, setting: 'auto', applied: true, reason: null, seasonal_differences: true, differences_decided_by: 'evidence' });
    expect(record.evidence.seasonal?.unit_root?.seasonal_differencing).toBe(true);
    const stochastic = record.models.stochastic.seasonal;
    // Seasonal differences remove a fixed pattern, so that model has no harmonic pairs.
    expect(stochastic).toMatchObject({ period: 4, seasonal_differences: true, harmonics: 0 });
    expect(record.models.deterministic.seasonal).toMatchObject({ period: 4, seasonal_differences: false });
    expect(record.models.stochastic.equation.startsWith('(1 - B^4) w_t')).toBe(true);
  });

  it('says in the evidence section what the seasonal test found and how strong the pattern is', () => {
    const view = evidenceView(record);
    expect(view.seasonal?.heading).toBe('Seasonal pattern');
    expect(view.seasonal?.sentences.some((s) => s.includes('seasonal differencing'))).toBe(true);
    expect(view.seasonal?.sentences.some((s) => s.startsWith('The seasonal pattern is strong'))).toBe(true);
    // The pattern by quarter: the STL effects (STL checked against R's stl() in
    // test/evidence/stlDecomposition.test.ts), the first and last complete years of the data,
    // 1960 and 1986, and the deterministic model's fixed pattern where it has harmonics.
    const pattern = view.seasonal?.pattern;
    expect(pattern?.rows.map((row) => row.season)).toEqual(['Q1', 'Q2', 'Q3', 'Q4']);
    const hasFixed = (record.models.deterministic.seasonal?.harmonics ?? 0) > 0;
    expect(pattern?.columns).toEqual(['Average', '1960', '1986', ...(hasFixed ? ['Det. fixed pattern'] : [])]);
    expect(pattern?.rows[0].cells[0]).toBe(record.evidence.seasonal?.pattern?.mean_effect[0].toPrecision(3).replace('-', '\u2212'));
  });

  it('runs the trend-stability checks with each model\u2019s seasonal part and says so', () => {
    const stability = record.evidence.stability;
    if (stability === null) throw new Error(`no stability: ${JSON.stringify(record.evidence.unavailable)}`);
    expect(record.evidence.unavailable.map((entry) => entry.test)).not.toContain('stability');
    // The full-history window is the model itself (src/evidence/expandingWindows.ts).
    expect(stability.windows.deterministic.at(-1)?.slope).toBe(record.models.deterministic.coefficients.slope);
    expect(stability.windows.stochastic.at(-1)?.drift).toBe(record.models.stochastic.coefficients.drift);
    // On seasonal differences the drift's test runs on the changes over a year, and a regime of
    // τ of them reaches the levels up to position τ + 3: the break is dated in levels.
    const stochastic = stability.break_test.stochastic;
    expect(stochastic.method).toBe('sup-Wald for a break in the drift on the differences over a year, GLS-whitened, 15% trimming');
    expect(stochastic.break_index).toBeGreaterThanOrEqual(Math.ceil(0.15 * (108 - 4)) + 4);
    expect(stochastic.break_index).toBeLessThanOrEqual(Math.floor(0.85 * (108 - 4)) + 4);
    const view = stabilityView(stability, record.series.first, { deterministic: record.models.deterministic.seasonal, stochastic: record.models.stochastic.seasonal });
    expect(view.settings).toContain('with the ARMA orders and each model\u2019s seasonal part held at their full-history choice');
    expect(view.breaks[1].text).toContain('the drift (the average change per period, measured as the average change over a year divided by 4)');
    const harmonics = record.models.deterministic.seasonal?.harmonics ?? 0;
    expect(view.method.some((note) => note.startsWith('A model with a fixed seasonal pattern keeps it in the test'))).toBe(harmonics > 0);
    // The terminal's block says the same.
    const lines = formatEvidence(record);
    expect(lines.some((line) => /^ {2}Stochastic trend\s+\d/.test(line) && line.includes('drift (changes over a year)'))).toBe(true);
    const text = lines.join(' ').replace(/\s+/g, ' ');
    expect(text).toMatch(/Expanding windows \(\d+, from \d+ observations, seasonal parts kept\): .* per period \(the change over a year \/ 4\)\./);
  });

  it('describes each model\u2019s seasonal part beside its coefficients', () => {
    const stochastic = modelView(record, 'stochastic');
    expect(stochastic.notes.some((n) => n.startsWith('Seasonal part, chosen from the data with the order') && n.includes('same quarter a year earlier'))).toBe(true);
  });
});

describe('the backtest of a seasonal series in the memo', () => {
  it('names the seasonal naive as the benchmark and shows its scores', async () => {
    const record = await fitRecord(UK_GAS, ['--transform', 'log', '--backtest', '--max-p', '1', '--max-q', '1', '--origins', '4', '--backtest-horizon', '3']);
    const backtest = record.backtest;
    if (backtest === undefined || backtest === null) throw new Error('no backtest');
    // At least s = 4 origins so every quarter is forecast from (src/backtest/planOrigins.ts).
    expect(backtest.settings).toMatchObject({ benchmark: 'seasonal_naive', mase_scaling: 'seasonal_naive', period: 4 });
    const view = backtestView(backtest, 'quarterly', 1, 95);
    expect(view.benchmarkName).toBe('Seasonal naive');
    const seasonalRmse = backtest.per_horizon.seasonal_naive?.[0].rmse ?? Number.NaN;
    // The combined table's third RMSE column is the benchmark's.
    expect(Number(view.summary.rows[0].cells[2].replace('\u2212', '-'))).toBeCloseTo(seasonalRmse, 1);
    expect(view.summary.note).toContain('Bench.: the seasonal naive benchmark');
    expect(view.settings).toContain('their ARMA orders and seasonal parts chosen afresh by AICc.');
    // Four origins make two warm runs of two per model (src/backtest/runBacktest.ts), and the record says so.
    expect(backtest.notes.some((note) => note.startsWith("To save time, the origins' seasonal searches are grouped in runs of up to 2 consecutive origins"))).toBe(true);
    expect(formatBacktest(backtest).some((line) => line.includes('seasonal naive'))).toBe(true);
  }, 60_000);
});

describe('series that keep no seasonal part', () => {
  it('leaves it out for seasonal: none and says why', async () => {
    const record = await fitRecord(UK_GAS, ['--transform', 'log', '--max-p', '1', '--max-q', '1', '--seasonal', 'none']);
    expect(record.seasonal).toEqual({ period: 4, setting: 'none', applied: false, reason: null, seasonal_differences: null, differences_decided_by: null });
    expect(record.models.deterministic.seasonal).toBeNull();
    expect(record.evidence.seasonal).toBeUndefined();
    expect(evidenceView(record).seasonal?.sentences).toEqual([
      'The configuration says the series has no seasonal pattern to model (seasonally adjusted data), so neither model has a seasonal part.',
    ]);
  }, 60_000);

  it('has none for annual data and says nothing of seasons', async () => {
    const record = await fitRecord('test/fixtures/lake-huron.csv', ['--max-p', '1', '--max-q', '1']);
    expect(record.seasonal).toMatchObject({ period: 1, applied: false });
    expect(evidenceView(record).seasonal).toBeNull();
  }, 60_000);
});
