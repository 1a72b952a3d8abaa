/**
 * One cutting diagram on paper: a sheet or board from shared/layout's diagrams, drawn to a
 * stated scale, each part outlined and labelled with its cut-list name and size (or, when the
 * part is too small on paper for words, its number on this diagram, named in a key), the saw
 * cuts with their order, the trimmed edge dashed and defects marked in pencil red.
 */
import type { BoardDiagram, DiagramBox, DiagramCut, DiagramPart, SheetDiagram } from '../layout/diagram.ts';
import { lengthText, type DrawingUnits } from './lengthText.ts';
import { scaleText } from './scale.ts';
import { MM_PER_PT, MONO_ADVANCE, VIEW_TITLE_PT } from './textMetrics.ts';
import type { Label, LineKind, PlacedView, Primitive, Pt, Rect } from './types.ts';

/** Largest and smallest text inside a part, pt; below the smallest a part shows its number. */
const LABEL_MAX_PT = 7;
const LABEL_MIN_PT = 4;
/** Smallest number drawn in a part, pt. */
const TAG_MIN_PT = 3;
/** Height of the line over a diagram that names it, mm. */
export const DIAGRAM_TITLE_MM = 5;

/** A diagram to draw: a sheet's or a board's, with the words over it. */
export interface DiagramInput {
  id: string;
  title: string;
  lengthMm: number;
  widthMm: number;
  parts: readonly DiagramPart[];
  cuts: readonly DiagramCut[];
  /** The sheet inside its trimmed edges; absent on boards. */
  usable?: DiagramBox;
  defects?: readonly (DiagramBox & { note: string })[];
}

/** A sheet diagram as {@link DiagramInput}. */
export function sheetInput(id: string, title: string, d: SheetDiagram): DiagramInput {
  return { id, title, lengthMm: d.lengthMm, widthMm: d.widthMm, parts: d.parts, cuts: d.cuts, usable: d.usable };
}

/** A board diagram as {@link DiagramInput}. */
export function boardInput(id: string, title: string, d: BoardDiagram): DiagramInput {
  return { id, title, lengthMm: d.lengthMm, widthMm: d.widthMm, parts: d.parts, cuts: d.crosscuts, defects: d.defects };
}

/** The part's size as a cut list writes it: length × width. */
export function diagramPartSize(part: DiagramPart, units: DrawingUnits): string {
  return `${lengthText(part.lengthMm, units)} × ${lengthText(part.widthMm, units)}`;
}

function rect(box: Rect, fill: 'light' | null, kind: LineKind): Primitive {
  const { x, y, w, h } = box;
  return { type: 'polygon', points: [[x, y], [x + w, y], [x + w, y + h], [x, y + h]], fill, kind };
}

/** The largest text size at which `lines` (longest first) fit `along` × `across` mm. */
function fitPt(lines: readonly string[], along: number, across: number, max: number): number {
  const chars = Math.max(...lines.map((l) => l.length));
  const byWidth = (along - 1) / (chars * MONO_ADVANCE * MM_PER_PT);
  const byHeight = (across - 0.8) / (lines.length * 1.25 * MM_PER_PT);
  return Math.min(max, byWidth, byHeight);
}

/**
 * Words inside a part's paper box: name and size on two lines, turned upright for tall narrow
 * parts, or only the part's number. `tagOnly` is true when the key must name the part.
 */
function partLabels(part: DiagramPart, box: Rect, units: DrawingUnits): { labels: Label[]; tagOnly: boolean } {
  const lines = [part.name, diagramPartSize(part, units)];
  const flat = fitPt(lines, box.w, box.h, LABEL_MAX_PT);
  const upright = fitPt(lines, box.h, box.w, LABEL_MAX_PT);
  const vertical = upright > flat * 1.2;
  const pt = Math.floor((vertical ? upright : flat) * 2) / 2;
  const cx = box.x + box.w / 2;
  const cy = box.y + box.h / 2;
  const lineMm = 1.25 * pt * MM_PER_PT;
  if (pt >= LABEL_MIN_PT) {
    // Two lines centred on the box: the name above, the size below (left of, when upright).
    const offsets = [-0.15 * lineMm, 0.85 * lineMm];
    const labels = lines.map((text, i): Label => vertical
      ? { type: 'label', at: [cx + offsets[i]!, cy], text, sizePt: pt, anchor: 'middle', font: i === 0 ? 'sans' : 'mono', bold: i === 0, rotate: 90 }
      : { type: 'label', at: [cx, cy + offsets[i]!], text, sizePt: pt, anchor: 'middle', font: i === 0 ? 'sans' : 'mono', bold: i === 0 });
    return { labels, tagOnly: false };
  }
  const tag = String(part.tag);
  const tagPt = Math.floor(Math.max(fitPt([tag], box.w, box.h, LABEL_MAX_PT), fitPt([tag], box.h, box.w, LABEL_MAX_PT)) * 2) / 2;
  if (tagPt < TAG_MIN_PT) return { labels: [], tagOnly: true };
  return { labels: [{ type: 'label', at: [cx, cy + 0.35 * tagPt * MM_PER_PT], text: tag, sizePt: tagPt, anchor: 'middle', font: 'mono', bold: true }], tagOnly: true };
}

/** What {@link drawDiagram} returns: the view, and the parts that show only their number. */
export interface DrawnDiagram {
  view: PlacedView;
  tagOnly: DiagramPart[];
}

/**
 * Draws `d` at 1:`scale` with its top-left corner (under its title line) at `at`, paper mm.
 * x runs along the stock's length, y across it, as on the layout.
 */
export function drawDiagram(d: DiagramInput, scale: number, at: Pt, units: DrawingUnits): DrawnDiagram {
  const [ox, oy] = [at[0], at[1] + DIAGRAM_TITLE_MM];
  const box = (b: DiagramBox): Rect => ({ x: ox + b.x / scale, y: oy + b.y / scale, w: b.w / scale, h: b.h / scale });
  const geometry: Rect = { x: ox, y: oy, w: d.lengthMm / scale, h: d.widthMm / scale };
  const primitives: Primitive[] = [
    { type: 'label', at: [at[0], at[1] + 3.5], text: `${d.title}   ${scaleText(scale)}`, sizePt: VIEW_TITLE_PT - 1, anchor: 'start', font: 'sans', bold: true },
    rect(geometry, null, 'visible'),
  ];
  if (d.usable) primitives.push(rect(box(d.usable), null, 'hidden'));
  const tagOnly: DiagramPart[] = [];
  for (const part of d.parts) {
    const b = box(part);
    primitives.push(rect(b, 'light', 'thin'));
    const { labels, tagOnly: tagged } = partLabels(part, b, units);
    primitives.push(...labels);
    if (tagged) tagOnly.push(part);
  }
  for (const defect of d.defects ?? []) {
    const b = box(defect);
    primitives.push(rect(b, null, 'accent'), { type: 'segment', a: [b.x, b.y], b: [b.x + b.w, b.y + b.h], kind: 'accent' });
    primitives.push({ type: 'label', at: [b.x + b.w / 2, b.y - 0.6], text: defect.note, sizePt: 5, anchor: 'middle', font: 'sans', accent: true });
  }
  for (const cut of d.cuts) {
    const a: Pt = [ox + cut.x1 / scale, oy + cut.y1 / scale];
    const b: Pt = [ox + cut.x2 / scale, oy + cut.y2 / scale];
    primitives.push({ type: 'segment', a, b, kind: 'accent' });
    // The cut's number at its start, just inside the stock, so the order reads along the saw's path.
    const alongX = a[1] === b[1];
    primitives.push({ type: 'label', at: alongX ? [a[0] + 0.8, a[1] - 0.5] : [a[0] + 0.5, a[1] + 2.2], text: String(cut.order), sizePt: 4.5, anchor: 'start', font: 'mono', accent: true });
  }
  const frame: Rect = { x: at[0], y: at[1], w: Math.max(geometry.w, 10), h: DIAGRAM_TITLE_MM + geometry.h };
  return { view: { id: d.id, title: d.title, scale, scaleText: scaleText(scale), primitives, frame, geometry, dimensionTexts: [] }, tagOnly };
}
