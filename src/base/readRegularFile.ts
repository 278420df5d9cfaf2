// Reads a file only when it is a regular file (following a symbolic link only to one), with a
// size bound, and never blocks: the path is stat'ed before it is opened, so a FIFO, a socket or
// a device such as /dev/zero is refused without opening it, and the open is non-blocking with
// an fstat after it, so a file swapped for a FIFO in between is refused too. Failures come back
// as data; each caller words them (readInputFile for configs and series, the run stage for its
// own documents, which it may skip).
import { closeSync, constants, fstatSync, lstatSync, openSync, readSync, statSync, type Stats } from 'node:fs';

export type FileFault =
  | { kind: 'missing' }
  | { kind: 'dangling-link' }
  | { kind: 'link-loop' }
  | { kind: 'name-too-long' }
  | { kind: 'directory' }
  | { kind: 'special file' }
  | { kind: 'too-large'; bytes: number }
  | { kind: 'unreadable'; reason: string };

export type FileRead = { bytes: Buffer; fault?: undefined } | { fault: FileFault };

/** Largest record.json or manifest.json read back from an earlier run: far above 200 series' records. */
export const MAX_RUN_DOCUMENT_BYTES = 256 * 1024 * 1024;

function errorCode(error: unknown): string {
  return error instanceof Error && 'code' in error ? String(error.code) : 'unknown error';
}

function isSymbolicLink(file: string): boolean {
  try {
    return lstatSync(file).isSymbolicLink();
  } catch {
    return false;
  }
}

function faultOfError(file: string, error: unknown): FileFault {
  const code = errorCode(error);
  if (code === 'ENOENT') return isSymbolicLink(file) ? { kind: 'dangling-link' } : { kind: 'missing' };
  if (code === 'ENOTDIR') return { kind: 'missing' };
  if (code === 'ELOOP') return { kind: 'link-loop' };
  if (code === 'ENAMETOOLONG') return { kind: 'name-too-long' };
  if (code === 'EISDIR') return { kind: 'directory' };
  return { kind: 'unreadable', reason: code };
}

function faultOfStats(stats: Stats, limitBytes: number): FileFault | undefined {
  if (stats.isDirectory()) return { kind: 'directory' };
  if (!stats.isFile()) return { kind: 'special file' };
  if (stats.size > limitBytes) return { kind: 'too-large', bytes: stats.size };
  return undefined;
}

export function readRegularFile(file: string, limitBytes: number): FileRead {
  let fd: number;
  try {
    const before = faultOfStats(statSync(file), limitBytes);
    if (before !== undefined) return { fault: before };
    // O_NOCTTY: a terminal swapped in after the stat never becomes ours.
    fd = openSync(file, constants.O_RDONLY | constants.O_NONBLOCK | constants.O_NOCTTY);
  } catch (error) {
    return { fault: faultOfError(file, error) };
  }
  try {
    const after = faultOfStats(fstatSync(fd), limitBytes);
    if (after !== undefined) return { fault: after };
    return readBounded(fd, limitBytes);
  } catch (error) {
    return { fault: faultOfError(file, error) };
  } finally {
    closeSync(fd);
  }
}

/** The bytes, or null for anything but a regular file within the bound: for files a missing one of which is no error. */
export function regularFileBytes(file: string, limitBytes: number): Buffer | null {
  const read = readRegularFile(file, limitBytes);
  return read.fault === undefined ? read.bytes : null;
}

/** Reads to the end, but never more than one byte past the limit: the file may have grown since fstat. */
function readBounded(fd: number, limitBytes: number): FileRead {
  const chunks: Buffer[] = [];
  let total = 0;
  for (;;) {
    const chunk = Buffer.allocUnsafe(Math.min(1024 * 1024, limitBytes + 1 - total));
    const count = readSync(fd, chunk, 0, chunk.length, null);
    if (count === 0) break;
    chunks.push(chunk.subarray(0, count));
    total += count;
    if (total > limitBytes) return { fault: { kind: 'too-large', bytes: total } };
  }
  return { bytes: Buffer.concat(chunks, total) };
}
