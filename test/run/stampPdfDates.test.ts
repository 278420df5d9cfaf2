// The PDF's information dates set from the run date, in place (our spec; the date form is
// PDF 1.7 §7.9.4, D:YYYYMMDDHHmmSSOHH'mm').
import { describe, expect, it } from 'vitest';
import { stampPdfDates } from '../../src/run/stampPdfDates.js';

const PRINTED = "%PDF-1.4\n1 0 obj\n<</Creator (HeadlessChrome)\n/CreationDate (D:20261201211606+00'00')\n/ModDate (D:20261201211606+00'00')>>\nendobj\n";

describe('stampPdfDates', () => {
  it('sets both dates to midnight UTC of the run date without moving a byte', () => {
    const stamped = Buffer.from(stampPdfDates(Buffer.from(PRINTED, 'latin1'), '2026-01-01')).toString('latin1');
    expect(stamped).toBe(PRINTED.replaceAll('20261201211606', '20260101000000'));
    expect(stamped.length).toBe(PRINTED.length);
  });

  it('writes the offset as UTC when the printer used another zone', () => {
    const eastern = PRINTED.replaceAll("+00'00'", "-05'00'");
    const stamped = Buffer.from(stampPdfDates(Buffer.from(eastern, 'latin1'), '2026-01-01')).toString('latin1');
    expect(stamped).toContain("/CreationDate (D:20260101000000+00'00')");
    expect(stamped).toContain("/ModDate (D:20260101000000+00'00')");
  });

  it('leaves a PDF alone when its dates are not one of each in the expected form', () => {
    const once = Buffer.from(PRINTED.replace(/\/ModDate[^\n]*\n/, ''), 'latin1');
    expect(stampPdfDates(once, '2026-01-01')).toBe(once);
    const short = Buffer.from(PRINTED.replaceAll('20261201211606', '2026'), 'latin1');
    expect(stampPdfDates(short, '2026-01-01')).toBe(short);
    expect(() => stampPdfDates(once, '1 Jan 2026')).toThrow(/YYYY-MM-DD/);
  });
});
