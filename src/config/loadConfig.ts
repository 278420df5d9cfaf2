// A config file from disk: size limit, encoding and file-system errors, then parseConfig.
import { closeSync, constants, fstatSync, openSync, readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { configMessages, InputError, type InputProblem } from '../errors.js';
import { parseConfig } from './parseConfig.js';
import type { RunPlan } from './runPlan.js';

/** Largest config accepted, in bytes: far above any real memo, far below what could strain the parser. */
export const MAX_CONFIG_FILE_BYTES = 1024 * 1024;

function fileSystemProblem(file: string, error: unknown): InputProblem {
  const code = error instanceof Error && 'code' in error ? String(error.code) : 'unknown error';
  if (code === 'ENOENT' || code === 'ENOTDIR') return configMessages.fileMissing(file);
  if (code === 'EISDIR') return configMessages.notAFile(file, 'directory');
  return configMessages.unreadable(file, code);
}

function readConfigBytes(file: string): Buffer {
  let fd: number;
  try {
    // Non-blocking, so a FIFO named as the file is refused below instead of waiting for a writer.
    fd = openSync(file, constants.O_RDONLY | constants.O_NONBLOCK);
  } catch (error) {
    throw new InputError(fileSystemProblem(file, error));
  }
  try {
    const stats = fstatSync(fd);
    if (stats.isDirectory()) throw new InputError(configMessages.notAFile(file, 'directory'));
    if (!stats.isFile()) throw new InputError(configMessages.notAFile(file, 'special file'));
    if (stats.size > MAX_CONFIG_FILE_BYTES) throw new InputError(configMessages.tooLarge(file, stats.size, MAX_CONFIG_FILE_BYTES));
    const bytes = readFileSync(fd);
    if (bytes.length > MAX_CONFIG_FILE_BYTES) throw new InputError(configMessages.tooLarge(file, bytes.length, MAX_CONFIG_FILE_BYTES));
    return bytes;
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(fileSystemProblem(file, error));
  } finally {
    closeSync(fd);
  }
}

/** Reads, checks and plans one config; relative paths in it are resolved against its own folder. */
export function loadConfig(file: string): RunPlan {
  const bytes = readConfigBytes(file);
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new InputError(configMessages.notUtf8(file));
  }
  return parseConfig(text, file, dirname(resolve(file)));
}
