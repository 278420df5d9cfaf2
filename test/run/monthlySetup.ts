// Test helper: a folder with a small memo config (one series, orders at most 1, four backtest
// origins) and the Lake Huron fixture, for the monthly-run, rerun and verify tests. The
// fixture's provenance is in test/fixtures/README.md; revisions of it are made by the tests.
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

export { EPOCH_2026_01_01, fixRunDate } from '../support/fixRunDate.js';

/** Another memo id, or interval levels other than the built-in ones, for tests that need them. */
export interface MemoVariant {
  id?: string;
  levels?: readonly number[];
}

export function memoConfig(asOf: string | undefined, formats = '[html, json, csv]', title = 'Lake outlook', variant: MemoVariant = {}): string {
  return `memo:
  id: ${variant.id ?? 'lake-outlook'}
  title: ${title}
  client: Invented Shoreline Trust
${asOf === undefined ? '' : `  as_of: ${asOf}\n`}  reviewers:
    - name: A. Reviewer
defaults:
${variant.levels === undefined ? '' : `  levels: [${variant.levels.join(', ')}]\n`}  max_p: 1
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
