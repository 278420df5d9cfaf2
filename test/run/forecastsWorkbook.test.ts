// forecasts.xlsx, the forecasts as the client opens them (our spec, README "What it does"): a
// summary sheet and one sheet per series with both models at every step and level, the
// recommended model flagged, periods as real dates, the numbers forecasts.csv gives; read back
// here with exceljs, the general-purpose workbook library that writes it. The same memo gives
// the same bytes, so verify compares it.
import { cpSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sheetNames } from '../../src/run/forecastsWorkbook.js';
import { stampZipDates } from '../../src/run/stampZipDates.js';
import { HARDENING_FIXTURES } from '../hardening/refusedCases.js';
import { fixRunDate } from '../support/fixRunDate.js';
import { runCli } from '../support/runCli.js';

fixRunDate('all');

let root = '';
let memo = '';

beforeAll(async () => {
  root = mkdtempSync(join(tmpdir(), 'tb-workbook-'));
  cpSync(join(HARDENING_FIXTURES, 'base'), join(root, 'project'), { recursive: true });
  const run = await runCli(['run', join(root, 'project/memo.yaml'), '--out', join(root, 'out'), '--formats', 'json,csv,xlsx', '--quiet']);
  if (run.code !== 0) throw new Error(run.stderr);
  memo = join(root, 'out/tarnwick-cargo');
}, 60_000);

afterAll(() => rmSync(root, { recursive: true, force: true }));

async function workbookAt(file: string): Promise<ExcelJS.Workbook> {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.load(readFileSync(file) as unknown as ExcelJS.Buffer);
  return workbook;
}

describe('forecasts.xlsx', () => {
  it('holds a summary and one sheet per series whose rows are forecasts.csv\'s numbers, with dates and the recommended flag', async () => {
    const workbook = await workbookAt(join(memo, 'forecasts.xlsx'));
    expect(workbook.worksheets.map((sheet) => sheet.name)).toEqual(['Summary', 'cargo']);
    const sheet = workbook.getWorksheet('cargo');
    if (sheet === undefined) throw new Error('no cargo sheet');
    expect(sheet.getRow(1).values).toEqual([undefined, 'Period', 'Starts', 'Step', 'Model', 'Recommended', 'Point (thousand tonnes)', 'Lower 80%', 'Upper 80%', 'Lower 95%', 'Upper 95%']);
    const csv = readFileSync(join(memo, 'forecasts.csv'), 'utf8').trimEnd().split('\r\n').map((line) => line.split(','));
    const [head, ...rows] = csv;
    const column = (name: string) => head.indexOf(name);
    // Five steps (horizon: 5 in the fixture) for each model.
    expect(rows).toHaveLength(10);
    expect(sheet.rowCount).toBe(11);
    rows.forEach((cells, i) => {
      const row = sheet.getRow(i + 2);
      expect(row.getCell(1).value).toBe(cells[column('period')]);
      const start = row.getCell(2).value;
      expect(start instanceof Date ? start.toISOString().slice(0, 10) : start).toBe(cells[column('period_start')]);
      expect(row.getCell(3).value).toBe(Number(cells[column('h')]));
      expect(row.getCell(4).value).toBe(cells[column('model')] === 'deterministic' ? 'Deterministic trend' : 'Stochastic trend');
      expect(row.getCell(5).value).toBe(cells[column('recommended')]);
      expect([6, 7, 8, 9, 10].map((c) => row.getCell(c).value)).toEqual(['point', 'lower_80', 'upper_80', 'lower_95', 'upper_95'].map((name) => Number(cells[column(name)])));
    });
    // Exactly one model is recommended, at every step.
    expect(new Set(rows.filter((cells) => cells[column('recommended')] === 'yes').map((cells) => cells[column('model')])).size).toBe(1);
    const summary = workbook.getWorksheet('Summary');
    expect(summary?.getRow(1).getCell(1).value).toBe('Tarnwick cargo outlook');
    const cautions = summary === undefined ? [] : summary.getColumn(1).values.filter((value): value is string => typeof value === 'string');
    expect(cautions).toContain('A forecast is an estimate, not a guarantee. Actual outcomes can and do fall outside the ranges shown.');
  });

  it('is the same byte for byte when the memo is run again, so verify checks it', async () => {
    const first = readFileSync(join(memo, 'forecasts.xlsx'));
    const again = await runCli(['run', join(root, 'project/memo.yaml'), '--out', join(root, 'again'), '--formats', 'json,csv,xlsx', '--quiet']);
    expect(again.code).toBe(0);
    expect(readFileSync(join(root, 'again/tarnwick-cargo/forecasts.xlsx')).equals(first)).toBe(true);
    const verify = await runCli(['verify', memo]);
    expect(verify.stderr).toBe('');
    expect(verify.code).toBe(0);
    expect(verify.stdout).toContain('forecasts.xlsx');
  });

  it('names sheets within the format\'s 31 characters, each once', () => {
    const long = 'a-very-long-series-identifier-that-runs-on';
    expect(sheetNames(['cargo', long, `${long}-too`, 'summary'])).toEqual(['cargo', 'a-very-long-series-identifier-t', 'a-very-long-series-identifier~2', 'summary~2']);
  });

  it('sets every member\'s time in a zip to the run date (APPNOTE.TXT 4.4.6: DOS date, 2026-11-30 is 0x5D7E)', async () => {
    const workbook = new ExcelJS.Workbook();
    workbook.addWorksheet('x').addRow([1]);
    const stamped = stampZipDates(new Uint8Array((await workbook.xlsx.writeBuffer()) as ArrayBuffer), '2026-11-30');
    // ((2026 − 1980) << 9) | (11 << 5) | 30 = 23552 + 352 + 30 = 23934 = 0x5D7E.
    const dates = new Set<number>();
    for (let at = stamped.indexOf(Buffer.from([0x50, 0x4b, 0x03, 0x04])); at >= 0; at = stamped.indexOf(Buffer.from([0x50, 0x4b, 0x03, 0x04]), at + 4)) dates.add(stamped.readUInt16LE(at + 12));
    expect([...dates]).toEqual([0x5d7e]);
    const back = new ExcelJS.Workbook();
    await back.xlsx.load(stamped as unknown as ExcelJS.Buffer);
    expect(back.getWorksheet('x')?.getRow(1).getCell(1).value).toBe(1);
  });
});
