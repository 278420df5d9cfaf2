// Test helper: a folder with a small memo config (one series, orders at most 1, four backtest
// origins) and the Lake Huron fixture, for the monthly-run, rerun and verify tests. The
// fixture's provenance is in test/fixtures/README.md; revisions of it are made by the tests.
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, beforeEach } from 'vitest';

/** SOURCE_DATE_EPOCH of 2026-01-01T00:00:00Z (common practice: date -u -d @1767225600). */
export const EPOCH_2026_01_01 = '1767225600';

/** Runs every test of the calling file at the run date 2026-01-01, restoring SOURCE_DATE_EPOCH after each. */
export function fixRunDate(): void {
  const saved = process.env.SOURCE_DATE_EPOCH;
  beforeEach(() => {
    process.env.SOURCE_DATE_EPOCH = EPOCH_2026_01_01;
  });
  afterEach(() => {
    if (saved === undefined) delete process.env.SOURCE_DATE_EPOCH;
    else process.env.SOURCE_DATE_EPOCH = saved;
  });
}

export function memoConfig(asOf: string | undefined, formats = '[html, json, csv]', title = 'Lake outlook'): string {
  return `memo:
  id: lake-outlook
  title: ${title}
  client: Invented Shoreline Trust
${asOf === undefined ? '' : `  as_of: ${asOf}\n`}  reviewers:
    - name: A. Reviewer
defaults:
  max_p: 1
  max_q: 1
  backtest: {origins: 4, horizon: 2, refit: reestimate}
series:
  - id: lake-level
    title: Lake level
    units: ft
    file: data/lake-huron.csv
    horizon: 4
output:
  folder: out
  formats: ${formats}
`;
}

/** A fresh folder with memo.yaml (for `asOf`) and data/lake-huron.csv. */
export function monthlyFolder(asOf: string | undefined, formats?: string): string {
  const root = mkdtempSync(join(tmpdir(), 'tb-monthly-'));
  mkdirSync(join(root, 'data'));
  copyFileSync(resolve('test/fixtures/lake-huron.csv'), join(root, 'data/lake-huron.csv'));
  writeFileSync(join(root, 'memo.yaml'), memoConfig(asOf, formats));
  return root;
}

export function setAsOf(root: string, asOf: string): void {
  writeFileSync(join(root, 'memo.yaml'), memoConfig(asOf));
}

/** Adds `delta` to the value of `period` and appends one invented observation after the last. */
export function reviseData(root: string, period: string, delta: number, appended: number): void {
  const file = join(root, 'data/lake-huron.csv');
  const lines = readFileSync(file, 'utf8').trimEnd().split('\n');
  const revised = lines.map((line) => {
    const [label, value] = line.split(',');
    return label === period ? `${label},${(Number(value) + delta).toFixed(2)}` : line;
  });
  const last = Number(revised[revised.length - 1].split(',')[0]);
  writeFileSync(file, `${[...revised, `${last + 1},${appended}`].join('\n')}\n`);
}

export function readText(root: string, path: string): string {
  return readFileSync(join(root, path), 'utf8');
}
