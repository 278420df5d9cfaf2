// One series of a config → its AnalysisRecord: both models, the evidence, the backtest and the
// recommendation. Runs in the main thread or in a worker (seriesPool.ts loads this module).
import { analyseSeries } from '../analysis/analyseSeries.js';
import type { AnalysisRecord } from '../analysis/record.js';
import type { PlannedSeries } from './readPlannedSeries.js';

export interface SeriesTask extends PlannedSeries {
  /** Threads for the backtest; 1 inside a worker, where the series itself is the unit of work. */
  threads?: number;
}

export function analysePlannedSeries({ plan, series, settings, threads }: SeriesTask): Promise<AnalysisRecord> {
  return analyseSeries(series, settings, { id: plan.id, title: plan.title, file: plan.fileAsWritten }, { backtest: true, threads });
}
