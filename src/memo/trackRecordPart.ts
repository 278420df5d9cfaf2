// What the memo's track record section is rendered from: how the forecasts of the earlier
// as-of memos of the same id fared against the values since observed in this memo's data.
// Plain data, computed by the run stage (src/run/trackRecord.ts) and kept in record.json as
// `track_record`; the memo computes nothing from it but formatting.
import type { TrendModelKind } from '../base/settings.js';

/** One model's forecast of one target period in an earlier memo, set against the outcome. */
export interface TrackedForecast {
  point: number | null;
  /** actual − point; null without a point. */
  error: number | null;
  /** Interval ends by level key ("80", "95"), as the earlier record has them. */
  intervals: Record<string, [number | null, number | null]>;
  /** By level key: the outcome inside the interval (ends included); null where an end is missing. */
  inside: Record<string, boolean | null>;
}

/** A target period an earlier memo forecast and this memo's data now hold. */
export interface TrackedRow {
  /** The earlier memo's as-of period. */
  as_of: string;
  period: string;
  /** Steps ahead of the earlier memo's last observation. */
  h: number;
  /** The value in this memo's data (revisions included). */
  actual: number;
  /** The model the earlier memo recommended; null when it recorded none. */
  recommended: TrendModelKind | null;
  /** Null for a model the earlier record has no forecast of this period from. */
  models: Record<TrendModelKind, TrackedForecast | null>;
}

export interface LevelCoverage {
  /** Level key, e.g. "80". */
  level: string;
  /** Outcomes inside the interval. */
  hits: number;
  /** Outcomes with an interval at this level. */
  total: number;
}

/** Accuracy so far of one choice: a model, or whichever model each earlier memo recommended. */
export interface ChoiceScore {
  outcomes: number;
  /** Levels in ascending order. */
  coverage: LevelCoverage[];
  /** Mean absolute error; null without outcomes. */
  mae: number | null;
  /** Mean absolute percentage error; null without outcomes or when an actual is not positive. */
  mape: number | null;
}

export type TrackedChoice = TrendModelKind | 'recommended';

export interface EarlierMemoSummary {
  as_of: string;
  run_date: string;
}

export interface SeriesTrackRecord {
  series_id: string;
  title: string;
  /** The earlier memos that forecast this series, oldest first. */
  memos: (EarlierMemoSummary & { recommended: TrendModelKind | null; forecasts: number; observed: number })[];
  /** Oldest memo first, then by target period. */
  rows: TrackedRow[];
  scores: Record<TrackedChoice, ChoiceScore>;
}

export interface TrackRecord {
  /** This memo's as-of period. */
  as_of: string;
  /** Every earlier as-of memo of this id read, oldest first. */
  earlier: EarlierMemoSummary[];
  /** In the order of this memo's series. */
  series: SeriesTrackRecord[];
  /** Interval coverage over every series of whichever model each earlier memo recommended (errors in different units are not pooled). */
  overall: Pick<ChoiceScore, 'outcomes' | 'coverage'>;
}
