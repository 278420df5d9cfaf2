// A series CSV file from disk: size limit, encoding and file-system errors, then parseSeriesCsv.

import { createHash } from 'node:crypto';
import { closeSync, constants, fstatSync, openSync, readFileSync } from 'node:fs';
import { dataMessages, InputError, type InputProblem } from '../errors.js';
import { parseSeriesCsv } from './parseSeriesCsv.js';
import type { Series, SeriesOptions } from './series.js';

/** Largest series file accepted, in bytes; larger files are refused before they are read. */
export const MAX_SERIES_FILE_BYTES = 20 * 1024 * 1024;

function fileSystemProblem(file: string, error: unknown): InputProblem {
  const code = error instanceof Error && 'code' in error ? String(error.code) : 'unknown error';
  if (code === 'ENOENT' || code === 'ENOTDIR') return dataMessages.fileMissing(file);
  if (code === 'EISDIR') return dataMessages.notAFile(file, 'directory');
  return dataMessages.unreadable(file, code);
}

function readBytes(file: string): Buffer {
  let fd: number;
  try {
    // Non-blocking, so a FIFO named as the file is refused below instead of waiting for a writer.
    fd = openSync(file, constants.O_RDONLY | constants.O_NONBLOCK);
  } catch (error) {
    throw new InputError(fileSystemProblem(file, error));
  }
  try {
    const stats = fstatSync(fd);
    if (stats.isDirectory()) throw new InputError(dataMessages.notAFile(file, 'directory'));
    if (!stats.isFile()) throw new InputError(dataMessages.notAFile(file, 'special file'));
    if (stats.size > MAX_SERIES_FILE_BYTES) throw new InputError(dataMessages.tooLarge(file, stats.size, MAX_SERIES_FILE_BYTES));
    const bytes = readFileSync(fd);
    // The file may have grown since fstat.
    if (bytes.length > MAX_SERIES_FILE_BYTES) throw new InputError(dataMessages.tooLarge(file, bytes.length, MAX_SERIES_FILE_BYTES));
    return bytes;
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(fileSystemProblem(file, error));
  } finally {
    closeSync(fd);
  }
}

/** Reads, checks and returns one series; throws InputError listing every problem found. */
export function readSeriesCsv(file: string, options: SeriesOptions = {}): Series {
  const bytes = readBytes(file);
  let text: string;
  try {
    // A leading BOM is dropped by the decoder (WHATWG Encoding, "UTF-8 decode").
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new InputError(dataMessages.notUtf8(file));
  }
  return { ...parseSeriesCsv(text, file, options), sha256: createHash('sha256').update(bytes).digest('hex') };
}
