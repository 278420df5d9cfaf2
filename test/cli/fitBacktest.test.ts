// `trendbrief fit --backtest`: the backtest and the recommendation reach the record
// (record keys: our spec in DESIGN.md and the backtest issue).
import { describe, expect, it } from 'vitest';
import { fitRecord, runCli } from '../support/runCli.js';

describe('fit with a backtest', () => {
  it('adds the backtest and a recommendation to the record', async () => {
    const record = await fitRecord('test/fixtures/lake-huron.csv', ['--refit', 'reestimate', '--origins', '6', '--backtest-horizon', '3']);
    const backtest = record.backtest;
    if (backtest === undefined || backtest === null) throw new Error('no backtest in the record');
    expect(backtest.origins).toHaveLength(6);
    expect(backtest.per_horizon.deterministic.map((row) => row.h)).toEqual([1, 2, 3]);
    expect(backtest.per_horizon.naive).toHaveLength(3);
    // The last origin leaves exactly B = 3 observations to score: 98 − 3 = 95 (our spec).
    expect(backtest.origins[5].length).toBe(95);
    expect(record.recommendation?.rule).toBe('prefer-stochastic');
    expect(['deterministic', 'stochastic']).toContain(record.recommendation?.model);
  });

  it('records why a series too short to backtest has none, and still recommends', async () => {
    const run = await runCli(['fit', 'configs/data/desalination-output.csv', '--json', '--backtest', '--max-p', '1', '--max-q', '1']);
    expect(run.code).toBe(0);
    const record = JSON.parse(run.stdout) as { backtest: unknown; backtest_unavailable: string; recommendation: { model: string; reasons: string[] } };
    expect(record.backtest).toBeNull();
    expect(record.backtest_unavailable.length).toBeGreaterThan(10);
    expect(record.recommendation.model).toBe('stochastic');
    expect(record.recommendation.reasons[0]).toBe('There are no backtest 95% interval scores to compare.');
  });

  it('rejects a bad refit policy with the field named', async () => {
    const run = await runCli(['fit', 'test/fixtures/lake-huron.csv', '--refit', 'sometimes']);
    expect(run.code).toBe(2);
    expect(run.errorLines[0]).toMatch(/^--refit: .*reselect, reestimate, fixed/);
  });
});
