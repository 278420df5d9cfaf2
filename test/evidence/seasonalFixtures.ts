// Readers for the seasonal reference fixtures in test/fixtures/seasonal/ (provenance in
// test/fixtures/README.md, "Seasonal evidence").
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const FOLDER = fileURLToPath(new URL('../fixtures/seasonal/', import.meta.url));

export type SeasonalDataset = 'nottingham-temperature.csv' | 'us-accidental-deaths.csv' | 'uk-gas.csv';

/** The `value` column of a seasonal dataset, on the natural-log scale when `log`. */
export function readSeasonalValues(file: SeasonalDataset, log = false): number[] {
  const lines = readFileSync(`${FOLDER}${file}`, 'utf8').trim().split('\n').slice(1);
  const values = lines.map((line) => Number(line.split(',')[1]));
  return log ? values.map(Math.log) : values;
}

/** A JSON fixture under test/fixtures/seasonal/, parsed as the caller's declared shape. */
export function readSeasonalFixture<T>(name: string): T {
  const parsed: unknown = JSON.parse(readFileSync(`${FOLDER}${name}`, 'utf8'));
  return parsed as T;
}
