/**
 * Conventional breaks for long parts: a long stretch with no cuts is left out of the face and
 * edge views, so a rail or leg can be drawn large enough to read its joinery. Dimensions that
 * span the break keep their true length; break lines mark where the part is cut short.
 */
import type { DimensionRequest, ModelView, Primitive, Pt, ViewNote } from './types.ts';

/** A break along the view's horizontal axis: model x from `from` to `to` is left out. */
export interface ViewBreak {
  from: number;
  to: number;
  /** Width the break is drawn as, model mm. */
  gap: number;
}

/** Only parts at least this many times longer than they are wide are broken. */
const MIN_SLENDERNESS = 3;
/** The uncut stretch must be at least this share of the length to be worth a break. */
const MIN_BREAK_SHARE = 0.3;

/**
 * The break for a part of `length` × `across` (mm) whose cuts start and end at `stations`
 * along its length, or null when it is short or has no long uncut stretch.
 */
export function chooseBreak(length: number, across: number, stations: readonly number[]): ViewBreak | null {
  if (length < MIN_SLENDERNESS * across) return null;
  const s = [...new Set([0, length, ...stations])].sort((a, b) => a - b);
  let best: [number, number] = [0, 0];
  for (let i = 0; i + 1 < s.length; i++) if (s[i + 1]! - s[i]! > best[1] - best[0]) best = [s[i]!, s[i + 1]!];
  const gapLen = best[1] - best[0];
  if (gapLen < MIN_BREAK_SHARE * length) return null;
  const keep = Math.max(12, 0.1 * gapLen, across * 0.6);
  const from = best[0] + keep;
  const to = best[1] - keep;
  if (to - from < MIN_BREAK_SHARE * length * 0.5) return null;
  return { from, to, gap: Math.max(8, 0.05 * (length - (to - from))) };
}

function mapX(x: number, b: ViewBreak): number {
  if (x <= b.from) return x;
  if (x >= b.to) return x - (b.to - b.from) + b.gap;
  return b.from + b.gap / 2;
}

function mapPt(p: Pt, b: ViewBreak): Pt {
  return [mapX(p[0], b), p[1]];
}

function inside(x: number, b: ViewBreak): boolean {
  return x > b.from + 1e-6 && x < b.to - 1e-6;
}

function breakPrimitive(p: Primitive, b: ViewBreak): Primitive[] {
  switch (p.type) {
    case 'segment': {
      const [x0, x1] = p.a[0] <= p.b[0] ? [p.a[0], p.b[0]] : [p.b[0], p.a[0]];
      if (x0 === x1) return inside(x0, b) ? [] : [{ ...p, a: mapPt(p.a, b), b: mapPt(p.b, b) }];
      if (Math.abs(p.a[1] - p.b[1]) > 1e-9) return [{ ...p, a: mapPt(p.a, b), b: mapPt(p.b, b) }];
      const y = p.a[1];
      const out: Primitive[] = [];
      if (x0 < b.from) out.push({ ...p, a: mapPt([x0, y], b), b: mapPt([Math.min(x1, b.from), y], b) });
      if (x1 > b.to) out.push({ ...p, a: mapPt([Math.max(x0, b.to), y], b), b: mapPt([x1, y], b) });
      return out;
    }
    case 'polygon': return p.points.some((q) => inside(q[0], b)) ? [] : [{ ...p, points: p.points.map((q) => mapPt(q, b)) }];
    case 'circle': return inside(p.centre[0], b) ? [] : [{ ...p, centre: mapPt(p.centre, b) }];
    case 'arrow': return [{ ...p, tip: mapPt(p.tip, b), from: mapPt(p.from, b) }];
    case 'label': return inside(p.at[0], b) ? [] : [{ ...p, at: mapPt(p.at, b) }];
  }
}

/** A note's target moved as the part is shortened; none when its feature falls in the break. */
function breakNote(n: ViewNote, b: ViewBreak): ViewNote[] {
  if (inside(n.target.x, b) || inside(n.target.x + n.target.w, b)) return [];
  const x = mapX(n.target.x, b);
  return [{ ...n, target: { ...n.target, x, w: mapX(n.target.x + n.target.w, b) - x } }];
}

/** Break lines: a straight line with one zigzag at its middle, past the part at both ends. */
function breakLine(x: number, y0: number, y1: number, amp: number): Primitive[] {
  const mid = (y0 + y1) / 2;
  const over = amp;
  const pts: Pt[] = [[x, y0 - over], [x, mid - amp], [x + amp * 0.6, mid - amp / 3], [x - amp * 0.6, mid + amp / 3], [x, mid + amp], [x, y1 + over]];
  return pts.slice(1).map((q, i) => ({ type: 'segment', a: pts[i]!, b: q, kind: 'thin' }));
}

/** `view` with its horizontal stretch `b` left out and break lines drawn. */
export function applyBreak(view: ModelView, b: ViewBreak): ModelView {
  const { bounds } = view;
  const amp = Math.min(bounds.h * 0.25, b.gap * 0.35);
  const primitives: Primitive[] = [
    ...view.primitives.flatMap((p) => breakPrimitive(p, b)),
    ...breakLine(b.from, bounds.y, bounds.y + bounds.h, amp),
    ...breakLine(b.from + b.gap, bounds.y, bounds.y + bounds.h, amp),
  ];
  const dimensions: DimensionRequest[] = view.dimensions.map((d) => ({ ...d, a: mapPt(d.a, b), b: mapPt(d.b, b) }));
  return {
    ...view,
    title: `${view.title} (shortened)`,
    primitives,
    dimensions,
    callouts: view.callouts.map((c) => ({ ...c, at: mapPt(c.at, b) })),
    ...(view.notes ? { notes: view.notes.flatMap((n) => breakNote(n, b)) } : {}),
    bounds: { ...bounds, w: mapX(bounds.x + bounds.w, b) - bounds.x },
  };
}
