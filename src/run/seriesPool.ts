// A pool of worker threads that analyse whole series, for runs with many series: each worker
// takes one series at a time and runs its backtest inline, so the threads never nest.
// Results come back per task, so records do not depend on the thread count.
import Tinypool from 'tinypool';
import type { AnalysisRecord } from '../analysis/record.js';
import { workerModule } from '../base/workerModule.js';
import type { SeriesTask } from './analysePlannedSeries.js';

export interface SeriesPool {
  readonly threads: number;
  analyse(task: SeriesTask): Promise<AnalysisRecord>;
  close(): Promise<void>;
}

export function openSeriesPool(threads: number): SeriesPool {
  const pool = new Tinypool({
    filename: workerModule(import.meta.url, 'analysePlannedSeries', 'analysePlannedSeries'),
    name: 'analysePlannedSeries',
    minThreads: threads,
    maxThreads: threads,
  });
  return {
    threads,
    analyse: (task) => pool.run({ ...task, threads: 1 }) as Promise<AnalysisRecord>,
    close: () => pool.destroy(),
  };
}
