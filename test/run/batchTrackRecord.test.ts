// Three as-of memos of one memo id in one batch, the latest given first: they run in period
// order, and the latest compares with the one before it and tracks the forecasts of both (our
// spec: DEVELOPERS.md "Batches of as-of memos" and "The track record"). Data: the Lake Huron
// fixture (test/fixtures/lake-huron.csv), the earlier memos' copies cut after 1968 and 1970.
// The track record's numbers are worked out here from the earlier record.json files and the
// fixture's values, not by the code under test.
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Manifest } from '../../src/run/manifest.js';
import { runCli, type CliRun } from '../support/runCli.js';
import { fixRunDate, memoConfig } from './monthlySetup.js';

fixRunDate('all');

/** The monthly tests' config (monthlySetup.ts) for `asOf`, reading `file`. */
function config(asOf: string, file: string): string {
  return memoConfig(asOf).replace('file: data/lake-huron.csv', `file: ${file}`);
}

let root = '';
let run: CliRun;

beforeAll(async () => {
  root = mkdtempSync(join(tmpdir(), 'tb-batch-'));
  mkdirSync(join(root, 'data'));
  const lines = readFileSync(resolve('test/fixtures/lake-huron.csv'), 'utf8').trimEnd().split('\n');
  writeFileSync(join(root, 'data/lake-1972.csv'), `${lines.join('\n')}\n`);
  writeFileSync(join(root, 'data/lake-1968.csv'), `${lines.filter((line) => !/^(1969|197\d),/.test(line)).join('\n')}\n`);
  writeFileSync(join(root, 'data/lake-1970.csv'), `${lines.filter((line) => !/^197[12],/.test(line)).join('\n')}\n`);
  writeFileSync(join(root, 'later.yaml'), config('1972', 'data/lake-1972.csv'));
  writeFileSync(join(root, 'middle.yaml'), config('1970', 'data/lake-1970.csv'));
  writeFileSync(join(root, 'earlier.yaml'), config('1968', 'data/lake-1968.csv'));
  run = await runCli(['run', join(root, 'later.yaml'), join(root, 'earlier.yaml'), join(root, 'middle.yaml'), '--quiet', '--threads', '2']);
});

function read(path: string): string {
  return readFileSync(join(root, 'out/lake-outlook', path), 'utf8');
}

describe('a batch with two as-of memos of one id', () => {
  it('runs the earlier period first, so the later memo compares with it', () => {
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    const html = read('1972/memo.html').replace(/<[^>]+>/g, ' ').replace(/\s+/g, ' ');
    expect(html).toContain('This memo, as of 1972, set against the memo as of 1970 (run on 2026-01-01)');
    // Every earlier record read is an input, the most recent first.
    const manifest = JSON.parse(read('1972/manifest.json')) as Manifest;
    expect(manifest.inputs.filter((input) => input.role === 'earlier-record').map((input) => input.path)).toEqual(['1970/record.json', '1968/record.json']);
  });

  it('tracks the earlier memos: each observed target, hits and coverage, and the mean absolute error, by hand', () => {
    const actual = new Map(readFileSync(resolve('test/fixtures/lake-huron.csv'), 'utf8').trimEnd().split('\n').slice(1).map((line) => [line.split(',')[0], Number(line.split(',')[1])] as const));
    type Forecast = { period: string; point: number; intervals: Record<string, [number, number]> };
    type Earlier = { records: { forecasts: Record<Model, Forecast[]>; recommendation: { model: Model } }[] };
    type Model = 'deterministic' | 'stochastic';
    // Hand count over the 1968 memo (1969-1972 observed) and the 1970 memo (1971-1972 observed).
    const outcomes: { model: Model; recommended: boolean; point: number; actual: number; intervals: Record<string, [number, number]> }[] = [];
    for (const asOf of ['1968', '1970']) {
      const earlier = JSON.parse(read(`${asOf}/record.json`)) as Earlier;
      for (const model of ['deterministic', 'stochastic'] as const) {
        for (const row of earlier.records[0].forecasts[model]) {
          const value = actual.get(row.period);
          if (value === undefined || Number(row.period) > 1972) continue;
          outcomes.push({ model, recommended: earlier.records[0].recommendation.model === model, point: row.point, actual: value, intervals: row.intervals });
        }
      }
    }
    const count = (model: Model | 'recommended', level: string) => {
      const chosen = outcomes.filter((o) => (model === 'recommended' ? o.recommended : o.model === model));
      const hits = chosen.filter((o) => o.intervals[level][0] <= o.actual && o.actual <= o.intervals[level][1]).length;
      return { level, hits, total: chosen.length };
    };
    const mae = (model: Model | 'recommended') => {
      const chosen = outcomes.filter((o) => (model === 'recommended' ? o.recommended : o.model === model));
      return chosen.reduce((sum, o) => sum + Math.abs(o.actual - o.point), 0) / chosen.length;
    };
    type Tracked = { track_record: { series: { rows: { as_of: string; period: string; actual: number }[]; scores: Record<string, { outcomes: number; coverage: unknown[]; mae: number }> }[] } };
    const tracked = (JSON.parse(read('1972/record.json')) as Tracked).track_record.series[0];
    expect(tracked.rows.map((r) => [r.as_of, r.period, r.actual])).toEqual([
      ['1968', '1969', actual.get('1969')],
      ['1968', '1970', actual.get('1970')],
      ['1968', '1971', actual.get('1971')],
      ['1968', '1972', actual.get('1972')],
      ['1970', '1971', actual.get('1971')],
      ['1970', '1972', actual.get('1972')],
    ]);
    for (const choice of ['deterministic', 'stochastic', 'recommended'] as const) {
      expect(tracked.scores[choice].outcomes, choice).toBe(6);
      expect(tracked.scores[choice].coverage, choice).toEqual([count(choice, '80'), count(choice, '95')]);
      expect(tracked.scores[choice].mae, choice).toBeCloseTo(mae(choice), 9);
    }
    const html = read('1972/memo.html').replace(/<[^>]+>/g, ' ').replace(/&#x27;/g, "'").replace(/\s+/g, ' ');
    const [c80, c95] = [count('recommended', '80'), count('recommended', '95')];
    expect(html).toContain(
      `Track record: 2 earlier memos; 6 of their forecasts are now observed: the recommended model's 80% intervals held ${c80.hits} of 6 and its 95% intervals ${c95.hits} of 6; 6 outcomes are too few to judge coverage.`,
    );
  });

  it('verifies: the rerun reads the same earlier records and gives the same track record', async () => {
    const verify = await runCli(['verify', join(root, 'out/lake-outlook/1972')]);
    expect(verify.stderr).toBe('');
    expect(verify.code).toBe(0);
  });
});
