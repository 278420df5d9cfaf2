// Runs the origin tasks inline (one thread) or on a pool of worker threads. Each task is a
// pure function of its input and results are returned in task order, so the output does
// not depend on the thread count. The worker module sits next to this one: compiled .js
// under dist/, or TypeScript when running from the sources (tests, benchmarks).
//
// A caller that runs many backtests (a batch of memos) opens one pool and passes it to
// every runBacktest, so threads start once; otherwise each backtest opens its own.
import Tinypool from 'tinypool';
import { forecastAtOrigin, type OriginForecast, type OriginTask } from './forecastAtOrigin.js';

export interface OriginPool {
  readonly threads: number;
  run(tasks: readonly OriginTask[]): Promise<OriginForecast[]>;
  close(): Promise<void>;
}

/** A pool of `threads` workers for origin tasks; close it when done. */
export function openOriginPool(threads: number): OriginPool {
  const pool = new Tinypool({ filename: workerModule(), name: 'forecastAtOrigin', minThreads: threads, maxThreads: threads });
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

/**
 * The module each worker imports. From the sources it is a small inline module that
 * registers tsx before importing the TypeScript file: Node 20 does not hand the parent's
 * loader hooks (nor an `--import` in the worker's execArgv) to worker threads.
 */
function workerModule(): string {
  if (!import.meta.url.endsWith('.ts')) return new URL('./forecastAtOrigin.js', import.meta.url).href;
  const tsxApi = import.meta.resolve('tsx/esm/api');
  const source = new URL('./forecastAtOrigin.ts', import.meta.url).href;
  const entry = `const { register } = await import(${JSON.stringify(tsxApi)}); register(); export const { forecastAtOrigin } = await import(${JSON.stringify(source)});`;
  return `data:text/javascript,${encodeURIComponent(entry)}`;
}
