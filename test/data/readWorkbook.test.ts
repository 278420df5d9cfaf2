// Series read from .xlsx workbooks made here with exceljs (the library the reader uses, 4.4.0),
// and the refusals of files that are no such workbook. Cell references are the spreadsheet's
// (column B is the second column, rows counted from 1; common practice). A date cell holds a day
// number that exceljs returns as midnight UTC, so the day read is the day written whatever the
// machine's time zone. The values are small invented numbers.
import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { deflateRawSync } from 'node:zlib';
import ExcelJS from 'exceljs';
import { afterAll, describe, expect, it } from 'vitest';
import { formatProblem, InputError, type InputProblem } from '../../src/base/problem.js';
import { readSeriesCsv } from '../../src/data/readSeriesCsv.js';
import { readSeriesFile } from '../../src/data/readSeriesFile.js';
import type { SeriesOptions } from '../../src/data/seriesOptions.js';
import { readZipEntries } from '../../src/data/zipArchive.js';

const scratch = mkdtempSync(join(tmpdir(), 'trendbrief-workbook-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

const SALES = [112.5, 118, 132.25, 129, 121.5, 135, 148.75, 148, 136.5, 119, 104.25, 118];

/** Writes the workbook that `fill` builds; returns its path and its bytes. */
async function workbook(name: string, fill: (book: ExcelJS.Workbook) => void): Promise<{ file: string; bytes: Buffer }> {
  const book = new ExcelJS.Workbook();
  fill(book);
  const bytes = Buffer.from(await book.xlsx.writeBuffer());
  const file = join(scratch, name);
  writeFileSync(file, bytes);
  return { file, bytes };
}

/** A sheet of monthly sales dated on each month's last day, as date cells. */
function monthlySheet(book: ExcelJS.Workbook, name = 'Sales'): ExcelJS.Worksheet {
  const sheet = book.addWorksheet(name);
  sheet.addRow(['month', 'sales']);
  SALES.forEach((value, i) => sheet.addRow([new Date(Date.UTC(2021, i + 1, 0)), value]));
  return sheet;
}

const read = (file: string, options: Partial<SeriesOptions> = {}) => readSeriesFile(file, { missing: 'error', ...options });

async function problemsOf(file: string, options: Partial<SeriesOptions> = {}): Promise<readonly InputProblem[]> {
  try {
    await read(file, options);
  } catch (error) {
    if (error instanceof InputError) return error.problems;
    throw error;
  }
  throw new Error('expected an InputError, but the workbook was accepted');
}

describe('readSeriesFile on workbooks', () => {
  it('reads numbers against date cells on the first sheet, hashing the file bytes', async () => {
    const { file, bytes } = await workbook('monthly.xlsx', (book) => {
      monthlySheet(book);
      book.addWorksheet('Notes').addRow(['written by hand']);
    });
    const series = await read(file);
    expect(series).toMatchObject({ file, periodColumn: 'month', column: 'sales', frequency: 'monthly', first: '2021-01', last: '2021-12', n: 12 });
    expect([...series.values]).toEqual(SALES);
    // The Series' digest is of the file's bytes, as for a CSV file.
    expect(series.sha256).toBe(createHash('sha256').update(bytes).digest('hex'));
  });

  it('reads text periods from the sheet and columns chosen by their header text', async () => {
    const { file } = await workbook('two-sheets.xlsx', (book) => {
      monthlySheet(book);
      const sheet = book.addWorksheet('Quarterly');
      sheet.addRow(['note', 'revenue', 'quarter', 'costs']);
      ['2022-Q1', '2022-Q2', '2022-Q3', '2022-Q4', '2023-Q1'].forEach((quarter, i) => sheet.addRow(['', 40 + i * 2.5 + (i % 2), quarter, 30 - i]));
    });
    const series = await read(file, { sheet: 'Quarterly', periodColumn: 'quarter', column: 'revenue' });
    expect(series).toMatchObject({ frequency: 'quarterly', first: '2022-Q1', last: '2023-Q1', column: 'revenue' });
    expect([...series.values]).toEqual([40, 43.5, 45, 48.5, 50]);
  });

  it('reads years written as numbers and values written as text with a decimal comma', async () => {
    const { file } = await workbook('annual.xlsx', (book) => {
      const sheet = book.addWorksheet('Annual');
      sheet.addRow(['year', 'value']);
      [['2001', '1,5'], ['2002', '2,75'], ['2003', '2,5'], ['2004', '3,25']].forEach(([year, value]) => sheet.addRow([Number(year), value]));
    });
    const series = await read(file);
    expect(series).toMatchObject({ frequency: 'annual', first: '2001', last: '2004' });
    expect([...series.values]).toEqual([1.5, 2.75, 2.5, 3.25]);
  });

  it('uses the saved result of a formula, and refuses one without a result at its cell', async () => {
    const withResult = await workbook('formula.xlsx', (book) => {
      const sheet = monthlySheet(book);
      sheet.getCell('B4').value = { formula: 'B3+14.25', result: 132.25 };
    });
    expect([...(await read(withResult.file)).values]).toEqual(SALES);
    const without = await workbook('formula-no-result.xlsx', (book) => {
      const sheet = monthlySheet(book);
      sheet.getCell('B7').value = { formula: 'B6*1.1', date1904: false };
    });
    const found = await problemsOf(without.file);
    expect(found.map(formatProblem)).toEqual([
      `${without.file}:7:2: Sales!B7: sales: the cell holds the formula '=B6*1.1' with no saved result; open the workbook in a spreadsheet program and save it again, so every formula keeps its result; or paste the values`,
    ]);
  });

  it('names the file, sheet, row and column of each bad cell', async () => {
    const { file } = await workbook('bad-cells.xlsx', (book) => {
      const sheet = book.addWorksheet('Data sheet');
      sheet.addRow(['period', 'value']);
      ['2010', '2011', '2012', '2013', '2014', '2015'].forEach((year, i) => sheet.addRow([year, i === 2 ? '12 kt' : i === 4 ? new Date(Date.UTC(2020, 0, 1)) : 10 + i]));
      sheet.getCell('B3').value = { error: '#DIV/0!' };
    });
    const found = await problemsOf(file);
    expect(found.map(formatProblem)).toEqual([
      `${file}:3:2: 'Data sheet'!B3: value: the cell shows the error #DIV/0!; correct the formula or the cell it refers to`,
      `${file}:4:2: 'Data sheet'!B4: value: '12 kt' is not a number; write a plain number such as 1234.5, without units, symbols or thousands separators`,
      `${file}:6:2: 'Data sheet'!B6: value: the cell holds the date 2020-01-01, not a number; check that the value column is chosen (column in the config, --column for fit)`,
    ]);
  });

  it('speaks of rows, not lines, where a period repeats, is out of order or is missing', async () => {
    const { file } = await workbook('rows.xlsx', (book) => {
      const sheet = book.addWorksheet('Data');
      sheet.addRow(['period', 'value']);
      ['2010', '2011', '2011', '2013', '2012'].forEach((year, i) => sheet.addRow([year, 10 + i]));
    });
    const found = await problemsOf(file);
    expect(found.map(formatProblem)).toEqual([
      `${file}:4:1: Data!A4: period: period 2011 already appears on row 3; keep one row per period`,
      `${file}:6:1: Data!A6: period: period 2012 comes after 2013 (row 5); sort the rows by period, oldest first`,
    ]);
    const { file: gappy } = await workbook('gap.xlsx', (book) => {
      const sheet = book.addWorksheet('Data');
      sheet.addRow(['period', 'value']);
      ['2010', '2011', '2013', '2014'].forEach((year, i) => sheet.addRow([year, 10 + i]));
    });
    expect((await problemsOf(gappy)).map(formatProblem)).toEqual([
      `${gappy}:4:1: Data!A4: period: missing 2012 before 2013; add a row for each missing period, or allow gaps (missing: allow in the config, --allow-missing for fit)`,
    ]);
  });

  it('reports a period column of text dates it cannot read once, at the first cell', async () => {
    const { file } = await workbook('text-dates.xlsx', (book) => {
      const sheet = book.addWorksheet('Sheet1');
      sheet.addRow(['month', 'sales']);
      SALES.forEach((value, i) => sheet.addRow([`${i + 1}/1/2021`, value]));
    });
    const found = await problemsOf(file);
    expect(found).toHaveLength(1);
    expect(formatProblem(found[0])).toMatch(new RegExp(`^${file.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}:2:1: Sheet1!A2: month: '1/1/2021' is not a period, nor are the other 11 labels in this column;`));
  });

  it('names the sheets there are when the one asked for is missing', async () => {
    const { file } = await workbook('sheets.xlsx', (book) => {
      monthlySheet(book);
      monthlySheet(book, 'Sales 2020');
    });
    const found = await problemsOf(file, { sheet: 'sales' });
    expect(found.map(formatProblem)).toEqual([`${file}: has no sheet 'sales'; its sheets are 'Sales', 'Sales 2020'; did you mean 'Sales'?`]);
  });

  it('is refused by the CSV-only reader as a workbook, not as text that is not UTF-8', async () => {
    const { file } = await workbook('for-csv-reader.xlsx', (book) => monthlySheet(book));
    expect(() => readSeriesCsv(file, { missing: 'error' })).toThrow(`${file}: is a workbook (a ZIP archive), not CSV text; read it with readSeriesFile, which reads .xlsx workbooks too`);
  });

  it('refuses a CSV setting on a workbook and a sheet on a CSV file', async () => {
    const { file } = await workbook('plain.xlsx', (book) => monthlySheet(book));
    expect((await problemsOf(file, { delimiter: 'semicolon' }))[0].code).toBe('workbook.delimiter');
    const csv = join(scratch, 'plain.csv');
    writeFileSync(csv, 'period,value\n2001,1\n2002,3\n2003,2\n');
    expect((await problemsOf(csv, { sheet: 'Sales' }))[0]).toMatchObject({ code: 'csv.sheet-for-text', file: csv });
  });
});

/** A ZIP archive of stored (uncompressed) or deflated entries, per APPNOTE.TXT §4.3; CRCs left 0, which the reader does not check before refusing. */
function zipOf(entries: { name: string; data: Buffer; deflate?: boolean }[]): Buffer {
  const locals: Buffer[] = [];
  const directory: Buffer[] = [];
  let offset = 0;
  for (const entry of entries) {
    const body = entry.deflate === true ? deflateRawSync(entry.data) : entry.data;
    const name = Buffer.from(entry.name);
    const local = Buffer.alloc(30);
    local.writeUInt32LE(0x04034b50, 0);
    local.writeUInt16LE(entry.deflate === true ? 8 : 0, 8);
    local.writeUInt32LE(body.length, 18);
    local.writeUInt32LE(entry.data.length, 22);
    local.writeUInt16LE(name.length, 26);
    const central = Buffer.alloc(46);
    central.writeUInt32LE(0x02014b50, 0);
    central.writeUInt16LE(entry.deflate === true ? 8 : 0, 10);
    central.writeUInt32LE(body.length, 20);
    central.writeUInt32LE(entry.data.length, 24);
    central.writeUInt16LE(name.length, 28);
    central.writeUInt32LE(offset, 42);
    locals.push(local, name, body);
    directory.push(central, name);
    offset += 30 + name.length + body.length;
  }
  const size = directory.reduce((sum, part) => sum + part.length, 0);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(entries.length, 8);
  end.writeUInt16LE(entries.length, 10);
  end.writeUInt32LE(size, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...locals, ...directory, end]);
}

describe('files that are no .xlsx workbook', () => {
  const written = (name: string, bytes: Buffer) => {
    const file = join(scratch, name);
    writeFileSync(file, bytes);
    return file;
  };

  it('refuses an old binary workbook, an OpenDocument spreadsheet and a ZIP of something else', async () => {
    // The OLE2 compound file signature (MS-CFB §2.2) opens every .xls file.
    const xls = written('old.xls', Buffer.concat([Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]), Buffer.alloc(504)]));
    expect((await problemsOf(xls)).map(formatProblem)).toEqual([
      `${xls}: is an Excel 97-2003 workbook (.xls) or a password-protected one, which is not read; save the sheet as an .xlsx workbook (Excel 2007 or later) without a password, or as CSV`,
    ]);
    // An OpenDocument package starts with its mimetype entry and holds content.xml (OpenDocument 1.2, part 3, §3.3).
    const ods = written('sheet.ods', zipOf([{ name: 'mimetype', data: Buffer.from('application/vnd.oasis.opendocument.spreadsheet') }, { name: 'content.xml', data: Buffer.from('<office:document-content/>') }]));
    expect((await problemsOf(ods))[0].message).toBe('is an OpenDocument spreadsheet (.ods), which is not read');
    const other = written('archive.xlsx', zipOf([{ name: 'readme.txt', data: Buffer.from('not a workbook') }]));
    expect((await problemsOf(other))[0].message).toBe('is a ZIP archive but not an .xlsx workbook');
  });

  it('refuses a truncated workbook and a file named .xlsx that is text', async () => {
    const { bytes } = await workbook('whole.xlsx', (book) => monthlySheet(book));
    const cut = written('cut.xlsx', bytes.subarray(0, Math.floor(bytes.length / 2)));
    expect((await problemsOf(cut))[0]).toMatchObject({ code: 'workbook.unreadable', message: 'is not a valid .xlsx workbook' });
    const text = written('text.xlsx', Buffer.from('period,value\n2001,1\n'));
    expect((await problemsOf(text))[0].message).toBe('has a workbook name but is not a workbook (an .xlsx file is a ZIP archive)');
  });

  it('stops unpacking an archive at the size cap, whatever sizes it declares', () => {
    // 64 kB of zeros deflate to well under a kilobyte (RFC 1951); a cap of 10 kB stops them.
    const bomb = zipOf([{ name: 'xl/workbook.xml', data: Buffer.alloc(64 * 1024), deflate: true }]);
    expect(bomb.length).toBeLessThan(1024);
    expect(readZipEntries(bomb, 10 * 1024)).toEqual({ fault: 'too-large' });
    expect(readZipEntries(bomb, 128 * 1024)).toEqual({ entries: [{ name: 'xl/workbook.xml', size: 64 * 1024 }] });
  });
});
