// Names for the parts of an AnalysisRecord that the memo reads. The memo renders whatever a
// record holds: a backtest that is missing or null, a stability check that is null and a
// missing recommendation each become a "not run" note rather than an error.
import type { AnalysisRecord } from '../analysis/record.js';
import type { RecommendationRecord } from '../analysis/recommendModel.js';
import type { BacktestRecord, ComparisonRow, ForecastMethod, HorizonScores } from '../backtest/backtestRecord.js';
import type { StabilityRecord } from '../evidence/types.js';
import type { TrendModelKind } from '../models/trendModels.js';

export type MemoRecord = AnalysisRecord;
export type BacktestPart = BacktestRecord;
export type BacktestHorizonRow = HorizonScores;
export type BacktestComparison = ComparisonRow;
export type BacktestMethod = ForecastMethod;
export type StabilityPart = StabilityRecord;
export type RecommendationPart = RecommendationRecord;
export type ModelKind = TrendModelKind;
