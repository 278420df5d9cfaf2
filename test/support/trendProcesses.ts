// The four processes the model-selection checks and the recommendation study draw from, each
// simulated n + extra periods from a seed (the last `extra` held out): a trend with AR(1)
// noise (φ = 0.5 and 0.9; trend-stationary), a random walk with drift and an ARIMA(1,1,0)
// with drift (difference-stationary). Shocks N(0, 1); the AR noise starts from its stationary
// law and the differenced AR from its mean.
import { seededNormals } from '../evidence/seededNormals.js';

export type TrendProcess = 'trend-ar1-0.5' | 'trend-ar1-0.9' | 'random-walk' | 'arima-110';

export const TREND_PROCESSES: readonly TrendProcess[] = ['trend-ar1-0.5', 'trend-ar1-0.9', 'random-walk', 'arima-110'];

/** Whether the process's trend is a fixed line (trend-stationary) or wanders (difference-stationary). */
export function processTrend(process: TrendProcess): 'deterministic' | 'stochastic' {
  return process.startsWith('trend') ? 'deterministic' : 'stochastic';
}

/** The slope per period of every process: the line's slope, or the drift. */
export const PROCESS_SLOPE = 0.5;

export function simulateProcess(process: TrendProcess, length: number, seed: number): Float64Array {
  const draw = seededNormals(seed);
  const y = new Float64Array(length);
  if (processTrend(process) === 'deterministic') {
    const phi = process === 'trend-ar1-0.5' ? 0.5 : 0.9;
    let u = draw() / Math.sqrt(1 - phi * phi);
    for (let t = 0; t < length; t++) {
      if (t > 0) u = phi * u + draw();
      y[t] = 10 + PROCESS_SLOPE * (t + 1) + u;
    }
    return y;
  }
  const phi = process === 'arima-110' ? 0.5 : 0;
  let level = 10;
  let change = 0;
  for (let t = 0; t < length; t++) {
    change = phi * change + draw();
    level += PROCESS_SLOPE + change;
    y[t] = level;
  }
  return y;
}

/** The seed of replicate `rep` of a process at length n, so every study and test draws the same series. */
export function processSeed(process: TrendProcess, n: number, rep: number): number {
  return 100_000 * (TREND_PROCESSES.indexOf(process) + 1) + 1000 * n + rep;
}
