// The central directory of a ZIP archive (an .xlsx workbook is one), read without trusting the
// archive: the end of central directory record, then one central directory header per entry,
// each pointing at its local header. Layout from the ZIP File Format Specification (PKWARE
// APPNOTE.TXT 6.3.10, §4.3.7, §4.3.12, §4.3.16). Shared by the workbook reader, which inflates
// each entry under a size cap, and the workbook writer, which stamps the entries' times.

const LOCAL_HEADER = 0x04034b50;
const DIRECTORY_HEADER = 0x02014b50;
const END_OF_DIRECTORY = 0x06054b50;
/** The end record is 22 bytes plus a comment of at most 65535. */
const END_SEARCH = 22 + 0xffff;

export interface ZipDirectoryEntry {
  /** Offset of the entry's central directory header. */
  header: number;
  /** Offset of its local header, checked to carry the local header's signature. */
  local: number;
  flags: number;
  /** 0 stored, 8 deflated. */
  method: number;
  compressed: number;
  name: string;
}

export type ZipDirectory = { entries: ZipDirectoryEntry[] } | { fault: 'not-zip' | 'too-large' | 'corrupt' };

export function isZip(bytes: Buffer): boolean {
  return bytes.length >= 4 && bytes.readUInt32LE(0) === LOCAL_HEADER;
}

export function zipDirectory(bytes: Buffer): ZipDirectory {
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
  const entries: ZipDirectoryEntry[] = [];
  for (let i = 0; i < count; i++) {
    if (at + 46 > bytes.length || bytes.readUInt32LE(at) !== DIRECTORY_HEADER) return { fault: 'corrupt' };
    const nameLength = bytes.readUInt16LE(at + 28);
    const local = bytes.readUInt32LE(at + 42);
    if (local + 30 > bytes.length || bytes.readUInt32LE(local) !== LOCAL_HEADER) return { fault: 'corrupt' };
    entries.push({
      header: at,
      local,
      flags: bytes.readUInt16LE(at + 8),
      method: bytes.readUInt16LE(at + 10),
      compressed: bytes.readUInt32LE(at + 20),
      name: bytes.toString('utf8', at + 46, at + 46 + nameLength),
    });
    at += 46 + nameLength + bytes.readUInt16LE(at + 30) + bytes.readUInt16LE(at + 32);
  }
  return { entries };
}
