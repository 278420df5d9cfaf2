// The two models' searches run side by side in two threads for a seasonal series; the record
// must not depend on it (common practice: a result independent of the thread count).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fitBothModels, type ModelTask } from '../../src/analysis/fitModelTask.js';
import type { TrendModelKind } from '../../src/base/settings.js';
import { seasonalTrendStability } from '../../src/evidence/trendStability.js';

// UK gas consumption, quarterly (test/fixtures/seasonal-models/, provenance in test/fixtures/README.md), on the log scale.
const text = readFileSync(new URL('../fixtures/seasonal-models/uk-gas.csv', import.meta.url), 'utf8');
const w = Float64Array.from(text.trim().split('\n').slice(1), (line) => Math.log(Number(line.split(',')[1])));

function tasks(seasonal: boolean): Record<TrendModelKind, ModelTask> {
  const task = (kind: TrendModelKind, seasonalDifferencing: boolean): ModelTask => ({
    kind,
    w,
    maxP: 2,
    maxQ: 2,
    options: {
      estimation: 'reml',
      ...(seasonal ? { seasonal: { period: 4, firstSeason: 0, seasonalDifferencing, maxHarmonics: 2, maxSeasonalP: 1, maxSeasonalQ: 1 } } : {}),
    },
  });
  return { deterministic: task('deterministic', false), stochastic: task('stochastic', true) };
}

/** What crosses threads and what is built again, compared as data (the design's future rows too). */
function comparable(model: Awaited<ReturnType<typeof fitBothModels>>['deterministic']): unknown {
  const { design, ...rest } = model;
  return { ...rest, design: { ...design, futureRows: design.futureRows(9) } };
}

describe('fitBothModels', () => {
  it('gives the same models in one thread and in two', async () => {
    const inline = await fitBothModels(tasks(true), 1);
    const sideBySide = await fitBothModels(tasks(true), 2);
    for (const kind of ['deterministic', 'stochastic'] as const) expect(comparable(sideBySide[kind])).toEqual(comparable(inline[kind]));
    // The stochastic model on seasonal differences keeps its seasonal part through the worker.
    expect(sideBySide.stochastic.seasonal?.seasonalDifferencing).toBe(true);
    expect(sideBySide.stochastic.design.seasonality?.seasonalDifferencing).toBe(true);
  });

  it("brings each seasonal model's stability windows, the same as the evidence computes them", async () => {
    const models = await fitBothModels(tasks(true), 2);
    const fits = { deterministic: { design: models.deterministic.design, fit: models.deterministic.fit }, stochastic: { design: models.stochastic.design, fit: models.stochastic.fit } };
    expect(models.deterministic.windows?.estimates.length).toBeGreaterThan(10);
    const ahead = { deterministic: models.deterministic.windows, stochastic: models.stochastic.windows };
    expect(seasonalTrendStability(w, fits, ahead)).toEqual(seasonalTrendStability(w, fits));
  });

  it('fits a series without a seasonal part in this thread, as before', async () => {
    const models = await fitBothModels(tasks(false), 2);
    expect(models.deterministic.seasonal).toBeNull();
    expect(models.stochastic.design.coefficientNames).toEqual(['drift']);
  });
});
