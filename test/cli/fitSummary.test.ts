// The terminal summary of `fit` on Lake Huron (test/fixtures/lake-huron.csv, R 4.2.2
// datasets::LakeHuron): the memo's labels, the estimates and unit-root statistics against the
// statsmodels 0.13.5 reference fits in test/fixtures/lake-huron.json (provenance in
// test/fixtures/README.md) at the precision the layout prints, p-values as "< 0.01", coverage
// as percentages, and the legend of a missing standard error. The layout itself (labels,
// decimals, legends) is our spec: src/cli/formatSummary.ts and src/memo/wording.ts.
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { formatSummary } from '../../src/cli/formatSummary.js';
import { COEFFICIENT_NAME, FIT_FIGURE_NAME } from '../../src/memo/wording.js';
import { fitRecord, QUICK_BACKTEST, runCli } from '../support/runCli.js';

const SERIES = 'test/fixtures/lake-huron.csv';

interface ReferenceFit {
  p: number;
  q: number;
  loglik: number;
  aicc: number;
  params: { ar: number[]; ma: number[]; sigma2: number; intercept?: number; slope?: number; drift?: number };
}
interface Reference {
  fits: { trend: ReferenceFit[]; drift: ReferenceFit[] };
  ljung_box: { trend: { lags: number; model_df: number; stat: number; pvalue: number } };
  unit_root_tests: Record<string, { stat: number; lags: number; pvalue?: number }>;
}
const ref = JSON.parse(readFileSync(new URL('../fixtures/lake-huron.json', import.meta.url), 'utf8')) as Reference;
const fitAt = (model: 'trend' | 'drift', p: number, q: number): ReferenceFit => {
  const found = ref.fits[model].find((fit) => fit.p === p && fit.q === q);
  if (found === undefined) throw new Error(`no reference fit ${model} (${p}, ${q})`);
  return found;
};

/** The cells of the line starting with `label` (after its indent), split at runs of two or more spaces. */
function cellsOf(text: string, label: string): string[] {
  const line = text.split('\n').find((l) => l.trimStart().startsWith(label) && /^\s{2,}\S/.test(l.trimStart().slice(label.length)));
  if (line === undefined) throw new Error(`no line starting ${label}`);
  return line.trim().slice(label.length).trim().split(/\s{2,}/);
}

describe('fit summary, Lake Huron, exact ML', () => {
  let text: string;
  let record: AnalysisRecord;
  beforeAll(async () => {
    // Exact ML, as the reference library fits.
    const run = await runCli(['fit', SERIES, '--estimation', 'ml']);
    expect([run.code, run.stderr]).toEqual([0, '']);
    text = run.stdout;
    record = await fitRecord(SERIES, ['--estimation', 'ml']);
  });

  it('names coefficients and fit figures as the memo does, with the reference estimates', () => {
    // Deterministic trend (1, 1): lake-huron.json fits.trend; stochastic (0, 3), our search's choice (cli.test.ts): fits.drift.
    const det = fitAt('trend', 1, 1);
    const sto = fitAt('drift', 0, 3);
    expect([record.models.deterministic.p, record.models.deterministic.q, record.models.stochastic.p, record.models.stochastic.q]).toEqual([1, 1, 0, 3]);
    // Estimates to the decimals that show their standard error to three significant digits.
    expect(cellsOf(text, COEFFICIENT_NAME.intercept)[0]).toBe((det.params.intercept ?? NaN).toFixed(3));
    expect(cellsOf(text, COEFFICIENT_NAME.slope)[0]).toBe((det.params.slope ?? NaN).toFixed(5));
    expect(cellsOf(text, COEFFICIENT_NAME.ar(1))[0]).toBe(det.params.ar[0].toFixed(4));
    expect(cellsOf(text, COEFFICIENT_NAME.drift)[0]).toBe((sto.params.drift ?? NaN).toFixed(4));
    expect(cellsOf(text, COEFFICIENT_NAME.ma(1)).filter((_, i) => i % 2 === 0)).toEqual([det.params.ma[0].toFixed(3), sto.params.ma[0].toFixed(3)]);
    expect(cellsOf(text, COEFFICIENT_NAME.ma(2))[0]).toBe(sto.params.ma[1].toFixed(3));
    expect(cellsOf(text, COEFFICIENT_NAME.ma(3))[0]).toBe(sto.params.ma[2].toFixed(3));
    // Fit figures: log-likelihood and AICc to 2 decimals, the innovation variance to 4 significant digits.
    expect(cellsOf(text, FIT_FIGURE_NAME.loglik)).toEqual([det.loglik.toFixed(2), sto.loglik.toFixed(2)]);
    expect(cellsOf(text, FIT_FIGURE_NAME.aicc)).toEqual([det.aicc.toFixed(2), sto.aicc.toFixed(2)]);
    expect(cellsOf(text, FIT_FIGURE_NAME.sigma2)).toEqual([det.params.sigma2.toPrecision(4), sto.params.sigma2.toPrecision(4)]);
    expect(cellsOf(text, FIT_FIGURE_NAME.order)).toEqual(['(1, 1)', '(0, 3)']);
    expect(cellsOf(text, FIT_FIGURE_NAME.estimation)).toEqual(['exact ML', 'exact ML']);
    // None of the old lower-case row names.
    expect(text).not.toMatch(/^\s*(ar1|ma1|sigma2|loglik|drift)\s/m);
    expect(text).not.toMatch(/\d ± \d/);
  });

  it('prints the unit-root checks with reference statistics and p-values in the "< 0.01" form', () => {
    const kpss = ref.unit_root_tests.kpss_c_auto;
    const adf = ref.unit_root_tests.adf_c_aic;
    const adfTrend = ref.unit_root_tests.adf_ct_aic;
    // KPSS level statistic 0.7655 exceeds the 1% critical value 0.739 (KPSS 1992, Table 1): p below the table.
    expect(cellsOf(text, 'KPSS: steady level')).toEqual([kpss.stat.toFixed(3), String(kpss.lags), '< 0.01', 'rules it out']);
    expect(cellsOf(text, 'ADF: lasting shocks, around a level')).toEqual([adf.stat.toFixed(3), String(adf.lags), (adf.pvalue ?? NaN).toFixed(3), 'rules them out']);
    expect(cellsOf(text, 'ADF: lasting shocks, around a trend line')).toEqual([adfTrend.stat.toFixed(3), String(adfTrend.lags), (adfTrend.pvalue ?? NaN).toFixed(3), 'rules them out']);
    expect(text).not.toContain('p = 0.000');
  });

  it('prints the Ljung-Box check of the deterministic trend as the reference computes it', () => {
    // lake-huron.json ljung_box.trend: 10 lags, 2 ARMA parameters, so 8 df.
    const lb = ref.ljung_box.trend;
    const row = text.split('\n').find((line) => /^\s+Deterministic trend\s+\d/.test(line)) ?? '';
    expect(row.trim().split(/\s{2,}/).slice(1, 4)).toEqual([lb.stat.toFixed(2), String(lb.lags - lb.model_df), lb.pvalue.toFixed(3)]);
    expect(text).toContain('No finding against either model’s errors.');
    expect(text).not.toMatch(/FLAGGED|ljung_box/);
  });

  it('keeps every line within 100 columns', () => {
    for (const line of text.split('\n')) expect(line.length).toBeLessThanOrEqual(100);
    // No escape sequences (colour) in the summary.
    expect(text).not.toContain('\u001b');
  });

  it('marks a missing standard error with a dash and says why in a legend', () => {
    // An altered record: the stochastic MA 1 term without a standard error, its root on the unit circle.
    const atEdge = structuredClone(record);
    atEdge.models.stochastic.stderr.ma[0] = null;
    atEdge.models.stochastic.roots.ma_min_modulus = 1;
    const edgeText = formatSummary(atEdge);
    const edgeLegend = edgeText.replace(/\n\s+/g, ' ');
    expect(cellsOf(edgeText, COEFFICIENT_NAME.ma(1))).toEqual([record.models.deterministic.coefficients.ma[0].toFixed(3), expect.any(String), record.models.stochastic.coefficients.ma[0].toPrecision(4).replace(/0+$/, ''), '\u2014']);
    expect(edgeLegend).toContain('\u2014 Stochastic trend: no standard error, as the MA part sits on the edge of invertibility (smallest root modulus 1.0000)');
    const singular = structuredClone(record);
    singular.models.deterministic.stderr.ar[0] = null;
    expect(formatSummary(singular).replace(/\n\s+/g, ' ')).toContain(
      "\u2014 Deterministic trend: no standard error, as the information matrix is singular at this optimum: neither the likelihood's curvature nor the outer product of the scores could be inverted.",
    );
  });
});

describe('fit summary with a backtest', () => {
  it('gives coverage as percentages and comparison p-values as the record has them', async () => {
    const record = await fitRecord(SERIES, [...QUICK_BACKTEST]);
    const run = await runCli(['fit', SERIES, ...QUICK_BACKTEST]);
    expect(run.code).toBe(0);
    const backtest = record.backtest;
    if (backtest === undefined || backtest === null) throw new Error('no backtest in the record');
    // Row h = 1 of the accuracy table: RMSE and 95% interval score of three methods, then cover at 80% and 95% of the two models.
    const lines = run.stdout.split('\n');
    const head = lines.findIndex((line) => /^\s+h\s+Det\.\s+Stoch\.\s+Bench\./.test(line));
    expect(lines[head - 1]).toMatch(/RMSE\s+95% interval score\s+80% cover\s+95% cover/);
    const cells = lines[head + 1].trim().split(/\s+/);
    const at1 = { det: backtest.per_horizon.deterministic[0], sto: backtest.per_horizon.stochastic[0] };
    const pct = (share: number | null | undefined): string => `${Math.round((share ?? NaN) * 100)}%`;
    expect(cells.slice(7)).toEqual([pct(at1.det.coverage['80']), pct(at1.sto.coverage['80']), pct(at1.det.coverage['95']), pct(at1.sto.coverage['95'])]);
    // Comparison p-values: "< 0.001" below a thousandth, else three decimals.
    const p = backtest.comparison.find((row) => row.h === 1 && row.loss === 'squared_error')?.p_value ?? NaN;
    const comparisonHead = lines.findIndex((line) => /^\s+h\s+p-value\s+lower for/.test(line));
    expect(lines[comparisonHead + 1].trim().split(/\s{2,}/)[1]).toBe(p < 0.001 ? '< 0.001' : p.toFixed(3));
    expect(run.stdout).toContain(`Recommended: the ${record.recommendation?.model} trend`);
  });
});
