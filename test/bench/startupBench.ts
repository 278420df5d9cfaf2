// Start-up benchmark: whole processes as a user starts them, `node bin/trendbrief.js ...` on the
// compiled tool (npm run bench builds it first), beside a bare `node -e 0`: `--version`, and
// `fit` without backtest on the Lake Huron series (shared reference data, n = 98; both 16-order
// searches, the evidence and the forecasts). Medians of several runs after one warm-up.
import { execFileSync } from 'node:child_process';
import { resolve } from 'node:path';
import { median, type BenchRow } from './timing.js';

const REPEATS = 9;
const PROGRAM = resolve('bin/trendbrief.js');
const LAKE_HURON = resolve('test/fixtures/lake-huron.csv');

function timeProcess(args: readonly string[]): number {
  const once = (): number => {
    const start = performance.now();
    execFileSync(process.execPath, args, { stdio: 'ignore' });
    return performance.now() - start;
  };
  once();
  return median(Array.from({ length: REPEATS }, once));
}

export function startupBench(): BenchRow[] {
  const bare = timeProcess(['-e', '0']);
  const version = timeProcess([PROGRAM, '--version']);
  const fit = timeProcess([PROGRAM, 'fit', LAKE_HURON]);
  return [
    { name: 'node -e 0 (bare Node start)', ms: bare },
    { name: 'trendbrief --version', ms: version },
    { name: 'trendbrief --version, time above bare Node', ms: version - bare, target: 60 },
    { name: 'trendbrief fit lake-huron.csv (no backtest)', ms: fit, target: 250 },
  ];
}
