// Runs the origin tasks inline (one thread) or on a pool of worker threads. Each task is a
// pure function of its input, tasks of one chain run in order in one thread (forecastAtOrigin.ts),
// and results are returned in task order, so the output does not depend on the thread count.
// The worker module sits next to this one (see base/workerModule.ts).
//
// A caller that runs many backtests (a batch of memos) opens one pool and passes it to
// every runBacktest, so threads start once; otherwise each backtest opens its own.
import Tinypool from 'tinypool';
import { workerModule } from '../base/workerModule.js';
import { forecastChain, type OriginForecast, type OriginTask } from './forecastAtOrigin.js';

/** Called as each chain of tasks finishes, with the chain's task indices; for progress only. */
export type ChainsDone = (taskIndices: readonly number[]) => void;

export interface OriginPool {
  readonly threads: number;
  run(tasks: readonly OriginTask[], onChainDone?: ChainsDone): Promise<OriginForecast[]>;
  close(): Promise<void>;
}

/** A pool of `threads` workers for origin tasks; close it when done. */
export function openOriginPool(threads: number): OriginPool {
  const pool = new Tinypool({ filename: workerModule(import.meta.url, 'forecastAtOrigin', 'forecastChain'), name: 'forecastChain', minThreads: threads, maxThreads: threads });
  return {
    threads,
    run: (tasks, onChainDone) => inChains(tasks, (chain) => pool.run(chain) as Promise<OriginForecast[]>, onChainDone),
    close: () => pool.destroy(),
  };
}

export async function runOriginTasks(tasks: readonly OriginTask[], threads: number, shared?: OriginPool, onChainDone?: ChainsDone): Promise<OriginForecast[]> {
  const chains = chainsOf(tasks);
  if (shared !== undefined && chains.length > 1) return shared.run(tasks, onChainDone);
  if (threads <= 1 || chains.length <= 1) return inChains(tasks, (chain) => Promise.resolve(forecastChain(chain)), onChainDone);
  const pool = openOriginPool(Math.min(threads, chains.length));
  try {
    return await pool.run(tasks, onChainDone);
  } finally {
    await pool.close();
  }
}

/** The tasks' chains, each in task order: tasks sharing a `chain` together, every other task alone. */
function chainsOf(tasks: readonly OriginTask[]): number[][] {
  const byChain = new Map<number, number[]>();
  const chains: number[][] = [];
  tasks.forEach((task, index) => {
    if (task.chain === undefined) {
      chains.push([index]);
      return;
    }
    const chain = byChain.get(task.chain);
    if (chain !== undefined) chain.push(index);
    else {
      const fresh = [index];
      byChain.set(task.chain, fresh);
      chains.push(fresh);
    }
  });
  return chains;
}

/** Runs each chain with `run` and puts the forecasts back in task order; `onChainDone` hears of each chain as it finishes. */
async function inChains(tasks: readonly OriginTask[], run: (chain: OriginTask[]) => Promise<OriginForecast[]>, onChainDone?: ChainsDone): Promise<OriginForecast[]> {
  const chains = chainsOf(tasks);
  const results = new Array<OriginForecast>(tasks.length);
  const done = await Promise.all(
    chains.map(async (chain) => {
      const forecasts = await run(chain.map((index) => tasks[index]));
      onChainDone?.(chain);
      return forecasts;
    }),
  );
  chains.forEach((chain, c) => chain.forEach((index, i) => (results[index] = done[c][i])));
  return results;
}
