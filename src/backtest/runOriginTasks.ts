// Runs the origin tasks inline (one thread) or on a pool of worker threads. Each task is a
// pure function of its input and results are returned in task order, so the output does
// not depend on the thread count. The worker module sits next to this one (see
// parallel/workerModule.ts).
//
// A caller that runs many backtests (a batch of memos) opens one pool and passes it to
// every runBacktest, so threads start once; otherwise each backtest opens its own.
import Tinypool from 'tinypool';
import { workerModule } from '../base/workerModule.js';
import { forecastAtOrigin, type OriginForecast, type OriginTask } from './forecastAtOrigin.js';

export interface OriginPool {
  readonly threads: number;
  run(tasks: readonly OriginTask[]): Promise<OriginForecast[]>;
  close(): Promise<void>;
}

/** A pool of `threads` workers for origin tasks; close it when done. */
export function openOriginPool(threads: number): OriginPool {
  const pool = new Tinypool({ filename: workerModule(import.meta.url, 'forecastAtOrigin', 'forecastAtOrigin'), name: 'forecastAtOrigin', minThreads: threads, maxThreads: threads });
  return {
    threads,
    run: (tasks) => Promise.all(tasks.map((task): Promise<OriginForecast> => pool.run(task))),
    close: () => pool.destroy(),
  };
}

export async function runOriginTasks(tasks: readonly OriginTask[], threads: number, shared?: OriginPool): Promise<OriginForecast[]> {
  if (shared !== undefined && tasks.length > 1) return shared.run(tasks);
  if (threads <= 1 || tasks.length <= 1) return tasks.map(forecastAtOrigin);
  const pool = openOriginPool(Math.min(threads, tasks.length));
  try {
    return await pool.run(tasks);
  } finally {
    await pool.close();
  }
}
