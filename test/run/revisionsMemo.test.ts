// The memo's revisions section from constructed revisions: the chart spec as data (valid,
// titled, described, both memos' points, greyscale-safe dashes) and the view's formatted rows
// (our spec: src/memo/charts/revisionChart.ts, src/memo/view/revisionsView.ts).
import { describe, expect, it } from 'vitest';
import { revisionChart, REVISION_DASH } from '../../src/memo/charts/revisionChart.js';
import { compileChart } from '../../src/memo/charts/renderChart.js';
import { MODEL_COLOUR, MUTED } from '../../src/memo/charts/palette.js';
import type { ModelPaths, Revisions, SeriesRevisions } from '../../src/memo/revisionsPart.js';
import { DATA_ROWS_SHOWN, revisionsView } from '../../src/memo/view/revisionsView.js';

const now: ModelPaths = {
  deterministic: [{ period: '2026', point: 103 }, { period: '2027', point: 105 }],
  stochastic: [{ period: '2026', point: 101 }, { period: '2027', point: null }],
};
const earlier: ModelPaths = {
  deterministic: [{ period: '2025', point: 100 }, { period: '2026', point: 102 }, { period: '2027', point: 104.5 }],
  stochastic: [{ period: '2025', point: 100 }, { period: '2026', point: 101.5 }, { period: '2027', point: 102 }],
};

const series: SeriesRevisions = {
  series_id: 'ferry',
  title: 'Ferry boardings',
  in_earlier: true,
  last: { now: '2025', earlier: '2024' },
  forecasts: [
    { model: 'deterministic', period: '2026', h: 1, h_earlier: 2, point: 103, point_earlier: 102, change: 1, percent_change: 100 / 102 },
    { model: 'deterministic', period: '2027', h: 2, h_earlier: 3, point: 105, point_earlier: 104.5, change: 0.5, percent_change: 50 / 104.5 },
    { model: 'stochastic', period: '2026', h: 1, h_earlier: 2, point: 101, point_earlier: 101.5, change: -0.5, percent_change: -50 / 101.5 },
  ],
  paths: { now, earlier },
  orders: [{ model: 'stochastic', now: { p: 1, q: 0 }, earlier: { p: 0, q: 0 } }],
  recommendation: null,
  data: Array.from({ length: DATA_ROWS_SHOWN + 2 }, (_, i) => ({ period: String(2000 + i), value: 10 + i, value_earlier: 9 + i, change: 1, percent_change: 100 / (9 + i) })),
};

const revisions: Revisions = { as_of: '2025-12', earlier: { as_of: '2025-11', run_date: '2025-12-02' }, series: [series], dropped: [{ series_id: 'old', title: 'Old series' }] };

type Layer = { data: { values: { t: number; point: number }[] }; mark: { type: string; color: string; strokeDash?: number[]; filled?: boolean } };

describe('revisionChart', () => {
  const chart = revisionChart({ series: 'Ferry boardings', units: 'k', decimals: 1, asOf: '2025-12', earlierAsOf: '2025-11', paths: { now, earlier }, forecasts: series.forecasts });

  it('compiles without a warning and says what it shows, with the largest revision of each model', () => {
    expect(compileChart(chart).warnings).toEqual([]);
    expect(chart.title).toEqual({
      text: 'This memo’s forecasts against the previous memo’s',
      subtitle: ['Solid line, filled markers: this memo (as of 2025-12).', 'Dashed grey line, open markers: the memo as of 2025-11.'],
    });
    expect(chart.description).toContain('The deterministic-trend model forecast moved most at 2026, by +1.0 k.');
    expect(chart.description).toContain('The stochastic-trend model forecast moved most at 2026, by −0.5 k.');
  });

  it('draws this memo solid in the model colour and the previous one dashed in grey, with every point', () => {
    if (!('hconcat' in chart)) throw new Error('expected two panels');
    const panels = chart.hconcat as unknown as { layer: Layer[] }[];
    expect(panels).toHaveLength(2);
    const [earlierLine, earlierPoints, nowLine, nowPoints] = panels[0].layer;
    expect(earlierLine.mark).toMatchObject({ type: 'line', color: MUTED, strokeDash: REVISION_DASH.earlier });
    expect(earlierPoints.mark).toMatchObject({ type: 'point', filled: false });
    expect(nowLine.mark).toMatchObject({ type: 'line', color: MODEL_COLOUR.deterministic, strokeDash: [] });
    expect(nowPoints.mark).toMatchObject({ type: 'point', filled: true });
    expect(REVISION_DASH.earlier.length).toBeGreaterThan(0);
    expect(earlierLine.data.values.map((row) => row.point)).toEqual([100, 102, 104.5]);
    // The missing 2027 stochastic point is left out rather than drawn at 0.
    expect(panels[1].layer[2].data.values).toEqual([{ t: 2026, period: '2026', point: 101 }]);
  });
});

describe('revisionsView', () => {
  it('is absent for a memo without an as-of period, and not compared without an earlier memo (page 1 says so)', async () => {
    expect(await revisionsView({ series: [] })).toBeNull();
    const alone = await revisionsView({ series: [], revisions: { as_of: '2025-12', earlier: null, series: [], dropped: [] } });
    expect(alone?.compared).toBe(false);
  });

  it('formats the revisions with signs, one row per period for both models, and caps the data rows', async () => {
    const view = await revisionsView({ series: [], revisions });
    expect(view?.dropped).toBe('No longer in this memo: Old series.');
    const block = view?.series[0];
    expect(block?.notes).toEqual(['Latest observation: 2025 (previously 2024).', 'Stochastic trend: order now ARMA(1, 0), previously ARMA(0, 0).']);
    expect(block?.forecastRows[0]).toEqual({
      period: '2026',
      steps: '2 → 1',
      deterministic: { earlier: '102.00', now: '103.00', change: '+1.00', percent: '+0.98%' },
      stochastic: { earlier: '101.50', now: '101.00', change: '−0.50', percent: '−0.49%' },
    });
    expect(block?.forecastRows[1].stochastic).toEqual({ earlier: 'n/a', now: 'n/a', change: 'n/a', percent: 'n/a' });
    expect(block?.dataRows).toHaveLength(DATA_ROWS_SHOWN);
    expect(block?.dataNote).toBe(`The first ${DATA_ROWS_SHOWN} of ${DATA_ROWS_SHOWN + 2} revised observations are listed; both memos’ record.json files hold every value.`);
    expect(block?.figure?.svg.startsWith('<svg role="img"')).toBe(true);
  });
});

describe('a long run of common periods', () => {
  it('prints the first three, then every quarter to the last, and says how many it left out (our layout rule)', async () => {
    const months = Array.from({ length: 12 }, (_, i) => `2026-${String(i + 1).padStart(2, '0')}`);
    const monthly: SeriesRevisions = {
      ...series,
      forecasts: months.map((period, i) => ({ model: 'deterministic' as const, period, h: i + 1, h_earlier: i + 2, point: 100 + i, point_earlier: 100, change: i, percent_change: i })),
      paths: { now: { deterministic: [], stochastic: [] }, earlier: null },
      data: [],
    };
    const view = await revisionsView({ revisions: { ...revisions, series: [monthly] }, series: [] });
    const block = view?.series[0];
    expect(block?.forecastRows.map((row) => row.period)).toEqual(['2026-01', '2026-02', '2026-03', '2026-06', '2026-09', '2026-12']);
    expect(block?.forecastRowsNote).toBe('6 of the 12 periods both memos forecast are shown; both memos\u2019 record.json files hold every one.');
  });
});
