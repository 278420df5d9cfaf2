// Engine benchmarks: one fit per (p, q) at n = 100, the full order grid for both models,
// and the grid against n. Series are simulated from a seeded trend + ARMA(1,1) process.
import { fitRegressionArma } from '../../src/models/fitRegressionArma.js';
import { fitTrendModel, trendDesign } from '../../src/models/trendModels.js';
import { simulateTrendArma } from '../support/simulateTrendArma.js';
import { median, timeRuns, type BenchRow } from './timing.js';

function simulate(n: number, seed: number): Float64Array {
  return simulateTrendArma({ n, seed, phi: 0.6, theta: 0.3, intercept: 50, slope: 0.3 });
}

export function engineBench(): BenchRow[] {
  const rows: BenchRow[] = [];
  const series = Array.from({ length: 5 }, (_, i) => simulate(100, 100 + i));
  const perOrder: number[] = [];
  for (let p = 0; p <= 3; p++) {
    for (let q = 0; q <= 3; q++) {
      const times: number[] = [];
      for (const w of series) {
        const design = trendDesign('deterministic', w);
        times.push(...timeRuns(() => fitRegressionArma(design.response, design.regressors, p, q), 3));
      }
      const value = median(times);
      perOrder.push(value);
      rows.push({ name: `one fit ARMA(${p},${q}), n = 100`, ms: value });
    }
  }
  rows.push({ name: 'one fit, median over all 16 orders, n = 100', ms: median(perOrder), target: 1 });
  const grid = series.flatMap((w) => timeRuns(() => (fitTrendModel('deterministic', w, 3, 3), fitTrendModel('stochastic', w, 3, 3)), 2));
  rows.push({ name: 'grid: 32 candidates, both models, n = 100', ms: median(grid), target: 40 });
  for (const n of [50, 100, 200, 400, 800]) {
    const w = simulate(n, 7);
    const times = timeRuns(() => (fitTrendModel('deterministic', w, 3, 3), fitTrendModel('stochastic', w, 3, 3)), 3);
    rows.push({ name: `grid, both models, n = ${n}`, ms: median(times) });
  }
  return rows;
}
