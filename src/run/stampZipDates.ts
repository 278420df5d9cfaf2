// A zip archive (an .xlsx workbook is one) records each member's modification time in DOS
// form, in its local header and again in the central directory (APPNOTE.TXT 6.3, sections
// 4.3.7 and 4.3.12). The library that writes the workbook stamps the moment of writing, the
// only bytes that differ between two runs; this sets them all to the run date at 00:00, in
// place, so the same memo gives the same workbook byte for byte.
import { zipDirectory } from '../base/zipDirectory.js';

/** DOS date and time fields of `runDate` (YYYY-MM-DD) at midnight. */
function dosStamp(runDate: string): { date: number; time: number } {
  const match = /^(\d{4})-(\d\d)-(\d\d)$/.exec(runDate);
  if (match === null) throw new RangeError(`stampZipDates needs a YYYY-MM-DD date, got '${runDate}'`);
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  return { date: ((Math.max(year, 1980) - 1980) << 9) | (month << 5) | day, time: 0 };
}

/** The archive with every member's time set to `runDate`; throws on an archive it cannot walk. */
export function stampZipDates(archive: Uint8Array, runDate: string): Buffer {
  const zip = Buffer.from(archive);
  const { date, time } = dosStamp(runDate);
  const directory = zipDirectory(zip);
  if ('fault' in directory) throw new Error(`stampZipDates: the archive cannot be walked (${directory.fault})`);
  for (const { header, local } of directory.entries) {
    zip.writeUInt16LE(time, header + 12);
    zip.writeUInt16LE(date, header + 14);
    zip.writeUInt16LE(time, local + 10);
    zip.writeUInt16LE(date, local + 12);
  }
  return zip;
}
