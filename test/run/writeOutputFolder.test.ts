// Output folders appear whole or not at all (our spec, DESIGN.md "Output and safety").
import { existsSync, mkdtempSync, readFileSync, readdirSync, renameSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { isInside, recoverOutputFolder, writeOutputFolder } from '../../src/run/writeOutputFolder.js';
import { runDate } from '../../src/run/runDate.js';
import { forecastsCsv } from '../../src/run/forecastsCsv.js';

describe('writeOutputFolder', () => {
  it('creates, then replaces a folder as a whole', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-out-'));
    const target = join(root, 'memo');
    writeOutputFolder(target, [{ name: 'a.txt', content: 'one' }, { name: 'sub/b.txt', content: 'two' }]);
    expect(readFileSync(join(target, 'sub/b.txt'), 'utf8')).toBe('two');
    writeOutputFolder(target, [{ name: 'c.txt', content: 'three' }]);
    expect(readdirSync(target)).toEqual(['c.txt']);
    expect(readdirSync(root)).toEqual(['memo']);
  });

  it('leaves the previous folder untouched when writing fails', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-out-'));
    const target = join(root, 'memo');
    writeOutputFolder(target, [{ name: 'memo.html', content: 'issued' }]);
    expect(() => writeOutputFolder(target, [{ name: 'ok.txt', content: 'x' }, { name: '../escape.txt', content: 'y' }])).toThrow(/leave the output folder/);
    expect(readFileSync(join(target, 'memo.html'), 'utf8')).toBe('issued');
    expect(readdirSync(root)).toEqual(['memo']);
  });

  it('puts back a previous folder left under its backup name by a killed run', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-out-'));
    const target = join(root, 'memo');
    writeOutputFolder(target, [{ name: 'memo.html', content: 'issued' }]);
    renameSync(target, join(root, '.previous-memo'));
    mkdirSync(join(root, '.partial-memo-99999'));
    writeFileSync(join(root, '.partial-memo-99999', 'half.html'), '<html');
    recoverOutputFolder(target);
    expect(readFileSync(join(target, 'memo.html'), 'utf8')).toBe('issued');
    expect(existsSync(join(root, '.partial-memo-99999'))).toBe(false);
  });

  it('knows inside from outside', () => {
    expect(isInside('/a/b', '/a/b/c')).toBe(true);
    expect(isInside('/a/b', '/a/b')).toBe(false);
    expect(isInside('/a/b', '/a/bc')).toBe(false);
    expect(isInside('/a/b', '/a/b/../c')).toBe(false);
  });
});

describe('runDate', () => {
  it('follows SOURCE_DATE_EPOCH (reproducible-builds.org convention)', () => {
    // 1700000000 s after the epoch is 2023-11-14T22:13:20Z (common practice: date -u -d @1700000000).
    expect(runDate({ SOURCE_DATE_EPOCH: '1700000000' })).toBe('2023-11-14');
    expect(runDate({}, () => new Date('2026-12-01T10:00:00Z'))).toBe('2026-12-01');
    expect(() => runDate({ SOURCE_DATE_EPOCH: 'soon' })).toThrow(/SOURCE_DATE_EPOCH/);
  });
});

describe('forecastsCsv', () => {
  it('writes one row per model and horizon with every level, quoting text (RFC 4180)', () => {
    const row = (h: number) => ({ h, period: `20${30 + h}`, point: 10 + h, intervals: { '80': [9, 11] as [number, number], '95': [8, 12] as [number, number] }, model_scale: { mean: 10 + h, se_process: 1, se_total: 1.1 } });
    const record = { series: { id: 'a,b' }, settings: { levels: [80, 95] }, forecasts: { deterministic: [row(1)], stochastic: [row(1), row(2)] } };
    const csv = forecastsCsv([record as unknown as Parameters<typeof forecastsCsv>[0][number]]);
    const lines = csv.trimEnd().split('\r\n');
    expect(lines[0]).toBe('series_id,model,h,period,point,lower_80,upper_80,lower_95,upper_95,model_scale_mean,se_process,se_total');
    expect(lines).toHaveLength(4);
    expect(lines[1]).toBe('"a,b",deterministic,1,2031,11,9,11,8,12,11,1,1.1');
  });
});
