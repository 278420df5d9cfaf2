// How wide a table's rows run on the page, estimated from the memo's table font, so a view can
// choose a layout that fits instead of letting the printer shrink or clip the page. The
// figures are templates/memo.css's: tables at 7.2 pt with 1.6 mm of padding on each side of a
// cell, on a sheet 176 mm wide (A4 less 17 mm margins each side).
import { estimateTextWidth } from '../charts/textWidth.js';

const POINTS_PER_MM = 72 / 25.4;
const TABLE_FONT_SIZE = 7.2;
const CELL_PADDING = 3.2 * POINTS_PER_MM;
/**
 * estimateTextWidth holds Arial's widths; where none of the stylesheet's first sans fonts is
 * installed (Debian's Chromium alone, say) the tables fall back to DejaVu Sans, whose digits
 * run 0.636 em against Arial's 0.556 (the fonts' own advance widths): measure for the wider.
 */
const FALLBACK_FONT_WIDENING = 0.636 / 0.556;

/** The width of the memo's text, in mm. */
export const SHEET_WIDTH = 176;

export interface MeasuredRow {
  cells: readonly string[];
  /** Bold rows (heads, the recommended model) run wider. */
  bold?: boolean;
}

/** Whether every row fits in `widthMm` millimetres. */
export function rowsFit(rows: readonly MeasuredRow[], widthMm: number): boolean {
  const rowWidth = ({ cells, bold = false }: MeasuredRow): number => cells.reduce((sum, cell) => sum + estimateTextWidth(cell, TABLE_FONT_SIZE, bold) * FALLBACK_FONT_WIDENING + CELL_PADDING, 0);
  return rows.every((row) => rowWidth(row) <= widthMm * POINTS_PER_MM);
}
