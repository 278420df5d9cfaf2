// A machine without the browser that prints the PDF (our spec, README "Exit codes"): exit 4,
// one line saying what is missing, the setting that points at a browser and how to leave the
// PDF out; no stack trace; nothing written for a memo that needed the PDF; the other memos of
// the batch still run, and a memo whose formats leave the PDF out is written as usual.
import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { EXIT } from '../../src/cli/exitCodes.js';
import { openPdfPrinter } from '../../src/memo/print/pdfPrinter.js';
import { HARDENING_FIXTURES } from '../hardening/refusedCases.js';
import { runCli } from '../support/runCli.js';

let root = '';
let saved: string | undefined;

beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'tb-no-browser-'));
  cpSync(join(HARDENING_FIXTURES, 'base'), join(root, 'project'), { recursive: true });
  const config = readFileSync(join(root, 'project/memo.yaml'), 'utf8');
  // A second memo of the batch that asks for the PDF in its config.
  writeFileSync(join(root, 'project/with-pdf.yaml'), config.replace('id: tarnwick-cargo', 'id: tarnwick-cargo-pdf').replace('formats: [html, json, csv]', 'formats: [html, pdf]'));
});

afterAll(() => rmSync(root, { recursive: true, force: true }));

beforeEach(() => {
  saved = process.env.TRENDBRIEF_CHROMIUM;
  process.env.TRENDBRIEF_CHROMIUM = join(root, 'no-such-browser/chromium');
});

afterEach(() => {
  if (saved === undefined) delete process.env.TRENDBRIEF_CHROMIUM;
  else process.env.TRENDBRIEF_CHROMIUM = saved;
});

const noStackTrace = /internal error|\n\s+at /;

describe('no browser for the PDF', () => {
  it('stops a memo that needs the PDF with exit 4 and one line naming the path, the setting and --formats', async () => {
    const out = join(root, 'out-pdf');
    const result = await runCli(['run', join(root, 'project/memo.yaml'), '--out', out, '--formats', 'html,pdf']);
    expect(result.code).toBe(EXIT.environment);
    expect(result.code).toBe(4);
    expect(result.errorLines).toEqual([
      `no Chromium to print the PDF: ${join(root, 'no-such-browser/chromium')} (set by TRENDBRIEF_CHROMIUM) does not exist; install Debian's chromium (apt-get install chromium), point TRENDBRIEF_CHROMIUM at a Chromium or Chrome binary, or, for run, leave the PDF out (--formats html,json,csv, or output.formats in the config)`,
    ]);
    expect(result.stderr).not.toMatch(noStackTrace);
    expect(result.stdout).toContain('failed: no browser for the PDF (see above; nothing written)');
    expect(existsSync(out)).toBe(false);
  });

  it('writes the HTML when the formats leave the PDF out, and runs the rest of a batch', async () => {
    const out = join(root, 'out-batch');
    const result = await runCli(['run', join(root, 'project/with-pdf.yaml'), join(root, 'project/memo.yaml'), '--out', out]);
    expect(result.code).toBe(4);
    // Reported once for the batch, not once per memo.
    expect(result.errorLines.filter((line) => line.includes('no Chromium'))).toHaveLength(1);
    expect(result.stderr).not.toMatch(noStackTrace);
    expect(existsSync(join(out, 'tarnwick-cargo-pdf'))).toBe(false);
    expect(readFileSync(join(out, 'tarnwick-cargo/memo.html'), 'utf8')).toContain('Tarnwick cargo outlook');
    expect(existsSync(join(out, 'tarnwick-cargo/memo.pdf'))).toBe(false);
  });

  it('refuses a browser path that is a folder, and one that cannot be run, as the library call', async () => {
    await expect(openPdfPrinter({ executablePath: root })).rejects.toThrow(`no Chromium to print the PDF: ${root} is not a file`);
    const notExecutable = join(root, 'project/memo.yaml');
    await expect(openPdfPrinter({ executablePath: notExecutable })).rejects.toThrow(`${notExecutable} may not be run (not executable)`);
  });
});
