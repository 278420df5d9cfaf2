// The new series formats through the command line: `fit` on a workbook, and `check` on a config
// whose series are a workbook's sheet and a semicolon file with decimal commas, set by the series
// keys sheet, delimiter and decimal_mark. Invented monthly data, written here: a trend of 0.8 a
// month plus a wobble that repeats every 7 months (so no exact monthly pattern).
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fitRecord, runCli } from '../support/runCli.js';

const DIR = mkdtempSync(join(tmpdir(), 'trendbrief-formats-'));
afterAll(() => rmSync(DIR, { recursive: true, force: true }));

const WOBBLE = [3, -1, 4, -1, -5, 9, -2];
const MONTHS = 48;
const value = (t: number) => Math.round((200 + 0.8 * t + WOBBLE[t % 7]) * 100) / 100;
const WORKBOOK = join(DIR, 'deliveries.xlsx');
const SEMICOLON = join(DIR, 'deliveries-de.csv');

beforeAll(async () => {
  const book = new ExcelJS.Workbook();
  book.addWorksheet('Read me').addRow(['Deliveries by month, invented for a test']);
  const sheet = book.addWorksheet('Deliveries');
  sheet.addRow(['month', 'tonnes', 'depot']);
  for (let t = 0; t < MONTHS; t++) sheet.addRow([new Date(Date.UTC(2020, t, 1)), value(t), 'north']);
  writeFileSync(WORKBOOK, Buffer.from(await book.xlsx.writeBuffer()));
  const lines = Array.from({ length: MONTHS }, (_, t) => `${2020 + Math.floor(t / 12)}-${String((t % 12) + 1).padStart(2, '0')}-01;${String(value(t)).replace('.', ',')}`);
  writeFileSync(SEMICOLON, `Monat;Tonnen\n${lines.join('\n')}\n`);
});

describe('fit on a workbook', () => {
  it('reads the sheet and column asked for and records the file digest', async () => {
    const record = await fitRecord(WORKBOOK, ['--sheet', 'Deliveries', '--column', 'tonnes', '--max-p', '1', '--max-q', '1', '--seasonal', 'none']);
    expect(record.series).toMatchObject({ frequency: 'monthly', first: '2020-01', last: '2023-12', n: MONTHS });
    // The digest is of the workbook's bytes (sha256 by node:crypto, as `sha256sum` computes it).
    expect(record.series.source).toEqual({ file: WORKBOOK, column: 'tonnes', sha256: createHash('sha256').update(readFileSync(WORKBOOK)).digest('hex') });
  });

  it('exits 2 naming the sheets when the sheet is missing', async () => {
    const run = await runCli(['fit', WORKBOOK, '--sheet', 'Delivery']);
    expect(run.code).toBe(2);
    expect(run.errorLines).toEqual([`${WORKBOOK}: has no sheet 'Delivery'; its sheets are 'Read me', 'Deliveries'; name one of the sheets with sheet in the config (--sheet for fit)`]);
  });

  it('refuses an unknown delimiter by the option name', async () => {
    const run = await runCli(['fit', SEMICOLON, '--delimiter', 'pipe']);
    expect(run.code).toBe(2);
    expect(run.errorLines[0]).toContain('--delimiter');
  });
});

describe('check on a config naming a workbook sheet and a semicolon file', () => {
  const config = (name: string, lines: readonly string[]) => {
    const file = join(DIR, name);
    writeFileSync(file, ['memo:', '  id: deliveries', '  title: Deliveries', 'series:', ...lines].join('\n') + '\n');
    return file;
  };

  it('reads both series with the keys set', async () => {
    const file = config('formats.yaml', [
      '  - id: from-workbook',
      '    file: deliveries.xlsx',
      '    sheet: Deliveries',
      '    column: tonnes',
      '  - id: from-csv',
      '    file: deliveries-de.csv',
      '    delimiter: semicolon',
      '    decimal_mark: comma',
    ]);
    const run = await runCli(['check', file]);
    // stderr may carry warnings about the forecast horizon, which are not about reading.
    expect(run.code).toBe(0);
    expect(run.stdout).toBe(`${file}: ok, memo deliveries, 2 series: from-workbook 2020-01 to 2023-12 (48 monthly); from-csv 2020-01 to 2023-12 (48 monthly)\n`);
  });

  it('reports a missing sheet with the config entry that names the file', async () => {
    const file = config('no-sheet.yaml', ['  - id: from-workbook', '    file: deliveries.xlsx', '    sheet: Totals']);
    const run = await runCli(['check', file]);
    expect(run.code).toBe(2);
    expect(run.errorLines).toEqual([`${WORKBOOK}: has no sheet 'Totals'; its sheets are 'Read me', 'Deliveries'; name one of the sheets with sheet in the config (--sheet for fit) (the file of series[0], ${file}:5:5)`]);
  });

  it('refuses a value outside the choices of decimal_mark at its line', async () => {
    const file = config('bad-mark.yaml', ['  - id: from-csv', '    file: deliveries-de.csv', '    decimal_mark: dot']);
    const run = await runCli(['check', file]);
    expect(run.code).toBe(2);
    expect(run.errorLines).toHaveLength(1);
    expect(run.errorLines[0].startsWith(`${file}:7:19: series[0].decimal_mark:`)).toBe(true);
  });
});
