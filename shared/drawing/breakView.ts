/**
 * Conventional breaks for long parts: long stretches with no cuts are left out of the face and
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
/** An uncut stretch must be at least this share of the length to be worth a break. */
const MIN_BREAK_SHARE = 0.12;
/** A break must leave out at least this many times the part's width. */
const MIN_LEFT_OUT_ACROSS = 2;
/** Most breaks in one view: more would make a rail look like a row of stubs. */
const MAX_BREAKS = 4;

/**
 * The breaks for a part of `length` × `across` (mm) whose cuts start and end at `stations`
 * along its length: the longest uncut stretches (at most {@link MAX_BREAKS}), each kept for a
 * short length at both ends, so a rail with a notch at its middle or a cleat with a line of
 * screw holes is shortened between its cuts too. Empty when the part is short or has no long
 * uncut stretch. Sorted along the length.
 */
export function chooseBreaks(length: number, across: number, stations: readonly number[]): ViewBreak[] {
  if (length < MIN_SLENDERNESS * across) return [];
  const s = [...new Set([0, length, ...stations])].filter((x) => x >= 0 && x <= length).sort((a, b) => a - b);
  const stretches: [number, number][] = [];
  for (let i = 0; i + 1 < s.length; i++) stretches.push([s[i]!, s[i + 1]!]);
  const out: ViewBreak[] = [];
  for (const [a, b] of stretches.sort((p, q) => q[1] - q[0] - (p[1] - p[0])).slice(0, MAX_BREAKS)) {
    const gapLen = b - a;
    if (gapLen < MIN_BREAK_SHARE * length) break;
    const keep = Math.max(12, 0.1 * gapLen, across * 0.6);
    const from = a + keep;
    const to = b - keep;
    // A break that leaves out little only clutters the view.
    if (to - from < Math.max(MIN_BREAK_SHARE * length * 0.5, MIN_LEFT_OUT_ACROSS * across)) continue;
    out.push({ from, to, gap: Math.max(8, across * 0.25) });
  }
  return out.sort((p, q) => p.from - q.from);
}

/** Where model x lands once `breaks` (sorted, apart) are left out. */
function mapX(x: number, breaks: readonly ViewBreak[]): number {
  let shift = 0;
  for (const b of breaks) {
    if (x <= b.from) break;
    if (x < b.to) return b.from - shift + b.gap / 2;
    shift += b.to - b.from - b.gap;
  }
  return x - shift;
}

function mapPt(p: Pt, b: readonly ViewBreak[]): Pt {
  return [mapX(p[0], b), p[1]];
}

function inside(x: number, breaks: readonly ViewBreak[]): boolean {
  return breaks.some((b) => x > b.from + 1e-6 && x < b.to - 1e-6);
}

/** The pieces of [x0, x1] outside every break. */
function keptSpans(x0: number, x1: number, breaks: readonly ViewBreak[]): [number, number][] {
  const out: [number, number][] = [];
  let at = x0;
  for (const b of breaks) {
    if (b.to <= at || b.from >= x1) continue;
    if (b.from > at) out.push([at, b.from]);
    at = Math.max(at, b.to);
  }
  if (at < x1) out.push([at, x1]);
  return out;
}

function breakPrimitive(p: Primitive, b: readonly ViewBreak[]): Primitive[] {
  switch (p.type) {
    case 'segment': {
      const [x0, x1] = p.a[0] <= p.b[0] ? [p.a[0], p.b[0]] : [p.b[0], p.a[0]];
      if (x0 === x1) return inside(x0, b) ? [] : [{ ...p, a: mapPt(p.a, b), b: mapPt(p.b, b) }];
      if (Math.abs(p.a[1] - p.b[1]) > 1e-9) return [{ ...p, a: mapPt(p.a, b), b: mapPt(p.b, b) }];
      const y = p.a[1];
      return keptSpans(x0, x1, b).map(([u, v]) => ({ ...p, a: mapPt([u, y], b), b: mapPt([v, y], b) }));
    }
    case 'polygon': return p.points.some((q) => inside(q[0], b)) ? [] : [{ ...p, points: p.points.map((q) => mapPt(q, b)) }];
    case 'circle': return inside(p.centre[0], b) ? [] : [{ ...p, centre: mapPt(p.centre, b) }];
    case 'arrow': return [{ ...p, tip: mapPt(p.tip, b), from: mapPt(p.from, b) }];
    case 'label': return inside(p.at[0], b) ? [] : [{ ...p, at: mapPt(p.at, b) }];
  }
}

/** A note's target moved as the part is shortened; none when its feature falls in a break. */
function breakNote(n: ViewNote, b: readonly ViewBreak[]): ViewNote[] {
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

/** `view` with its horizontal stretches `breaks` (from {@link chooseBreaks}) left out and break lines drawn. */
export function applyBreaks(view: ModelView, breaks: readonly ViewBreak[]): ModelView {
  if (!breaks.length) return view;
  const { bounds } = view;
  const amp = Math.min(bounds.h * 0.25, Math.min(...breaks.map((b) => b.gap)) * 0.35);
  const primitives: Primitive[] = [
    ...view.primitives.flatMap((p) => breakPrimitive(p, breaks)),
    ...breaks.flatMap((b) => {
      const x = mapX(b.from, breaks);
      return [...breakLine(x, bounds.y, bounds.y + bounds.h, amp), ...breakLine(x + b.gap, bounds.y, bounds.y + bounds.h, amp)];
    }),
  ];
  const dimensions: DimensionRequest[] = view.dimensions.map((d) => ({ ...d, a: mapPt(d.a, breaks), b: mapPt(d.b, breaks) }));
  return {
    ...view,
    title: `${view.title} (shortened)`,
    primitives,
    dimensions,
    callouts: view.callouts.map((c) => ({ ...c, at: mapPt(c.at, breaks) })),
    ...(view.notes ? { notes: view.notes.flatMap((n) => breakNote(n, breaks)) } : {}),
    bounds: { ...bounds, w: mapX(bounds.x + bounds.w, breaks) - bounds.x },
  };
}
