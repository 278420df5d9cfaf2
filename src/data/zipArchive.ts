// The entries of a ZIP archive (an .xlsx workbook is one), each inflated once under a size cap
// before the workbook library sees the archive: the sizes an archive declares can lie, and a
// few megabytes of deflated XML can expand to gigabytes (a "zip bomb"). Layout from the ZIP
// File Format Specification (PKWARE APPNOTE.TXT 6.3.10, §4.3): the end of central directory
// record, then one central directory header per entry pointing at its local header.
import { inflateRawSync } from 'node:zlib';

export interface ZipEntry {
  name: string;
  /** Bytes after inflating; checked by inflating, not taken from the archive's word. */
  size: number;
}

export type ZipReading = { entries: ZipEntry[] } | { fault: 'not-zip' | 'too-large' | 'encrypted' | 'unsupported' | 'corrupt' };

const END_OF_DIRECTORY = 0x06054b50;
const DIRECTORY_HEADER = 0x02014b50;
const LOCAL_HEADER = 0x04034b50;
/** The end record is 22 bytes plus a comment of at most 65535. */
const END_SEARCH = 22 + 0xffff;

export function isZip(bytes: Buffer): boolean {
  return bytes.length >= 4 && bytes.readUInt32LE(0) === LOCAL_HEADER;
}

/** Every entry inflated, the sum of their sizes at most `limitBytes`; a fault otherwise. */
export function readZipEntries(bytes: Buffer, limitBytes: number): ZipReading {
  let end = -1;
  for (let at = bytes.length - 22; at >= Math.max(0, bytes.length - END_SEARCH); at--) {
    if (bytes.readUInt32LE(at) === END_OF_DIRECTORY) {
      end = at;
      break;
    }
  }
  if (end < 0) return { fault: 'not-zip' };
  const count = bytes.readUInt16LE(end + 10);
  let at = bytes.readUInt32LE(end + 16);
  // 0xFFFF and 0xFFFFFFFF mark ZIP64 fields: far beyond any series file.
  if (count === 0xffff || at === 0xffffffff) return { fault: 'too-large' };
  const entries: ZipEntry[] = [];
  let budget = limitBytes;
  for (let i = 0; i < count; i++) {
    if (at + 46 > bytes.length || bytes.readUInt32LE(at) !== DIRECTORY_HEADER) return { fault: 'corrupt' };
    const flags = bytes.readUInt16LE(at + 8);
    const method = bytes.readUInt16LE(at + 10);
    const compressed = bytes.readUInt32LE(at + 20);
    const nameLength = bytes.readUInt16LE(at + 28);
    const skip = nameLength + bytes.readUInt16LE(at + 30) + bytes.readUInt16LE(at + 32);
    const local = bytes.readUInt32LE(at + 42);
    const name = bytes.toString('utf8', at + 46, at + 46 + nameLength);
    at += 46 + skip;
    if ((flags & 1) !== 0) return { fault: 'encrypted' };
    if (method !== 0 && method !== 8) return { fault: 'unsupported' };
    if (local + 30 > bytes.length || bytes.readUInt32LE(local) !== LOCAL_HEADER) return { fault: 'corrupt' };
    const start = local + 30 + bytes.readUInt16LE(local + 26) + bytes.readUInt16LE(local + 28);
    if (start + compressed > bytes.length) return { fault: 'corrupt' };
    const data = bytes.subarray(start, start + compressed);
    let size: number;
    if (method === 0) size = compressed;
    else {
      try {
        size = inflateRawSync(data, { maxOutputLength: Math.max(1, budget) }).length;
      } catch (error) {
        return { fault: (error as { code?: string }).code === 'ERR_BUFFER_TOO_LARGE' ? 'too-large' : 'corrupt' };
      }
    }
    budget -= size;
    if (budget < 0) return { fault: 'too-large' };
    entries.push({ name, size });
  }
  return { entries };
}
