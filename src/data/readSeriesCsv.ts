// A series CSV file from disk: size limit, encoding and file-system errors, then parseSeriesCsv.

import { createHash } from 'node:crypto';
import { dataMessages } from './messages.js';
import { decodeInputText, readInputBytes } from '../base/readInputFile.js';
import { InputError } from '../base/problem.js';
import { isZip } from '../base/zipDirectory.js';
import type { Series } from '../base/series.js';
import { parseSeriesCsv, type SeriesOptions } from './parseSeriesCsv.js';

/** Largest series file accepted, in bytes; larger files are refused before they are read. */
export const MAX_SERIES_FILE_BYTES = 20 * 1024 * 1024;

/** Reads, checks and returns one series from CSV text; throws InputError listing every problem found. readSeriesFile reads workbooks too. */
export function readSeriesCsv(file: string, options: SeriesOptions): Series {
  const bytes = readInputBytes(file, MAX_SERIES_FILE_BYTES, dataMessages);
  // A workbook would otherwise be reported as text that is not UTF-8.
  if (isZip(bytes)) throw new InputError(dataMessages.workbookForText(file));
  return seriesFromCsvBytes(bytes, file, options);
}

/** A series file's bytes decoded as UTF-8 and read as CSV; its digest is that of the bytes. */
export function seriesFromCsvBytes(bytes: Buffer, file: string, options: SeriesOptions): Series {
  const { text } = decodeInputText(file, bytes, dataMessages);
  return { ...parseSeriesCsv(text, file, options), sha256: createHash('sha256').update(bytes).digest('hex') };
}
