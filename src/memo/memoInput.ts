// What the memo is rendered from: memo details, paper size, one entry per series (its
// AnalysisRecord plus what the analyst wrote about it) and the reproducibility facts.
// Plain data, independent of the config code: whoever runs the analysis fills it in.
import type { AnalysisRecord } from '../analysis/record.js';
import type { RecordedSignOff, Supersedes } from './reviewPart.js';
import type { Revisions } from './revisionsPart.js';
import type { TrackRecord } from './trackRecordPart.js';

export type Paper = 'A4' | 'Letter';

export type SignOffDecision = 'approved' | 'approved-with-changes' | 'rejected';

export interface Reviewer {
  name: string;
  role: string;
}

export interface SignOff {
  /** A reviewer's name as listed in `memo.reviewers`. */
  reviewer: string;
  /** ISO date, YYYY-MM-DD. */
  date: string;
  decision: SignOffDecision;
  comment?: string;
}

export interface MemoDetails {
  id: string;
  title: string;
  client: string;
  prepared_by: string;
  reference: string;
  /** The date the memo speaks for, as the analyst writes it. */
  as_of: string;
  author: string;
  reviewers: Reviewer[];
  /** Sign-offs typed into the config: shown as declared, not recorded; they never sign a memo off. */
  sign_off: SignOff[];
}

export interface Assumption {
  choice: string;
  value: string;
  basis: string;
  /** Who settled it: the config, the tool's default, or the data (a choice the analysis made, such as the ARMA order). */
  set_by: 'config' | 'default' | 'data';
}

export interface HistoryPoint {
  period: string;
  /** null for a missing observation. */
  value: number | null;
}

/** A series whose data end more than one period before what the memo's as-of period could include. */
export interface DataEnd {
  /** The last observed period. */
  last: string;
  /** The memo's as-of period. */
  as_of: string;
  /** The latest period of the series' frequency that ends by the end of the as-of period. */
  reachable: string;
  /** Periods from `last` to `reachable` (more than one). */
  missing: number;
}

export interface MemoSeries {
  record: AnalysisRecord;
  /** Observed values oldest first; the record does not carry them. Without it the history chart is left out with a note. */
  history?: HistoryPoint[];
  /** Unit of the values, e.g. "ML/day"; shown after numbers. */
  units?: string;
  notes?: string;
  /** Where the data come from and which release, as the config gives them (shown on page 1). */
  source?: string;
  vintage?: string;
  assumptions: Assumption[];
  /** Set when the data end well before the as-of period (src/run/checkAsOf.ts). */
  data_end?: DataEnd;
}

export interface FileDigest {
  file: string;
  sha256: string;
}

export interface Reproducibility {
  tool: string;
  version: string;
  command: string;
  run_date: string;
  config: FileDigest;
  data: FileDigest[];
}

export interface MemoInput {
  memo: MemoDetails;
  paper: Paper;
  series: MemoSeries[];
  reproducibility: Reproducibility;
  /** This memo against the previous as-of memo; absent for a memo without an as-of period. */
  revisions?: Revisions;
  /** How the earlier as-of memos' forecasts fared (src/run/trackRecord.ts); absent without an as-of period. */
  track_record?: TrackRecord;
  /** SHA-256 of the memo's content (src/run/contentDigest.ts), which sign-offs are bound to. */
  digest?: string;
  /** The sign-offs recorded in the memo folder, in log order, each judged against `digest`. */
  sign_offs?: RecordedSignOff[];
  /** For a revised memo: the revision it supersedes and what changed. */
  supersedes?: Supersedes;
}
