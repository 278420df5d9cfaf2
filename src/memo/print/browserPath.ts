// Which Chromium prints the PDF, and whether it is there: checked before a run analyses
// anything, so a machine without a browser hears so at once (exit 4), not after the analysis.
// Kept apart from pdfPrinter.ts so the check does not load the browser driver.
import { accessSync, constants, statSync } from 'node:fs';
import type { InputProblem } from '../../base/problem.js';
import { printMessages, type ChromiumSource } from '../messages.js';

export const DEFAULT_CHROMIUM = '/usr/bin/chromium';

export interface PdfPrinterOptions {
  /** Path to a Chromium binary; default TRENDBRIEF_CHROMIUM, else /usr/bin/chromium. */
  executablePath?: string;
}

export function chromiumSetting(options: PdfPrinterOptions = {}): { path: string; source: ChromiumSource } {
  if (options.executablePath !== undefined) return { path: options.executablePath, source: 'option' };
  const fromEnvironment = process.env.TRENDBRIEF_CHROMIUM;
  if (fromEnvironment !== undefined && fromEnvironment !== '') return { path: fromEnvironment, source: 'environment' };
  return { path: DEFAULT_CHROMIUM, source: 'default' };
}

export function chromiumPath(options: PdfPrinterOptions = {}): string {
  return chromiumSetting(options).path;
}

/** The problem when the browser is missing, not a file or not executable; undefined when it may be started. */
export function browserProblem(options: PdfPrinterOptions = {}): InputProblem | undefined {
  const { path, source } = chromiumSetting(options);
  let why: string;
  try {
    if (!statSync(path).isFile()) why = 'is not a file';
    else {
      accessSync(path, constants.X_OK);
      return undefined;
    }
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    why = code === 'ENOENT' || code === 'ENOTDIR' ? 'does not exist' : code === 'EACCES' ? 'may not be run (not executable)' : `cannot be reached (${code ?? 'unknown error'})`;
  }
  return printMessages.browserMissing(path, source, why);
}
