// The demo data: the seeded script reproduces the committed files byte for byte, every file
// passes `fit`, and each series shows the character configs/data/README.md promises.
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { DEMO_SERIES, writeDemoData } from '../../configs/generateDemoData.js';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { fitRecord } from '../support/runCli.js';

const DATA = fileURLToPath(new URL('../../configs/data/', import.meta.url));
const OUT = mkdtempSync(join(tmpdir(), 'trendbrief-demo-'));
afterAll(() => rmSync(OUT, { recursive: true, force: true }));

/**
 * The estimate (entry `index` of a lag list such as `ar`) lies within 3 standard errors of the
 * value the script drew the series with (common practice).
 */
function expectNear(record: AnalysisRecord, kind: 'deterministic' | 'stochastic', name: string, generating: number, index = 0): void {
  // Read by name across both models' coefficient sets.
  const coefficients: Record<string, number | number[]> = { ...record.models[kind].coefficients };
  const stderr: Record<string, number | null | (number | null)[]> = { ...record.models[kind].stderr };
  const value = coefficients[name];
  const error = stderr[name];
  const estimate = Array.isArray(value) ? value[index] : value;
  const se = Array.isArray(error) ? error[index] : error;
  if (typeof estimate !== 'number' || typeof se !== 'number') throw new Error(`${kind} model has no ${name} with a standard error`);
  expect(Math.abs(estimate - generating), `${name} ${estimate} ± ${se} vs ${generating}`).toBeLessThanOrEqual(3 * se);
}

describe('demo data', () => {
  it('regenerates the committed files byte for byte', () => {
    const written = writeDemoData(OUT);
    const committed = readdirSync(DATA).filter((file) => file.endsWith('.csv'));
    expect([...written].sort()).toEqual(committed.sort());
    for (const file of written) expect(readFileSync(join(OUT, file)).equals(readFileSync(join(DATA, file))), file).toBe(true);
  });

  it('has the four series of the scenario with their spans', () => {
    // Frequencies, spans and lengths: configs/data/README.md.
    expect(DEMO_SERIES.map((series) => [series.name, series.first, series.n])).toEqual([
      ['metered-connections', '1955', 70],
      ['treatment-cost-index', '2002-Q1', 92],
      ['desalination-output', '2005', 20],
      ['daily-demand', '2015-01', 120],
      ['bulk-deliveries', '2015-01', 120],
    ]);
  });

  it('metered-connections: steady growth of about 3% a year, a straight line on the log scale', async () => {
    const record = await fitRecord('configs/data/metered-connections.csv', ['--transform', 'log', '--horizon', '15']);
    expect(record.series).toMatchObject({ frequency: 'annual', first: '1955', last: '2024', n: 70 });
    // Drawn as 8200·exp(0.031·t + u_t), u AR(1) with φ = 0.55 (configs/generateDemoData.ts).
    expectNear(record, 'deterministic', 'slope', 0.031);
    expectNear(record, 'deterministic', 'intercept', Math.log(8200));
    expect([record.models.deterministic.p, record.models.deterministic.q]).toEqual([1, 0]);
    expect(record.forecasts.deterministic.map((row) => row.period).slice(-1)).toEqual(['2039']);
  });

  it('treatment-cost-index: a random walk with drift', async () => {
    const record = await fitRecord('configs/data/treatment-cost-index.csv');
    expect(record.series).toMatchObject({ frequency: 'quarterly', first: '2002-Q1', last: '2024-Q4', n: 92 });
    // Drawn with drift 0.35 and AR(1) steps (configs/generateDemoData.ts).
    expectNear(record, 'stochastic', 'drift', 0.35);
    expect([record.models.stochastic.p, record.models.stochastic.q]).toEqual([1, 0]);
  });

  it('desalination-output: twenty annual values with a trend', async () => {
    const record = await fitRecord('configs/data/desalination-output.csv');
    expect(record.series).toMatchObject({ frequency: 'annual', first: '2005', last: '2024', n: 20 });
    // Drawn as 1450 + 38·t + u_t (configs/generateDemoData.ts).
    expectNear(record, 'deterministic', 'slope', 38);
  });

  it('bulk-deliveries: a fixed seasonal pattern of two harmonics on a trend line', async () => {
    const record = await fitRecord('configs/data/bulk-deliveries.csv', ['--max-p', '2', '--max-q', '2']);
    expect(record.series).toMatchObject({ frequency: 'monthly', first: '2015-01', last: '2024-12', n: 120 });
    // Drawn as 3200 + 6·t + 900·cos(2π(m − 6)/12) + 250·cos(4π(m − 6)/12) + u_t, u AR(1) with
    // φ = 0.5 (configs/generateDemoData.ts): two harmonic pairs, a July peak.
    expect(record.models.deterministic.seasonal).toMatchObject({ harmonics: 2, P: 0, Q: 0 });
    expect([record.models.deterministic.p, record.models.deterministic.q]).toEqual([1, 0]);
    expectNear(record, 'deterministic', 'slope', 6);
    const pattern = record.models.deterministic.seasonal?.pattern ?? [];
    expect(pattern.indexOf(Math.max(...pattern))).toBe(6);
    // The July effect of the drawn pattern: 900 + 250 = 1150 above the line.
    expect(Math.abs(pattern[6] - 1150)).toBeLessThan(100);
  });

  it('daily-demand: a trend-stationary monthly series with AR(1) deviations', async () => {
    const record = await fitRecord('configs/data/daily-demand.csv');
    expect(record.series).toMatchObject({ frequency: 'monthly', first: '2015-01', last: '2024-12', n: 120 });
    // Drawn as 212 + 0.09·t + u_t, u AR(1) with φ = 0.7 (configs/generateDemoData.ts).
    expectNear(record, 'deterministic', 'slope', 0.09);
    expect([record.models.deterministic.p, record.models.deterministic.q]).toEqual([1, 0]);
    expectNear(record, 'deterministic', 'ar', 0.7);
  });
});
