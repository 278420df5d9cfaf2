// Memos appear whole or not at all, and only inside the output folder (our spec, DEVELOPERS.md "Publishing").
import { existsSync, lstatSync, mkdtempSync, readFileSync, readdirSync, readlinkSync, renameSync, rmSync, symlinkSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { isInside, writeOutputFolder } from '../../src/run/writeOutputFolder.js';
import { recoverMemoLink } from '../../src/run/memoVersions.js';
import { makeFolders, pseudoFileSystem } from '../../src/run/outputTree.js';
import { InputError } from '../../src/base/problem.js';
import { runDate } from '../../src/run/runDate.js';
import { forecastsCsv } from '../../src/run/forecastsCsv.js';

describe('writeOutputFolder', () => {
  it('creates, then replaces a memo as a whole: its name is a link to the complete current version', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-out-'));
    const target = join(root, 'memo');
    writeOutputFolder(target, [{ name: 'a.txt', content: 'one' }, { name: 'sub/b.txt', content: 'two' }]);
    expect(readFileSync(join(target, 'sub/b.txt'), 'utf8')).toBe('two');
    expect(readlinkSync(target)).toBe('.memo.v1');
    writeOutputFolder(target, [{ name: 'c.txt', content: 'three' }]);
    expect(readdirSync(target)).toEqual(['c.txt']);
    expect(readlinkSync(target)).toBe('.memo.v2');
    // The old version is removed after the swap; nothing else is left beside the name.
    expect(readdirSync(root).sort()).toEqual(['.memo.v2', 'memo']);
  });

  it('leaves the previous folder untouched when writing fails', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-out-'));
    const target = join(root, 'memo');
    writeOutputFolder(target, [{ name: 'memo.html', content: 'issued' }]);
    expect(() => writeOutputFolder(target, [{ name: 'ok.txt', content: 'x' }, { name: '../escape.txt', content: 'y' }])).toThrow(/leave the output folder/);
    expect(readFileSync(join(target, 'memo.html'), 'utf8')).toBe('issued');
    expect(readdirSync(root).sort()).toEqual(['.memo.v1', 'memo']);
  });

  it('puts back a previous folder left under the old backup name, and makes a plain folder the first version', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-out-'));
    const target = join(root, 'memo');
    mkdirSync(join(root, '.previous-memo'));
    writeFileSync(join(root, '.previous-memo', 'memo.html'), 'issued');
    mkdirSync(join(root, '.partial-memo-99999'));
    writeFileSync(join(root, '.partial-memo-99999', 'half.html'), '<html');
    // Another memo's leftovers are not this memo's to remove.
    mkdirSync(join(root, '.partial-memo-b-99999'));
    recoverMemoLink(target);
    expect(readFileSync(join(target, 'memo.html'), 'utf8')).toBe('issued');
    expect(lstatSync(target).isSymbolicLink()).toBe(true);
    expect(readdirSync(root).sort()).toEqual(['.memo.v1', '.partial-memo-b-99999', 'memo']);
  });

  it('links the highest version again when a killed run left the name missing, and drops versions nobody links to', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-out-'));
    const target = join(root, 'memo');
    writeOutputFolder(target, [{ name: 'memo.html', content: 'first' }]);
    renameSync(join(root, '.memo.v1'), join(root, '.memo.v4'));
    rmSync(target);
    mkdirSync(join(root, '.memo.v2'));
    recoverMemoLink(target);
    expect(readlinkSync(target)).toBe('.memo.v4');
    expect(readFileSync(join(target, 'memo.html'), 'utf8')).toBe('first');
    expect(existsSync(join(root, '.memo.v2'))).toBe(false);
  });

  it('refuses a name that is a link to a folder elsewhere, and a hidden version named as the memo', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-out-'));
    const elsewhere = mkdtempSync(join(tmpdir(), 'tb-elsewhere-'));
    symlinkSync(elsewhere, join(root, 'memo'));
    expect(() => writeOutputFolder(join(root, 'memo'), [{ name: 'a.txt', content: 'x' }])).toThrow(InputError);
    expect(readdirSync(elsewhere)).toEqual([]);
    expect(readdirSync(root)).toEqual(['memo']);
    writeOutputFolder(join(root, 'other'), [{ name: 'a.txt', content: 'x' }]);
    expect(() => writeOutputFolder(join(root, '.other.v1'), [{ name: 'a.txt', content: 'y' }])).toThrow(/hidden version of the memo/);
    expect(readFileSync(join(root, 'other/a.txt'), 'utf8')).toBe('x');
  });

  it('refuses a folder on the way that resolves outside the output folder', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-out-'));
    const elsewhere = mkdtempSync(join(tmpdir(), 'tb-elsewhere-'));
    symlinkSync(elsewhere, join(root, 'memo-id'));
    expect(() => writeOutputFolder(join(root, 'memo-id', '2024'), [{ name: 'a.txt', content: 'x' }], root)).toThrow(/outside the output folder/);
    expect(readdirSync(elsewhere)).toEqual([]);
  });

  it('knows inside from outside', () => {
    expect(isInside('/a/b', '/a/b/c')).toBe(true);
    expect(isInside('/a/b', '/a/b')).toBe(false);
    expect(isInside('/a/b', '/a/bc')).toBe(false);
    expect(isInside('/a/b', '/a/b/../c')).toBe(false);
  });
});

describe('makeFolders', () => {
  it('refuses a folder under /proc/self at once instead of looping (Linux procfs)', () => {
    expect(pseudoFileSystem('/proc/self/memos/out')).toBe('proc');
    expect(() => makeFolders('/proc/self/memos/out')).toThrow(/ENOENT|EACCES|EPERM/);
    expect(pseudoFileSystem(tmpdir())).toBeNull();
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
  it('writes one row per model and horizon with every level, the units, the recommended flag and the period start, quoting text (RFC 4180)', () => {
    const row = (h: number) => ({ h, period: `20${30 + h}`, point: 10 + h + 1 / 3, intervals: { '80': [9, 11] as [number, number], '95': [8, 12] as [number, number] }, model_scale: { mean: 10 + h, se_process: 1, se_total: 1.1 } });
    const record = { series: { id: 'a,b' }, settings: { levels: [80, 95] }, forecasts: { deterministic: [row(1)], stochastic: [row(1), row(2)] }, recommendation: { model: 'stochastic' } };
    const csv = forecastsCsv([record as unknown as Parameters<typeof forecastsCsv>[0][number]], new Map([['a,b', 'ML a "year"']]));
    const lines = csv.trimEnd().split('\r\n');
    expect(lines[0]).toBe('series_id,units,model,recommended,h,period,period_start,point,lower_80,upper_80,lower_95,upper_95,model_scale_mean,se_process,se_total');
    expect(lines).toHaveLength(4);
    // 11.333… to six significant digits.
    expect(lines[1]).toBe('"a,b","ML a ""year""",deterministic,no,1,2031,2031-01-01,11.3333,9,11,8,12,11,1,1.1');
    expect(lines[3]).toBe('"a,b","ML a ""year""",stochastic,yes,2,2032,2032-01-01,12.3333,9,11,8,12,12,1,1.1');
  });
});
