// An input file read as UTF-8 text with a size limit, every file-system failure turned into
// an InputError in the caller's wording (series files and configs word them alike, but with
// their own codes). Shared by the data and config stages; readRegularFile refuses anything
// but a regular file before opening it, so no input can make a run wait.
import { InputError, type InputProblem } from './problem.js';
import { readRegularFile, type FileFault } from './readRegularFile.js';
import { firstInvalidUtf8 } from './utf8Position.js';

export interface FileMessages {
  fileMissing(file: string): InputProblem;
  notAFile(file: string, kind: 'directory' | 'special file'): InputProblem;
  badLink(file: string, kind: 'dangling' | 'loop'): InputProblem;
  nameTooLong(file: string): InputProblem;
  unreadable(file: string, reason: string): InputProblem;
  tooLarge(file: string, bytes: number, limitBytes: number): InputProblem;
  /** `at`: the line and column (in characters) of the first byte that is not UTF-8. */
  notUtf8(file: string, at: { line: number; column: number }): InputProblem;
}

export interface InputFile {
  bytes: Buffer;
  /** The bytes decoded as UTF-8, a leading BOM dropped (WHATWG Encoding, "UTF-8 decode"). */
  text: string;
}

export function readInputFile(file: string, limitBytes: number, messages: FileMessages): InputFile {
  return decodeInputText(file, readInputBytes(file, limitBytes, messages), messages);
}

/** Bytes already read, decoded as readInputFile decodes them. */
export function decodeInputText(file: string, bytes: Buffer, messages: Pick<FileMessages, 'notUtf8'>): InputFile {
  try {
    return { bytes, text: new TextDecoder('utf-8', { fatal: true }).decode(bytes) };
  } catch {
    throw new InputError(messages.notUtf8(file, firstInvalidUtf8(bytes)));
  }
}

/** The bytes of a binary input (a workbook), with the same refusals as readInputFile before any decoding. */
export function readInputBytes(file: string, limitBytes: number, messages: FileMessages): Buffer {
  const read = readRegularFile(file, limitBytes);
  if (read.fault !== undefined) throw new InputError(faultProblem(file, read.fault, limitBytes, messages));
  return read.bytes;
}

function faultProblem(file: string, fault: FileFault, limitBytes: number, messages: FileMessages): InputProblem {
  switch (fault.kind) {
    case 'missing':
      return messages.fileMissing(file);
    case 'dangling-link':
      return messages.badLink(file, 'dangling');
    case 'link-loop':
      return messages.badLink(file, 'loop');
    case 'name-too-long':
      return messages.nameTooLong(file);
    case 'directory':
    case 'special file':
      return messages.notAFile(file, fault.kind);
    case 'too-large':
      return messages.tooLarge(file, fault.bytes, limitBytes);
    case 'unreadable':
      return messages.unreadable(file, fault.reason);
  }
}
