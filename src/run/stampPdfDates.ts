// Chromium (Skia) writes the moment of printing into the PDF's document information as
// /CreationDate and /ModDate, `D:YYYYMMDDHHmmSS+00'00'` (PDF 1.7, §7.9.4): the only bytes that
// differ between two prints of the same memo. Both are set to the run date at midnight UTC,
// in place and at the same length, so no byte offset in the cross-reference table moves.
// A PDF whose dates are not exactly one of each in that uncompressed form is left as it came.
const DATE = /\/(CreationDate|ModDate) ?\(D:(\d{14})([+-]\d\d'\d\d'|Z)\)/g;
const UTC = "+00'00'";

/** The PDF with its two information dates set to `runDate` (YYYY-MM-DD), 00:00:00 UTC. */
export function stampPdfDates(pdf: Uint8Array, runDate: string): Uint8Array {
  if (!/^\d{4}-\d\d-\d\d$/.test(runDate)) throw new RangeError(`stampPdfDates needs a YYYY-MM-DD date, got '${runDate}'`);
  const text = Buffer.from(pdf.buffer, pdf.byteOffset, pdf.byteLength).toString('latin1');
  const found = [...text.matchAll(DATE)];
  const keys = found.map((match) => match[1]).sort();
  if (keys.length !== 2 || keys[0] !== 'CreationDate' || keys[1] !== 'ModDate') return pdf;
  const stamped = Buffer.from(pdf);
  const digits = `${runDate.replaceAll('-', '')}000000`;
  for (const match of found) {
    const start = match.index + match[0].indexOf('(D:') + 3;
    stamped.write(digits, start, 'latin1');
    if (match[3].length === UTC.length) stamped.write(UTC, start + digits.length, 'latin1');
  }
  return stamped;
}
