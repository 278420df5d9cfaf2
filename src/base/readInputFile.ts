// An input file read as UTF-8 text with a size limit, every file-system failure turned into
// an InputError in the caller's wording (series files and configs word them alike, but with
// their own codes). Shared by the data and config stages.
import { closeSync, constants, fstatSync, openSync, readFileSync } from 'node:fs';
import { InputError, type InputProblem } from './problem.js';

export interface FileMessages {
  fileMissing(file: string): InputProblem;
  notAFile(file: string, kind: 'directory' | 'special file'): InputProblem;
  unreadable(file: string, reason: string): InputProblem;
  tooLarge(file: string, bytes: number, limitBytes: number): InputProblem;
  notUtf8(file: string): InputProblem;
}

export interface InputFile {
  bytes: Buffer;
  /** The bytes decoded as UTF-8, a leading BOM dropped (WHATWG Encoding, "UTF-8 decode"). */
  text: string;
}

export function readInputFile(file: string, limitBytes: number, messages: FileMessages): InputFile {
  const bytes = readBytes(file, limitBytes, messages);
  try {
    return { bytes, text: new TextDecoder('utf-8', { fatal: true }).decode(bytes) };
  } catch {
    throw new InputError(messages.notUtf8(file));
  }
}

function readBytes(file: string, limitBytes: number, messages: FileMessages): Buffer {
  let fd: number;
  try {
    // Non-blocking, so a FIFO named as the file is refused below instead of waiting for a writer.
    fd = openSync(file, constants.O_RDONLY | constants.O_NONBLOCK);
  } catch (error) {
    throw new InputError(fileSystemProblem(file, error, messages));
  }
  try {
    const stats = fstatSync(fd);
    if (stats.isDirectory()) throw new InputError(messages.notAFile(file, 'directory'));
    if (!stats.isFile()) throw new InputError(messages.notAFile(file, 'special file'));
    if (stats.size > limitBytes) throw new InputError(messages.tooLarge(file, stats.size, limitBytes));
    const bytes = readFileSync(fd);
    // The file may have grown since fstat.
    if (bytes.length > limitBytes) throw new InputError(messages.tooLarge(file, bytes.length, limitBytes));
    return bytes;
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(fileSystemProblem(file, error, messages));
  } finally {
    closeSync(fd);
  }
}

function fileSystemProblem(file: string, error: unknown, messages: FileMessages): InputProblem {
  const code = error instanceof Error && 'code' in error ? String(error.code) : 'unknown error';
  if (code === 'ENOENT' || code === 'ENOTDIR') return messages.fileMissing(file);
  if (code === 'EISDIR') return messages.notAFile(file, 'directory');
  return messages.unreadable(file, code);
}
