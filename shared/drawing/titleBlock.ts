/**
 * The sheet frame: a border and a title block along the bottom with the design's title, the
 * sheet's name, revision, date, units, scale, sheet number and the workshop's name.
 */
import { borderRect, TITLE_BLOCK_MM } from './paper.ts';
import type { Primitive, SheetSpec, TitleBlockInfo } from './types.ts';

/** Words for the units field. */
export function unitsText(units: 'in' | 'mm'): string {
  return units === 'in' ? 'inches' : 'millimetres';
}

function rectSegments(x: number, y: number, w: number, h: number, kind: 'visible' | 'thin'): Primitive[] {
  return [
    { type: 'segment', a: [x, y], b: [x + w, y], kind },
    { type: 'segment', a: [x + w, y], b: [x + w, y + h], kind },
    { type: 'segment', a: [x + w, y + h], b: [x, y + h], kind },
    { type: 'segment', a: [x, y + h], b: [x, y], kind },
  ];
}

/**
 * Border and title block of sheet `number` of `total`, paper mm. `scaleText` is the scale of
 * the sheet's views (`1:8`, several joined, or `none` for tables).
 */
export function sheetFrame(spec: SheetSpec, info: TitleBlockInfo, sheetName: string, scaleText: string, number: number, total: number): Primitive[] {
  const b = borderRect(spec);
  const out: Primitive[] = rectSegments(b.x, b.y, b.w, b.h, 'visible');
  const top = b.y + b.h - TITLE_BLOCK_MM;
  out.push({ type: 'segment', a: [b.x, top], b: [b.x + b.w, top], kind: 'visible' });
  // Cells: title (wide), sheet name (wide), then fixed fields; widths as fractions of the border.
  const cells: { label: string; value: string; share: number; mono?: boolean }[] = [
    { label: 'DESIGN', value: info.title, share: 0.24 },
    { label: 'SHEET', value: sheetName, share: 0.24 },
    { label: 'REVISION', value: info.revision, share: 0.07, mono: true },
    { label: 'DATE', value: info.date, share: 0.09, mono: true },
    { label: 'UNITS', value: unitsText(info.units), share: 0.08 },
    { label: 'SCALE', value: scaleText, share: 0.1, mono: true },
    { label: 'SHEET NO.', value: `${number} of ${total}`, share: 0.07, mono: true },
    { label: 'WORKSHOP', value: info.workshopName, share: 0.11 },
  ];
  let x = b.x;
  cells.forEach((cell, i) => {
    const w = b.w * cell.share;
    if (i > 0) out.push({ type: 'segment', a: [x, top], b: [x, b.y + b.h], kind: 'thin' });
    out.push({ type: 'label', at: [x + 1.5, top + 3.6], text: cell.label, sizePt: 5, anchor: 'start', font: 'sans', accent: true });
    const fitted = fitText(cell.value, w - 3, cell.mono ? 8 : 8.5);
    out.push({ type: 'label', at: [x + 1.5, top + 10.5], text: fitted.text, sizePt: fitted.sizePt, anchor: 'start', font: cell.mono ? 'mono' : 'sans', bold: i < 2 });
    x += w;
  });
  return out;
}

/** Smallest size a title-block value is set in before it is shortened, pt. */
const MIN_VALUE_PT = 6;

/**
 * Fits `text` into `widthMm` (estimated widths): at `sizePt` if it fits, else at a smaller
 * size down to 6 pt, and only then shortened with an ellipsis.
 */
function fitText(text: string, widthMm: number, sizePt: number): { text: string; sizePt: number } {
  const maxChars = (pt: number) => Math.max(4, Math.floor(widthMm / (0.6 * pt * (25.4 / 72))));
  for (let pt = sizePt; pt >= MIN_VALUE_PT; pt -= 0.5) if (text.length <= maxChars(pt)) return { text, sizePt: pt };
  const max = maxChars(MIN_VALUE_PT);
  return { text: `${text.slice(0, max - 1)}…`, sizePt: MIN_VALUE_PT };
}
