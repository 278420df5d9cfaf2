// HTML → PDF with headless Chromium through puppeteer-core (never a downloaded browser).
// The page is loaded with setContent and every request is aborted, so nothing is fetched
// from anywhere; Chromium's own background traffic is switched off by flags.
// The browser dies with the run: it is driven over a pipe (--remote-debugging-pipe), and
// Chromium exits when the pipe closes, which it does when the run ends however it ends,
// SIGKILL included. Its profile and home folder live in the run's own temporary folder
// (browserFolder.ts), so it writes nothing to the user's home.
import puppeteer, { type Browser } from 'puppeteer-core';
import { EnvironmentError } from '../../base/environmentError.js';
import { printMessages } from '../messages.js';
import { browserProblem, chromiumSetting, type PdfPrinterOptions } from './browserPath.js';
import { openBrowserFolder } from './browserFolder.js';
import type { Paper } from '../memoInput.js';
import { footerTemplate } from './footerTemplate.js';
import { PAGE_MARGIN, PAPER_SIZES } from './paperSize.js';

export { chromiumPath, DEFAULT_CHROMIUM, type PdfPrinterOptions } from './browserPath.js';

export interface PrintOptions {
  paper: Paper;
  /** Text at the left of every page's footer, e.g. the memo reference. */
  footer?: string;
}

export interface PdfPrinter {
  print(html: string, options: PrintOptions | Paper): Promise<Buffer>;
  close(): Promise<void>;
}

const FLAGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-extensions',
  '--disable-default-apps',
  '--no-first-run',
  '--no-default-browser-check',
  '--host-resolver-rules=MAP * ~NOTFOUND',
  '--disable-breakpad',
];

/** Prints one memo on an open browser: a fresh page, all requests blocked, page numbers in the footer. */
export async function printOnBrowser(browser: Browser, html: string, options: PrintOptions | Paper): Promise<Buffer> {
  const { paper, footer } = typeof options === 'string' ? { paper: options, footer: undefined } : options;
  const page = await browser.newPage();
  try {
    await page.setJavaScriptEnabled(false);
    await page.setRequestInterception(true);
    page.on('request', (request) => {
      void request.abort('blockedbyclient');
    });
    await page.setContent(html, { waitUntil: 'load' });
    const pdf = await page.pdf({
      format: PAPER_SIZES[paper].format,
      printBackground: true,
      displayHeaderFooter: true,
      headerTemplate: '<span></span>',
      footerTemplate: footerTemplate(footer ?? ''),
      margin: { ...PAGE_MARGIN },
    });
    return Buffer.from(pdf);
  } finally {
    await page.close();
  }
}

/** One browser for many PDFs; close it when done (it also removes its temporary profile). */
export async function openPdfPrinter(options: PdfPrinterOptions = {}): Promise<PdfPrinter> {
  const missing = browserProblem(options);
  if (missing !== undefined) throw new EnvironmentError(missing);
  const { path } = chromiumSetting(options);
  const folder = openBrowserFolder();
  let browser: Browser;
  try {
    browser = await puppeteer.launch({ executablePath: path, headless: true, args: FLAGS, userDataDir: folder.profile, env: folder.env, pipe: true });
  } catch (error) {
    folder.remove();
    // The launcher's message starts with its own summary line; the rest is Chromium's log.
    const detail = (error instanceof Error ? error.message : String(error)).split('\n')[0].slice(0, 200);
    throw new EnvironmentError(printMessages.browserFailed(path, detail));
  }
  return {
    print: (html, printOptions) => printOnBrowser(browser, html, printOptions),
    async close() {
      try {
        await browser.close();
      } finally {
        folder.remove();
      }
    },
  };
}

/** One PDF; opens and closes its own browser unless one is given. */
export async function printMemoPdf(html: string, options: PrintOptions & { browser?: Browser } & PdfPrinterOptions): Promise<Buffer> {
  if (options.browser !== undefined) return printOnBrowser(options.browser, html, options);
  const printer = await openPdfPrinter(options);
  try {
    return await printer.print(html, options);
  } finally {
    await printer.close();
  }
}
