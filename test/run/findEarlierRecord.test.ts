// Which as-of memo a run compares with: the latest earlier one by period order, skipping
// folders without a valid record.json (our spec: src/run/findEarlierRecord.ts).
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, symlinkSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { asOfFolders, byRecency, findEarlierRecord, findEarlierRecords, isEarlierAsOf, monthSpan } from '../../src/run/findEarlierRecord.js';
import { recordedCommand, shellWord } from '../../src/run/recordedCommand.js';

function recordDocument(id: string, asOf: string): string {
  const forecasts = [{ h: 1, period: '2026', point: 1 }];
  const record = { series: { id: 's', title: 'S', last: '2025' }, models: { deterministic: { p: 0, q: 0 }, stochastic: { p: 0, q: 0 } }, forecasts: { deterministic: forecasts, stochastic: forecasts } };
  return JSON.stringify({ schema: 'trendbrief.memo/1', memo: { id, as_of: asOf }, run_date: '2026-01-01', records: [record] });
}

function asOfFolder(root: string, label: string, content: string | undefined): void {
  mkdirSync(join(root, label), { recursive: true });
  if (content !== undefined) writeFileSync(join(root, label, 'record.json'), content);
}

describe('as-of periods in order', () => {
  it('spans the months of a period label', () => {
    // 2024 × 12 = 24288: January 2024 is month 24288 (our spec: year × 12 + month − 1).
    expect(monthSpan('2024')).toEqual([24288, 24299]);
    expect(monthSpan('2024-Q2')).toEqual([24291, 24293]);
    expect(monthSpan('2024-06')).toEqual([24293, 24293]);
    expect(monthSpan('.partial-2024-06-12')).toBeNull();
  });

  it('orders by the last month covered, the shorter period first on a tie', () => {
    expect(['2024', '2024-Q4', '2023-12', '2024-12', '2024-11'].sort(byRecency)).toEqual(['2024-12', '2024-Q4', '2024', '2024-11', '2023-12']);
    expect(isEarlierAsOf('2024-11', '2024-12')).toBe(true);
    expect(isEarlierAsOf('2024-Q4', '2024-12')).toBe(false);
    expect(isEarlierAsOf('2025-01', '2024-12')).toBe(false);
  });
});

describe('findEarlierRecord', () => {
  it('takes the latest earlier period with a valid record, whatever the file times', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-earlier-'));
    asOfFolder(root, '2025-09', recordDocument('lake-outlook', '2025-09'));
    asOfFolder(root, '2025-10', recordDocument('lake-outlook', '2025-10'));
    asOfFolder(root, '2025-11', '{"schema": "trendbrief.memo/1"'); // cut short
    asOfFolder(root, '2025-12', recordDocument('lake-outlook', '2025-12')); // this month itself
    asOfFolder(root, '2026-01', recordDocument('lake-outlook', '2026-01')); // later
    asOfFolder(root, 'notes', recordDocument('lake-outlook', '2025-11'));
    // The older folder is the newest on disk: time must not decide.
    utimesSync(join(root, '2025-09', 'record.json'), new Date('2030-01-01'), new Date('2030-01-01'));
    const found = findEarlierRecord(root, 'lake-outlook', '2025-12');
    expect(found?.asOf).toBe('2025-10');
    expect(found?.file).toBe(join(root, '2025-10', 'record.json'));
    expect(found?.sha256).toMatch(/^[0-9a-f]{64}$/);
    // The track record reads every valid earlier one, the most recent first.
    expect(findEarlierRecords(root, 'lake-outlook', '2025-12').map((memo) => memo.asOf)).toEqual(['2025-10', '2025-09']);
  });

  it('skips a record of another memo id or another as-of period, and finds none in a missing folder', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-earlier-'));
    asOfFolder(root, '2025-10', recordDocument('other-memo', '2025-10'));
    asOfFolder(root, '2025-11', recordDocument('lake-outlook', '2025-08'));
    asOfFolder(root, '2025-09', undefined);
    expect(findEarlierRecord(root, 'lake-outlook', '2025-12')).toBeNull();
    expect(findEarlierRecord(join(root, 'absent'), 'lake-outlook', '2025-12')).toBeNull();
    expect(asOfFolders(root)).toEqual(['2025-11', '2025-10', '2025-09']);
  });

  it('skips, without opening, a record.json that is a FIFO, a link to /dev/zero or a folder', () => {
    const root = mkdtempSync(join(tmpdir(), 'tb-earlier-'));
    asOfFolder(root, '2025-08', recordDocument('lake-outlook', '2025-08'));
    asOfFolder(root, '2025-09', undefined);
    execFileSync('mkfifo', [join(root, '2025-09', 'record.json')]);
    asOfFolder(root, '2025-10', undefined);
    symlinkSync('/dev/zero', join(root, '2025-10', 'record.json'));
    mkdirSync(join(root, '2025-11', 'record.json'), { recursive: true });
    // Opened blocking, the FIFO would wait for a writer and /dev/zero fill memory: the test would hang.
    expect(findEarlierRecords(root, 'lake-outlook', '2025-12').map((memo) => memo.asOf)).toEqual(['2025-08']);
  });
});

describe('recordedCommand', () => {
  it('writes the command as typed in the config folder, quoting what a shell would split', () => {
    const plan = { configFile: '/srv/memos/configs/lake memo.yaml', baseDir: '/srv/memos/configs' };
    expect(recordedCommand(plan, {})).toBe("trendbrief run 'lake memo.yaml'");
    expect(recordedCommand(plan, { outputFolder: '/srv/memos/out', formats: ['html', 'csv'] })).toBe("trendbrief run 'lake memo.yaml' --out ../out --formats html,csv");
    expect(shellWord("it's")).toBe("'it'\\''s'");
  });
});
