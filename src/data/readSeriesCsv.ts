// A series CSV file from disk: size limit, encoding and file-system errors, then parseSeriesCsv.

import { createHash } from 'node:crypto';
import { dataMessages } from './messages.js';
import { readInputFile } from '../base/readInputFile.js';
import type { Series } from '../base/series.js';
import { parseSeriesCsv, type SeriesOptions } from './parseSeriesCsv.js';

/** Largest series file accepted, in bytes; larger files are refused before they are read. */
export const MAX_SERIES_FILE_BYTES = 20 * 1024 * 1024;

/** Reads, checks and returns one series; throws InputError listing every problem found. */
export function readSeriesCsv(file: string, options: SeriesOptions): Series {
  const { bytes, text } = readInputFile(file, MAX_SERIES_FILE_BYTES, dataMessages);
  return { ...parseSeriesCsv(text, file, options), sha256: createHash('sha256').update(bytes).digest('hex') };
}
