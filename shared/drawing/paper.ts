/**
 * Paper sizes and the fixed parts of every sheet: the border and the title block strip along
 * the bottom. Sizes are ISO 216 (A4, A3) and ANSI/ASME Y14.1 (Letter), in mm.
 */
import type { PaperSize, Rect, SheetSpec } from './types.ts';

/** Portrait width × height of each paper size, mm (ISO 216; Letter is 8 1/2 × 11 in). */
export const PAPER_MM: Readonly<Record<PaperSize, readonly [number, number]>> = {
  letter: [215.9, 279.4],
  a4: [210, 297],
  a3: [297, 420],
};

/** Margin from the paper's edge to the border, mm; most printers cannot print the outer 5 mm. */
export const SHEET_MARGIN_MM = 8;
/** Height of the title block strip inside the border, mm. */
export const TITLE_BLOCK_MM = 16;
/** Space between the border and the drawing area, mm. */
export const INNER_PAD_MM = 4;

/** The sheet's width and height in mm for its size and orientation. */
export function sheetSizeMm(spec: SheetSpec): { widthMm: number; heightMm: number } {
  const [w, h] = PAPER_MM[spec.size];
  return spec.orientation === 'portrait' ? { widthMm: w, heightMm: h } : { widthMm: h, heightMm: w };
}

/** The area inside the border, mm. */
export function borderRect(spec: SheetSpec): Rect {
  const { widthMm, heightMm } = sheetSizeMm(spec);
  return { x: SHEET_MARGIN_MM, y: SHEET_MARGIN_MM, w: widthMm - 2 * SHEET_MARGIN_MM, h: heightMm - 2 * SHEET_MARGIN_MM };
}

/** The area views and tables may use: inside the border, above the title block, mm. */
export function drawingArea(spec: SheetSpec): Rect {
  const b = borderRect(spec);
  return {
    x: b.x + INNER_PAD_MM,
    y: b.y + INNER_PAD_MM,
    w: b.w - 2 * INNER_PAD_MM,
    h: b.h - TITLE_BLOCK_MM - 2 * INNER_PAD_MM,
  };
}
