// The entries of a ZIP archive (an .xlsx workbook is one), each inflated once under a size cap
// before the workbook library sees the archive: the sizes an archive declares can lie, and a
// few megabytes of deflated XML can expand to gigabytes (a "zip bomb"). The directory is read
// by src/base/zipDirectory.ts.
import { inflateRawSync } from 'node:zlib';
import { zipDirectory } from '../base/zipDirectory.js';

export interface ZipEntry {
  name: string;
  /** Bytes after inflating; checked by inflating, not taken from the archive's word. */
  size: number;
}

export type ZipReading = { entries: ZipEntry[] } | { fault: 'not-zip' | 'too-large' | 'encrypted' | 'unsupported' | 'corrupt' };

/** Every entry inflated, the sum of their sizes at most `limitBytes`; a fault otherwise. */
export function readZipEntries(bytes: Buffer, limitBytes: number): ZipReading {
  const directory = zipDirectory(bytes);
  if ('fault' in directory) return directory;
  const entries: ZipEntry[] = [];
  let budget = limitBytes;
  for (const { flags, method, compressed, local, name } of directory.entries) {
    if ((flags & 1) !== 0) return { fault: 'encrypted' };
    if (method !== 0 && method !== 8) return { fault: 'unsupported' };
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
