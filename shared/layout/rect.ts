/**
 * Axis-aligned rectangles on a sheet or board, in mm: `x` along the stock's length, `y` across
 * its width, from the stock's low corner.
 */

/** A rectangle: low corner (`x`, `y`) and size (`length` along x, `width` along y), mm. */
export interface Rect {
  readonly x: number;
  readonly y: number;
  readonly length: number;
  readonly width: number;
}

/** True when the interiors of `a` and `b` share any area; touching edges do not overlap. */
export function rectsOverlap(a: Rect, b: Rect): boolean {
  return a.x < b.x + b.length && b.x < a.x + a.length && a.y < b.y + b.width && b.y < a.y + a.width;
}

/** True when `inner` lies inside `outer` (edges may coincide), within `toleranceMm`. */
export function rectContains(outer: Rect, inner: Rect, toleranceMm = 0): boolean {
  return (
    inner.x >= outer.x - toleranceMm &&
    inner.y >= outer.y - toleranceMm &&
    inner.x + inner.length <= outer.x + outer.length + toleranceMm &&
    inner.y + inner.width <= outer.y + outer.width + toleranceMm
  );
}

/** Area of `r`, mm². */
export function rectArea(r: Rect): number {
  return r.length * r.width;
}

/** `r` grown by `marginMm` on every side (a negative margin shrinks it). */
export function inflateRect(r: Rect, marginMm: number): Rect {
  return { x: r.x - marginMm, y: r.y - marginMm, length: r.length + 2 * marginMm, width: r.width + 2 * marginMm };
}
