import { mkdtempSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { MAX_SERIES_FILE_BYTES, readSeriesCsv } from '../../src/data/readSeriesCsv.js';
import { codesAndLines, problemsOf } from './problemsOf.js';

const fixture = (name: string) => fileURLToPath(new URL(`../fixtures/${name}`, import.meta.url));
const scratch = mkdtempSync(join(tmpdir(), 'trendbrief-data-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe('readSeriesCsv on the open datasets', () => {
  // n, first and last: /work/shared/reference/README.md. First and last values: the files
  // themselves (R 4.2.2 datasets::LakeHuron and ::Nile; statsmodels 0.13.5 macrodata realgdp).
  // sha256: `sha256sum` (GNU coreutils 9.1) of each fixture.
  const cases = [
    {
      name: 'lake-huron.csv',
      frequency: 'annual',
      n: 98,
      first: '1875',
      last: '1972',
      values: [580.38, 579.96],
      sha256: 'f029d62b5be796ca00480493b24c195e9cd9ab9ddc4e1a88375b02c39bfa0c0f',
    },
    {
      name: 'nile.csv',
      frequency: 'annual',
      n: 100,
      first: '1871',
      last: '1970',
      values: [1120, 740],
      sha256: '1ffc429f8d4877bbdf2e7fac576993a0304c3a514e51304b1766f60d1c27ca20',
    },
    {
      name: 'us-real-gdp.csv',
      frequency: 'quarterly',
      n: 203,
      first: '1959-Q1',
      last: '2009-Q3',
      values: [2710.349, 12990.341],
      sha256: '9abb75ae94e8544ed72107c3da8c8aec202810eddb35d6195a90d448c48a5849',
    },
  ] as const;

  for (const expected of cases) {
    it(`reads ${expected.name}`, () => {
      const file = fixture(expected.name);
      const series = readSeriesCsv(file, { minObservations: 20, transform: { kind: 'log' }, missing: 'error' });
      expect(series).toMatchObject({
        file,
        column: 'value',
        periodColumn: 'period',
        frequency: expected.frequency,
        n: expected.n,
        first: expected.first,
        last: expected.last,
        sha256: expected.sha256,
      });
      expect(series.values).toHaveLength(expected.n);
      expect(series.periods).toHaveLength(expected.n);
      expect(series.periods[0]).toBe(expected.first);
      expect(series.periods[expected.n - 1]).toBe(expected.last);
      expect(series.values[0]).toBe(expected.values[0]);
      expect(series.values[expected.n - 1]).toBe(expected.values[1]);
    });
  }

  it('says how many observations a too-demanding use would need', () => {
    const found = problemsOf(() => readSeriesCsv(fixture('nile.csv'), { minObservations: 120, missing: 'error' }));
    expect(found).toEqual([expect.objectContaining({ code: 'series.too-few', message: 'has 100 observations; at least 120 are needed' })]);
  });
});

describe('readSeriesCsv on hand-written bad files', () => {
  it('accepts a BOM, CRLF endings, padded and quoted cells and trailing blank lines', () => {
    const series = readSeriesCsv(fixture('data/bom-crlf.csv'), { missing: 'error' });
    expect(series).toMatchObject({ periodColumn: 'period', column: 'value', frequency: 'quarterly', first: '2008-Q3', last: '2009-Q2', n: 4 });
    expect([...series.values]).toEqual([101.5, 99.25, 98, 97]);
    // sha256sum (GNU coreutils 9.1) of the file bytes, BOM included.
    expect(series.sha256).toBe('82cb356e06e02d57146c81d39b4e4515d5d4614646190897820338715b00bdd5');
  });

  it('reports every bad value line of a file in one error', () => {
    const file = fixture('data/bad-values.csv');
    const found = problemsOf(() => readSeriesCsv(file, { missing: 'error' }));
    expect(codesAndLines(found)).toEqual([
      'csv.bad-value@3',
      'csv.non-finite@4',
      'csv.missing-value@5',
      'csv.non-finite@7',
      'csv.non-finite@8',
      'csv.bad-value@9',
      'csv.missing-value@10',
    ]);
    for (const item of found) expect(item).toMatchObject({ file, column: 2, field: 'value' });
  });

  it('reports every period problem of a file in one error', () => {
    const found = problemsOf(() => readSeriesCsv(fixture('data/bad-periods.csv'), { missing: 'error' }));
    expect(codesAndLines(found)).toEqual([
      'csv.duplicate-period@4',
      'csv.unsorted@6',
      'csv.gap@6',
      'csv.gap@7',
      'csv.mixed-frequency@8',
      'csv.empty-period@9',
      'csv.mixed-period-form@10',
    ]);
    expect(found[2].message).toBe('missing 2001-03 before 2001-04');
    expect(found[3].message).toBe('missing 2001-06, 2001-07, 2001-08 before 2001-09');
  });

  it('refuses a file without a header, and reads a semicolon-separated file with decimal commas', () => {
    expect(problemsOf(() => readSeriesCsv(fixture('data/no-header.csv'), { missing: 'error' }))[0]).toMatchObject({ code: 'csv.no-header', line: 1 });
    // The file holds 2001;1,5 and 2002;2,5: a comma as decimal mark (common practice where it is the decimal mark).
    expect([...readSeriesCsv(fixture('data/semicolon.csv'), { missing: 'error' }).values]).toEqual([1.5, 2.5]);
  });

  it('refuses text that is not UTF-8', () => {
    const file = fixture('data/latin1.csv');
    expect(problemsOf(() => readSeriesCsv(file, { missing: 'error' }))).toEqual([expect.objectContaining({ code: 'csv.not-utf8', file })]);
  });
});

describe('readSeriesCsv file-system problems', () => {
  it('reports a missing file', () => {
    const file = join(scratch, 'absent.csv');
    expect(problemsOf(() => readSeriesCsv(file, { missing: 'error' }))).toEqual([expect.objectContaining({ code: 'csv.file-missing', file })]);
    expect(problemsOf(() => readSeriesCsv(join(fixture('nile.csv'), 'inner.csv'), { missing: 'error' }))[0].code).toBe('csv.file-missing');
  });

  it('reports a directory given as a file', () => {
    expect(problemsOf(() => readSeriesCsv(scratch, { missing: 'error' }))).toEqual([
      expect.objectContaining({ code: 'csv.not-a-file', file: scratch, message: 'is a directory, not a regular file' }),
    ]);
  });

  it('refuses a file above the size limit before reading it', () => {
    // A sparse file: its size is past the limit without 20 MB being written or read.
    const file = join(scratch, 'huge.csv');
    writeFileSync(file, 'period,value\n');
    truncateSync(file, MAX_SERIES_FILE_BYTES + 1);
    const [found] = problemsOf(() => readSeriesCsv(file, { missing: 'error' }));
    expect(found).toMatchObject({ code: 'csv.too-large', file, message: 'is 20.1 MB, above the 20 MB limit for a series file' });
  });
});
