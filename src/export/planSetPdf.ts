/**
 * Renders a plan-set model to a PDF with jsPDF and jspdf-autotable: views and frames from the
 * drawing model's primitives, tables and text flowing down each sheet's free area onto
 * continuation pages when they overflow, and every number set in the embedded JetBrains Mono.
 * Runs unchanged in the browser (loaded only on export) and under Node (the command line).
 */
import { jsPDF } from 'jspdf';
import { autoTable } from 'jspdf-autotable';
import { drawingArea } from '../../shared/drawing/paper.ts';
import { sheetScaleText } from '../../shared/drawing/planSet.ts';
import { LINE_STYLES, PALETTE } from '../../shared/drawing/svg.ts';
import { sheetFrame } from '../../shared/drawing/titleBlock.ts';
import type { PlanSetModel, Primitive, Rect, Sheet, TableBlock, TextBlock } from '../../shared/drawing/types.ts';
import { winAnsi } from './pdfText.ts';

/** JetBrains Mono as TrueType bytes: regular and bold. */
export interface MonoFonts {
  regular: Uint8Array;
  bold: Uint8Array;
}

/** Progress of a long export: pages done of the total known so far. */
export type ProgressCallback = (done: number, total: number) => void;

const MONO = 'JetBrainsMono';
const SANS = 'helvetica';

function rgb(hex: string): [number, number, number] {
  const v = Number.parseInt(hex.slice(1), 16);
  return [(v >> 16) & 255, (v >> 8) & 255, v & 255];
}

function binaryString(bytes: Uint8Array): string {
  let out = '';
  const chunk = 0x8000;
  for (let i = 0; i < bytes.length; i += chunk) out += String.fromCharCode(...bytes.subarray(i, i + chunk));
  return out;
}

function embedFonts(doc: jsPDF, fonts: MonoFonts): void {
  doc.addFileToVFS('JetBrainsMono-Regular.ttf', binaryString(fonts.regular));
  doc.addFont('JetBrainsMono-Regular.ttf', MONO, 'normal');
  doc.addFileToVFS('JetBrainsMono-Bold.ttf', binaryString(fonts.bold));
  doc.addFont('JetBrainsMono-Bold.ttf', MONO, 'bold');
}

function drawPrimitive(doc: jsPDF, p: Primitive): void {
  const ink = rgb(PALETTE.ink);
  const accent = rgb(PALETTE.accent);
  switch (p.type) {
    case 'segment':
    case 'polygon':
    case 'circle': {
      const style = LINE_STYLES[p.kind];
      doc.setDrawColor(...(style.accent ? accent : ink));
      doc.setLineWidth(style.width);
      doc.setLineDashPattern(style.dash ? [...style.dash] : [], 0);
      if (p.type === 'segment') doc.line(p.a[0], p.a[1], p.b[0], p.b[1]);
      else if (p.type === 'circle') doc.circle(p.centre[0], p.centre[1], p.radius, 'S');
      else {
        const [first, ...rest] = p.points;
        if (!first) return;
        let prev = first;
        const deltas = rest.map((q) => {
          const d: [number, number] = [q[0] - prev[0], q[1] - prev[1]];
          prev = q;
          return d;
        });
        if (p.fill) doc.setFillColor(...rgb(PALETTE.fills[p.fill]));
        doc.lines(deltas, first[0], first[1], [1, 1], p.fill ? 'FD' : 'S', true);
      }
      doc.setLineDashPattern([], 0);
      return;
    }
    case 'arrow': {
      const dx = p.tip[0] - p.from[0];
      const dy = p.tip[1] - p.from[1];
      const len = Math.hypot(dx, dy) || 1;
      const w = len * 0.18;
      const px = (-dy / len) * w;
      const py = (dx / len) * w;
      doc.setFillColor(...ink);
      doc.triangle(p.tip[0], p.tip[1], p.from[0] + px, p.from[1] + py, p.from[0] - px, p.from[1] - py, 'F');
      return;
    }
    case 'label': {
      const mono = p.font === 'mono';
      doc.setFont(mono ? MONO : SANS, p.bold ? 'bold' : 'normal');
      doc.setFontSize(p.sizePt);
      doc.setTextColor(...(p.accent ? accent : ink));
      const text = mono ? p.text : winAnsi(p.text);
      const w = doc.getTextWidth(text);
      const shift = p.anchor === 'middle' ? w / 2 : p.anchor === 'end' ? w : 0;
      if (p.rotate === 90) doc.text(text, p.at[0], p.at[1] + shift, { angle: 90 });
      else doc.text(text, p.at[0] - shift, p.at[1]);
      return;
    }
  }
}

interface PageRecord {
  sheet: Sheet;
  continued: boolean;
}

/** Padding inside a table cell, mm: the usual, and the tight rows of a sheet that asks for them. */
const CELL_PADDING_MM = 1;
const TIGHT_CELL_PADDING_MM = 0.6;

/** Draws one table; returns the y below it. New pages it adds are recorded against `sheet`. */
function drawTable(doc: jsPDF, block: TableBlock, y: number, area: Rect, page: Rect, onNewPage: () => void, cellPadding = CELL_PADDING_MM): number {
  doc.setFont(SANS, 'bold');
  doc.setFontSize(10);
  doc.setTextColor(...rgb(PALETTE.ink));
  doc.text(winAnsi(block.title), area.x, y + 4);
  // A length broken over two lines reads as two numbers: numbers and named columns keep to one line.
  const columnStyles: Record<number, { font?: string; halign?: 'right'; cellWidth: 'wrap' }> = {};
  for (const c of block.unbrokenColumns ?? []) columnStyles[c] = { cellWidth: 'wrap' };
  for (const c of block.numericColumns) columnStyles[c] = { font: MONO, halign: 'right', cellWidth: 'wrap' };
  const startPage = doc.getNumberOfPages();
  autoTable(doc, {
    startY: y + 6,
    head: [block.head.map(winAnsi)],
    body: block.rows.map((r) => r.map((cell, i) => (block.numericColumns.includes(i) ? cell : winAnsi(cell)))),
    theme: 'grid',
    margin: { left: area.x, right: page.w - (area.x + area.w), top: drawingArea({ size: 'a4', orientation: 'portrait' }).y, bottom: page.h - (area.y + area.h) },
    tableWidth: area.w,
    styles: { font: SANS, fontSize: 7.5, cellPadding, textColor: rgb(PALETTE.ink), lineColor: rgb('#8a8378'), lineWidth: 0.1, overflow: 'linebreak' },
    headStyles: { fillColor: rgb('#e9dfc9'), textColor: rgb(PALETTE.ink), fontStyle: 'bold' },
    columnStyles,
    didDrawPage: () => {
      if (doc.getNumberOfPages() > startPage) onNewPage();
    },
  });
  let after = (doc as unknown as { lastAutoTable: { finalY: number } }).lastAutoTable.finalY + 2;
  if (block.footnote) {
    doc.setFont(SANS, 'normal');
    doc.setFontSize(6.5);
    const lines = doc.splitTextToSize(winAnsi(block.footnote), area.w) as string[];
    if (after + 2.5 + lines.length * 2.8 > area.y + area.h) {
      onNewPage();
      doc.addPage();
      after = drawingArea({ size: 'a4', orientation: 'portrait' }).y;
    }
    doc.text(lines, area.x, after + 2.5);
    after += 2.5 + lines.length * 2.8;
  }
  return after + 4;
}

/** Clear space between two columns of a sheet's flow, mm. */
const COLUMN_GAP_MM = 8;

/** Column `index` of `columns` across `area`. */
function columnRect(area: Rect, columns: number, index: number): Rect {
  const w = (area.w - (columns - 1) * COLUMN_GAP_MM) / columns;
  return { x: area.x + index * (w + COLUMN_GAP_MM), y: area.y, w, h: area.h };
}

/**
 * Measures flow blocks by setting them on a page too tall to break, in a document of their
 * own, so a block can be moved whole to the next column before it is drawn.
 */
function blockMeasurer(fonts: MonoFonts, pageWidthMm: number): (block: TableBlock | TextBlock, width: number, cellPadding: number) => number {
  const tallMm = 5000;
  let scratch: jsPDF | null = null;
  return (block, width, cellPadding) => {
    if (!scratch) {
      scratch = new jsPDF({ unit: 'mm', format: [pageWidthMm, tallMm], orientation: 'portrait', compress: true });
      embedFonts(scratch, fonts);
    }
    const area: Rect = { x: 0, y: 0, w: width, h: tallMm };
    const page: Rect = { x: 0, y: 0, w: pageWidthMm, h: tallMm };
    return block.type === 'table' ? drawTable(scratch, block, 0, area, page, () => undefined, cellPadding) : drawText(scratch, block, 0, area);
  };
}

function textBlockHeight(doc: jsPDF, block: TextBlock, width: number): number {
  doc.setFont(SANS, 'normal');
  doc.setFontSize(8.5);
  const lines = block.paragraphs.flatMap((p) => doc.splitTextToSize(winAnsi(p), width - 4) as string[]);
  return 6 + lines.length * 3.9 + block.paragraphs.length * 1.2;
}

function drawText(doc: jsPDF, block: TextBlock, y: number, area: Rect): number {
  doc.setTextColor(...rgb(PALETTE.ink));
  doc.setFont(SANS, 'bold');
  doc.setFontSize(10);
  doc.text(winAnsi(block.title), area.x, y + 4);
  let at = y + 9;
  doc.setFont(SANS, 'normal');
  doc.setFontSize(8.5);
  for (const p of block.paragraphs) {
    const lines = doc.splitTextToSize(winAnsi(p), area.w - 4) as string[];
    if (block.bullets) doc.text('•', area.x, at);
    doc.text(lines, area.x + (block.bullets ? 3 : 0), at);
    at += lines.length * 3.9 + 1.2;
  }
  return at + 2;
}

/**
 * The plan set as PDF bytes. `fonts` are JetBrains Mono TrueType files (see `monoFonts*`);
 * `onProgress` is told after each sheet.
 */
export async function renderPlanSetPdf(model: PlanSetModel, fonts: MonoFonts, onProgress?: ProgressCallback): Promise<ArrayBuffer> {
  const orientation = model.sheet.orientation === 'landscape' ? 'landscape' : 'portrait';
  const doc = new jsPDF({ unit: 'mm', format: model.sheet.size, orientation, compress: true });
  embedFonts(doc, fonts);
  doc.setProperties({ title: `${model.info.title} — plan set, revision ${model.info.revision}`, creator: 'Casewright' });
  const pages: PageRecord[] = [];
  const total = model.sheets.length;
  const measure = blockMeasurer(fonts, doc.internal.pageSize.getWidth());

  for (const [i, sheet] of model.sheets.entries()) {
    if (i > 0) doc.addPage(model.sheet.size, orientation);
    pages.push({ sheet, continued: false });
    const page: Rect = { x: 0, y: 0, w: sheet.widthMm, h: sheet.heightMm };
    for (const view of sheet.views) for (const p of view.primitives) drawPrimitive(doc, p);
    for (const p of sheet.primitives) drawPrimitive(doc, p);

    const columns = Math.max(1, sheet.flowColumns ?? 1);
    const cellPadding = sheet.tightTables ? TIGHT_CELL_PADDING_MM : CELL_PADDING_MM;
    const full = drawingArea(model.sheet);
    let column = 0;
    let area = columnRect(sheet.flowArea, columns, column);
    let y = area.y;
    const newPage = (): void => {
      doc.addPage(model.sheet.size, orientation);
      pages.push({ sheet, continued: true });
      column = 0;
      area = columnRect(full, columns, column);
      y = area.y;
    };
    // The next column down, or a fresh page after the last one.
    const nextColumn = (): void => {
      if (column + 1 >= columns) return newPage();
      column += 1;
      area = columnRect(pages[pages.length - 1]!.continued ? full : sheet.flowArea, columns, column);
      y = area.y;
    };
    for (const block of sheet.flow) {
      // In columns, a block that would not fit where it is goes whole to the next column.
      if (columns > 1 && y > area.y && y + measure(block, area.w, cellPadding) > area.y + area.h) nextColumn();
      if (block.type === 'table') {
        // A table whose title and first rows do not fit starts in the next column or on a fresh page.
        if (y + 20 > area.y + area.h) nextColumn();
        y = drawTable(doc, block, y, area, page, () => {
          pages.push({ sheet, continued: true });
          area = columnRect(full, columns, column);
        }, cellPadding);
      } else {
        const h = textBlockHeight(doc, block, area.w);
        if (y + h > area.y + area.h && y > area.y) nextColumn();
        y = drawText(doc, block, y, area);
      }
    }
    onProgress?.(i + 1, total);
    // Yield a whole task (not a microtask) so a browser can paint the progress bar between sheets.
    await new Promise<void>((done) => setTimeout(done, 0));
  }

  const count = doc.getNumberOfPages();
  for (let n = 1; n <= count; n++) {
    doc.setPage(n);
    const record = pages[n - 1] ?? pages[pages.length - 1]!;
    const name = record.continued ? `${record.sheet.name} (continued)` : record.sheet.name;
    for (const p of sheetFrame(model.sheet, model.info, name, sheetScaleText(record.sheet), n, count)) drawPrimitive(doc, p);
  }
  return doc.output('arraybuffer');
}
