// Backtest benchmark: the whole method re-run at every origin (`reselect`: the AICc order
// search over p, q ≤ 3 for both models) on the Nile series (n = 100, R datasets::Nile),
// K = 20 origins, B = 5: once with a pool started per run (thread start-up counted; from the
// sources the workers also load tsx), once on a pool already running, as in a batch.
import { availableParallelism } from 'node:os';
import { runBacktest } from '../../src/backtest/runBacktest.js';
import { openOriginPool } from '../../src/backtest/runOriginTasks.js';
import { resolveSettings } from '../../src/config/resolveSettings.js';
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
  const nile = readSeriesCsv(new URL('../fixtures/nile.csv', import.meta.url).pathname, { missing: 'error' });
  const settings = resolveSettings({ max_p: 3, max_q: 3, backtest: { refit: 'reselect', origins: 20, horizon: 5 } }, nile);
  const threads = Math.min(availableParallelism(), settings.backtest.origins);
  const pooled = await timeAsync(() => runBacktest(nile, settings, { threads }), REPEATS);
  const inline = await timeAsync(() => runBacktest(nile, settings, { threads: 1 }), REPEATS);
  const pool = openOriginPool(threads);
  const warm = await timeAsync(() => runBacktest(nile, settings, { pool }), REPEATS);
  await pool.close();
  return [
    { name: `reselect, n = 100, K = 20, B = 5, both models, ${threads} threads started per run`, ms: median(pooled), target: 1000, extra: { threads } },
    { name: `reselect, n = 100, K = 20, B = 5, both models, ${threads} threads already running`, ms: median(warm), target: 1000, extra: { threads } },
    { name: 'reselect, n = 100, K = 20, B = 5, both models, inline (1 thread)', ms: median(inline) },
  ];
}
