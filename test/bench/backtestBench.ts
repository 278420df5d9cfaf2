// Backtest benchmark: the whole method re-run at every origin (`reselect`: the AICc order
// search over p, q ≤ 3 for both models) on the Nile series (n = 100, R datasets::Nile),
// K = 20 origins, B = 5. Every run starts its own worker pool, as one command-line run does,
// so thread start-up is counted. From the sources the workers also load tsx.
import { availableParallelism } from 'node:os';
import { runBacktest } from '../../src/backtest/runBacktest.js';
import { readSeriesCsv } from '../../src/data/readSeriesCsv.js';
import { median, type BenchRow } from './timing.js';

const REPEATS = 3;

async function timeAsync(run: () => Promise<unknown>, repeats: number): Promise<number[]> {
  await run();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const start = performance.now();
    await run();
    times.push(performance.now() - start);
  }
  return times;
}

export async function backtestBench(): Promise<BenchRow[]> {
  const nile = readSeriesCsv(new URL('../fixtures/nile.csv', import.meta.url).pathname);
  const options = { refit: 'reselect', origins: 20, horizon: 5, maxP: 3, maxQ: 3 } as const;
  const threads = Math.min(availableParallelism(), options.origins);
  const pooled = await timeAsync(() => runBacktest(nile, options), REPEATS);
  const inline = await timeAsync(() => runBacktest(nile, { ...options, threads: 1 }), REPEATS);
  return [
    { name: `reselect, n = 100, K = 20, B = 5, both models, ${threads} threads`, ms: median(pooled), target: 1000, extra: { threads } },
    { name: 'reselect, n = 100, K = 20, B = 5, both models, inline (1 thread)', ms: median(inline) },
  ];
}
