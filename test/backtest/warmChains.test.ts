// Warm searches along a backtest's origins (forecastAtOrigin.ts, seasonalSearch.ts): a
// reselecting seasonal search at an origin starts each candidate from the previous origin's
// optimum of the same candidate. Checked on UK gas consumption (quarterly, log; test/fixtures/
// seasonal-models/, provenance in test/fixtures/README.md) against cold searches of the same
// windows, and for independence of the thread count (common practice: a result must not depend
// on how the work was scheduled).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { forecastAtOrigin, forecastChain, type OriginTask } from '../../src/backtest/forecastAtOrigin.js';
import { runOriginTasks } from '../../src/backtest/runOriginTasks.js';
import { searchSeasonalModel, type SeasonalSearchSpec } from '../../src/models/seasonalSearch.js';

const text = readFileSync(new URL('../fixtures/seasonal-models/uk-gas.csv', import.meta.url), 'utf8');
const w = Float64Array.from(text.trim().split('\n').slice(1), (line) => Math.log(Number(line.split(',')[1])));
const spec = (seasonalDifferencing: boolean): SeasonalSearchSpec => ({ period: 4, firstSeason: 0, seasonalDifferencing, maxHarmonics: 2, maxSeasonalP: 1, maxSeasonalQ: 1 });
/** Three expanding windows one quarter apart, the last ending two years before the data's end. */
const ENDS = [98, 99, 100];

describe('a warm seasonal search', () => {
  for (const [kind, seasonalDifferencing] of [['deterministic', false], ['stochastic', true]] as const) {
    it(`selects what a cold search selects at each of three origins (${kind})`, () => {
      let previous = searchSeasonalModel(kind, w.slice(0, ENDS[0]), 2, 2, spec(seasonalDifferencing));
      for (const end of ENDS.slice(1)) {
        const window = w.slice(0, end);
        const cold = searchSeasonalModel(kind, window, 2, 2, spec(seasonalDifferencing));
        const warm = searchSeasonalModel(kind, window, 2, 2, spec(seasonalDifferencing), previous.optima);
        expect(warm.choice).toEqual(cold.choice);
        expect(warm.best.order).toEqual(cold.best.order);
        // The same optimum: the optimiser's tolerance, not a different maximum.
        expect(Math.abs(warm.best.loglik - cold.best.loglik)).toBeLessThan(1e-6);
        // The stages take the same path: as many candidates.
        expect(warm.candidates.length).toBe(cold.candidates.length);
        previous = warm;
      }
    });
  }
});

describe('chains of origin tasks', () => {
  const tasks: OriginTask[] = ENDS.flatMap((end, o) =>
    (['deterministic', 'stochastic'] as const).map((kind, m) => ({
      kind,
      w: w.slice(0, end),
      horizon: 4,
      refit: 'reselect' as const,
      maxP: 1,
      maxQ: 1,
      estimation: 'reml' as const,
      seasonal: spec(kind === 'stochastic'),
      chain: m * 10 + (o < 2 ? 0 : 1),
    })),
  );

  it('run each chain in order and return forecasts in task order, whatever the threads', async () => {
    const inline = await runOriginTasks(tasks, 1);
    const pooled = await runOriginTasks(tasks, 2);
    expect(pooled).toEqual(inline);
    // The first task of each chain is a cold search: the same as the task alone.
    expect(inline[0]).toEqual(forecastAtOrigin(tasks[0]));
    expect(inline[1]).toEqual(forecastAtOrigin(tasks[1]));
    // The second origin of the deterministic chain is warm from the first.
    expect(inline[2]).toEqual(forecastChain([tasks[0], tasks[2]])[1]);
  });
});
