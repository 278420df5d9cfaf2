// This memo against the most recent earlier as-of memo of the same id: forecast revisions for
// every target period both memos forecast, changed ARMA orders and recommendation, and data
// revisions (observations both hold whose values differ). A pure function of two record
// documents; series are matched by id.
import type { TrendModelKind } from '../base/settings.js';
import type { DataRevision, ForecastRevision, ModelPaths, Revisions, SeriesRevisions } from '../memo/revisionsPart.js';
import type { ComparableDocument, ComparableForecast, ComparableRecord } from './comparableDocument.js';
import type { SeriesHistory } from './recordDocument.js';

const MODELS: readonly TrendModelKind[] = ['deterministic', 'stochastic'];

export function compareRecords(now: ComparableDocument, earlier: ComparableDocument | null): Revisions {
  if (earlier === null) return { as_of: now.memo.as_of, earlier: null, series: [], dropped: [] };
  const ids = new Set(now.records.map((record) => record.series.id));
  return {
    as_of: now.memo.as_of,
    earlier: { as_of: earlier.memo.as_of, run_date: earlier.run_date },
    series: now.records.map((record) => {
      const before = earlier.records.find((candidate) => candidate.series.id === record.series.id);
      return seriesRevisions(record, historyOf(now, record.series.id), before, before === undefined ? undefined : historyOf(earlier, record.series.id));
    }),
    dropped: earlier.records.filter((record) => !ids.has(record.series.id)).map((record) => ({ series_id: record.series.id, title: record.series.title })),
  };
}

function historyOf(document: ComparableDocument, id: string): SeriesHistory | undefined {
  return document.history?.find((entry) => entry.series_id === id);
}

function seriesRevisions(record: ComparableRecord, history: SeriesHistory | undefined, earlier: ComparableRecord | undefined, earlierHistory: SeriesHistory | undefined): SeriesRevisions {
  const base = { series_id: record.series.id, title: record.series.title, paths: { now: paths(record), earlier: earlier === undefined ? null : paths(earlier) } };
  if (earlier === undefined) {
    return { ...base, in_earlier: false, last: { now: record.series.last, earlier: null }, forecasts: [], orders: [], recommendation: null, data: null };
  }
  const nowModel = record.recommendation?.model ?? null;
  const earlierModel = earlier.recommendation?.model ?? null;
  return {
    ...base,
    in_earlier: true,
    last: { now: record.series.last, earlier: earlier.series.last },
    forecasts: MODELS.flatMap((model) => forecastRevisions(model, record.forecasts[model], earlier.forecasts[model])),
    orders: MODELS.flatMap((model) => {
      const { p, q } = record.models[model];
      const before = earlier.models[model];
      return p === before.p && q === before.q ? [] : [{ model, now: { p, q }, earlier: { p: before.p, q: before.q } }];
    }),
    recommendation: nowModel === earlierModel ? null : { now: nowModel, earlier: earlierModel },
    data: history === undefined || earlierHistory === undefined ? null : dataRevisions(history, earlierHistory),
  };
}

function paths(record: ComparableRecord): ModelPaths {
  const path = (rows: ComparableForecast[]) => rows.map(({ period, point }) => ({ period, point }));
  return { deterministic: path(record.forecasts.deterministic), stochastic: path(record.forecasts.stochastic) };
}

function forecastRevisions(model: TrendModelKind, now: ComparableForecast[], earlier: ComparableForecast[]): ForecastRevision[] {
  const byPeriod = new Map(earlier.map((row) => [row.period, row]));
  return now.flatMap((row) => {
    const before = byPeriod.get(row.period);
    if (before === undefined) return [];
    const { change, percent } = difference(row.point, before.point);
    return [{ model, period: row.period, h: row.h, h_earlier: before.h, point: row.point, point_earlier: before.point, change, percent_change: percent }];
  });
}

/** Periods both histories hold whose values differ; a value that went missing or appeared counts. */
function dataRevisions(now: SeriesHistory, earlier: SeriesHistory): DataRevision[] {
  const byPeriod = new Map(earlier.values.map((point) => [point.period, point.value]));
  return now.values.flatMap(({ period, value }) => {
    if (!byPeriod.has(period)) return [];
    const before = byPeriod.get(period) ?? null;
    if (value === before) return [];
    const { change, percent } = difference(value, before);
    return [{ period, value, value_earlier: before, change, percent_change: percent }];
  });
}

function difference(now: number | null, earlier: number | null): { change: number | null; percent: number | null } {
  if (now === null || earlier === null) return { change: null, percent: null };
  const change = now - earlier;
  return { change, percent: earlier === 0 ? null : (100 * change) / Math.abs(earlier) };
}
