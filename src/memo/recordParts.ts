// The parts of an AnalysisRecord that the memo reads but that other stages add: the
// rolling-origin backtest, trend stability and the recommendation. Shapes follow the record
// contract, with every number allowed to be null as it may be in the JSON; each part may be
// missing so a record without it still renders, with a "not run" note.
import type { AnalysisRecord, JsonNumber } from '../analysis/record.js';
import type { EvidenceRecord } from '../evidence/collectEvidence.js';

/** Values keyed by interval level in percent, e.g. { "80": 0.81, "95": 0.94 }. */
export type ByLevel = Record<string, JsonNumber>;

export interface BacktestHorizonRow {
  h: number;
  /** Forecast errors averaged at this horizon. */
  n: number;
  mae: JsonNumber;
  rmse: JsonNumber;
  mape: JsonNumber;
  mase: JsonNumber;
  coverage?: ByLevel;
  width?: ByLevel;
  interval_score?: ByLevel;
  crps?: JsonNumber;
}

export type BacktestMethod = 'deterministic' | 'stochastic' | 'naive';

export interface BacktestComparison {
  h: number;
  loss: 'squared_error' | 'interval_score_95';
  statistic: JsonNumber;
  p_value: JsonNumber;
  better: 'deterministic' | 'stochastic' | null;
  available: boolean;
  reason?: string;
}

export interface BacktestPart {
  settings: {
    origins: number;
    horizon: number;
    refit: boolean | number | string;
    window: number | string | null;
    min_train: number;
    levels: number[];
  };
  /** Each origin: observations used to fit and the last period they cover. */
  origins: { length: number; period: string }[];
  per_horizon: Record<BacktestMethod, BacktestHorizonRow[]>;
  comparison: BacktestComparison[];
  notes: string[];
}

export interface SlopeWindowPart {
  /** Observations used. */
  end: number;
  slope: JsonNumber;
  se: JsonNumber;
}

export interface DriftWindowPart {
  end: number;
  drift: JsonNumber;
  se: JsonNumber;
}

/** Keyed by test size in percent: "10", "5", "1". */
export interface BreakTestPart {
  method: string;
  source: string;
  stat: JsonNumber;
  restrictions: number;
  /** Fraction of the sample cut from each end of the candidate dates. */
  trimming: number;
  /** 0-based position of the first observation after the most likely break. */
  break_index: number;
  critical: Record<'10' | '5' | '1', JsonNumber>;
  reject: Record<'10' | '5' | '1', boolean>;
  /** Where the p-value lies among the critical values, e.g. "0.01 < p < 0.05". */
  p_bound: string;
  summary?: string;
}

export interface StabilityPart {
  windows: {
    deterministic: SlopeWindowPart[];
    stochastic: DriftWindowPart[];
    min_window: number;
    step: number;
  };
  break_test: { deterministic: BreakTestPart; stochastic: BreakTestPart };
}

export type ModelKind = 'deterministic' | 'stochastic';

export interface RecommendationPart {
  model: ModelKind;
  rule: string;
  fixed_by_config: boolean;
  justification?: string;
  reasons: string[];
}

/** An AnalysisRecord as the memo reads it: the later parts may be missing (stability is null when it could not be computed). */
export type MemoRecord = Omit<AnalysisRecord, 'evidence'> & {
  evidence: Omit<EvidenceRecord, 'stability'> & { stability?: StabilityPart | null };
  backtest?: BacktestPart;
  recommendation?: RecommendationPart;
};
