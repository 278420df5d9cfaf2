// Model selection on seeded simulations (test/support/trendProcesses.ts): a trend with AR(1)
// noise, φ = 0.5 and 0.9, a random walk with drift and an ARIMA(1,1,0) with drift, at n = 40
// and 100, 100 series each, both trend models searched over p, q ≤ 3 by AICc among the
// admissible fits (src/models/admissibility.ts), the chosen order estimated by REML (the
// default). Checked: no selected fit has a root within the margin; the deterministic slope's
// standard error is honest where the model is right; the 95% coverage at h = 10 of the model
// that matches the process is no more than 2 points below that of the same AICc search in
// statsmodels 0.13.5 on the same series (test/fixtures/selection/statsmodels-selection.json,
// made by statsmodelsSelection.py beside it; provenance in test/fixtures/README.md).
import { readFileSync } from 'node:fs';
import Tinypool from 'tinypool';
import { beforeAll, describe, expect, it } from 'vitest';
import { workerModule } from '../../src/base/workerModule.js';
import { UNIT_ROOT_MARGIN } from '../../src/models/admissibility.js';
import { processTrend, TREND_PROCESSES, type TrendProcess } from '../support/trendProcesses.js';
import type { SelectionOutcome, SelectionTask } from './selectionReplicate.js';

const REPLICATES = 100;
const LENGTHS = [40, 100] as const;

interface ReferenceCell {
  process: TrendProcess;
  n: number;
  models: Record<'deterministic' | 'stochastic', { coverage95AtH10: number; seriesFitted: number }>;
}

const reference = JSON.parse(readFileSync(new URL('../fixtures/selection/statsmodels-selection.json', import.meta.url), 'utf8')) as { cells: ReferenceCell[] };

function cellName(process: TrendProcess, n: number): string {
  return `${process}, n = ${n}`;
}

describe('model selection on simulated trend processes', () => {
  const outcomes = new Map<string, SelectionOutcome[]>();
  beforeAll(async () => {
    const pool = new Tinypool({ filename: workerModule(import.meta.url, 'selectionReplicate', 'selectionReplicate'), name: 'selectionReplicate', minThreads: 2, maxThreads: 2 });
    try {
      for (const process of TREND_PROCESSES) {
        for (const n of LENGTHS) {
          const tasks: SelectionTask[] = Array.from({ length: REPLICATES }, (_, rep) => ({ process, n, rep }));
          outcomes.set(cellName(process, n), await Promise.all(tasks.map((task): Promise<SelectionOutcome> => pool.run(task))));
        }
      }
    } finally {
      await pool.destroy();
    }
  }, 180_000);

  it.each(TREND_PROCESSES.flatMap((process) => LENGTHS.map((n) => [process, n] as const)))('selects no fit with a root within the margin: %s, n = %i', (process, n) => {
    const cell = outcomes.get(cellName(process, n)) ?? [];
    expect(cell).toHaveLength(REPLICATES);
    const inside = cell.filter((o) => Math.min(o.minRoot.deterministic, o.minRoot.stochastic) < 1 + UNIT_ROOT_MARGIN);
    expect(inside).toHaveLength(0);
  });

  it.each(LENGTHS)('reports an honest slope standard error for a trend with AR(1) noise, φ = 0.5, n = %i', (n) => {
    const cell = outcomes.get(cellName('trend-ar1-0.5', n)) ?? [];
    const slopes = cell.map((o) => o.slope);
    const mean = slopes.reduce((a, b) => a + b, 0) / slopes.length;
    const spread = Math.sqrt(slopes.reduce((a, b) => a + (b - mean) ** 2, 0) / (slopes.length - 1));
    const meanSe = cell.reduce((a, o) => a + o.slopeSe, 0) / cell.length;
    // At least 0.8 of the Monte Carlo spread (our bar). Measured: 0.867 (n = 40) and 0.992
    // (n = 100) with REML; 0.758 and 0.928 with exact ML, whose AR estimate is biased towards
    // zero; statsmodels' search (ML, OPG standard errors) gives 0.726 and 0.935 on these series.
    expect(meanSe / spread).toBeGreaterThanOrEqual(0.8);
  });

  it.each(TREND_PROCESSES.flatMap((process) => LENGTHS.map((n) => [process, n] as const)))('covers the held-out value about as often as statsmodels: %s, n = %i', (process, n) => {
    const model = processTrend(process);
    const cell = outcomes.get(cellName(process, n)) ?? [];
    const coverage = cell.filter((o) => o.covered[model]).length / cell.length;
    const row = reference.cells.find((c) => c.process === process && c.n === n)?.models[model];
    expect(row?.seriesFitted).toBe(REPLICATES);
    // No more than 2 points below the reference search's coverage on the same series.
    expect(coverage).toBeGreaterThanOrEqual((row?.coverage95AtH10 ?? 1) - 0.02);
  });
});
