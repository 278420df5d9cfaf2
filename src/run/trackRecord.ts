// How the earlier as-of memos' forecasts fared: for each series of this memo, each earlier memo
// that forecast it and each target period this memo's data now hold, the outcome against both
// models' point forecasts and intervals, and the coverage and errors so far of each model and of
// whichever model each earlier memo recommended. A pure function of the record documents;
// outcomes are this memo's values (revised values included), series are matched by id.
import type { TrendModelKind } from '../base/settings.js';
import type { ChoiceScore, LevelCoverage, SeriesTrackRecord, TrackedChoice, TrackedForecast, TrackedRow, TrackRecord } from '../memo/trackRecordPart.js';
import type { ComparableDocument, ComparableForecast, ComparableRecord } from './comparableDocument.js';
import { byRecency, type EarlierRecord } from './findEarlierRecord.js';
import type { RecordDocument } from './recordDocument.js';

const MODELS: readonly TrendModelKind[] = ['deterministic', 'stochastic'];

/**
 * Adds `track_record` to a memo's record document when the memo has an as-of period and earlier
 * as-of memos were read; `run` and `verify` both call it, with the same earlier records.
 */
export function attachTrackRecord(document: RecordDocument, earlier: readonly EarlierRecord[]): void {
  if (document.memo.as_of !== '' && earlier.length > 0) document.track_record = trackRecord(document, earlier.map((memo) => memo.document));
}

/** `now` with its observed values; `earlier` every earlier as-of memo of the same id, in any order. */
export function trackRecord(now: ComparableDocument, earlier: readonly ComparableDocument[]): TrackRecord {
  const oldestFirst = [...earlier].sort((a, b) => byRecency(b.memo.as_of, a.memo.as_of));
  const series = now.records.map((record) => seriesTrackRecord(record, observedValues(now, record.series.id), oldestFirst));
  const recommended = series.flatMap((entry) => entry.rows.flatMap((row) => chosen(row, 'recommended')));
  return {
    as_of: now.memo.as_of,
    earlier: oldestFirst.map(({ memo, run_date }) => ({ as_of: memo.as_of, run_date })),
    series,
    overall: { outcomes: recommended.length, coverage: coverage(recommended) },
  };
}

function observedValues(document: ComparableDocument, id: string): Map<string, number> {
  const history = document.history?.find((entry) => entry.series_id === id);
  return new Map((history?.values ?? []).flatMap(({ period, value }) => (value === null ? [] : [[period, value] as const])));
}

function seriesTrackRecord(record: ComparableRecord, observed: Map<string, number>, earlier: readonly ComparableDocument[]): SeriesTrackRecord {
  const memos: SeriesTrackRecord['memos'] = [];
  const rows: TrackedRow[] = [];
  for (const document of earlier) {
    const before = document.records.find((candidate) => candidate.series.id === record.series.id);
    if (before === undefined) continue;
    const recommended = before.recommendation?.model ?? null;
    const byPeriod = (model: TrendModelKind) => new Map(before.forecasts[model].map((row) => [row.period, row]));
    const forecasts = { deterministic: byPeriod('deterministic'), stochastic: byPeriod('stochastic') };
    const periods = [...new Set(MODELS.flatMap((model) => before.forecasts[model].map((row) => row.period)))];
    const memoRows = periods.flatMap((period): TrackedRow[] => {
      const actual = observed.get(period);
      if (actual === undefined) return [];
      const first = forecasts.deterministic.get(period) ?? forecasts.stochastic.get(period);
      const tracked = (model: TrendModelKind) => {
        const row = forecasts[model].get(period);
        return row === undefined ? null : trackedForecast(row, actual);
      };
      return [{ as_of: document.memo.as_of, period, h: first?.h ?? 0, actual, recommended, models: { deterministic: tracked('deterministic'), stochastic: tracked('stochastic') } }];
    });
    memos.push({ as_of: document.memo.as_of, run_date: document.run_date, recommended, forecasts: periods.length, observed: memoRows.length });
    rows.push(...memoRows);
  }
  const score = (choice: TrackedChoice) => choiceScore(rows.flatMap((row) => chosen(row, choice)));
  return { series_id: record.series.id, title: record.series.title, memos, rows, scores: { deterministic: score('deterministic'), stochastic: score('stochastic'), recommended: score('recommended') } };
}

function trackedForecast(row: ComparableForecast, actual: number): TrackedForecast {
  const intervals = row.intervals ?? {};
  const inside: Record<string, boolean | null> = {};
  for (const [level, [lo, hi]] of Object.entries(intervals)) inside[level] = lo === null || hi === null ? null : lo <= actual && actual <= hi;
  return { point: row.point, error: row.point === null ? null : actual - row.point, intervals, inside };
}

/** The row's forecast from `choice` with its outcome, as a list of none or one. */
function chosen(row: TrackedRow, choice: TrackedChoice): { forecast: TrackedForecast; actual: number }[] {
  const model = choice === 'recommended' ? row.recommended : choice;
  const forecast = model === null ? null : row.models[model];
  return forecast === null ? [] : [{ forecast, actual: row.actual }];
}

function coverage(outcomes: readonly { forecast: TrackedForecast }[]): LevelCoverage[] {
  const levels = [...new Set(outcomes.flatMap(({ forecast }) => Object.keys(forecast.inside)))].sort((a, b) => Number(a) - Number(b));
  return levels.map((level) => {
    const judged = outcomes.map(({ forecast }) => forecast.inside[level]).filter((inside): inside is boolean => inside !== undefined && inside !== null);
    return { level, hits: judged.filter((inside) => inside).length, total: judged.length };
  });
}

function choiceScore(outcomes: readonly { forecast: TrackedForecast; actual: number }[]): ChoiceScore {
  const scored = outcomes.flatMap(({ forecast, actual }) => (forecast.error === null ? [] : [{ error: forecast.error, actual }]));
  const mean = (values: number[]) => (values.length === 0 ? null : values.reduce((sum, value) => sum + value, 0) / values.length);
  // A percentage error means something only against a positive outcome.
  const positive = scored.every(({ actual }) => actual > 0);
  return {
    outcomes: outcomes.length,
    coverage: coverage(outcomes),
    mae: mean(scored.map(({ error }) => Math.abs(error))),
    mape: positive ? mean(scored.map(({ error, actual }) => (100 * Math.abs(error)) / actual)) : null,
  };
}
