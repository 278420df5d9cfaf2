// A zip archive (an .xlsx workbook is one) records each member's modification time in DOS
// form, in its local header and again in the central directory (APPNOTE.TXT 6.3, sections
// 4.3.7 and 4.3.12). The library that writes the workbook stamps the moment of writing, the
// only bytes that differ between two runs; this sets them all to the run date at 00:00, in
// place, so the same memo gives the same workbook byte for byte.
const END_OF_CENTRAL_DIRECTORY = 0x06054b50;
const CENTRAL_HEADER = 0x02014b50;
const LOCAL_HEADER = 0x04034b50;

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
  // The end record sits in the last 22 bytes when the archive has no comment, as written here.
  let end = zip.length - 22;
  while (end >= 0 && zip.readUInt32LE(end) !== END_OF_CENTRAL_DIRECTORY) end--;
  if (end < 0) throw new Error('stampZipDates: no end of central directory');
  const entries = zip.readUInt16LE(end + 10);
  let at = zip.readUInt32LE(end + 16);
  for (let i = 0; i < entries; i++) {
    if (zip.readUInt32LE(at) !== CENTRAL_HEADER) throw new Error(`stampZipDates: no central header at ${at}`);
    zip.writeUInt16LE(time, at + 12);
    zip.writeUInt16LE(date, at + 14);
    const local = zip.readUInt32LE(at + 42);
    if (zip.readUInt32LE(local) !== LOCAL_HEADER) throw new Error(`stampZipDates: no local header at ${local}`);
    zip.writeUInt16LE(time, local + 10);
    zip.writeUInt16LE(date, local + 12);
    at += 46 + zip.readUInt16LE(at + 28) + zip.readUInt16LE(at + 30) + zip.readUInt16LE(at + 32);
  }
  return zip;
}
