// What the memo's revisions section is rendered from: this memo compared with the most recent
// earlier as-of memo of the same id. Plain data, filled in by whoever runs the analysis
// (src/run/compareRecords.ts); the memo computes nothing from it but formatting.
import type { TrendModelKind } from '../base/settings.js';

export interface ArmaOrder {
  p: number;
  q: number;
}

/** One model's point forecast for one target period; null where the record holds no number. */
export interface PathPoint {
  period: string;
  point: number | null;
}

export type ModelPaths = Record<TrendModelKind, PathPoint[]>;

/** The same target period forecast by both memos. */
export interface ForecastRevision {
  model: TrendModelKind;
  period: string;
  /** Steps ahead in this memo and in the earlier one. */
  h: number;
  h_earlier: number;
  point: number | null;
  point_earlier: number | null;
  /** point − point_earlier. */
  change: number | null;
  /** 100 × change / |point_earlier|; null when the earlier point is 0 or missing. */
  percent_change: number | null;
}

/** An observation both memos hold whose value differs (a data revision). */
export interface DataRevision {
  period: string;
  value: number | null;
  value_earlier: number | null;
  change: number | null;
  percent_change: number | null;
}

export interface SeriesRevisions {
  series_id: string;
  title: string;
  /** False when the earlier memo has no series with this id: nothing else is compared. */
  in_earlier: boolean;
  /** Last observed period in this memo and in the earlier one (null when not in it). */
  last: { now: string; earlier: string | null };
  forecasts: ForecastRevision[];
  paths: { now: ModelPaths; earlier: ModelPaths | null };
  /** Models whose ARMA order changed. */
  orders: { model: TrendModelKind; now: ArmaOrder; earlier: ArmaOrder }[];
  /** Null when the recommended model is the same in both (or neither has one). */
  recommendation: { now: TrendModelKind | null; earlier: TrendModelKind | null } | null;
  /** Null when the earlier record carries no observed values to compare with. */
  data: DataRevision[] | null;
}

export interface Revisions {
  /** This memo's as-of period. */
  as_of: string;
  /** The memo compared with; null when no earlier as-of memo was found. */
  earlier: { as_of: string; run_date: string } | null;
  series: SeriesRevisions[];
  /** Series of the earlier memo that this one no longer has. */
  dropped: { series_id: string; title: string }[];
}
