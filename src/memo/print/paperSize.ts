// Paper sizes and page margins, shared by the CSS @page rule and the PDF printer so the two
// never disagree about where the footer goes.
import type { Paper } from '../memoInput.js';

export interface PaperSize {
  /** The CSS @page size keyword. */
  css: string;
  /** Puppeteer's paper format name. */
  format: 'A4' | 'Letter';
}

export const PAPER_SIZES: Record<Paper, PaperSize> = {
  A4: { css: 'A4', format: 'A4' },
  Letter: { css: 'letter', format: 'Letter' },
};

/** Margins leave room at the foot of each page for the printer's page-number footer. */
export const PAGE_MARGIN = { top: '17mm', right: '17mm', bottom: '19mm', left: '17mm' } as const;

/** The margin shorthand for CSS: top right bottom left. */
export function cssMargin(): string {
  return `${PAGE_MARGIN.top} ${PAGE_MARGIN.right} ${PAGE_MARGIN.bottom} ${PAGE_MARGIN.left}`;
}
