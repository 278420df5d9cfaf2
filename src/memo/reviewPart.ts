// What the memo's status, sign-off block and supersession note are rendered from: the sign-offs
// recorded in the memo folder, each already judged valid or void against this memo's content
// digest, and, for a revised memo, what changed since the revision it supersedes. Plain data,
// filled in by whoever assembles the memo (src/run/); the memo judges and computes nothing.

/** A reviewer's recorded decision. */
export type ReviewDecision = 'approve' | 'approve-with-changes' | 'return';

/**
 * Why a recorded sign-off does not count: its reviewer is not listed in the config; it was
 * given on other content (another digest); its reviewer has a public key and it carries no
 * signature, or one that does not verify.
 */
export type VoidReason = 'not-listed' | 'other-content' | 'unsigned' | 'bad-signature';

export interface RecordedSignOff {
  /** Its line in the sign-off log, from 1. */
  number: number;
  reviewer: string;
  /** The reviewer's role in the config when recorded; '' when none. */
  role: string;
  decision: ReviewDecision;
  /** YYYY-MM-DD. */
  date: string;
  /** '' when none. */
  comment: string;
  /** Numbers of earlier sign-offs whose comments this one resolves. */
  resolves: number[];
  /** True when it carries an Ed25519 signature that verifies with the reviewer's public key. */
  signed: boolean;
  /** null when valid. */
  void_reason: VoidReason | null;
}

/** An input whose digest differs between the superseded revision and this memo. */
export interface InputChange {
  role: string;
  path: string;
  /** null when the input is new. */
  before: string | null;
  /** null when the input is gone. */
  after: string | null;
}

/** One of the largest forecast changes between the superseded revision and this memo. */
export interface PointChange {
  series: string;
  model: 'deterministic' | 'stochastic';
  period: string;
  before: number | null;
  after: number | null;
  percent_change: number | null;
}

export interface Supersedes {
  /** The number of the revision kept under revisions/. */
  revision: number;
  /** That revision's content digest. */
  digest: string;
  inputs: InputChange[];
  /** Numbers of record.json compared (as verify compares them), and how many differ; null when either lacks record.json. */
  numbers: { compared: number; differing: number } | null;
  /** The largest changes of point forecasts, by size of the percent change. */
  largest: PointChange[];
  /** Observations revised (values that differ in periods both hold), over all series. */
  observations_revised: number;
}
