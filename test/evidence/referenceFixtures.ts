// Readers for the reference fixtures in test/fixtures/ (provenance in test/fixtures/README.md).
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const FIXTURES = fileURLToPath(new URL('../fixtures/', import.meta.url));

export type ReferenceDataset = 'lake-huron' | 'nile' | 'us-real-gdp';

/** The `value` column of a `period,value` fixture CSV. */
export function readSeriesValues(dataset: ReferenceDataset): number[] {
  const lines = readFileSync(`${FIXTURES}${dataset}.csv`, 'utf8').trim().split('\n');
  return lines.slice(1).map((line) => Number(line.split(',')[1]));
}

/** One statsmodels 0.13.5 `kpss` or `adfuller` result as stored in a reference fit file. */
export interface UnitRootReference {
  stat: number;
  lags: number;
  pvalue?: number;
  nobs?: number;
  crit: Record<string, number>;
}

/** `unit_root_tests` and `transform` of test/fixtures/<dataset>.json. */
export function readUnitRootReferences(dataset: ReferenceDataset): {
  transform: string;
  tests: Record<string, UnitRootReference>;
} {
  const parsed: unknown = JSON.parse(readFileSync(`${FIXTURES}${dataset}.json`, 'utf8'));
  const file = parsed as { transform: string; unit_root_tests: Record<string, UnitRootReference> };
  return { transform: file.transform, tests: file.unit_root_tests };
}

/** A fixture under test/fixtures/evidence/, parsed as the caller's declared shape. */
export function readEvidenceFixture<T>(name: string): T {
  const parsed: unknown = JSON.parse(readFileSync(`${FIXTURES}evidence/${name}`, 'utf8'));
  return parsed as T;
}
