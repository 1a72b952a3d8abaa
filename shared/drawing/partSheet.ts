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
const HEADING_MM = 18;
/** Share of the drawing area's height part views may always take, however long the cut table. */
const PART_VIEWS_MIN_SHARE = 0.66;
/** Height a cut-table row and the table's title and footnote take, mm (7.5 pt rows). */
const TABLE_ROW_MM = 4.6;
const TABLE_EXTRA_MM = 22;
/** Narrowest column the cut table may be given beside the views, mm. */
const SIDE_TABLE_MIN_MM = 100;
/** The cut table's columns. */
const TABLE_HEAD: readonly string[] = ['Cut', 'Where', 'Sizes', 'For'];
/** Fewest like holes or slots listed as one row of the cut table. */
const HOLE_GROUP_MIN = 3;

/**
 * The cut table's rows: one per cut, except that like holes or slots on one face (shelf-pin
 * lines, screw slots) share a row with their count, their centres being dimensioned on the drawing,
 * and a rabbet and the tongue it leaves on one edge or end share a row, as they are one cut.
 */
export function cutRows(part: Part, units: DrawingUnits): string[][] {
  const byFace = (type: Feature['type']) => new Map(part.features.filter((f) => f.type === type).map((f) => [f.face, f]));
  const rabbets = byFace('rabbet');
  const tongues = byFace('tongue');
  const oneOnFace = (f: Feature) => part.features.filter((g) => g.face === f.face && g.type === f.type).length === 1;
  // The rabbet each tongue is left by: the only rabbet and the only tongue on that face.
  const pairs = new Map([...tongues].flatMap(([face, tongue]) => {
    const rabbet = rabbets.get(face);
    return rabbet && oneOnFace(rabbet) && oneOnFace(tongue) ? [[rabbet.id, tongue] as const] : [];
  }));
  const paired = new Set([...pairs.values()].map((t) => t.id));
  const holes = new Map<string, Feature[]>();
  for (const f of part.features) {
    if (f.type !== 'hole' && f.type !== 'slot') continue;
    const key = `${f.type}|${f.face}|${f.diameterMm}|${f.depthMm}|${f.type === 'slot' ? f.slotLengthMm : 0}|${f.label}`;
    holes.set(key, [...(holes.get(key) ?? []), f]);
  }
  const grouped = new Set([...holes.values()].filter((g) => g.length >= HOLE_GROUP_MIN).flatMap((g) => g.map((f) => f.id)));
  const rows: string[][] = [];
  for (const f of part.features) {
    if (paired.has(f.id)) continue;
    const tongue = pairs.get(f.id);
    if (tongue && tongue.type === 'tongue') {
      // The rabbet's own note says it leaves the tongue; the row says so already.
      rows.push(['Rabbet and tongue', featureFaceText(f), `rabbet ${featureSizeText(f, units)}, leaving a tongue ${lengthText(tongue.lengthMm, units)} long × ${lengthText(tongue.thicknessMm, units)} thick`, `${tongue.label}; ${f.label.replace(/, leaving the tongue$/, '')}`]);
      continue;
    }
    if (!grouped.has(f.id)) {
      rows.push([featureKindText(f), featureFaceText(f), featureSizeText(f, units), f.label]);
      continue;
    }
    const group = [...holes.values()].find((g) => g[0] === f);
    if (!group) continue;
    if (f.type === 'slot') rows.push([`Slots (${group.length})`, featureFaceText(f), `${lengthText(f.diameterMm, units)} wide × ${lengthText(f.slotLengthMm, units)} long (along the ${f.along}), ${lengthText(f.depthMm, units)} deep; centres as dimensioned on the drawing`, f.label]);
    else if (f.type === 'hole') rows.push([`Holes (${group.length})`, featureFaceText(f), `${lengthText(f.diameterMm, units)} diameter × ${lengthText(f.depthMm, units)} deep; centres as dimensioned on the drawing`, f.label]);
  }
  return mergeLikeRows(rows);
}

/**
 * Rows alike but for where the cut is, on two edges, ends or faces of one kind, as one row:
 * `edges A and B`. A panel's two long edges, rabbeted alike, are then one line of the table.
 */
function mergeLikeRows(rows: readonly string[][]): string[][] {
  const out: string[][] = [];
  const taken = new Set<number>();
  rows.forEach((row, i) => {
    if (taken.has(i)) return;
    const [kind, letter] = row[1]!.split(' ');
    const twin = rows.findIndex((r, j) => j > i && !taken.has(j) && r[0] === row[0] && r[2] === row[2] && r[3] === row[3] && r[1]!.split(' ')[0] === kind);
    if (twin < 0 || letter === undefined) return out.push(row);
    taken.add(twin);
    out.push([row[0]!, `${kind}s ${letter} and ${rows[twin]![1]!.split(' ')[1]}`, row[2]!, row[3]!]);
  });
  return out;
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

/** Average advance of the cut table's sans text (7.5 pt), mm: a little over half an em, to err on room. */
const TABLE_CHAR_MM = 1.5;
/** Height each further line of a wrapped cell adds to its row, mm (7.5 pt at 1.15 leading). */
const TABLE_LINE_MM = 3.1;
/** Padding either side of a cell's text, mm. */
const TABLE_CELL_PAD_MM = 2;

/**
 * Height the cut table `rows` (under `head`) needs at `widthMm`, mm. The table gives each column
 * a width in proportion to its longest text, so a cell wraps onto as many lines as its text
 * is longer than that share.
 */
function tableNeedMm(head: readonly string[], rows: readonly (readonly string[])[], widthMm: number): number {
  if (!rows.length) return 0;
  const longest = head.map((h, c) => Math.max(h.length, ...rows.map((r) => (r[c] ?? '').length)));
  const total = longest.reduce((a, b) => a + b, 0);
  const textW = Math.max(10, widthMm - head.length * TABLE_CELL_PAD_MM);
  const lines = (row: readonly string[]): number => Math.max(1, ...row.map((cell, c) => {
    const colW = Math.max(8, (textW * longest[c]!) / total);
    return Math.ceil((cell.length * TABLE_CHAR_MM) / colW);
  }));
  return TABLE_EXTRA_MM + rows.reduce((h, r) => h + TABLE_ROW_MM + (lines(r) - 1) * TABLE_LINE_MM, 0);
}

/** A page layout: the views placed and where the cut table flows. */
interface PageLayout {
  views: PlacedView[];
  flowArea: Rect;
  scale: number;
  /** The whole cut table fits the page, none continued on another. */
  whole: boolean;
}

/** The cut table: its header and rows, for estimating the room it takes. */
interface CutTable {
  head: readonly string[];
  rows: readonly (readonly string[])[];
}

/**
 * Lays the page out in the ways that can work — table under the views (whole, or only its
 * start with the rest continued); views on the left with the details and the table in a column
 * beside them; or views and details side by side with the table under both — and keeps the one
 * that draws the part largest, except that a layout holding the whole table wins over one a
 * usual scale larger that continues it on another sheet. On a tie the first tried wins.
 */
function layoutPage(part: Part, units: DrawingUnits, area: Rect, table: CutTable, joints: readonly JointDetail[]): PageLayout {
  const marks = joints.map((d) => d.mark);
  const top = area.y + HEADING_MM;
  const fullH = area.y + area.h - top;
  const need = (w: number): number => tableNeedMm(table.head, table.rows, w);
  const flowNeed = need(area.w);
  const tableStart = flowNeed ? Math.min(flowNeed, TABLE_EXTRA_MM + 2 * TABLE_ROW_MM) : 0;
  const row = detailBlock(joints, area.w);
  const rowH = row ? row.frame.h + VIEW_GAP_MM : 0;
  const options: PageLayout[] = [];
  const push = (views: PlacedView[], flowArea: Rect, scale: number, flowW: number): void => {
    options.push({ views, flowArea, scale, whole: flowArea.h >= need(flowW) - 0.5 });
  };

  const under = (viewsH: number): void => {
    const laid = partViewsFitting(part, units, { w: area.w, h: viewsH }, marks);
    if (!laid) return;
    const views = centreIn(laid.views, laid.frame, { x: area.x, y: top, w: area.w, h: viewsH }, true);
    const used = rectUnion(views.map((v) => v.frame));
    const details = row ? moved(row.views, row.frame, used.x, used.y + used.h + VIEW_GAP_MM) : [];
    const bottom = rectUnion([...views, ...details].map((v) => v.frame));
    const flowTop = bottom.y + bottom.h + 4;
    push([...views, ...details], { x: area.x, y: flowTop, w: area.w, h: area.y + area.h - flowTop }, laid.scale, area.w);
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
    const flowW = area.x + area.w - columnX;
    push([...views, ...details], { x: columnX, y: flowTop, w: flowW, h: area.y + area.h - flowTop }, laid.scale, flowW);
  };
  const detailsBeside = (columnW: number): void => {
    const column = detailBlock(joints, columnW);
    const viewsH = fullH - flowNeed;
    if (!column || column.frame.h > viewsH) return;
    const laid = partViewsFitting(part, units, { w: area.w - columnW - VIEW_GAP_MM, h: viewsH }, marks);
    if (!laid) return;
    const views = moved(laid.views, laid.frame, area.x, top);
    const details = moved(column.views, column.frame, area.x + laid.frame.w + VIEW_GAP_MM, top);
    const bottom = rectUnion([...views, ...details].map((v) => v.frame));
    const flowTop = bottom.y + bottom.h + 4;
    push([...views, ...details], { x: area.x, y: flowTop, w: area.w, h: area.y + area.h - flowTop }, laid.scale, area.w);
  };

  under(Math.max(fullH * PART_VIEWS_MIN_SHARE, fullH - flowNeed) - rowH);
  if (flowNeed > 0 || joints.length) {
    const widths = joints.map((d) => layoutView(d.view, d.scale, scaleText(d.scale)).frame.w).sort((x, y) => y - x);
    const oneAcross = Math.max(SIDE_TABLE_MIN_MM, widths[0] ?? 0);
    const twoAcross = Math.max(SIDE_TABLE_MIN_MM, (widths[0] ?? 0) + (widths[1] ?? 0) + VIEW_GAP_MM);
    for (const w of new Set([oneAcross, twoAcross])) if (w <= area.w * 0.5) beside(w);
    if (widths.length) for (const w of new Set([widths[0]!, (widths[0] ?? 0) + (widths[1] ?? 0) + VIEW_GAP_MM])) if (w <= area.w * 0.5) detailsBeside(w);
  }
  under(fullH - rowH - tableStart);
  if (options.length) {
    const scales = usualScales(units);
    const rank = (o: PageLayout): number => scales.indexOf(o.scale);
    const best = options.reduce((b, o) => (o.scale < b.scale ? o : b));
    const wholes = options.filter((o) => o.whole);
    const bestWhole = wholes.length ? wholes.reduce((b, o) => (o.scale < b.scale ? o : b)) : null;
    return bestWhole && rank(bestWhole) - rank(best) <= 1 ? bestWhole : best;
  }
  // Nothing fits with the table: the views and details take the page; the table follows on the next.
  const laid = partViewsFitting(part, units, { w: area.w, h: fullH - rowH }, marks) ?? partViewsSmallest(part, units, marks);
  const views = centreIn(laid.views, laid.frame, { x: area.x, y: top, w: area.w, h: fullH }, true);
  const used = rectUnion(views.map((v) => v.frame));
  const details = row ? moved(row.views, row.frame, used.x, used.y + used.h + VIEW_GAP_MM) : [];
  const bottom = rectUnion([...views, ...details].map((v) => v.frame));
  const flowTop = bottom.y + bottom.h + 4;
  return { views: [...views, ...details], flowArea: { x: area.x, y: flowTop, w: area.w, h: area.y + area.h - flowTop }, scale: laid.scale, whole: false };
}

/** The drawing sheet of `part`, lettered `letter`. */
export function partSheet(part: Part, letter: string, spec: SheetSpec, units: DrawingUnits): Omit<Sheet, 'number'> {
  const area = drawingArea(spec);
  const rows = cutRows(part, units);
  const table: CutTable = { head: TABLE_HEAD, rows };
  // First without details, to learn the part's scale; then the cuts too small at that scale get
  // details. Details take room, so the scale may then drop: once more with the cuts too small at it.
  const plain = layoutPage(part, units, area, table, []);
  const scalesOf = (page: PageLayout): Record<'face' | 'edge' | 'end', number> => {
    const of = (id: string) => page.views.find((v) => v.id === id)?.scale ?? page.scale;
    return { face: of('face'), edge: of('edge'), end: of('end') };
  };
  let details = jointDetails(part, units, scalesOf(plain));
  let page = details.length ? layoutPage(part, units, area, table, details) : plain;
  if (details.length) {
    const again = jointDetails(part, units, scalesOf(page));
    if (again.length !== details.length) {
      details = again;
      page = layoutPage(part, units, area, table, details);
    }
  }

  const material = part.material.kind === 'solid' ? part.material.speciesName : part.material.sheetName;
  const grain = part.grain === 'length' ? 'grain along the length' : part.grain === 'width' ? 'grain across the width' : 'sheet good';
  const key = 'Faces A/B: broad faces; edges A/B: long edges; ends A/B: ends, end A at the left of the face view; offsets from the A side.';
  // Notes and the key to face names go under the heading, so the page never spills a line onto another.
  const heading: Label[] = [
    { type: 'label', at: [area.x, area.y + 5], text: `${letter}  ${part.name}`, sizePt: 13, anchor: 'start', font: 'sans', bold: true },
    { type: 'label', at: [area.x, area.y + 10.5], text: `${part.quantity} off   finished ${partSizeText(part, units)}   ${material}, ${grain}${part.glueUp ? `, glued up from ${part.glueUp.boards} boards` : ''}`, sizePt: 8.5, anchor: 'start', font: 'mono' },
    { type: 'label', at: [area.x, area.y + 14.5], text: part.notes.length ? `Notes: ${part.notes.map((n) => n.replace(/\.$/, '')).join('; ')}.  ${key}` : key, sizePt: 6.5, anchor: 'start', font: 'sans' },
  ];
  const flow: FlowBlock[] = rows.length ? [{ type: 'table', title: 'Cuts on this part', head: TABLE_HEAD, rows, numericColumns: [] }] : [];
  const { widthMm, heightMm } = sheetSizeMm(spec);
  return { name: `Part ${letter}: ${part.name}`, widthMm, heightMm, views: page.views, flow, primitives: heading, flowArea: page.flowArea };
}
