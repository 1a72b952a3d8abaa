/**
 * The three views of one part with every cut dimensioned: sizes of a cut (groove width and
 * depth, tongue length and thickness, rabbet width and depth, notch and recess sizes, slot
 * lengths) nearest the part, their positions (offsets, where a stopped groove starts and stops)
 * next, and the part's finished length, width and thickness outermost.
 */
import type { Box3, Feature, Part } from '../engine/types.ts';
import { applyBreaks, chooseBreaks } from './breakView.ts';
import { dimension } from './chain.ts';
import { markPrimitives, type DetailMark } from './jointDetails.ts';
import { lengthText, type DrawingUnits } from './lengthText.ts';
import { chooseFaceUp, inPlane, NORMAL, onAxis, partSize, partViewAxes, viewShowing, type FaceUp, type PartViewAxes, type PartViewId } from './partFrame.ts';
import { partEdges, partGrid } from './partSolid.ts';
import type { DimensionRequest, ModelView, Primitive, Pt, ViewNote } from './types.ts';

const EPS = 0.01;
/** A cut whose middle lies in this lower share of the view (clearly not centred) is dimensioned below it. */
const NEAR_LOW_SHARE = 0.35;
const TITLES: Readonly<Record<PartViewId, string>> = { face: 'Face', edge: 'Edge', end: 'End' };


class DimensionSet {
  readonly byView: Record<PartViewId, DimensionRequest[]> = { face: [], edge: [], end: [] };
  private readonly seen = new Set<string>();

  constructor(
    private readonly axes: Readonly<Record<PartViewId, PartViewAxes>>,
    private readonly size: readonly [number, number, number],
    private readonly units: DrawingUnits,
  ) {}

  /**
   * Dimensions `lo`–`hi` along local `axis` in the view that also shows `other`, with the
   * extension lines starting at the near side of `ref` (a local box).
   */
  add(axis: number, other: number, lo: number, hi: number, ref: Box3, tier: number, extra: { key?: string; overall?: boolean; note?: string } = {}): void {
    if (hi - lo < EPS) return;
    const view = viewShowing(axis, other);
    const va = this.axes[view];
    const horizontal = va.u.axis === axis;
    const use = horizontal ? va.u : va.v;
    const across = horizontal ? va.v : va.u;
    const a = onAxis(use, this.size, lo);
    const b = onAxis(use, this.size, hi);
    const r0 = onAxis(across, this.size, ref.min[across.axis]!);
    const r1 = onAxis(across, this.size, ref.max[across.axis]!);
    // A cut's sizes along the length go above or below the face or edge view, whichever is nearer the cut, so
    // their extension lines do not cross the part; sizes across it stay on the left, keeping the
    // view narrow; overall sizes below and to the right.
    // The end view stands beside the face view, tops level: its sizes stay above so it grows no taller.
    const low = view !== 'end' && (r0 + r1) / 2 < NEAR_LOW_SHARE * this.size[across.axis]!;
    const side: DimensionRequest['side'] = extra.overall ? (horizontal ? 'below' : 'right') : horizontal ? (low ? 'below' : 'above') : 'left';
    const at = side === 'below' || side === 'left' ? Math.min(r0, r1) : Math.max(r0, r1);
    const key = `${view}|${horizontal}|${Math.min(a, b).toFixed(2)}|${Math.max(a, b).toFixed(2)}`;
    if (this.seen.has(key)) return;
    this.seen.add(key);
    this.byView[view].push(dimension(Math.min(a, b), Math.max(a, b), at, horizontal ? 'h' : 'v', side, tier, this.units, { ...(extra.key ? { key: extra.key } : {}), ...(extra.note ? { note: extra.note } : {}) }));
  }

  /** A chain of positions along `axis` from the part's low end through `marks` to its high end. */
  chain(axis: number, other: number, marks: readonly number[], ref: Box3, tier: number): void {
    const s = [0, ...marks, this.size[axis]!].sort((p, q) => p - q);
    for (let i = 0; i + 1 < s.length; i++) this.add(axis, other, s[i]!, s[i + 1]!, ref, tier);
  }
}


function extentOf(box: Box3, axis: number): number {
  return box.max[axis]! - box.min[axis]!;
}

function addFeatureDimensions(f: Feature, size: readonly [number, number, number], dims: DimensionSet): void {
  const n = NORMAL[f.face];
  const m = f.removed[0];
  switch (f.type) {
    case 'groove':
    case 'stopped-groove':
    case 'dado': {
      if (!m) return;
      const [p, q] = inPlane(n);
      const run = extentOf(m, p) >= extentOf(m, q) ? p : q;
      const across = run === p ? q : p;
      dims.add(across, n, m.min[across]!, m.max[across]!, m, 0);
      dims.add(n, across, m.min[n]!, m.max[n]!, m, 0);
      dims.chain(across, n, [m.min[across]!, m.max[across]!], m, 1);
      if (m.min[run]! > EPS || m.max[run]! < size[run]! - EPS) dims.chain(run, across, [m.min[run]!, m.max[run]!], m, 1);
      return;
    }
    case 'tongue': {
      const t = f.tongue;
      const thick = n === 2 ? 1 : 2;
      const along = [0, 1, 2].find((a) => a !== n && a !== thick)!;
      dims.add(n, thick, t.min[n]!, t.max[n]!, t, 0);
      dims.add(thick, n, t.min[thick]!, t.max[thick]!, t, 0);
      dims.chain(thick, n, [t.min[thick]!, t.max[thick]!], t, 1);
      if (t.max[along]! - t.min[along]! < size[along]! - EPS) dims.chain(along, n, [t.min[along]!, t.max[along]!], t, 1);
      return;
    }
    case 'rabbet': {
      if (!m) return;
      const depthAxis = n === 2 ? 1 : 2;
      const run = [0, 1, 2].find((a) => a !== n && a !== depthAxis)!;
      dims.add(n, depthAxis, m.min[n]!, m.max[n]!, m, 0);
      dims.add(depthAxis, n, m.min[depthAxis]!, m.max[depthAxis]!, m, 0);
      if (m.min[run]! > EPS || m.max[run]! < size[run]! - EPS) dims.chain(run, n, [m.min[run]!, m.max[run]!], m, 1);
      return;
    }
    case 'notch':
    case 'recess':
    case 'mortise': {
      if (!m) return;
      const [p, q] = inPlane(n);
      dims.add(p, q, m.min[p]!, m.max[p]!, m, 0);
      dims.add(q, p, m.min[q]!, m.max[q]!, m, 0);
      dims.chain(p, q, [m.min[p]!, m.max[p]!], m, 1);
      dims.chain(q, p, [m.min[q]!, m.max[q]!], m, 1);
      if (m.min[n]! > EPS || m.max[n]! < size[n]! - EPS) dims.add(n, p, m.min[n]!, m.max[n]!, m, 0);
      return;
    }
    case 'hole':
    case 'slot': {
      if (!m) return;
      const [p, q] = inPlane(n);
      const cp = (m.min[p]! + m.max[p]!) / 2;
      const cq = (m.min[q]! + m.max[q]!) / 2;
      const lo: [number, number, number] = [m.min[0], m.min[1], m.min[2]];
      const hi: [number, number, number] = [m.max[0], m.max[1], m.max[2]];
      lo[p] = hi[p] = cp;
      lo[q] = hi[q] = cq;
      const centre: Box3 = { min: lo, max: hi };
      dims.add(p, q, 0, cp, centre, 1);
      dims.add(q, p, 0, cq, centre, 1);
      if (f.type === 'slot') {
        const runAxis = f.along === 'length' ? 0 : 1;
        const c = runAxis === p ? cp : cq;
        dims.add(runAxis, runAxis === p ? q : p, c - f.slotLengthMm / 2, c + f.slotLengthMm / 2, m, 0);
      }
      return;
    }
  }
}

/** Fewest holes in a row that are dimensioned as a line (first centre and spacing) rather than one by one. */
const HOLE_LINE_MIN = 3;
/** Spacings within this (mm) count as equal. */
const SPACING_TOLERANCE_MM = 0.05;

type Hole = Extract<Feature, { type: 'hole' | 'slot' }>;

/** A hole's centre in the part's frame and the in-plane axes of its face. */
function holeCentre(f: Hole): { p: number; q: number; c: number[] } | null {
  const m = f.removed[0];
  if (!m) return null;
  const [p, q] = inPlane(NORMAL[f.face]);
  return { p, q, c: [0, 1, 2].map((a) => (m.min[a]! + m.max[a]!) / 2) };
}

/**
 * Rows of like holes or slots evenly spaced along one axis (shelf-pin lines, screw slots): each is dimensioned by its
 * offset from the edge, its first centre from the end and one spacing with the count of spaces,
 * instead of a dimension per hole. Returns the lines' dimensions added and the ids of their holes.
 */
function addHoleLines(features: readonly Feature[], size: readonly [number, number, number], dims: DimensionSet): Set<string> {
  const rows = new Map<string, { along: number; across: number; c: number[]; f: Hole }[]>();
  for (const f of features) {
    if (f.type !== 'hole' && f.type !== 'slot') continue;
    const centre = holeCentre(f);
    if (!centre) continue;
    // A row runs along either in-plane axis; group by the other coordinate.
    for (const [along, across] of [[centre.p, centre.q], [centre.q, centre.p]] as const) {
      const slot = f.type === 'slot' ? `${f.slotLengthMm.toFixed(2)}|${f.along}` : 'hole';
      const key = `${f.face}|${slot}|${f.diameterMm.toFixed(2)}|${f.depthMm.toFixed(2)}|${along}|${centre.c[across]!.toFixed(2)}`;
      rows.set(key, [...(rows.get(key) ?? []), { along, across, c: centre.c, f }]);
    }
  }
  const done = new Set<string>();
  for (const row of [...rows.values()].sort((a, b) => b.length - a.length)) {
    const holes = row.filter((h) => !done.has(h.f.id)).sort((a, b) => a.c[a.along]! - b.c[b.along]!);
    if (holes.length < HOLE_LINE_MIN) continue;
    const { along, across } = holes[0]!;
    const at = holes.map((h) => h.c[along]!);
    const spacing = at[1]! - at[0]!;
    if (spacing < SPACING_TOLERANCE_MM || at.some((x, i) => i > 0 && Math.abs(x - at[i - 1]! - spacing) > SPACING_TOLERANCE_MM)) continue;
    const point = (c: readonly number[]): Box3 => ({ min: [c[0]!, c[1]!, c[2]!], max: [c[0]!, c[1]!, c[2]!] });
    const first = holes[0]!.c;
    dims.add(across, along, 0, first[across]!, point(first), 1);
    dims.add(along, across, 0, at[0]!, point(first), 1);
    dims.add(along, across, at[0]!, at[1]!, point(first), 0, { note: `${holes.length - 1} spaces @` });
    // A slot line also needs the slot's own length, once.
    if (holes[0]!.f.type === 'slot') addFeatureDimensions(holes[0]!.f, size, dims);
    for (const h of holes) done.add(h.f.id);
  }
  return done;
}

/**
 * Circles and slot outlines with centre lines, and a note of the size, for views that look onto
 * the hole's face; hidden lines for views that see it from the side.
 */
function holePrimitives(f: Feature, view: PartViewAxes, size: readonly [number, number, number], units: DrawingUnits): { primitives: Primitive[]; notes: ViewNote[] } {
  const none = { primitives: [], notes: [] };
  if (f.type !== 'hole' && f.type !== 'slot') return none;
  const m = f.removed[0];
  if (!m) return none;
  const n = NORMAL[f.face];
  const highFace = f.face.endsWith('-b');
  const map = (local: readonly number[]): Pt => [onAxis(view.u, size, local[view.u.axis]!), onAxis(view.v, size, local[view.v.axis]!)];
  const centreLocal = [0, 1, 2].map((a) => (m.min[a]! + m.max[a]!) / 2);
  const r = f.diameterMm / 2;
  const out: Primitive[] = [];
  if (view.toward.axis === n) {
    const seen = highFace !== view.toward.flip;
    const kind = seen ? 'visible' : 'hidden';
    const [cx, cy] = map(centreLocal);
    const half = f.type === 'slot' ? Math.max(0, f.slotLengthMm / 2 - r) : 0;
    const alongU = f.type === 'slot' && view.u.axis === (f.along === 'length' ? 0 : 1);
    const hu = alongU ? half : 0;
    const hv = alongU ? 0 : half;
    if (half === 0) out.push({ type: 'circle', centre: [cx, cy], radius: r, kind });
    else out.push({ type: 'polygon', points: obround(cx, cy, hu, hv, r), fill: null, kind });
    const arm = r + Math.max(3, r);
    out.push({ type: 'segment', a: [cx - hu - arm, cy], b: [cx + hu + arm, cy], kind: 'centre' });
    out.push({ type: 'segment', a: [cx, cy - hv - arm], b: [cx, cy + hv + arm], kind: 'centre' });
    const text = f.type === 'slot' ? `slot ${lengthText(f.diameterMm, units)} wide` : `${lengthText(f.diameterMm, units)} dia. × ${lengthText(f.depthMm, units)} deep`;
    return { primitives: out, notes: [{ text, target: { x: cx - hu - r, y: cy - hv - r, w: 2 * (hu + r), h: 2 * (hv + r) } }] };
  } else {
    // Seen from the side, a hole is two hidden lines as deep as it goes.
    const runAxis = f.type === 'slot' ? (f.along === 'length' ? 0 : 1) : null;
    const across = view.u.axis === n ? view.v : view.u;
    const half = runAxis === across.axis && f.type === 'slot' ? f.slotLengthMm / 2 : r;
    for (const s of [-1, 1]) {
      const a = [...centreLocal];
      const b = [...centreLocal];
      a[across.axis] = centreLocal[across.axis]! + s * half;
      b[across.axis] = a[across.axis]!;
      a[n] = m.min[n]!;
      b[n] = m.max[n]!;
      out.push({ type: 'segment', a: map(a), b: map(b), kind: 'hidden' });
    }
  }
  return { primitives: out, notes: [] };
}

function obround(cx: number, cy: number, hu: number, hv: number, r: number): Pt[] {
  const pts: Pt[] = [];
  const steps = 10;
  const horizontal = hu > 0;
  const ends: [number, number, number][] = horizontal ? [[cx + hu, cy, -Math.PI / 2], [cx - hu, cy, Math.PI / 2]] : [[cx, cy + hv, 0], [cx, cy - hv, Math.PI]];
  for (const [ex, ey, start] of ends) {
    for (let i = 0; i <= steps; i++) {
      const t = start + (Math.PI * i) / steps;
      pts.push([ex + r * Math.cos(t), ey + r * Math.sin(t)]);
    }
  }
  return pts;
}

/** Identical hole and slot notes are written once, at the first, with the count: `3× …`. */
function oneNoteEach(notes: readonly ViewNote[]): ViewNote[] {
  const counts = new Map<string, number>();
  for (const n of notes) counts.set(n.text, (counts.get(n.text) ?? 0) + 1);
  const done = new Set<string>();
  return notes.flatMap((n): ViewNote[] => {
    if (done.has(n.text)) return [];
    done.add(n.text);
    const count = counts.get(n.text) ?? 1;
    return [count > 1 ? { ...n, text: `${count}× ${n.text}` } : n];
  });
}

/** The three views of `part`, each with its dimensions and any detail `marks`, in model space (mm, y up). */
export function partViews(part: Part, units: DrawingUnits, up: FaceUp = chooseFaceUp(part), marks: readonly DetailMark[] = []): Record<PartViewId, ModelView> {
  const size = partSize(part);
  const axes = partViewAxes(up);
  const grid = partGrid(part);
  const dims = new DimensionSet(axes, size, units);
  const whole: Box3 = { min: [0, 0, 0], max: size };
  const inLines = addHoleLines(part.features, size, dims);
  for (const f of part.features) if (!inLines.has(f.id)) addFeatureDimensions(f, size, dims);
  dims.add(0, 1, 0, size[0], whole, 2, { key: 'length', overall: true });
  dims.add(1, 0, 0, size[1], whole, 2, { key: 'width', overall: true });
  dims.add(2, 0, 0, size[2], whole, 2, { key: 'thickness', overall: true });
  dims.add(2, 1, 0, size[2], whole, 2, { overall: true });

  const stationsX = [...grid.breaks[0], ...part.features.flatMap((f) => (f.type === 'hole' || f.type === 'slot' ? f.removed.flatMap((b) => [b.min[0], b.max[0]]) : []))];
  const cuts = chooseBreaks(size[0], Math.max(size[1], size[2]), stationsX);
  const out = {} as Record<PartViewId, ModelView>;
  for (const id of ['face', 'edge', 'end'] as const) {
    const va = axes[id];
    const holes = part.features.map((f) => holePrimitives(f, va, size, units));
    const primitives: Primitive[] = [
      ...partEdges(part, va, grid), ...holes.flatMap((h) => h.primitives),
      ...marks.filter((m) => m.view === id).flatMap(markPrimitives),
    ];
    const view: ModelView = {
      id, title: TITLES[id], primitives, dimensions: dims.byView[id], callouts: [], notes: oneNoteEach(holes.flatMap((h) => h.notes)),
      bounds: { x: 0, y: 0, w: size[va.u.axis], h: size[va.v.axis] },
    };
    // Face and edge views run along the length (u is local x), so a break shortens both alike.
    out[id] = va.u.axis === 0 ? applyBreaks(view, cuts) : view;
  }
  return out;
}
