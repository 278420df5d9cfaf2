// record.json, the memo's record document: the memo details, the run date, one AnalysisRecord
// per series and, beside them, each series' observed values. The values let a later as-of memo
// list data revisions; they sit beside the records, not inside them, because the
// AnalysisRecord describes an analysis and the data belong to the memo that used them.
// Keys are a contract: add freely, rename none.
import type { AnalysisRecord } from '../analysis/record.js';
import type { Series } from '../base/series.js';
import type { HistoryPoint, MemoDetails } from '../memo/memoInput.js';
import type { TrackRecord } from '../memo/trackRecordPart.js';

export const RECORD_DOCUMENT_SCHEMA = 'trendbrief.memo/1';

export interface SeriesHistory {
  series_id: string;
  /** Oldest first; null for a missing observation. */
  values: HistoryPoint[];
}

export interface RecordDocument {
  schema: typeof RECORD_DOCUMENT_SCHEMA;
  memo: MemoDetails;
  run_date: string;
  records: AnalysisRecord[];
  /** In the order of `records`. Documents written before the as-of folders existed lack it. */
  history: SeriesHistory[];
  /** How the earlier as-of memos' forecasts fared (trackRecord.ts); only in a memo with an as-of period. */
  track_record?: TrackRecord;
}

/** A series' observations as the memo and the record document hold them. */
export function seriesHistory(series: Series): HistoryPoint[] {
  return series.periods.map((period, t) => ({ period, value: Number.isFinite(series.values[t]) ? series.values[t] : null }));
}

export function recordDocumentText(document: RecordDocument): string {
  return `${JSON.stringify(document, null, 2)}\n`;
}
