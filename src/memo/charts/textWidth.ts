// Text width for vega's layout in Node. Without a canvas vega guesses 0.8 em per character,
// far wider than real type, so long titles widened every chart and the SVGs came out at
// different scales. This estimate uses per-character advance widths of Arial/Helvetica
// (AFM metrics, from memory), which Liberation Sans shares; vega documents replacing
// textMetrics.width for exactly this (its "user defined textMetrics.width" branch).
import * as vega from 'vega';

const WIDTHS: Record<string, number> = {};
const GROUPS: [string, number][] = [
  [' !,./:;I[\\]fijlt|', 0.278],
  ["'", 0.191],
  ['"', 0.355],
  ['()-`r{}', 0.333],
  ['*', 0.389],
  ['Jcksvxyz', 0.5],
  ['+<=>~', 0.584],
  ['#$0123456789?L_abdeghnopqu', 0.556],
  ['FTZ', 0.611],
  ['&ABEKPSVXY', 0.667],
  ['CDHNRUw', 0.722],
  ['GOQ', 0.778],
  ['Mm', 0.833],
  ['%', 0.889],
  ['W', 0.944],
  ['@', 1.015],
];
for (const [chars, width] of GROUPS) for (const c of chars) WIDTHS[c] = width;

/** Average advance of characters outside the table (accented letters, symbols), in em. */
const OTHER = 0.6;
/** Bold Arial runs a few per cent wider than regular. */
const BOLD = 1.08;

export function estimateTextWidth(text: string, fontSize: number, bold = false): number {
  let ems = 0;
  for (const c of text) ems += WIDTHS[c] ?? OTHER;
  return ems * fontSize * (bold ? BOLD : 1);
}

interface TextItem {
  text?: unknown;
  fontSize?: number;
  fontWeight?: string | number;
}

interface TextMetrics {
  width: (item: TextItem, text?: unknown) => number;
}

function isBold(weight: string | number | undefined): boolean {
  if (typeof weight === 'number') return weight >= 600;
  return weight === 'bold' || weight === 'bolder' || (weight !== undefined && Number(weight) >= 600);
}

function itemWidth(item: TextItem, text?: unknown): number {
  const value = text ?? item.text;
  if (value === null || value === undefined) return 0;
  return estimateTextWidth(String(value), item.fontSize ?? 11, isBold(item.fontWeight));
}

/** Points vega's text measurement at estimateTextWidth (idempotent). */
export function useTextWidthEstimate(): void {
  // vega re-exports vega-scenegraph's textMetrics, but its type declarations omit it.
  const metrics = (vega as unknown as { textMetrics?: TextMetrics }).textMetrics;
  if (metrics === undefined) throw new Error('vega no longer exports textMetrics; chart text cannot be measured');
  metrics.width = itemWidth;
}
