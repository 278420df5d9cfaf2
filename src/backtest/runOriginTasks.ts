// Runs the origin tasks inline (one thread) or on a pool of worker threads. Each task is a
// pure function of its input and results are returned in task order, so the output does
// not depend on the thread count. The worker module sits next to this one: compiled .js
// under dist/, or TypeScript when running from the sources (tests, benchmarks).
import Tinypool from 'tinypool';
import { forecastAtOrigin, type OriginForecast, type OriginTask } from './forecastAtOrigin.js';

export async function runOriginTasks(tasks: readonly OriginTask[], threads: number): Promise<OriginForecast[]> {
  if (threads <= 1 || tasks.length <= 1) return tasks.map(forecastAtOrigin);
  const size = Math.min(threads, tasks.length);
  const pool = new Tinypool({ filename: workerModule(), name: 'forecastAtOrigin', minThreads: size, maxThreads: size });
  try {
    return await Promise.all(tasks.map((task): Promise<OriginForecast> => pool.run(task)));
  } finally {
    await pool.destroy();
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
