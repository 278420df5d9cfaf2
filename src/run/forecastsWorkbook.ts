// forecasts.xlsx, the forecasts as a client opens them in a spreadsheet: a summary sheet (each
// series' units, last observation, end of the forecast, recommended model and both models'
// figures at the end of the horizon, then the standing cautions) and one sheet per series
// with both models at every step and interval level, the recommended one flagged and the
// periods as real dates. The numbers are forecasts.csv's, rounded alike; the workbook is
// written with exceljs, loaded only when this format is asked for, and its bytes depend on
// the content and the run date alone (stampZipDates.ts).
import type { Workbook, Worksheet } from 'exceljs';
import type { AnalysisRecord } from '../analysis/record.js';
import { levelKey, TREND_MODELS } from '../base/settings.js';
import { CAUTIONS, FREQUENCY_NAME, MODEL_NAME } from '../memo/wording.js';
import { recommendedFlag, roundedForecast, type UnitsById } from './forecastsCsv.js';
import { periodStartDate } from '../base/period.js';
import type { RecordDocument } from './recordDocument.js';
import { stampZipDates } from './stampZipDates.js';

export const WORKBOOK_FILE = 'forecasts.xlsx';

/** Sheet names: at most 31 characters, none of : \ / ? * [ ] (the workbook format's rule). */
const SHEET_NAME_LENGTH = 31;
const SUMMARY_SHEET = 'Summary';
const DATE_FORMAT = 'yyyy-mm-dd';

/** Each series' sheet name: its id, cut to fit and made unique. Ids are slugs, so no forbidden character appears. */
export function sheetNames(ids: readonly string[]): string[] {
  const used = new Set([SUMMARY_SHEET.toLowerCase()]);
  return ids.map((id) => {
    let name = id.slice(0, SHEET_NAME_LENGTH);
    for (let k = 2; used.has(name.toLowerCase()); k++) name = `${id.slice(0, SHEET_NAME_LENGTH - String(k).length - 1)}~${k}`;
    used.add(name.toLowerCase());
    return name;
  });
}

function finite(value: number): number | null {
  return Number.isFinite(value) ? roundedForecast(value) : null;
}

function header(sheet: Worksheet, cells: readonly string[]): void {
  const row = sheet.addRow([...cells]);
  row.font = { bold: true };
  sheet.views = [{ state: 'frozen', ySplit: sheet.rowCount }];
}

function widen(sheet: Worksheet, widths: readonly number[]): void {
  widths.forEach((width, i) => {
    sheet.getColumn(i + 1).width = width;
  });
}

function seriesSheet(workbook: Workbook, name: string, record: AnalysisRecord, units: string | undefined): void {
  const sheet = workbook.addWorksheet(name);
  const { levels } = record.settings;
  const unitText = units === undefined ? '' : ` (${units})`;
  header(sheet, [
    'Period',
    'Starts',
    'Step',
    'Model',
    'Recommended',
    `Point${unitText}`,
    ...levels.flatMap((level) => [`Lower ${level}%`, `Upper ${level}%`]),
  ]);
  for (const model of TREND_MODELS) {
    for (const row of record.forecasts[model]) {
      const bounds = levels.flatMap((level) => (row.intervals[levelKey(level)] ?? [Number.NaN, Number.NaN]).map(finite));
      sheet.addRow([row.period, periodStartDate(row.period), row.h, MODEL_NAME[model], recommendedFlag(record, model), finite(row.point), ...bounds]);
    }
  }
  sheet.getColumn(2).numFmt = DATE_FORMAT;
  widen(sheet, [10, 12, 6, 18, 13, 16, ...levels.flatMap(() => [12, 12])]);
}

function summarySheet(workbook: Workbook, document: RecordDocument, names: readonly string[], units: UnitsById): void {
  const sheet = workbook.addWorksheet(SUMMARY_SHEET);
  const { memo, records } = document;
  sheet.addRow([memo.title]).font = { bold: true, size: 13 };
  const about = [memo.client, memo.as_of === '' ? '' : `as of ${memo.as_of}`, `run on ${document.run_date}`].filter((part) => part !== '');
  sheet.addRow([about.join(', ')]);
  sheet.addRow([]);
  const widest = Math.max(...records.map((record) => record.settings.levels[record.settings.levels.length - 1]));
  header(sheet, [
    'Series',
    'Sheet',
    'Units',
    'Frequency',
    'Last observed',
    'Forecast through',
    'Recommended model',
    `${MODEL_NAME.deterministic}: point at the end`,
    `${MODEL_NAME.stochastic}: point at the end`,
    `Recommended: lower ${widest}% at the end`,
    `Recommended: upper ${widest}% at the end`,
  ]);
  records.forEach((record, i) => {
    const last = { deterministic: record.forecasts.deterministic.at(-1), stochastic: record.forecasts.stochastic.at(-1) };
    const chosen = record.recommendation?.model;
    const interval = chosen === undefined ? undefined : last[chosen]?.intervals[levelKey(widest)];
    sheet.addRow([
      record.series.title,
      names[i],
      units.get(record.series.id) ?? '',
      FREQUENCY_NAME[record.series.frequency],
      record.series.last,
      last.stochastic?.period ?? '',
      chosen === undefined ? 'none recorded' : MODEL_NAME[chosen],
      last.deterministic === undefined ? null : finite(last.deterministic.point),
      last.stochastic === undefined ? null : finite(last.stochastic.point),
      interval === undefined ? null : finite(interval[0]),
      interval === undefined ? null : finite(interval[1]),
    ]);
  });
  sheet.addRow([]);
  sheet.addRow(['Cautions']).font = { bold: true };
  for (const caution of CAUTIONS) sheet.addRow([caution]);
  sheet.addRow([`Numbers are rounded to 6 significant digits; the memo folder's record.json holds them in full. The memo itself gives the evidence and the reasons for the recommendation.`]);
  widen(sheet, [34, 22, 18, 11, 13, 16, 20, 18, 18, 18, 18]);
}

/** The workbook's bytes for a memo's records. */
export async function forecastsWorkbook(document: RecordDocument, units: UnitsById): Promise<Buffer> {
  const { default: ExcelJS } = await import('exceljs');
  const workbook = new ExcelJS.Workbook();
  const written = new Date(`${document.run_date}T00:00:00Z`);
  workbook.creator = 'trendbrief';
  workbook.lastModifiedBy = 'trendbrief';
  workbook.created = written;
  workbook.modified = written;
  const names = sheetNames(document.records.map((record) => record.series.id));
  summarySheet(workbook, document, names, units);
  document.records.forEach((record, i) => seriesSheet(workbook, names[i], record, units.get(record.series.id)));
  const bytes = await workbook.xlsx.writeBuffer();
  return stampZipDates(new Uint8Array(bytes as ArrayBuffer), document.run_date);
}
