/**
 * One cutting diagram on paper: a sheet or board from shared/layout's diagrams, drawn to a
 * stated scale, each part outlined and labelled with its cut-list name and size (or, when the
 * part is too small on paper for words, its number on this diagram, named in a key), the saw
 * cuts with their order, the trimmed edge dashed, defects marked in pencil red and grain-matched
 * runs bracketed under the board with their note (in pencil red when the run is split over boards).
 */
import type { BoardDiagram, DiagramBox, DiagramCut, DiagramMatchRun, DiagramPart, SheetDiagram } from '../layout/diagram.ts';
import { lengthText, type DrawingUnits } from './lengthText.ts';
import { scaleText } from './scale.ts';
import { MM_PER_PT, MONO_ADVANCE, VIEW_TITLE_PT, textWidthMm } from './textMetrics.ts';
import type { Label, LineKind, PlacedView, Primitive, Pt, Rect } from './types.ts';

/** Largest and smallest text inside a part, pt; below the smallest a part shows its number. */
const LABEL_MAX_PT = 7;
const LABEL_MIN_PT = 4;
/** Smallest number drawn in a part, pt. */
const TAG_MIN_PT = 3;
/** Height of the line over a diagram that names it, mm. */
export const DIAGRAM_TITLE_MM = 5;
/** Size of a grain-match run's note under its bracket, pt. */
const RUN_NOTE_PT = 6;
/** From the board's edge to its brackets, the brackets' ticks, and one row of bracket notes, mm. */
const RUN_GAP_MM = 1;
const RUN_TICK_MM = 1;
const RUN_ROW_MM = 2.8;

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
  /** Grain-matched runs on a board, bracketed under it. */
  matchRuns?: readonly DiagramMatchRun[];
}

/** A sheet diagram as {@link DiagramInput}. */
export function sheetInput(id: string, title: string, d: SheetDiagram): DiagramInput {
  return { id, title, lengthMm: d.lengthMm, widthMm: d.widthMm, parts: d.parts, cuts: d.cuts, usable: d.usable };
}

/** A board diagram as {@link DiagramInput}. */
export function boardInput(id: string, title: string, d: BoardDiagram): DiagramInput {
  return { id, title, lengthMm: d.lengthMm, widthMm: d.widthMm, parts: d.parts, cuts: d.crosscuts, defects: d.defects, matchRuns: d.matchRuns };
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

/**
 * Where each run's note is set under a board drawn at 1:`scale` from `ox`: from its bracket's
 * start, or ending at the board's end when it would run past it; and on the first row where it
 * clears the notes already there, so runs side by side never write over one another.
 */
function runNotePlaces(runs: readonly DiagramMatchRun[], boardMm: number, scale: number, ox: number): { x: number; row: number }[] {
  const rowEnds: number[] = [];
  return runs.map((run) => {
    const width = textWidthMm(run.text, RUN_NOTE_PT);
    const x = Math.max(ox, Math.min(ox + run.fromMm / scale, ox + boardMm / scale - width));
    let row = rowEnds.findIndex((e) => e <= x);
    if (row < 0) row = rowEnds.length;
    rowEnds[row] = x + width + 1;
    return { x, row };
  });
}

/** Height under a board of `boardMm` its grain-match brackets and notes take at 1:`scale`, mm (0 without runs). */
export function matchRunBandMm(runs: readonly DiagramMatchRun[], boardMm: number, scale: number): number {
  if (!runs.length) return 0;
  const rows = Math.max(...runNotePlaces(runs, boardMm, scale, 0).map((p) => p.row)) + 1;
  return RUN_GAP_MM + RUN_TICK_MM + rows * RUN_ROW_MM + 0.6;
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
  const runs = d.matchRuns ?? [];
  const places = runNotePlaces(runs, d.lengthMm, scale, ox);
  runs.forEach((run, i) => {
    // A bracket under the board from the run's first part to its last, its note under the bracket.
    const [x1, x2] = [ox + run.fromMm / scale, ox + run.toMm / scale];
    const y = geometry.y + geometry.h + RUN_GAP_MM + RUN_TICK_MM;
    const accent = run.partial;
    const kind: LineKind = accent ? 'accent' : 'visible';
    primitives.push(
      { type: 'segment', a: [x1, y - RUN_TICK_MM], b: [x1, y], kind },
      { type: 'segment', a: [x1, y], b: [x2, y], kind },
      { type: 'segment', a: [x2, y], b: [x2, y - RUN_TICK_MM], kind },
      { type: 'label', at: [places[i]!.x, y + RUN_ROW_MM * (places[i]!.row + 1) - 0.4], text: run.text, sizePt: RUN_NOTE_PT, anchor: 'start', font: 'sans', ...(accent ? { accent } : {}) },
    );
  });
  const frame: Rect = { x: at[0], y: at[1], w: Math.max(geometry.w, 10), h: DIAGRAM_TITLE_MM + geometry.h + matchRunBandMm(runs, d.lengthMm, scale) };
  return { view: { id: d.id, title: d.title, scale, scaleText: scaleText(scale), primitives, frame, geometry, dimensionTexts: [] }, tagOnly };
}
