// Chart specs tested as data: each compiles with vega-lite without a warning, carries a title
// and a description, carries exactly the record's numbers, and leaves its input untouched.
// Expected values come from the records analyseSeries writes for the fixtures (sampleInput.ts)
// or `fit` writes at other interval levels, and, for layout rules, from our spec
// (src/memo/charts/).
import { beforeAll, describe, expect, it } from 'vitest';
import type { TopLevelSpec } from 'vega-lite';
import { addPeriods } from '../../src/base/period.js';
import { bandFields, forecastChart, recentLength } from '../../src/memo/charts/forecastChart.js';
import { periodPosition, timeAxis } from '../../src/memo/charts/periodPosition.js';
import { compileChart, renderChartSvg } from '../../src/memo/charts/renderChart.js';
import { stabilityChart } from '../../src/memo/charts/stabilityChart.js';
import { widthNote, widthRatios } from '../../src/memo/view/widthRatios.js';
import type { MemoSeries } from '../../src/memo/memoInput.js';
import type { AnalysisRecord, ForecastRow, StabilityRecord } from '../../src/analysis/record.js';
import { fitRecord, QUICK_BACKTEST } from '../support/runCli.js';
import { sampleSeries } from './sampleInput.js';

function stabilityOf(entry: MemoSeries): StabilityRecord {
  const stability = entry.record.evidence.stability;
  if (stability === undefined || stability === null) throw new Error('the sample record has no stability part');
  return stability;
}

function allCharts(entry: MemoSeries): Record<string, TopLevelSpec> {
  const { record, history, units } = entry;
  const input = { series: record.series.title, units, decimals: 2, record };
  if (history === undefined) throw new Error('the sample series lacks its history');
  return {
    forecast: forecastChart({ ...input, history }),
    stability: stabilityChart({ ...input, stability: stabilityOf(entry) }),
  };
}

/** Chart rows as our spec has them: the record's point, and each level's ends as lo<level> and hi<level>. */
function expectedRows(forecasts: ForecastRow[], levels: string[]): Record<string, unknown>[] {
  return forecasts.map((f) => ({
    t: Number(f.period),
    period: f.period,
    h: f.h,
    point: f.point,
    ...Object.fromEntries(levels.flatMap((level) => [[`lo${level}`, f.intervals[level][0]], [`hi${level}`, f.intervals[level][1]]])),
  }));
}

/** The `values` of a panel's layer. */
function layerValues(spec: TopLevelSpec, panel: number, layer: number): Record<string, unknown>[] {
  // Panels side by side (hconcat) or one above the other (vconcat, the stability chart).
  type Panels = { layer: { data: { values: Record<string, unknown>[] } }[] }[];
  const json = JSON.parse(JSON.stringify(spec)) as { hconcat?: Panels; vconcat?: Panels };
  return (json.hconcat ?? json.vconcat ?? [])[panel].layer[layer].data.values;
}

describe('every chart', () => {
  for (const name of ['lakeHuron', 'gdp'] as const) {
    it(`compiles without warnings and has a title and a description (${name})`, () => {
      const entry = sampleSeries(name);
      const before = structuredClone(entry);
      for (const [chart, spec] of Object.entries(allCharts(entry))) {
        const { warnings, spec: vega } = compileChart(spec);
        expect(warnings, chart).toEqual([]);
        expect(vega.marks?.length ?? 0, chart).toBeGreaterThan(0);
        const title = typeof spec.title === 'object' && spec.title !== null && 'text' in spec.title ? spec.title.text : spec.title;
        // The section heading above each chart names the series; the chart's own title says what it shows.
        expect(String(title).length, chart).toBeGreaterThan(10);
        expect(spec.description?.length ?? 0, chart).toBeGreaterThan(40);
      }
      expect(entry).toEqual(before);
    });
  }
});

describe('chart data match the record', () => {
  const entry = sampleSeries('lakeHuron');
  const { record } = entry;
  const charts = allCharts(entry);

  it('forecast panels carry the record forecasts, after an h = 0 anchor at the last observation', () => {
    for (const [panel, model] of [[0, 'deterministic'], [1, 'stochastic']] as const) {
      const rows = layerValues(charts.forecast, panel, 0);
      expect(rows[0]).toMatchObject({ h: 0, period: '1972', point: entry.history?.at(-1)?.value });
      expect(rows.slice(1)).toEqual(expectedRows(record.forecasts[model], ['80', '95']));
    }
  });

  it('forecast panels show the last max(40, 6h) observations: 60 for h = 10, all of a shorter series', () => {
    expect(recentLength(10, 98)).toBe(60);
    expect(recentLength(3, 98)).toBe(40);
    expect(recentLength(10, 30)).toBe(30);
    const recent = layerValues(charts.forecast, 0, 2);
    expect(recent.map((r) => r.period)).toEqual(entry.history?.slice(-60).map((p) => p.period));
  });

  it('the width ratio is the deterministic over the stochastic 95% width at each horizon, read in one sentence', () => {
    const expected = record.forecasts.deterministic.map((d, i) => {
      const s = record.forecasts.stochastic[i];
      return (d.intervals['95'][1] - d.intervals['95'][0]) / (s.intervals['95'][1] - s.intervals['95'][0]);
    });
    expect(widthRatios(record).map((r) => r.ratio)).toEqual(expected);
    const note = widthNote(record);
    expect(note).toContain(`${expected[0].toFixed(2)} at ${record.forecasts.deterministic[0].period}`);
    expect(note).toContain(`${expected.at(-1)?.toFixed(2)} at ${record.forecasts.deterministic.at(-1)?.period}`);
  });

  it('stability windows are placed at the period of their last observation, band ±2 se', () => {
    const windows = stabilityOf(entry).windows.deterministic;
    const rows = layerValues(charts.stability, 0, 1);
    expect(rows).toHaveLength(windows.length);
    // end = observations used, so the window ends at first + end − 1 (record contract).
    expect(rows[0]).toEqual({
      end: windows[0].end,
      period: addPeriods('1875', windows[0].end - 1),
      t: 1875 + windows[0].end - 1,
      estimate: windows[0].slope,
      low: windows[0].slope - 2 * windows[0].se,
      high: windows[0].slope + 2 * windows[0].se,
    });
    expect(layerValues(charts.stability, 0, 2)).toEqual([{ estimate: record.models.deterministic.coefficients.slope }]);
  });
});

interface LayerData {
  mark: { type: string; opacity?: number };
  encoding: { y?: { field: string }; y2?: { field: string } };
  data?: { values: Record<string, unknown>[] };
}

/** The layers of a panel, as plain data. */
function layersOf(spec: TopLevelSpec, panel: number): LayerData[] {
  return (JSON.parse(JSON.stringify(spec)) as { hconcat: { layer: LayerData[] }[] }).hconcat[panel].layer;
}

describe('charts at other interval levels', () => {
  const lake = sampleSeries('lakeHuron');
  const records = new Map<string, AnalysisRecord>();
  beforeAll(async () => {
    for (const levels of ['68,95,99', '90', '80,99.5']) records.set(levels, await fitRecord('test/fixtures/lake-huron.csv', [...QUICK_BACKTEST, '--levels', levels]));
  });
  /** The record fitted at `levels` with the fixture's history, as the memo gets it. */
  const entryAt = (levels: string): MemoSeries => {
    const record = records.get(levels);
    if (record === undefined) throw new Error(`no record at ${levels}`);
    return { record, history: lake.history, units: 'ft', assumptions: [] };
  };

  it('compile without warnings at one, two with a decimal, and three levels', () => {
    for (const levels of records.keys()) {
      for (const [chart, spec] of Object.entries(allCharts(entryAt(levels)))) expect(compileChart(spec).warnings, `${chart} at ${levels}`).toEqual([]);
    }
  });

  it('shade one band per level, widest first and darker as they narrow, each carrying its interval', () => {
    const { record } = entryAt('68,95,99');
    const chart = allCharts(entryAt('68,95,99')).forecast;
    for (const [panel, model] of [[0, 'deterministic'], [1, 'stochastic']] as const) {
      const bands = layersOf(chart, panel).slice(0, 3);
      expect(bands.map((band) => band.mark.type)).toEqual(['area', 'area', 'area']);
      expect(bands.map((band) => [band.encoding.y?.field, band.encoding.y2?.field])).toEqual([['lo99', 'hi99'], ['lo95', 'hi95'], ['lo68', 'hi68']]);
      const opacities = bands.map((band) => band.mark.opacity ?? 0);
      expect(opacities[0]).toBeLessThan(opacities[1]);
      expect(opacities[1]).toBeLessThan(opacities[2]);
      // After the h = 0 anchor at the last observation, every level's ends are the record's.
      const rows = bands[0].data?.values ?? [];
      expect(rows[0]).toMatchObject({ h: 0, lo68: lake.history?.at(-1)?.value, hi99: lake.history?.at(-1)?.value });
      expect(rows.slice(1)).toEqual(expectedRows(record.forecasts[model], ['68', '95', '99']));
      expect(layersOf(chart, panel)[3].mark.type).toBe('line');
    }
    const title = JSON.parse(JSON.stringify(chart.title)) as { subtitle: string[] };
    expect(title.subtitle[1]).toBe('Shading, darkest to lightest: 68%, 95% and 99% prediction intervals.');
    expect(chart.description).toContain('with its 68%, 95% and 99% prediction intervals.');
    expect(chart.description).toContain('(99% interval ');
  });

  it('shade a single level with one band and name it', () => {
    const chart = allCharts(entryAt('90')).forecast;
    expect(layersOf(chart, 0).map((layer) => layer.mark.type).slice(0, 2)).toEqual(['area', 'line']);
    expect(layersOf(chart, 0)[0].encoding.y?.field).toBe('lo90');
    expect((JSON.parse(JSON.stringify(chart.title)) as { subtitle: string[] }).subtitle[1]).toBe('Shading: 90% prediction interval.');
    expect(chart.description).toContain('with its 90% prediction interval. ');
  });

  it('name a level with a decimal in fields Vega-Lite reads as flat', () => {
    expect(bandFields(99.5)).toEqual({ lo: 'lo99_5', hi: 'hi99_5' });
    const { record } = entryAt('80,99.5');
    const rows = layersOf(allCharts(entryAt('80,99.5')).forecast, 1)[0].data?.values ?? [];
    expect(rows.slice(1).map((row) => [row.lo99_5, row.hi99_5])).toEqual(record.forecasts.stochastic.map((f) => f.intervals['99.5']));
  });

  it('take the width ratio at the widest level', () => {
    const entry = entryAt('68,95,99');
    const { record } = entry;
    const ratios = widthRatios(record).map((v) => v.ratio);
    expect(ratios).toEqual(
      record.forecasts.deterministic.map((d, i) => {
        const s = record.forecasts.stochastic[i];
        return (d.intervals['99'][1] - d.intervals['99'][0]) / (s.intervals['99'][1] - s.intervals['99'][0]);
      }),
    );
    expect(widthNote(record)).toContain("the deterministic model's 99% interval divided by the stochastic model's");
  });
});

describe('periodPosition', () => {
  it('places quarters and months within their year (our spec)', () => {
    expect(periodPosition('1972')).toBe(1972);
    expect(periodPosition('2003-Q3')).toBe(2003.5);
    expect(periodPosition('2003-04')).toBe(2003.25);
    expect(() => periodPosition('2003/04')).toThrow(/period label/);
  });
});

describe('renderChartSvg', () => {
  it('inlines without namespace URLs, with prefixed ids, one label, and user text escaped', async () => {
    const entry = sampleSeries('nile');
    entry.record.series.title = '<img src=x onerror=alert(1)>';
    const { record } = entry;
    const units = '<img src=x onerror=alert(2)>';
    const svg = await renderChartSvg(forecastChart({ series: record.series.title, units, decimals: 0, record, history: entry.history }), 'fc');
    expect(svg.startsWith('<svg role="img" aria-label="')).toBe(true);
    expect(svg).not.toMatch(/https?:|xmlns/);
    expect(svg).not.toContain('<img');
    expect(svg).toContain('&lt;img src=x onerror=alert(2)&gt;</text>');
  });
  it('renumbers element ids from the prefix, references included', async () => {
    // A clipped mark makes vega emit a clipPath with an id from its process-wide counter.
    const clipped: TopLevelSpec = {
      title: 'Clipped',
      description: 'A clipped line.',
      data: { values: [{ x: 1, y: 1 }, { x: 2, y: 3 }] },
      mark: { type: 'line', clip: true },
      encoding: { x: { field: 'x', type: 'quantitative', scale: { domain: [1, 1.5] } }, y: { field: 'y', type: 'quantitative' } },
    };
    const svg = await renderChartSvg(clipped, 'fc');
    const ids = Array.from(svg.matchAll(/ id="([^"]+)"/g), (m) => m[1]);
    expect(ids).toEqual(['fc-1']);
    expect(svg).toContain('clip-path="url(#fc-1)"');
  });
  it('gives the same SVG for the same chart whatever was rendered before', async () => {
    const entry = sampleSeries('lakeHuron');
    const stability = stabilityOf(entry);
    const spec = stabilityChart({ series: 'Lake', record: entry.record, stability });
    const first = await renderChartSvg(spec, 'st');
    await renderChartSvg(spec, 'other');
    expect(await renderChartSvg(spec, 'st')).toBe(first);
  });
});

describe('timeAxis', () => {
  it('labels a span under two years by period, since whole years would leave a single tick (our layout rule)', () => {
    const months = ['2025-01', '2025-02', '2025-03', '2025-04', '2025-05', '2025-06', '2025-07', '2025-08', '2025-09', '2025-10', '2025-11', '2025-12'];
    const axis = timeAxis(months).axis as { values?: number[]; labelExpr?: string };
    // Twelve months, every second one labelled: six ticks.
    expect(axis.values).toEqual([2025, 2025 + 2 / 12, 2025 + 4 / 12, 2025 + 6 / 12, 2025 + 8 / 12, 2025 + 10 / 12]);
    expect(axis.labelExpr).toContain("datum.value === 2025 ? '2025-01'");
    expect(axis.labelExpr).toContain("'2025-11'");
    // A longer span keeps whole years.
    expect(timeAxis(['2020', '2021', '2022', '2023']).axis).toMatchObject({ format: 'd', tickMinStep: 1 });
    const spec: TopLevelSpec = {
      data: { values: months.map((period, i) => ({ t: periodPosition(period), v: i })) },
      mark: 'line',
      encoding: { x: timeAxis(months), y: { field: 'v', type: 'quantitative' } },
    };
    expect(compileChart(spec).warnings).toEqual([]);
  });
});

describe('widthNote', () => {
  /** Forecasts whose deterministic 95% interval is `ratio` times the stochastic one at each of four steps. */
  function withRatios(ratios: number[]) {
    const row = (h: number, width: number) => ({ h, period: String(2024 + h), point: 10, intervals: { '95': [10 - width / 2, 10 + width / 2] as [number, number] } });
    return {
      settings: { levels: [95] },
      forecasts: { deterministic: ratios.map((r, i) => row(i + 1, 2 * r)), stochastic: ratios.map((_, i) => row(i + 1, 2)) },
    } as unknown as Parameters<typeof widthNote>[0];
  }

  it('says the uncertainty hardly differs only when every ratio is near 1 (our wording rule)', () => {
    expect(widthNote(withRatios([0.99, 1, 1.01, 1]))).toContain("the two models' uncertainty hardly differs");
    // Steady at 0.60: the fixed line is much narrower throughout, whatever the ratio's steadiness.
    const steady = widthNote(withRatios([0.6, 0.6, 0.6, 0.6]));
    expect(steady).not.toContain('hardly differs');
    expect(steady).toContain('0.60 at 2025 and 0.60 at 2028 (narrower at every horizon)');
    expect(widthNote(withRatios([0.9, 1.1, 1.2, 1.3]))).toContain('(narrower at some horizons and wider at others)');
    expect(widthNote(withRatios([1.1, 1.2, 1.2, 1.3]))).toContain('(wider at every horizon)');
  });
});
