// The monthly comparison as a pure function of two record documents, on constructed pairs.
// Expected values are the arithmetic of the constructed numbers (our spec: src/run/compareRecords.ts).
import { describe, expect, it } from 'vitest';
import type { ComparableDocument, ComparableForecast, ComparableRecord } from '../../src/run/comparableDocument.js';
import { isComparableDocument } from '../../src/run/comparableDocument.js';
import { compareRecords } from '../../src/run/compareRecords.js';

function path(first: number, points: number[]): ComparableForecast[] {
  return points.map((point, i) => ({ h: i + 1, period: String(first + i), point }));
}

function record(id: string, last: number, deterministic: number[], stochastic: number[], extra: Partial<ComparableRecord> = {}): ComparableRecord {
  return {
    series: { id, title: `Series ${id}`, last: String(last) },
    models: { deterministic: { p: 1, q: 0 }, stochastic: { p: 0, q: 1 } },
    forecasts: { deterministic: path(last + 1, deterministic), stochastic: path(last + 1, stochastic) },
    recommendation: { model: 'stochastic' },
    ...extra,
  };
}

function document(asOf: string, records: ComparableRecord[], history?: ComparableDocument['history']): ComparableDocument {
  return { memo: { id: 'invented-outlook', as_of: asOf }, run_date: '2026-01-05', records, ...(history === undefined ? {} : { history }) };
}

describe('compareRecords', () => {
  const earlier = document(
    '2025-11',
    [record('a', 2020, [100, 102, 104], [100, 101, 102]), record('gone', 2020, [1], [1])],
    [
      { series_id: 'a', values: [{ period: '2019', value: 90 }, { period: '2020', value: 95 }] },
      { series_id: 'gone', values: [{ period: '2020', value: 1 }] },
    ],
  );
  const now = document(
    '2025-12',
    [
      record('a', 2021, [103, 105, 107], [101, 102, 103], { models: { deterministic: { p: 1, q: 0 }, stochastic: { p: 1, q: 1 } }, recommendation: { model: 'deterministic' } }),
      record('new', 2021, [5], [5]),
    ],
    [
      { series_id: 'a', values: [{ period: '2019', value: 90 }, { period: '2020', value: 96 }, { period: '2021', value: 99 }] },
      { series_id: 'new', values: [{ period: '2021', value: 5 }] },
    ],
  );
  const revisions = compareRecords(now, earlier);
  const a = revisions.series[0];

  it('names both memos and the series dropped since the earlier one', () => {
    expect(revisions.as_of).toBe('2025-12');
    expect(revisions.earlier).toEqual({ as_of: '2025-11', run_date: '2026-01-05' });
    expect(revisions.dropped).toEqual([{ series_id: 'gone', title: 'Series gone' }]);
  });

  it('compares the points for the same target period, with the horizon of each memo', () => {
    // Earlier: 2021 at h=1, 2022 at h=2, 2023 at h=3; now: 2022 at h=1, 2023 at h=2, 2024 at h=3.
    const deterministic = a.forecasts.filter((row) => row.model === 'deterministic');
    expect(deterministic.map((row) => [row.period, row.h_earlier, row.h, row.point_earlier, row.point])).toEqual([
      ['2022', 2, 1, 102, 103],
      ['2023', 3, 2, 104, 105],
    ]);
    expect(deterministic[0].change).toBe(1);
    // 100 × 1 / 102.
    expect(deterministic[0].percent_change).toBeCloseTo(0.98039215686, 10);
    const stochastic = a.forecasts.filter((row) => row.model === 'stochastic');
    // The stochastic path only moved on by a year: 2022 and 2023 are forecast as before.
    expect(stochastic.map((row) => [row.period, row.change, row.percent_change])).toEqual([
      ['2022', 0, 0],
      ['2023', 0, 0],
    ]);
  });

  it('reports changed orders and a changed recommendation, and the latest observations', () => {
    expect(a.orders).toEqual([{ model: 'stochastic', now: { p: 1, q: 1 }, earlier: { p: 0, q: 1 } }]);
    expect(a.recommendation).toEqual({ now: 'deterministic', earlier: 'stochastic' });
    expect(a.last).toEqual({ now: '2021', earlier: '2020' });
  });

  it('lists observations both memos hold whose values differ, not the new ones', () => {
    expect(a.data).toEqual([{ period: '2020', value: 96, value_earlier: 95, change: 1, percent_change: (100 * 1) / 95 }]);
  });

  it('marks a series the earlier memo lacks and compares nothing for it', () => {
    const added = revisions.series[1];
    expect(added.in_earlier).toBe(false);
    expect(added.forecasts).toEqual([]);
    expect(added.paths.earlier).toBeNull();
    expect(added.data).toBeNull();
  });

  it('says data revisions are unknown when the earlier record carries no observed values', () => {
    const { history: _dropped, ...withoutHistory } = earlier;
    const result = compareRecords(now, withoutHistory);
    expect(result.series[0].data).toBeNull();
    expect(result.series[0].forecasts).toHaveLength(4);
  });

  it('keeps a missing value and a zero apart: no percent change from zero', () => {
    const before = document('2025-11', [record('a', 2020, [0], [0])], [{ series_id: 'a', values: [{ period: '2020', value: null }] }]);
    const after = document('2025-12', [record('a', 2020, [2], [0])], [{ series_id: 'a', values: [{ period: '2020', value: 3 }] }]);
    const result = compareRecords(after, before).series[0];
    expect(result.forecasts[0]).toMatchObject({ period: '2021', change: 2, percent_change: null });
    expect(result.data).toEqual([{ period: '2020', value: 3, value_earlier: null, change: null, percent_change: null }]);
  });

  it('has nothing to compare without an earlier memo', () => {
    expect(compareRecords(now, null)).toEqual({ as_of: '2025-12', earlier: null, series: [], dropped: [] });
  });
});

describe('isComparableDocument', () => {
  it('accepts a record document and refuses one with a part of the wrong shape', () => {
    const good = { schema: 'trendbrief.memo/1', ...document('2025-11', [record('a', 2020, [1], [1])]) };
    expect(isComparableDocument(good)).toBe(true);
    expect(isComparableDocument({ ...good, schema: 'other/1' })).toBe(false);
    expect(isComparableDocument({ ...good, records: [{ ...good.records[0], forecasts: { deterministic: [] } }] })).toBe(false);
    expect(isComparableDocument({ ...good, history: [{ series_id: 'a', values: [{ period: '2020', value: '5' }] }] })).toBe(false);
    expect(isComparableDocument([good])).toBe(false);
  });
});
