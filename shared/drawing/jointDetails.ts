/**
 * Enlarged joint details. A groove, dado, rabbet or tongue a few millimetres across is under
 * 5 mm on paper at the scale a whole part is drawn, too small to read or to hold its own
 * dimensions; it gets a detail: a window of the view that shows its cross-section, drawn at a
 * large scale (1:1 or 1:2) with its sizes and shoulders dimensioned, and a numbered circle on
 * the part's view where it is taken from. Like cuts (sizes equal to 0.1 mm) share one detail.
 */
import type { Box3, Feature, Part } from '../engine/types.ts';
import { dimension } from './chain.ts';
import { featureKindText } from './featureText.ts';
import type { DrawingUnits } from './lengthText.ts';
import { chooseFaceUp, inPlane, NORMAL, onAxis, partSize, partViewAxes, viewShowing, type FaceUp, type PartViewId } from './partFrame.ts';
import { partEdges, partGrid } from './partSolid.ts';
import { inflate, rectsOverlap, rectUnion } from './rects.ts';
import { usualScales } from './scale.ts';
import { capHeightMm, textWidthMm } from './textMetrics.ts';
import type { DimensionRequest, ModelView, Primitive, Pt, Rect, Segment } from './types.ts';

/** A cut whose smallest size is under this on paper gets a detail, mm. */
export const DETAIL_MIN_PAPER_MM = 5;
/** Most details on one part sheet: the smallest cuts first. */
export const MAX_DETAILS = 3;
const EPS = 0.01;

/** Where a detail is taken from: a circle and its number on one of the part's views (view mm). */
export interface DetailMark {
  view: PartViewId;
  at: Pt;
  radius: number;
  text: string;
}

/** A detail to draw: its view in model space, its scale (1:n) and its mark on the part's view. */
export interface JointDetail {
  view: ModelView;
  scale: number;
  mark: DetailMark;
}

/** The cross-section of a cut: the view it shows in, the box it spans, and the sizes to dimension. */
interface Section {
  view: PartViewId;
  box: Box3;
  /** [local axis, from, to, tier]: tier 0 the cut's own sizes, 1 its shoulders or offsets. */
  sizes: [number, number, number, number][];
  smallest: number;
  key: string;
}

function extent(b: Box3, axis: number): number {
  return b.max[axis]! - b.min[axis]!;
}

function sectionOf(f: Feature, size: readonly [number, number, number]): Section | null {
  const n = NORMAL[f.face];
  const sizes: Section['sizes'] = [];
  const edges = (axis: number, b: Box3, tier: number) => {
    if (b.min[axis]! > EPS) sizes.push([axis, 0, b.min[axis]!, tier]);
    if (b.max[axis]! < size[axis]! - EPS) sizes.push([axis, b.max[axis]!, size[axis]!, tier]);
  };
  switch (f.type) {
    case 'groove':
    case 'stopped-groove':
    case 'dado': {
      const m = f.removed[0];
      if (!m) return null;
      const [p, q] = inPlane(n);
      const across = extent(m, p) >= extent(m, q) ? q : p;
      sizes.push([across, m.min[across]!, m.max[across]!, 0], [n, m.min[n]!, m.max[n]!, 0]);
      edges(across, m, 1);
      // Offsets are not part of the key: like grooves at different places share a detail of their section.
      return { view: viewShowing(across, n), box: m, sizes, smallest: Math.min(f.widthMm, f.depthMm), key: `${f.type}|${f.face}|${f.widthMm.toFixed(1)}|${f.depthMm.toFixed(1)}` };
    }
    case 'rabbet': {
      const m = f.removed[0];
      if (!m) return null;
      const depthAxis = n === 2 ? 1 : 2;
      sizes.push([n, m.min[n]!, m.max[n]!, 0], [depthAxis, m.min[depthAxis]!, m.max[depthAxis]!, 0]);
      return { view: viewShowing(n, depthAxis), box: m, sizes, smallest: Math.min(f.widthMm, f.depthMm), key: `rabbet|${f.widthMm.toFixed(1)}|${f.depthMm.toFixed(1)}` };
    }
    case 'tongue': {
      const t = f.tongue;
      const thick = n === 2 ? 1 : 2;
      sizes.push([n, t.min[n]!, t.max[n]!, 0], [thick, t.min[thick]!, t.max[thick]!, 0]);
      edges(thick, t, 1);
      return { view: viewShowing(n, thick), box: t, sizes, smallest: Math.min(f.lengthMm, f.thicknessMm), key: `tongue|${f.lengthMm.toFixed(1)}|${f.thicknessMm.toFixed(1)}|${t.min[thick]!.toFixed(1)}` };
    }
    default:
      return null;
  }
}

interface Found {
  section: Section;
  f: Feature;
  count: number;
}

/** Whether two boxes overlap or touch, seen along `toward` (the two axes a view shows). */
function touchInView(a: Box3, b: Box3, axes: readonly number[]): boolean {
  return axes.every((k) => a.min[k]! <= b.max[k]! + EPS && b.min[k]! <= a.max[k]! + EPS);
}

/**
 * Cuts whose sections touch in the view they show in — a rabbet and the tongue it leaves, a
 * groove and a rabbet beside it — are one joint to a maker: one detail draws them together with
 * all their sizes, titled with both.
 */
function joinTouching(found: readonly Found[], axes: ReturnType<typeof partViewAxes>): { section: Section; title: string }[] {
  const groups: Found[][] = [];
  for (const item of found) {
    const { view, box } = item.section;
    const inView = [axes[view].u.axis, axes[view].v.axis];
    const group = groups.find((g) => g[0]!.section.view === view && g.some((o) => touchInView(o.section.box, box, inView)));
    if (group) group.push(item);
    else groups.push([item]);
  }
  return groups.map((g) => {
    const first = g[0]!.section;
    const box: Box3 = {
      min: [0, 1, 2].map((k) => Math.min(...g.map((o) => o.section.box.min[k]!))) as unknown as Box3['min'],
      max: [0, 1, 2].map((k) => Math.max(...g.map((o) => o.section.box.max[k]!))) as unknown as Box3['max'],
    };
    const seen = new Set<string>();
    const sizes = g.flatMap((o) => o.section.sizes).filter(([axis, a, b]) => {
      const key = `${axis}|${a.toFixed(2)}|${b.toFixed(2)}`;
      if (seen.has(key)) return false;
      seen.add(key);
      return true;
    });
    const counts = new Set(g.map((o) => o.count));
    const names = [...new Set(g.map((o) => featureKindText(o.f).toLowerCase()))].join(' and ');
    const alike = counts.size === 1 && g[0]!.count > 1 ? `, ${g[0]!.count} alike` : '';
    return { section: { ...first, box, sizes, smallest: Math.min(...g.map((o) => o.section.smallest)) }, title: `${names}${alike}` };
  });
}

/** The scale (1:n) that draws `smallest` mm at 5 mm or more, as small a drawing as does; 1:1 at most. */
function detailScale(smallest: number, units: DrawingUnits): number {
  const fitting = usualScales(units).filter((s) => smallest / s >= DETAIL_MIN_PAPER_MM);
  return fitting.length ? fitting[fitting.length - 1]! : 1;
}

/** Clips segment `s` to `r` (Liang–Barsky); null when nothing is left. */
function clip(s: Segment, r: Rect): Segment | null {
  const [x0, y0] = s.a;
  const dx = s.b[0] - x0;
  const dy = s.b[1] - y0;
  let t0 = 0;
  let t1 = 1;
  for (const [p, q] of [[-dx, x0 - r.x], [dx, r.x + r.w - x0], [-dy, y0 - r.y], [dy, r.y + r.h - y0]] as const) {
    if (Math.abs(p) < 1e-12) {
      if (q < 0) return null;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
  }
  if (t0 > t1 + 1e-12) return null;
  return { ...s, a: [x0 + t0 * dx, y0 + t0 * dy], b: [x0 + t1 * dx, y0 + t1 * dy] };
}

/**
 * The details `part` needs when its face, edge and end views are drawn at `viewScales` (1:n):
 * one per distinct cut (kind and sizes) under 5 mm on paper in the view that shows its
 * cross-section, smallest first, at most {@link MAX_DETAILS}, numbered from 1.
 */
export function jointDetails(part: Part, units: DrawingUnits, viewScales: Readonly<Record<PartViewId, number>>, up: FaceUp = chooseFaceUp(part)): JointDetail[] {
  const size = partSize(part);
  const sections = new Map<string, Found>();
  for (const f of part.features) {
    const section = sectionOf(f, size);
    if (!section || section.smallest / viewScales[section.view] >= DETAIL_MIN_PAPER_MM) continue;
    const seen = sections.get(section.key);
    if (!seen) sections.set(section.key, { section, f, count: 1 });
    else {
      seen.count++;
      // Alike cuts at different offsets: the detail shows their section; where each is, the part's views say.
      const offsets = (x: Section) => JSON.stringify(x.sizes.filter((z) => z[3] === 1).map((z) => z.map((v) => v.toFixed(1))));
      if (offsets(seen.section) !== offsets(section)) seen.section = { ...seen.section, sizes: seen.section.sizes.filter((z) => z[3] === 0) };
    }
  }
  const chosen = joinTouching([...sections.values()].sort((a, b) => a.section.smallest - b.section.smallest), partViewAxes(up)).slice(0, MAX_DETAILS);
  const axesOf = partViewAxes(up);
  const grid = chosen.length ? partGrid(part) : null;
  return chosen.map(({ section, title: what }, i): JointDetail => {
    const va = axesOf[section.view];
    const [ua, vaAxis] = [va.u.axis, va.v.axis];
    const margin = Math.max(6, 0.8 * Math.max(extent(section.box, ua), extent(section.box, vaAxis)));
    const lo = (axis: number) => Math.max(0, section.box.min[axis]! - margin);
    const hi = (axis: number) => Math.min(size[axis]!, section.box.max[axis]! + margin);
    const span = (use: typeof va.u, a: number, b: number): [number, number] => {
      const p = onAxis(use, size, a);
      const q = onAxis(use, size, b);
      return [Math.min(p, q), Math.max(p, q)];
    };
    const [u0, u1] = span(va.u, lo(ua), hi(ua));
    const [v0, v1] = span(va.v, lo(vaAxis), hi(vaAxis));
    const window: Rect = { x: u0, y: v0, w: u1 - u0, h: v1 - v0 };
    const primitives: Primitive[] = partEdges(part, va, grid!).flatMap((s) => clip(s, window) ?? []);
    // Where the window cuts through wood, a thin line says the part goes on.
    const [pu, pv] = [size[ua]!, size[vaAxis]!];
    if (u0 > EPS) primitives.push({ type: 'segment', a: [u0, v0], b: [u0, v1], kind: 'thin' });
    if (u1 < pu - EPS) primitives.push({ type: 'segment', a: [u1, v0], b: [u1, v1], kind: 'thin' });
    if (v0 > EPS) primitives.push({ type: 'segment', a: [u0, v0], b: [u1, v0], kind: 'thin' });
    if (v1 < pv - EPS) primitives.push({ type: 'segment', a: [u0, v1], b: [u1, v1], kind: 'thin' });

    const [bu0, bu1] = span(va.u, section.box.min[ua]!, section.box.max[ua]!);
    const [bv0, bv1] = span(va.v, section.box.min[vaAxis]!, section.box.max[vaAxis]!);
    const dimensions: DimensionRequest[] = section.sizes.flatMap(([axis, a, b, tier]): DimensionRequest[] => {
      // A shoulder or offset running out of the window is left to the part's own views.
      if (a < lo(axis) - EPS || b > hi(axis) + EPS) return [];
      const horizontal = axis === ua;
      const [p, q] = span(horizontal ? va.u : va.v, a, b);
      if (horizontal) return [dimension(p, q, tier === 0 ? bv1 : bv0, 'h', tier === 0 ? 'above' : 'below', tier, units)];
      return [dimension(p, q, tier === 0 ? bu0 : bu1, 'v', tier === 0 ? 'left' : 'right', tier, units)];
    });
    const number = String(i + 1);
    const title = `Detail ${number}: ${what}`;
    // At least 3 mm on paper, so the circle shows round a cut the main scale makes tiny.
    const radius = Math.max(Math.max(window.w, window.h) * 0.6, 3 * viewScales[section.view]);
    return {
      view: { id: `detail-${number}`, title, primitives, dimensions, callouts: [], bounds: window },
      scale: detailScale(section.smallest, units),
      mark: { view: section.view, at: [(bu0 + bu1) / 2, (bv0 + bv1) / 2], radius, text: number },
    };
  });
}

/** Size of a mark's number, pt. */
const MARK_TEXT_PT = 8;
/** Clear paper kept between two marks, mm. */
const MARK_GAP_MM = 1;

/** Where a mark's number sits: beyond the circle's upper right, on paper as in the model (y up). */
function markLabelAt(mark: DetailMark): Pt {
  return [mark.at[0] + mark.radius * 0.75, mark.at[1] + mark.radius * 0.75];
}

/**
 * What a mark covers on its view when drawn at 1:`scale`, model mm (y up): its circle and its
 * number, whose size is fixed on paper and so grows in model mm as the scale gets smaller.
 */
export function markExtent(mark: DetailMark, scale: number): Rect {
  const [lx, ly] = markLabelAt(mark);
  const circle: Rect = { x: mark.at[0] - mark.radius, y: mark.at[1] - mark.radius, w: 2 * mark.radius, h: 2 * mark.radius };
  const label: Rect = { x: lx, y: ly, w: textWidthMm(mark.text, MARK_TEXT_PT) * scale, h: capHeightMm(MARK_TEXT_PT) * scale };
  return rectUnion([circle, label]);
}

/** One circle round the circles of `group`, numbered with all their numbers. */
function mergedMark(group: readonly DetailMark[]): DetailMark {
  const box = rectUnion(group.map((m) => ({ x: m.at[0] - m.radius, y: m.at[1] - m.radius, w: 2 * m.radius, h: 2 * m.radius })));
  const at: Pt = [box.x + box.w / 2, box.y + box.h / 2];
  const radius = Math.max(...group.map((m) => Math.hypot(m.at[0] - at[0], m.at[1] - at[1]) + m.radius));
  const numbers = group.flatMap((m) => m.text.split(', ')).sort((a, b) => Number(a) - Number(b));
  return { view: group[0]!.view, at, radius, text: numbers.join(', ') };
}

/**
 * Marks as drawn on views at `scales` (1:n): marks whose circles or numbers would touch (two
 * cuts at one place, e.g. a rabbet and the tongue it leaves) become one circle round both,
 * numbered `1, 3`, and so on until no two marks on a view touch.
 */
export function mergeMarks(marks: readonly DetailMark[], scales: Readonly<Record<PartViewId, number>>): DetailMark[] {
  let out = [...marks];
  for (;;) {
    const clash = out.flatMap((a, i) => out.slice(i + 1).map((b) => [a, b] as const)).find(([a, b]) => {
      if (a.view !== b.view) return false;
      const gap = MARK_GAP_MM * scales[a.view];
      return rectsOverlap(inflate(markExtent(a, scales[a.view]), gap / 2), inflate(markExtent(b, scales[b.view]), gap / 2));
    });
    if (!clash) return out;
    out = [...out.filter((m) => m !== clash[0] && m !== clash[1]), mergedMark(clash)];
  }
}

/** A detail's mark on the part view: a pencil-red circle and its number (view mm). */
export function markPrimitives(mark: DetailMark): Primitive[] {
  return [
    { type: 'circle', centre: mark.at, radius: mark.radius, kind: 'accent' },
    { type: 'label', at: markLabelAt(mark), text: mark.text, sizePt: MARK_TEXT_PT, anchor: 'start', font: 'sans', bold: true, accent: true },
  ];
}
