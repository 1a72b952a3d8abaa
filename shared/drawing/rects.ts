/** Small helpers on view rectangles (mm). */
import type { Pt, Rect } from './types.ts';

/** The smallest rectangle holding every rectangle in `rects`; a zero rectangle when empty. */
export function rectUnion(rects: readonly Rect[]): Rect {
  if (rects.length === 0) return { x: 0, y: 0, w: 0, h: 0 };
  const x0 = Math.min(...rects.map((r) => r.x));
  const y0 = Math.min(...rects.map((r) => r.y));
  const x1 = Math.max(...rects.map((r) => r.x + r.w));
  const y1 = Math.max(...rects.map((r) => r.y + r.h));
  return { x: x0, y: y0, w: x1 - x0, h: y1 - y0 };
}

/** The bounding rectangle of points. */
export function pointsRect(points: readonly Pt[]): Rect {
  return rectUnion(points.map(([x, y]) => ({ x, y, w: 0, h: 0 })));
}

/** `r` grown by `d` on every side. */
export function inflate(r: Rect, d: number): Rect {
  return { x: r.x - d, y: r.y - d, w: r.w + 2 * d, h: r.h + 2 * d };
}

/** True when two rectangles overlap with positive area. */
export function rectsOverlap(a: Rect, b: Rect): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}
