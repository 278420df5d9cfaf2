// A series file from disk, CSV text or an .xlsx workbook, told apart by the file's first bytes:
// a ZIP archive is read as a workbook, an OLE2 compound file (.xls, or a password-protected
// workbook) is refused, anything else is CSV text, unless its name says it is a workbook.
import { extname } from 'node:path';
import { readInputBytes } from '../base/readInputFile.js';
import { InputError } from '../base/problem.js';
import type { Series } from '../base/series.js';
import { dataMessages } from './messages.js';
import { MAX_SERIES_FILE_BYTES, seriesFromCsvBytes } from './readSeriesCsv.js';
import type { SeriesOptions } from './seriesOptions.js';
import { readWorkbookSeries } from './readWorkbook.js';
import { isZip } from '../base/zipDirectory.js';

/** The signature of an OLE2 compound file (Microsoft Compound File Binary Format, §2.2). */
const COMPOUND_FILE = Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]);
const WORKBOOK_NAMES: Readonly<Record<string, 'xls' | 'ods' | 'xlsb' | 'not-zip'>> = { '.xlsx': 'not-zip', '.xlsm': 'not-zip', '.xls': 'xls', '.ods': 'ods', '.xlsb': 'xlsb' };

/** Reads, checks and returns one series from a CSV file or a workbook; rejects with an InputError listing every problem found. */
export async function readSeriesFile(file: string, options: SeriesOptions): Promise<Series> {
  const bytes = readInputBytes(file, MAX_SERIES_FILE_BYTES, dataMessages);
  if (isZip(bytes)) return readWorkbookSeries(bytes, file, options);
  if (bytes.subarray(0, COMPOUND_FILE.length).equals(COMPOUND_FILE)) throw new InputError(dataMessages.notAWorkbook(file, 'xls'));
  const named = WORKBOOK_NAMES[extname(file).toLowerCase()];
  if (named !== undefined) throw new InputError(dataMessages.notAWorkbook(file, named));
  return seriesFromCsvBytes(bytes, file, options);
}
