// Tables that fit the page: the forecast table sets the two models side by side only when their
// rows fit (widths estimated from the memo's table font, src/memo/view/tableWidth.ts; our own
// layout rules). Wide numbers, as in a series in the millions, stack the models.
import { describe, expect, it } from 'vitest';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { forecastTableView } from '../../src/memo/view/forecastTableView.js';
import { rowsFit, SHEET_WIDTH } from '../../src/memo/view/tableWidth.js';
import { bareRecord } from './sampleInput.js';

/** The record as if the series were measured in units `factor` times smaller: every forecast figure scaled. */
function scaled(record: AnalysisRecord, factor: number): AnalysisRecord {
  const scale = (rows: AnalysisRecord['forecasts']['deterministic']) =>
    rows.map((row) => ({
      ...row,
      point: row.point * factor,
      intervals: Object.fromEntries(Object.entries(row.intervals).map(([level, [lo, hi]]) => [level, [lo * factor, hi * factor] as [number, number]])),
    }));
  return { ...record, forecasts: { deterministic: scale(record.forecasts.deterministic), stochastic: scale(record.forecasts.stochastic) } };
}

describe('rowsFit', () => {
  it('measures rows against a width in millimetres', () => {
    const interval = '1,086,170\u2009\u2013\u20091,152,800';
    // Two models' point and two intervals with the period and a ratio, in the millions: wider than the sheet.
    expect(rowsFit([{ cells: ['15', '2039', '1,118,990', interval, interval, '1,119,160', interval, interval, '0.99'] }], SHEET_WIDTH)).toBe(false);
    // In the hundred thousands the row fits at the memo's 7.2 pt table type (about 170 mm).
    const narrower = '108,617\u2009\u2013\u2009115,280';
    expect(rowsFit([{ cells: ['15', '2039', '111,899', narrower, narrower, '111,916', narrower, narrower, '0.99'] }], SHEET_WIDTH)).toBe(true);
    expect(rowsFit([{ cells: ['15', '2039', '580.1', '575.4\u2009\u2013\u2009580.3'] }], SHEET_WIDTH)).toBe(true);
  });
});

describe('layouts chosen by width', () => {
  const lake = bareRecord('lakeHuron'); // levels near 580 ft, two decimals
  const wide = scaled(lake, 2000); // near 1,160,000

  it('sets the models side by side when their rows fit, and stacks them when they do not', () => {
    expect(forecastTableView(lake, 2, 'ft').byModel).toBe(false);
    expect(forecastTableView(wide, 0, 'ft').byModel).toBe(true);
  });

});
