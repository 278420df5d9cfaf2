// The memo's consistency check (src/memo/consistency/memoContradictions.ts, our rules): silent
// on agreeing memos, the sample memo among them (the demo's check is in demoMemo.test.ts);
// firing on constructed contradictions of each kind it looks for.
import { beforeAll, describe, expect, it } from 'vitest';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { memoContradictions } from '../../src/memo/consistency/memoContradictions.js';
import { renderMemoHtml } from '../../src/memo/renderMemoHtml.js';
import { fixRunDate } from '../support/fixRunDate.js';
import { fullRecord, sampleInput } from './sampleInput.js';

fixRunDate('all');

/** The record with the stochastic model's intervals replaced by the deterministic model's: the two then agree exactly. */
function agreeing(record: AnalysisRecord): AnalysisRecord {
  return { ...record, forecasts: { ...record.forecasts, stochastic: record.forecasts.deterministic.map((row) => ({ ...row })) } };
}

describe('memoContradictions', () => {
  const input = sampleInput(['lakeHuron']);
  const records = input.series.map((entry) => entry.record);
  let html: string;
  beforeAll(async () => {
    html = await renderMemoHtml(input);
  });

  it('is silent on a memo that agrees with its records', () => {
    expect(memoContradictions(records, html)).toEqual([]);
  });

  it('fires on a significant result called not significant, the wording fault it exists for', () => {
    const wrong = html.replace('</tbody>', ' The comparison test at h = 5 gives p = 0.003 in favour of the stochastic trend: not significant at 5%.</tbody>');
    expect(memoContradictions(records, wrong)).toEqual(['series lake-huron: p = 0.003 is called not significant at 5%']);
    const right = html.replace('</tbody>', ' The comparison test at h = 5 gives p = 0.003 in favour of the stochastic trend: significant at 5%.</tbody>');
    expect(memoContradictions(records, right)).toEqual([]);
  });

  it('fires on a narrower-by figure the widths do not give', async () => {
    // The deterministic interval at the horizon end made 3 wide against 10: the narrow-line
    // caveat then says "70% narrower" (test/memo/caveatRules.test.ts).
    const record = fullRecord('lakeHuron');
    const narrowed = structuredClone(record);
    for (const [model, width] of [['deterministic', 3], ['stochastic', 10]] as const) {
      const last = narrowed.forecasts[model][narrowed.forecasts[model].length - 1];
      last.intervals['95'] = [last.point - width / 2, last.point + width / 2];
    }
    const narrowHtml = await renderMemoHtml({ ...input, series: [{ ...input.series[0], record: narrowed }] });
    expect(narrowHtml).toContain('95% interval is 70% narrower');
    expect(memoContradictions([narrowed], narrowHtml)).toEqual([]);
    const wrong = narrowHtml.replaceAll("95% interval is 70% narrower", "95% interval is 80% narrower");
    expect(memoContradictions([narrowed], wrong)).toContainEqual(expect.stringContaining('at 1982 the memo says 80% narrower; the record gives 70.0%'));
  });

  it('fires when intervals said to grow with the horizon do not', () => {
    const record = fullRecord('lakeHuron');
    const last = record.forecasts.stochastic.length - 1;
    const flat = { ...record, forecasts: { ...record.forecasts, stochastic: record.forecasts.stochastic.map((row) => ({ ...row, intervals: record.forecasts.stochastic[0].intervals })) } };
    expect(last).toBeGreaterThan(0);
    expect(memoContradictions([flat], html)).toContain("series lake-huron: the memo says the stochastic trend's uncertainty grows with the horizon, but its interval at the last horizon is 1.000 times the first");
  });

  it('fires when two models that agree are not said to, and is silent once the memo says it', async () => {
    const same = agreeing(records[0]);
    expect(memoContradictions([same], html)).toContain("series lake-huron: the two models' intervals at the end of the horizon are within 2% (ratio 1.000), and the memo does not say so");
    const said = await renderMemoHtml({ ...input, series: [{ ...input.series[0], record: same }] });
    expect(said).toContain('Here the two models give nearly the same interval at the end of the horizon (width ratio 1.00)');
    expect(memoContradictions([same], said)).not.toContain(expect.stringContaining('does not say so'));
  });

});
