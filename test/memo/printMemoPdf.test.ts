// PDF printing with headless Chromium at /usr/bin/chromium (or TRENDBRIEF_CHROMIUM). These
// tests never skip: without a browser they fail, naming the path they tried. One browser is
// shared by the whole file. Page sizes in points: ISO 216 A4 is 210 × 297 mm = 595.28 × 841.89
// pt, which puppeteer approximates in inches (within a point); US Letter is 8.5 × 11 in = 612 × 792 pt.
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openPdfPrinter, printMemoPdf, type PdfPrinter } from '../../src/memo/print/pdfPrinter.js';
import { renderMemoHtml } from '../../src/memo/renderMemoHtml.js';
import { sampleInput } from './sampleInput.js';

function pageCount(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?![s\w])/g) ?? []).length;
}

function mediaBoxes(pdf: Buffer): number[][] {
  return Array.from(pdf.toString('latin1').matchAll(/\/MediaBox\s*\[\s*([\d.\s]+)\]/g), (m) => m[1].trim().split(/\s+/).map(Number));
}

let printer: PdfPrinter;

beforeAll(async () => {
  printer = await openPdfPrinter();
});

afterAll(async () => {
  await printer.close();
});

describe('printing the memo', () => {
  it('writes a PDF with a page or more per series after the summary, on A4', async () => {
    const input = sampleInput(['lakeHuron', 'nile']);
    const pdf = await printer.print(await renderMemoHtml(input), { paper: 'A4', footer: input.memo.reference });
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // Summary page, at least one page per series section, register and appendix.
    expect(pageCount(pdf)).toBeGreaterThanOrEqual(1 + input.series.length + 2);
    const [width, height] = mediaBoxes(pdf)[0].slice(2);
    expect(Math.abs(width - 595.28)).toBeLessThan(1);
    expect(Math.abs(height - 841.89)).toBeLessThan(1);
  });

  it('prints on US Letter when the memo asks for it', async () => {
    const pdf = await printer.print('<!DOCTYPE html><html><body><p>One page.</p></body></html>', 'Letter');
    expect(pageCount(pdf)).toBe(1);
    expect(mediaBoxes(pdf)[0].slice(2)).toEqual([612, 792]);
  });

  it('fetches nothing: a page that points at a server leaves it untouched', async () => {
    let hits = 0;
    const server: Server = createServer((_request, response) => {
      hits += 1;
      response.end('x');
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as AddressInfo;
    const base = `http://127.0.0.1:${port}`;
    const html = `<!DOCTYPE html><html><head><link rel="stylesheet" href="${base}/a.css"></head><body><img src="${base}/b.png"><iframe src="${base}/c"></iframe></body></html>`;
    try {
      const pdf = await printer.print(html, 'A4');
      expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    } finally {
      await new Promise<void>((resolve) => server.close(() => resolve()));
    }
    expect(hits).toBe(0);
  });

  it('opens and closes its own browser when none is given', async () => {
    const pdf = await printMemoPdf('<!DOCTYPE html><html><body><p>Alone.</p></body></html>', { paper: 'A4', footer: 'TM-1' });
    expect(pageCount(pdf)).toBe(1);
  });

  it('names the browser path it could not start', async () => {
    await expect(openPdfPrinter({ executablePath: '/nonexistent/chromium' })).rejects.toThrow('no Chromium to print the PDF: /nonexistent/chromium does not exist');
  });
});
