/**
 * One part drawing sheet: the heading (letter, name, quantity, finished size, material, notes),
 * the face, edge and end views, enlarged details of cuts too small to read at the part's
 * scale, and the table of cuts. The table goes under the views, or beside them when that lets
 * the views be drawn at a larger scale (flat panels, whose views are wide and short).
 */
import type { Feature, Part } from '../engine/types.ts';
import { arrangeAt, centreIn, VIEW_GAP_MM, type Arrangement } from './arrange.ts';
import { layoutView, translateView } from './dimensionLayout.ts';
import { featureFaceText, featureKindText, featureSizeText } from './featureText.ts';
import { jointDetails, mergeMarks, type DetailMark, type JointDetail } from './jointDetails.ts';
import { lengthText, partSizeText, type DrawingUnits } from './lengthText.ts';
import { drawingArea, sheetSizeMm } from './paper.ts';
import { chooseFaceUp } from './partFrame.ts';
import { partViews } from './partViews.ts';
import { rectUnion } from './rects.ts';
import { scaleText, usualScales } from './scale.ts';
import type { FlowBlock, Label, PlacedView, Rect, Sheet, SheetSpec } from './types.ts';

/** Height of a part sheet's heading, mm. */
const HEADING_MM = 16;
/** Share of the drawing area's height part views may always take, however long the cut table. */
const PART_VIEWS_MIN_SHARE = 0.66;
/** Height a cut-table row and the table's title and footnote take, mm (7.5 pt rows). */
const TABLE_ROW_MM = 4.6;
const TABLE_EXTRA_MM = 22;
/** Narrowest column the cut table may be given beside the views, mm. */
const SIDE_TABLE_MIN_MM = 100;
/** Fewest like holes or slots listed as one row of the cut table. */
const HOLE_GROUP_MIN = 3;

/**
 * The cut table's rows: one per cut, except that like holes or slots on one face (shelf-pin
 * lines, screw slots) share a row with their count, their centres being dimensioned on the drawing.
 */
export function cutRows(part: Part, units: DrawingUnits): string[][] {
  const holes = new Map<string, Feature[]>();
  for (const f of part.features) {
    if (f.type !== 'hole' && f.type !== 'slot') continue;
    const key = `${f.type}|${f.face}|${f.diameterMm}|${f.depthMm}|${f.type === 'slot' ? f.slotLengthMm : 0}|${f.label}`;
    holes.set(key, [...(holes.get(key) ?? []), f]);
  }
  const grouped = new Set([...holes.values()].filter((g) => g.length >= HOLE_GROUP_MIN).flatMap((g) => g.map((f) => f.id)));
  const rows: string[][] = [];
  for (const f of part.features) {
    if (!grouped.has(f.id)) {
      rows.push([featureKindText(f), featureFaceText(f), featureSizeText(f, units), f.label]);
      continue;
    }
    const group = [...holes.values()].find((g) => g[0] === f);
    if (!group) continue;
    if (f.type === 'slot') rows.push([`Slots (${group.length})`, featureFaceText(f), `${lengthText(f.diameterMm, units)} wide × ${lengthText(f.slotLengthMm, units)} long (along the ${f.along}), ${lengthText(f.depthMm, units)} deep; centres as dimensioned on the drawing`, f.label]);
    else if (f.type === 'hole') rows.push([`Holes (${group.length})`, featureFaceText(f), `${lengthText(f.diameterMm, units)} diameter × ${lengthText(f.depthMm, units)} deep; centres as dimensioned on the drawing`, f.label]);
  }
  return rows;
}

interface Laid {
  views: PlacedView[];
  frame: Rect;
  scale: number;
}

/**
 * The part's views with `marks` merged as they would touch at the scales tried, built once for
 * each distinct set of merged marks.
 */
function viewsWithMarks(part: Part, units: DrawingUnits, marks: readonly DetailMark[]): (face: number, end: number) => ReturnType<typeof partViews> {
  const up = chooseFaceUp(part);
  const built = new Map<string, ReturnType<typeof partViews>>();
  return (face, end) => {
    const merged = mergeMarks(marks, { face, edge: face, end });
    const key = merged.map((m) => `${m.view}:${m.text}`).sort().join('|');
    let views = built.get(key);
    if (!views) {
      views = partViews(part, units, up, merged);
      built.set(key, views);
    }
    return views;
  };
}

/**
 * The part's three views at the largest usual scale at which they fit `size` (the end view as
 * large as fits, within four times the main scale), or null when none does.
 */
function partViewsFitting(part: Part, units: DrawingUnits, size: { w: number; h: number }, marks: readonly DetailMark[]): Laid | null {
  const viewsAt = viewsWithMarks(part, units, marks);
  const scales = usualScales(units);
  for (const s of scales) {
    for (const e of scales.filter((x) => x <= s && x * 4 >= s)) {
      const { face, edge, end } = viewsAt(s, e);
      const arrangement: Arrangement[] = [{ view: face, place: 'anchor' }, { view: edge, place: 'below' }, { view: end, place: 'right', scale: e }];
      const { views, frame } = arrangeAt(arrangement, s);
      if (frame.w <= size.w && frame.h <= size.h) return { views, frame, scale: s };
    }
  }
  return null;
}

/** The part's views at the smallest usual scale, for a part too big for any (then shown as it is). */
function partViewsSmallest(part: Part, units: DrawingUnits, marks: readonly DetailMark[]): Laid {
  const scales = usualScales(units);
  const s = scales[scales.length - 1]!;
  const { face, edge, end } = viewsWithMarks(part, units, marks)(s, s);
  return { ...arrangeAt([{ view: face, place: 'anchor' }, { view: edge, place: 'below' }, { view: end, place: 'right' }], s), scale: s };
}

/** Detail views left to right, tops level, wrapping to a new row past `maxW` mm; the first at the origin. */
function detailBlock(details: readonly JointDetail[], maxW: number): { views: PlacedView[]; frame: Rect } | null {
  if (!details.length) return null;
  const views: PlacedView[] = [];
  let x = 0;
  let y = 0;
  let rowBottom = 0;
  for (const d of details) {
    let v = translateView(layoutView(d.view, d.scale, scaleText(d.scale)), x, y);
    if (x > 0 && v.frame.x + v.frame.w > maxW) {
      x = 0;
      y = rowBottom + VIEW_GAP_MM;
      v = translateView(v, x, y);
    }
    views.push(v);
    x = v.frame.x + v.frame.w + VIEW_GAP_MM;
    rowBottom = Math.max(rowBottom, v.frame.y + v.frame.h);
  }
  return { views, frame: rectUnion(views.map((v) => v.frame)) };
}

const moved = (views: readonly PlacedView[], frame: Rect, x: number, y: number): PlacedView[] => centreIn(views, frame, { x, y, w: frame.w, h: frame.h }, true);

/** A page layout: the views placed and where the cut table flows. */
interface PageLayout {
  views: PlacedView[];
  flowArea: Rect;
  scale: number;
}

/**
 * Lays the page out in the ways that can work — table under the views (whole, or only its
 * start with the rest continued), or views on the left with the details and the table in a
 * column beside them — and keeps the one that draws the part largest. On a tie the whole
 * table under the views wins, then the column, then a table continued.
 */
function layoutPage(part: Part, units: DrawingUnits, area: Rect, flowNeed: number, joints: readonly JointDetail[]): PageLayout {
  const marks = joints.map((d) => d.mark);
  const top = area.y + HEADING_MM;
  const fullH = area.y + area.h - top;
  const tableStart = flowNeed ? Math.min(flowNeed, TABLE_EXTRA_MM + 2 * TABLE_ROW_MM) : 0;
  const row = detailBlock(joints, area.w);
  const rowH = row ? row.frame.h + VIEW_GAP_MM : 0;
  const options: PageLayout[] = [];

  const under = (viewsH: number): void => {
    const laid = partViewsFitting(part, units, { w: area.w, h: viewsH }, marks);
    if (!laid) return;
    const views = centreIn(laid.views, laid.frame, { x: area.x, y: top, w: area.w, h: viewsH }, true);
    const used = rectUnion(views.map((v) => v.frame));
    const details = row ? moved(row.views, row.frame, used.x, used.y + used.h + VIEW_GAP_MM) : [];
    const bottom = rectUnion([...views, ...details].map((v) => v.frame));
    const flowTop = bottom.y + bottom.h + 4;
    options.push({ views: [...views, ...details], flowArea: { x: area.x, y: flowTop, w: area.w, h: area.y + area.h - flowTop }, scale: laid.scale });
  };
  const beside = (columnW: number): void => {
    const column = detailBlock(joints, columnW);
    if ((column?.frame.h ?? 0) + tableStart > fullH) return;
    const laid = partViewsFitting(part, units, { w: area.w - columnW - VIEW_GAP_MM, h: fullH }, marks);
    if (!laid) return;
    const views = moved(laid.views, laid.frame, area.x, top);
    const columnX = area.x + laid.frame.w + VIEW_GAP_MM;
    const details = column ? moved(column.views, column.frame, columnX, top) : [];
    const flowTop = column ? top + column.frame.h + 4 : top;
    options.push({ views: [...views, ...details], flowArea: { x: columnX, y: flowTop, w: area.x + area.w - columnX, h: area.y + area.h - flowTop }, scale: laid.scale });
  };

  under(Math.max(fullH * PART_VIEWS_MIN_SHARE, fullH - flowNeed) - rowH);
  if (flowNeed > 0 || joints.length) {
    const widths = joints.map((d) => layoutView(d.view, d.scale, scaleText(d.scale)).frame.w).sort((x, y) => y - x);
    const oneAcross = Math.max(SIDE_TABLE_MIN_MM, widths[0] ?? 0);
    const twoAcross = Math.max(SIDE_TABLE_MIN_MM, (widths[0] ?? 0) + (widths[1] ?? 0) + VIEW_GAP_MM);
    for (const w of new Set([oneAcross, twoAcross])) if (w <= area.w * 0.5) beside(w);
  }
  under(fullH - rowH - tableStart);
  if (options.length) return options.reduce((best, o) => (o.scale < best.scale ? o : best));
  // Nothing fits with the table: the views and details take the page; the table follows on the next.
  const laid = partViewsFitting(part, units, { w: area.w, h: fullH - rowH }, marks) ?? partViewsSmallest(part, units, marks);
  const views = centreIn(laid.views, laid.frame, { x: area.x, y: top, w: area.w, h: fullH }, true);
  const used = rectUnion(views.map((v) => v.frame));
  const details = row ? moved(row.views, row.frame, used.x, used.y + used.h + VIEW_GAP_MM) : [];
  const bottom = rectUnion([...views, ...details].map((v) => v.frame));
  const flowTop = bottom.y + bottom.h + 4;
  return { views: [...views, ...details], flowArea: { x: area.x, y: flowTop, w: area.w, h: area.y + area.h - flowTop }, scale: laid.scale };
}

/** The drawing sheet of `part`, lettered `letter`. */
export function partSheet(part: Part, letter: string, spec: SheetSpec, units: DrawingUnits): Omit<Sheet, 'number'> {
  const area = drawingArea(spec);
  const rows = cutRows(part, units);
  // The views get what the cut table and notes leave, so the page holds both without a continuation.
  const flowNeed = rows.length ? TABLE_EXTRA_MM + rows.length * TABLE_ROW_MM : 0;
  // First without details, to learn the part's scale; then the cuts too small at that scale get details.
  const plain = layoutPage(part, units, area, flowNeed, []);
  const scaleOf = (id: string) => plain.views.find((v) => v.id === id)?.scale ?? plain.scale;
  const details = jointDetails(part, units, { face: scaleOf('face'), edge: scaleOf('edge'), end: scaleOf('end') });
  const page = details.length ? layoutPage(part, units, area, flowNeed, details) : plain;

  const material = part.material.kind === 'solid' ? part.material.speciesName : part.material.sheetName;
  const grain = part.grain === 'length' ? 'grain along the length' : part.grain === 'width' ? 'grain across the width' : 'sheet good';
  const key = 'Faces A/B: broad faces; edges A/B: long edges; ends A/B: ends, end A at the left of the face view; offsets from the A side.';
  // Notes and the key to face names go under the heading, so the page never spills a line onto another.
  const heading: Label[] = [
    { type: 'label', at: [area.x, area.y + 5], text: `${letter}  ${part.name}`, sizePt: 13, anchor: 'start', font: 'sans', bold: true },
    { type: 'label', at: [area.x, area.y + 10.5], text: `${part.quantity} off   finished ${partSizeText(part, units)}   ${material}, ${grain}${part.glueUp ? `, glued up from ${part.glueUp.boards} boards` : ''}`, sizePt: 8.5, anchor: 'start', font: 'mono' },
    { type: 'label', at: [area.x, area.y + 14.5], text: part.notes.length ? `Notes: ${part.notes.map((n) => n.replace(/\.$/, '')).join('; ')}.  ${key}` : key, sizePt: 6.5, anchor: 'start', font: 'sans' },
  ];
  const flow: FlowBlock[] = rows.length ? [{ type: 'table', title: 'Cuts on this part', head: ['Cut', 'Where', 'Sizes', 'For'], rows, numericColumns: [] }] : [];
  const { widthMm, heightMm } = sheetSizeMm(spec);
  return { name: `Part ${letter}: ${part.name}`, widthMm, heightMm, views: page.views, flow, primitives: heading, flowArea: page.flowArea };
}
