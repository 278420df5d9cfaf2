// Each caveat rule fires on a constructed case and stays silent on its opposite. Thresholds
// and severities are our spec (src/memo/caveats/, one rule per file); the base records are
// the open fixtures analysed by analyseSeries (test/memo/sampleInput.ts).
import { describe, expect, it } from 'vitest';
import { backTransformed } from '../../src/memo/caveats/backTransformed.js';
import { backtestThin } from '../../src/memo/caveats/backtestThin.js';
import { CAVEAT_RULES, collectCaveats } from '../../src/memo/caveats/caveatRules.js';
import { fixedLineExtrapolation } from '../../src/memo/caveats/fixedLineExtrapolation.js';
import { horizonLong } from '../../src/memo/caveats/horizonLong.js';
import { narrowLineIntervals } from '../../src/memo/caveats/narrowLineIntervals.js';
import { residualPattern } from '../../src/memo/caveats/residualPattern.js';
import { seasonalPattern } from '../../src/memo/caveats/seasonalPattern.js';
import { trendBreak } from '../../src/memo/caveats/trendBreak.js';
import { unitRootEvidence } from '../../src/memo/caveats/unitRootEvidence.js';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { formatSignificant } from '../../src/memo/format/formatNumber.js';
import { fitRecord } from '../support/runCli.js';
import { handMadeBacktest, handMadeRecommendation } from './handMadeParts.js';
import { bareRecord, fullRecord } from './sampleInput.js';

/** The record as if analysed at another horizon (the caveats read the horizon from the settings). */
function atHorizon(record: AnalysisRecord, horizon: number): AnalysisRecord {
  return { ...record, settings: { ...record.settings, horizon } };
}

/** Sets the last forecast's intervals at `level` (95 unless given) of both models around their points. */
function withEndWidths(record: AnalysisRecord, deterministic: number, stochastic: number, level = '95'): AnalysisRecord {
  const copy = structuredClone(record);
  for (const [model, width] of [['deterministic', deterministic], ['stochastic', stochastic]] as const) {
    const last = copy.forecasts[model][copy.forecasts[model].length - 1];
    last.intervals[level] = [last.point - width / 2, last.point + width / 2];
  }
  return copy;
}

/** Lake Huron fitted at other interval levels, orders up to (1, 1), by `fit` (its record as the memo reads it). */
function lakeAt(levels: string, ...options: string[]): Promise<AnalysisRecord> {
  return fitRecord('test/fixtures/lake-huron.csv', ['--max-p', '1', '--max-q', '1', '--levels', levels, ...options]);
}

describe('horizon-long', () => {
  it('fires above a quarter of the history and is high above half', () => {
    const record = atHorizon(bareRecord('lakeHuron'), 30); // n = 98
    const caveat = horizonLong.evaluate({ record });
    expect(caveat?.severity).toBe('medium');
    expect(caveat?.numbers.share).toBeCloseTo(30 / 98, 12);
    expect(caveat?.text).toContain('30 years ahead from a history of 98 observations');
    expect(caveat?.text).toContain('31% of the history');
    expect(horizonLong.evaluate({ record: atHorizon(record, 50) })?.severity).toBe('high');
  });
  it('is silent at a quarter or less', () => {
    const record = bareRecord('lakeHuron');
    expect(record.settings.horizon).toBe(10);
    expect(horizonLong.evaluate({ record })).toBeNull();
    expect(horizonLong.evaluate({ record: atHorizon(record, 24) })).toBeNull(); // 24/98 < 0.25
  });
});

describe('narrow-line-intervals', () => {
  it('fires when the deterministic 95% interval is under three quarters of the stochastic width', () => {
    const record = withEndWidths(bareRecord('lakeHuron'), 3, 10);
    const caveat = narrowLineIntervals.evaluate({ record, units: 'ft' });
    expect(caveat?.severity).toBe('high');
    expect(caveat?.numbers.ratio).toBeCloseTo(0.3, 12);
    expect(caveat?.text).toContain('At 1982');
    expect(caveat?.text).toContain('70% narrower');
    expect(caveat?.text).toContain('3.00 ft wide against 10.00 ft');
    expect(narrowLineIntervals.evaluate({ record: withEndWidths(record, 6, 10) })?.severity).toBe('medium');
  });
  it('is silent when the widths are close, as in the Lake Huron fit itself', () => {
    expect(narrowLineIntervals.evaluate({ record: bareRecord('lakeHuron') })).toBeNull(); // ratio 0.987 from analyseSeries
    expect(narrowLineIntervals.evaluate({ record: withEndWidths(bareRecord('lakeHuron'), 7.5, 10) })).toBeNull();
  });
  it('reads the widest level and names it, whatever the others say', async () => {
    const record = withEndWidths(withEndWidths(await lakeAt('68,95,99'), 3, 10, '99'), 10, 10, '68');
    const caveat = narrowLineIntervals.evaluate({ record, units: 'ft' });
    expect(caveat?.numbers.level).toBe(99);
    expect(caveat?.numbers.ratio).toBeCloseTo(0.3, 12);
    expect(caveat?.text).toContain("deterministic-trend model's 99% interval is 70% narrower");
    expect(narrowLineIntervals.evaluate({ record: withEndWidths(record, 10, 10, '99') })).toBeNull();
  });
});

describe('unit-root-evidence', () => {
  it("fires on the 'stochastic' reading of US real GDP: high against a deterministic recommendation, low for a stochastic one", () => {
    const record = bareRecord('gdp');
    expect(record.evidence.reading.verdict).toBe('stochastic');
    expect(unitRootEvidence.evaluate({ record })?.severity).toBe('medium');
    record.recommendation = handMadeRecommendation('deterministic');
    expect(unitRootEvidence.evaluate({ record })?.severity).toBe('high');
    record.recommendation = handMadeRecommendation('stochastic');
    const caveat = unitRootEvidence.evaluate({ record });
    expect(caveat?.severity).toBe('low');
    expect(caveat?.numbers.adf_p).toBe(record.evidence.adf.trend?.p_value);
    expect(caveat?.text).toMatch(/KPSS p (below|=) 0\.0\d+/);
    expect(caveat?.text).toContain('5% level');
  });
  it("is silent on Lake Huron's 'conflicting' reading", () => {
    const record = bareRecord('lakeHuron');
    expect(record.evidence.reading.verdict).toBe('conflicting');
    expect(unitRootEvidence.evaluate({ record })).toBeNull();
  });
});

describe('backtest-thin', () => {
  it('fires, high, when no backtest was run', () => {
    const caveat = backtestThin.evaluate({ record: bareRecord('nile') });
    expect(caveat?.severity).toBe('high');
    expect(caveat?.text).toContain('No backtest was run');
  });
  it('fires, medium, on fewer than ten origins', () => {
    const record = bareRecord('nile');
    record.backtest = handMadeBacktest(record, 6);
    const caveat = backtestThin.evaluate({ record });
    expect(caveat?.severity).toBe('medium');
    expect(caveat?.text).toContain('only 6 forecast origins (fewer than 10)');
  });
  it('is silent on ten origins or more', () => {
    const record = bareRecord('nile');
    record.backtest = handMadeBacktest(record, 10);
    expect(backtestThin.evaluate({ record })).toBeNull();
  });
});

describe('residual-pattern', () => {
  it('fires when Ljung-Box is flagged, high for the recommended model', () => {
    const record = bareRecord('lakeHuron');
    const checks = record.evidence.residuals.stochastic;
    const ljung = checks.findings.find((f) => f.check === 'ljung_box');
    if (ljung === undefined || checks.ljung_box === null) throw new Error('Lake Huron record lacks a Ljung-Box check');
    ljung.flagged = true;
    checks.ljung_box.p_value = 0.012;
    expect(residualPattern.evaluate({ record })?.severity).toBe('medium');
    record.recommendation = handMadeRecommendation('stochastic');
    const caveat = residualPattern.evaluate({ record });
    expect(caveat?.severity).toBe('high');
    expect(caveat?.text).toContain("stochastic-trend model's one-step forecast errors still show a pattern over 10 lags (Ljung-Box p = 0.012)");
    expect(caveat?.text).not.toContain('deterministic-trend model');
  });
  it('is silent when neither model is flagged (Lake Huron fit, p = 0.877 and 0.789)', () => {
    expect(residualPattern.evaluate({ record: bareRecord('lakeHuron') })).toBeNull();
  });
});

describe('back-transformed', () => {
  it('fires on the log-scale GDP record with the interval lopsided upwards', () => {
    const record = bareRecord('gdp');
    const caveat = backTransformed.evaluate({ record, units: 'bn USD' });
    const last = record.forecasts.stochastic[11];
    const [lo, hi] = last.intervals['95'];
    expect(caveat?.severity).toBe('low');
    expect(caveat?.numbers.above).toBeCloseTo(hi - last.point, 9);
    expect(caveat?.numbers.below).toBeCloseTo(last.point - lo, 9);
    expect(Number(caveat?.numbers.above)).toBeGreaterThan(Number(caveat?.numbers.below));
    expect(caveat?.text).toContain('natural log scale');
    expect(caveat?.text).toContain('2012-Q3');
    expect(caveat?.text).toContain('median');
  });
  it('is silent without a transform', () => {
    expect(backTransformed.evaluate({ record: bareRecord('nile') })).toBeNull();
  });
  it('measures and names the widest level', async () => {
    const record = await lakeAt('50,90', '--transform', 'log');
    const caveat = backTransformed.evaluate({ record, units: 'ft' });
    const last = record.forecasts.stochastic[record.forecasts.stochastic.length - 1];
    expect(caveat?.numbers.level).toBe(90);
    expect(caveat?.numbers.above).toBe(last.intervals['90'][1] - last.point);
    expect(caveat?.text).toContain("stochastic-trend model's 90% interval reaches");
  });
});

describe('trend-break', () => {
  it('fires on the Nile, whose deterministic break test rejects at 5% from 1899', () => {
    const record = bareRecord('nile');
    const test = record.evidence.stability?.break_test.deterministic;
    if (test === undefined) throw new Error('the Nile record lacks its break test');
    expect(test.reject['5']).toBe(true); // analyseSeries on nile.csv (test/evidence/nileBreak.test.ts checks the date)
    const caveat = trendBreak.evaluate({ record });
    expect(caveat?.severity).toBe('medium');
    // break_index 28 is the 29th observation, 1871 + 28 = 1899 (record contract: 0-based position).
    expect(test.break_index).toBe(28);
    expect(caveat?.numbers.deterministic_from).toBe('1899');
    expect(caveat?.text).toContain(
      `level or slope of the trend line from 1899 (statistic ${formatSignificant(test.stat, 3)} against a 5% critical value of ${formatSignificant(test.critical['5'], 3)})`,
    );
    expect(caveat?.text).not.toContain('drift');
    record.recommendation = handMadeRecommendation('deterministic');
    expect(trendBreak.evaluate({ record })?.severity).toBe('high');
    record.recommendation = handMadeRecommendation('stochastic');
    expect(trendBreak.evaluate({ record })?.severity).toBe('low');
  });
  it('is silent on Lake Huron, where neither test rejects, and when stability could not be computed', () => {
    const record = bareRecord('lakeHuron');
    expect(record.evidence.stability?.break_test.deterministic.reject['5']).toBe(false);
    expect(record.evidence.stability?.break_test.stochastic.reject['5']).toBe(false);
    expect(trendBreak.evaluate({ record })).toBeNull();
    const nile = bareRecord('nile');
    nile.evidence.stability = null;
    expect(trendBreak.evaluate({ record: nile })).toBeNull();
  });
});

describe('fixed-line-extrapolation', () => {
  it('fires on every record, whatever the numbers: high for a deterministic recommendation, low for a stochastic one', () => {
    const plain = bareRecord('lakeHuron');
    const caveat = fixedLineExtrapolation.evaluate({ record: plain });
    expect(caveat?.severity).toBe('medium');
    expect(caveat?.text).toContain('fitted to 1875\u20131972 carries on unchanged to 1982, 10 years beyond the data');
    const recommended = fullRecord('lakeHuron');
    expect(recommended.recommendation?.model).toBe('deterministic');
    expect(fixedLineExtrapolation.evaluate({ record: recommended })?.severity).toBe('high');
    expect(fixedLineExtrapolation.evaluate({ record: fullRecord('nile') })?.severity).toBe('low');
    const short = atHorizon(bareRecord('gdp'), 1);
    expect(fixedLineExtrapolation.evaluate({ record: short })?.text).toContain('1 quarter beyond the data');
  });
});

describe('collectCaveats', () => {
  it('orders by severity, ties in rule-table order, and always includes the standing caution', () => {
    const record = bareRecord('gdp');
    record.recommendation = handMadeRecommendation('stochastic');
    const ids = collectCaveats({ record }).map((c) => c.id);
    // gdp with the stochastic model recommended: backtest missing (high); then, all low and in
    // table order, the break in the deterministic line, the 'stochastic' unit-root reading, the
    // standing caution and the log scale. Ljung-Box, horizon share 12/203 and width ratio 0.93
    // stay silent.
    expect(ids).toEqual(['backtest-thin', 'trend-break', 'unit-root-evidence', 'fixed-line-extrapolation', 'back-transformed']);
  });
  it('has one rule per id', () => {
    expect(new Set(CAVEAT_RULES.map((r) => r.id)).size).toBe(CAVEAT_RULES.length);
    expect(CAVEAT_RULES).toHaveLength(10);
  });
});

describe('seasonal-pattern', () => {
  // UK gas, quarterly 1960-Q1 to 1986-Q4 on the log scale (R datasets::UKgas): the seasonal test
  // rules out a stable pattern (p below 0.001; test/evidence/seasonalEvidence.test.ts) and the
  // third quarter's effect moved by 43% of the pattern's range between 1960 and 1986.
  const gas = (options: string[] = []): Promise<AnalysisRecord> =>
    fitRecord('test/fixtures/seasonal/uk-gas.csv', ['--transform', 'log', '--max-p', '1', '--max-q', '1', ...options]);

  it('fires on a pattern the seasonal test finds changing, with the share it moved', async () => {
    const record = await gas();
    const caveat = seasonalPattern.evaluate({ record });
    expect(caveat?.severity).toBe('medium');
    expect(caveat?.numbers).toEqual({ years: 27, change_share: record.evidence.seasonal?.pattern?.change_share, unstable: 'yes' });
    expect(caveat?.text).toBe(
      "The seasonal pattern has been changing (one quarter's effect moved by 43% of the pattern's range between the first and last complete years): next year's pattern may differ from the one forecast, and the intervals do not allow for a sudden shift.",
    );
  }, 60_000);

  it('fires on few complete years, and is silent without a seasonal part', async () => {
    const record = await gas();
    // The same series as if it had four complete years and a stable pattern.
    const short = structuredClone(record);
    if (short.evidence.seasonal?.pattern != null && short.evidence.seasonal.unit_root != null) {
      short.evidence.seasonal.pattern.complete_years = 4;
      short.evidence.seasonal.pattern.change_share = 0.1;
      short.evidence.seasonal.unit_root.seasonal_differencing = false;
    }
    expect(seasonalPattern.evaluate({ record: short })?.text).toBe("The seasonal pattern rests on only 4 complete years, so each quarter's effect is estimated from a handful of values.");
    expect(seasonalPattern.evaluate({ record: await gas(['--seasonal', 'none']) })).toBeNull();
    expect(seasonalPattern.evaluate({ record: bareRecord('lakeHuron') })).toBeNull();
  }, 60_000);

  it('is silent when neither model forecasts a pattern, however much a weak one moved', async () => {
    // The same series as if the search had found no seasonal part worth its terms in either
    // model: the forecasts carry no pattern, so a pattern that moved cannot make them wrong.
    const record = structuredClone(await gas());
    for (const model of Object.values(record.models)) {
      if (model.seasonal != null) Object.assign(model.seasonal, { harmonics: 0, P: 0, Q: 0, seasonal_differences: false });
    }
    if (record.evidence.seasonal?.unit_root != null) record.evidence.seasonal.unit_root.seasonal_differencing = false;
    expect(record.evidence.seasonal?.pattern?.change_share).toBeGreaterThan(0.4);
    if (record.evidence.seasonal?.pattern != null) record.evidence.seasonal.pattern.change_share = 1.5;
    expect(seasonalPattern.evaluate({ record })).toBeNull();
  }, 60_000);
});
