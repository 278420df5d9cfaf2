// The AnalysisRecord: one series' complete analysis as plain JSON, the hinge between the
// statistics and everything that shows it (../../DEVELOPERS.md, "The AnalysisRecord").
// Keys are a contract: add freely, rename none. Numbers that do not exist (a standard
// error at a singular Hessian, say) are null, never NaN.
import type { Frequency } from '../data/period.js';
import type { BacktestRecord } from '../backtest/backtestRecord.js';
import type { EvidenceRecord } from '../evidence/collectEvidence.js';
import type { RecommendationRecord } from './recommendModel.js';

export const RECORD_SCHEMA = 'trendbrief.analysis/1';

export type JsonNumber = number | null;

export interface CandidateRecord {
  p: number;
  q: number;
  loglik: JsonNumber;
  aicc: JsonNumber;
  converged: boolean;
}

export interface ModelRecord {
  p: number;
  q: number;
  nobs: number;
  loglik: number;
  aicc: JsonNumber;
  sigma2: number;
  converged: boolean;
  /** intercept and slope (deterministic) or drift (stochastic), plus ar and ma. */
  coefficients: Record<string, number | number[]>;
  stderr: Record<string, JsonNumber | JsonNumber[]>;
  candidates: CandidateRecord[];
  /** The model in one line of algebra, with its estimates. */
  equation: string;
  /**
   * Smallest modulus of the AR and MA polynomial roots (null without such a part). Near 1:
   * the fit sits at the edge of stationarity or invertibility.
   */
  roots: { ar_min_modulus: JsonNumber; ma_min_modulus: JsonNumber };
}

export interface ForecastRow {
  h: number;
  period: string;
  point: number;
  intervals: Record<string, [number, number]>;
  model_scale: { mean: number; se_process: number; se_total: number };
}

export interface AnalysisRecord {
  schema: typeof RECORD_SCHEMA;
  tool: { name: string; version: string };
  series: {
    id: string;
    title: string;
    frequency: Frequency;
    first: string;
    last: string;
    n: number;
    transform: { kind: 'none' | 'log' | 'box-cox'; lambda?: number };
    source: { file: string; sha256: string; column: string };
  };
  settings: {
    horizon: number;
    levels: number[];
    max_p: number;
    max_q: number;
    coefficient_uncertainty: boolean;
    point: 'median' | 'mean';
    significance: number;
  };
  models: { deterministic: ModelRecord; stochastic: ModelRecord };
  forecasts: { deterministic: ForecastRow[]; stochastic: ForecastRow[] };
  evidence: EvidenceRecord;
  /** Rolling-origin backtest (see completeAnalysis); null when the series is too short for one. */
  backtest?: BacktestRecord | null;
  /** Why there is no backtest, when `backtest` is null. */
  backtest_unavailable?: string;
  recommendation?: RecommendationRecord;
}

/** A number for JSON: non-finite values become null. */
export function jsonNumber(value: number): JsonNumber {
  return Number.isFinite(value) ? value : null;
}
