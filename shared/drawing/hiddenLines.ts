/**
 * Visible and hidden edges of axis-aligned boxes seen square-on. Each box projects to a
 * rectangle at the depth of its nearest face; a stretch of one rectangle's edge is hidden where
 * a rectangle nearer to the viewer covers it. Edges that coincide merge, and a stretch that is
 * visible from any box is drawn visible only once.
 */
import { intersect, subtract, unionOf, type Interval } from './intervals.ts';
import type { Rect, Segment } from './types.ts';

/** A projected box: its rectangle in view coordinates (mm) and how far its nearest face is. */
export interface DepthRect {
  rect: Rect;
  /** Distance of the nearest face from the viewer, mm (smaller is nearer). */
  near: number;
}

const DEPTH_EPS = 1e-3;
const EDGE_EPS = 1e-3;

interface Edge {
  horizontal: boolean;
  /** y of a horizontal edge, x of a vertical one. */
  at: number;
  span: Interval;
  near: number;
}

function edgesOf({ rect: r, near }: DepthRect): Edge[] {
  return [
    { horizontal: true, at: r.y, span: [r.x, r.x + r.w], near },
    { horizontal: true, at: r.y + r.h, span: [r.x, r.x + r.w], near },
    { horizontal: false, at: r.x, span: [r.y, r.y + r.h], near },
    { horizontal: false, at: r.x + r.w, span: [r.y, r.y + r.h], near },
  ];
}

function coverOf(edge: Edge, by: DepthRect): Interval | null {
  if (by.near >= edge.near - DEPTH_EPS) return null;
  const r = by.rect;
  const [acrossLo, acrossHi, alongLo, alongHi] = edge.horizontal ? [r.y, r.y + r.h, r.x, r.x + r.w] : [r.x, r.x + r.w, r.y, r.y + r.h];
  if (edge.at <= acrossLo + EDGE_EPS || edge.at >= acrossHi - EDGE_EPS) return null;
  return [alongLo, alongHi];
}

/** A stretch of a horizontal or vertical line, visible or hidden. */
export interface LineRun {
  horizontal: boolean;
  /** y of a horizontal line, x of a vertical one. */
  at: number;
  span: Interval;
  kind: 'visible' | 'hidden';
}

/**
 * Merges runs that lie on the same line: overlapping stretches join, and a stretch that is
 * visible in any run is drawn visible only, never also dashed.
 */
export function mergeRuns(runs: readonly LineRun[], opts: { hidden: boolean }): Segment[] {
  const lines = new Map<string, { horizontal: boolean; at: number; visible: Interval[]; hidden: Interval[] }>();
  for (const run of runs) {
    const key = `${run.horizontal ? 'h' : 'v'}:${Math.round(run.at / EDGE_EPS)}`;
    const line = lines.get(key) ?? { horizontal: run.horizontal, at: run.at, visible: [], hidden: [] };
    (run.kind === 'visible' ? line.visible : line.hidden).push(run.span);
    lines.set(key, line);
  }
  const out: Segment[] = [];
  for (const line of lines.values()) {
    const visible = unionOf(line.visible);
    const hidden = opts.hidden ? subtract(line.hidden, visible) : [];
    const emit = (span: Interval, kind: 'visible' | 'hidden'): void => {
      out.push(
        line.horizontal
          ? { type: 'segment', a: [span[0], line.at], b: [span[1], line.at], kind }
          : { type: 'segment', a: [line.at, span[0]], b: [line.at, span[1]], kind },
      );
    };
    visible.forEach((s) => emit(s, 'visible'));
    hidden.forEach((s) => emit(s, 'hidden'));
  }
  return out;
}

/**
 * The visible and hidden segments of `rects` (view mm). With `hidden: false` the hidden
 * stretches are left out, for views where they would only clutter.
 */
export function projectEdges(rects: readonly DepthRect[], opts: { hidden: boolean }): Segment[] {
  const runs: LineRun[] = [];
  for (const r of rects) {
    for (const edge of edgesOf(r)) {
      const covers = rects.map((other) => coverOf(edge, other)).filter((c): c is Interval => c !== null);
      for (const span of subtract([edge.span], covers)) runs.push({ horizontal: edge.horizontal, at: edge.at, span, kind: 'visible' });
      for (const span of intersect([edge.span], covers)) runs.push({ horizontal: edge.horizontal, at: edge.at, span, kind: 'hidden' });
    }
  }
  return mergeRuns(runs, opts);
}
