// verify's comparison of two JSON documents: the tolerance rule and the paths it reports
// (our spec: src/run/compareJson.ts, relative 1e-9 with an absolute floor of 1e-12).
import { describe, expect, it } from 'vitest';
import { compareJson, numbersAgree } from '../../src/run/compareJson.js';

describe('numbersAgree', () => {
  it('accepts differences within relative 1e-9 and refuses larger ones', () => {
    expect(numbersAgree(101.2, 101.2)).toBe(true);
    expect(numbersAgree(101.2, 101.2 * (1 + 5e-10))).toBe(true);
    expect(numbersAgree(101.2, 101.2 * (1 + 2e-9))).toBe(false);
    expect(numbersAgree(-3e8, -3e8 - 0.2)).toBe(true);
    expect(numbersAgree(-3e8, -3e8 - 1)).toBe(false);
  });

  it('uses the absolute 1e-12 near zero', () => {
    expect(numbersAgree(0, 2e-17)).toBe(true);
    expect(numbersAgree(0, 9e-13)).toBe(true);
    expect(numbersAgree(0, 1e-11)).toBe(false);
  });
});

describe('compareJson', () => {
  it('names each difference by its path, stored value first', () => {
    const stored = { records: [{ forecasts: { stochastic: [{ point: 1 }, { point: 2 }, { point: 3 }, { point: 101.2 }] }, intervals: { '80': [1, 2] } }] };
    const rerun = { records: [{ forecasts: { stochastic: [{ point: 1 }, { point: 2 }, { point: 3 }, { point: 101.5 }] }, intervals: { '80': [1, 2.5] } }] };
    const { differences, numbers } = compareJson(stored, rerun);
    expect(numbers).toBe(6);
    expect(differences).toEqual([
      { path: 'records[0].forecasts.stochastic[3].point', stored: '101.2', rerun: '101.5' },
      { path: 'records[0].intervals["80"][1]', stored: '2', rerun: '2.5' },
    ]);
  });

  it('compares text, booleans and null exactly, and reports missing keys and items', () => {
    const { differences } = compareJson({ a: 'x', b: true, c: null, d: [1, 2], only: 1 }, { a: 'y', b: true, c: 0, d: [1], extra: 'z' }, 'doc');
    expect(differences).toEqual([
      { path: 'doc.a', stored: '"x"', rerun: '"y"' },
      { path: 'doc.c', stored: 'null', rerun: '0' },
      { path: 'doc.d[1]', stored: '2', rerun: 'missing' },
      { path: 'doc.only', stored: '1', rerun: 'missing' },
      { path: 'doc.extra', stored: 'missing', rerun: '"z"' },
    ]);
  });
});
