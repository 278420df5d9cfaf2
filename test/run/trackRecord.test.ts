// The track record on hand-made record documents (our spec: DEVELOPERS.md "The track record"):
// outcomes against both models' points and intervals, coverage and errors so far, the
// recommended choice following each memo's recommendation, and the wording when outcomes are
// few. Every expected number is worked out by hand beside it.
import { describe, expect, it } from 'vitest';
import type { ComparableDocument, ComparableRecord } from '../../src/run/comparableDocument.js';
import { trackRecord } from '../../src/run/trackRecord.js';
import { compileChart } from '../../src/memo/charts/renderChart.js';
import { trackRecordChart } from '../../src/memo/charts/trackRecordChart.js';
import { trackRecordView } from '../../src/memo/view/trackRecordView.js';
import { trackRecordClaims } from '../../src/memo/consistency/trackRecordClaims.js';

type Row = [period: string, point: number, lo80: number, hi80: number, lo95: number, hi95: number];

function record(id: string, det: Row[], sto: Row[], model: 'deterministic' | 'stochastic'): ComparableRecord {
  const rows = (list: Row[]) => list.map(([period, point, lo80, hi80, lo95, hi95], i) => ({ h: i + 1, period, point, intervals: { '80': [lo80, hi80] as [number, number], '95': [lo95, hi95] as [number, number] } }));
  return { series: { id, title: 'Ferry boardings', last: '2020' }, models: { deterministic: { p: 1, q: 0 }, stochastic: { p: 0, q: 0 } }, forecasts: { deterministic: rows(det), stochastic: rows(sto) }, recommendation: { model } };
}

function document(asOf: string, records: ComparableRecord[], values: [string, number | null][] = []): ComparableDocument {
  return { memo: { id: 'ferry', as_of: asOf }, run_date: '2026-01-01', records, history: [{ series_id: 'boardings', values: values.map(([period, value]) => ({ period, value })) }] };
}

// Memo as of 2020 forecast 2021-2023; memo as of 2021 forecast 2022-2024. Outcomes now: 2021 = 104, 2022 = 111, 2023 = 100 (invented).
const as2020 = document('2020', [
  record('boardings', [['2021', 102, 99, 105, 97, 107], ['2022', 104, 100, 108, 98, 110], ['2023', 106, 101, 111, 99, 113]], [['2021', 101, 97, 105, 95, 107], ['2022', 102, 96, 108, 93, 111], ['2023', 103, 95, 111, 91, 115]], 'stochastic'),
]);
const as2021 = document('2021', [
  record('boardings', [['2022', 107, 104, 110, 102, 112], ['2023', 109, 105, 113, 103, 115], ['2024', 111, 106, 116, 104, 118]], [['2022', 105, 101, 109, 99, 111], ['2023', 106, 100, 112, 97, 115], ['2024', 107, 99, 115, 96, 118]], 'deterministic'),
]);
const now = document('2023', [record('boardings', [], [], 'stochastic')], [['2020', 100], ['2021', 104], ['2022', 111], ['2023', 100]]);

describe('trackRecord', () => {
  const tracked = trackRecord(now, [as2021, as2020]);
  const series = tracked.series[0];

  it('lists each observed target of each earlier memo, oldest memo first', () => {
    expect(tracked.earlier.map((e) => e.as_of)).toEqual(['2020', '2021']);
    expect(series.rows.map((r) => [r.as_of, r.period, r.h, r.actual, r.recommended])).toEqual([
      ['2020', '2021', 1, 104, 'stochastic'],
      ['2020', '2022', 2, 111, 'stochastic'],
      ['2020', '2023', 3, 100, 'stochastic'],
      ['2021', '2022', 1, 111, 'deterministic'],
      ['2021', '2023', 2, 100, 'deterministic'],
    ]);
    // 2024 is not observed yet: 3 of the 2021 memo's forecasts, 2 observed.
    expect(series.memos.map((m) => [m.as_of, m.forecasts, m.observed])).toEqual([['2020', 3, 3], ['2021', 3, 2]]);
    // 2022 from 2020, deterministic: 111 − 104 = 7; outside [100, 108], outside [98, 110].
    expect(series.rows[1].models.deterministic).toMatchObject({ point: 104, error: 7, inside: { '80': false, '95': false } });
  });

  it('counts hits and errors for each model and for the recommended choice', () => {
    // Deterministic: errors 2, 7, −6 (2020 memo), 4, −9 (2021 memo); |e| mean = 28/5 = 5.6.
    // Inside 80%: 104∈[99,105] yes, 111∈[100,108] no, 100∈[101,111] no, 111∈[104,110] no, 100∈[105,113] no → 1 of 5.
    // Inside 95%: yes, no (111>110), yes (100∈[99,113]), yes (111∈[102,112]), no (100<103) → 3 of 5.
    expect(series.scores.deterministic.coverage).toEqual([{ level: '80', hits: 1, total: 5 }, { level: '95', hits: 3, total: 5 }]);
    expect(series.scores.deterministic.mae).toBeCloseTo(5.6, 12);
    // MAPE: 100 × (2/104 + 7/111 + 6/100 + 4/111 + 9/100) / 5.
    expect(series.scores.deterministic.mape).toBeCloseTo((100 * (2 / 104 + 7 / 111 + 6 / 100 + 4 / 111 + 9 / 100)) / 5, 10);
    // Recommended: stochastic for 2020's rows (errors 3, 9, −3), deterministic for 2021's (4, −9): MAE 28/5 = 5.6.
    // Inside 80%: 104∈[97,105] yes, 111∈[96,108] no, 100∈[95,111] yes, 111∈[104,110] no, 100∈[105,113] no → 2 of 5.
    // Inside 95%: yes, 111∈[93,111] yes, yes, yes, no → 4 of 5.
    expect(series.scores.recommended).toMatchObject({ outcomes: 5, coverage: [{ level: '80', hits: 2, total: 5 }, { level: '95', hits: 4, total: 5 }] });
    expect(series.scores.recommended.mae).toBeCloseTo(5.6, 12);
    expect(tracked.overall).toEqual({ outcomes: 5, coverage: [{ level: '80', hits: 2, total: 5 }, { level: '95', hits: 4, total: 5 }] });
  });

  it('leaves the percentage error out when an outcome is not positive', () => {
    const negative = document('2023', [record('boardings', [], [], 'stochastic')], [['2021', -1]]);
    expect(trackRecord(negative, [as2020]).series[0].scores.stochastic).toMatchObject({ outcomes: 1, mape: null });
  });

  it('says in one sentence what the earlier memos show, and that five outcomes are too few to judge', async () => {
    const view = await trackRecordView({ track_record: tracked, series: [] });
    expect(view?.summary).toBe(
      "Track record: 2 earlier memos; 5 of their forecasts are now observed: the recommended model's 80% intervals held 2 of 5 and its 95% intervals 4 of 5; 5 outcomes are too few to judge coverage.",
    );
    expect(view?.series[0].tooFew).toBe('5 outcomes: too few to judge coverage; the counts are shown without shares.');
    // The memo's read-back finds the sentences true, and a changed count false.
    const lines = `<section class="track-record"><p>${view?.summary}</p><p>${view?.series[0].summary}</p></section>`;
    expect(view?.series[0].summary).toBe(
      "Ferry boardings: 5 of 6 forecasts from 2 earlier memos observed so far; the recommended model's intervals held 2 of 5 at 80% and 4 of 5 at 95%, with a mean absolute error of 5.60.",
    );
    expect(trackRecordClaims(tracked, lines)).toEqual([]);
    expect(trackRecordClaims(tracked, lines.replace('80% intervals held 2 of 5', '80% intervals held 3 of 5'))).toEqual([
      "the track record sentence says 80% intervals held 3 of 5, which is not the track record's count",
    ]);
    expect(view?.series[0].detailRows[0]).toMatchObject({ asOf: '2020', period: '2021', actual: '104.00', stochastic: { point: '101.00 \u2605', inside: ['in', 'in'] } });
  });

  it('draws the recommended forecasts with their 80% bars and the outcomes, with no compile warnings', () => {
    const spec = trackRecordChart({ series: 'Ferry boardings', level: '80', rows: series.rows, history: now.history?.[0].values ?? [] });
    expect(compileChart(spec).warnings).toEqual([]);
    const layers = (spec as { layer: { data: { values: { period: string; point?: number; value?: number }[] } }[] }).layer;
    // The bars: the recommended forecasts, stochastic from 2020 (101, 102, 103) and deterministic from 2021 (107, 109).
    expect(layers[0].data.values.map((row) => row.point)).toEqual([101, 102, 103, 107, 109]);
    expect(layers.at(-1)?.data.values.map((row) => row.value)).toEqual([100, 104, 111, 100]);
    expect(spec.description).toContain('2 of the 5 outcomes fell inside those intervals.');
  });
});
