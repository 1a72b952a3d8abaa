/**
 * Plane geometry for swinging parts: a rectangle turned about a pivot, and whether two convex
 * polygons overlap by more than a touch (the separating axis theorem: two convex shapes are
 * apart exactly when some edge normal of one of them separates their projections).
 */

/** A point in a plane, mm. */
export type Point2 = readonly [number, number];

/** Overlap below this (mm) counts as touching, not hitting: a lid may rest against a wall. */
export const TOUCH_MM = 1e-6;

/** The corners of the rectangle [min, max], counter-clockwise. */
export function rectCorners(min: Point2, max: Point2): Point2[] {
  return [
    [min[0], min[1]],
    [max[0], min[1]],
    [max[0], max[1]],
    [min[0], max[1]],
  ];
}

/** `p` turned about `pivot` by `angleRad`, counter-clockwise for a positive angle. */
export function rotateAbout(p: Point2, pivot: Point2, angleRad: number): Point2 {
  const c = Math.cos(angleRad);
  const s = Math.sin(angleRad);
  const du = p[0] - pivot[0];
  const dv = p[1] - pivot[1];
  return [pivot[0] + du * c - dv * s, pivot[1] + du * s + dv * c];
}

/** True when convex polygons `a` and `b` share more than a touch (more than {@link TOUCH_MM} deep). */
export function convexOverlap(a: readonly Point2[], b: readonly Point2[]): boolean {
  for (const poly of [a, b]) {
    for (let i = 0; i < poly.length; i++) {
      const p = poly[i]!;
      const q = poly[(i + 1) % poly.length]!;
      const length = Math.hypot(q[0] - p[0], q[1] - p[1]);
      if (length === 0) continue;
      const normal: Point2 = [-(q[1] - p[1]) / length, (q[0] - p[0]) / length];
      const [aMin, aMax] = project(a, normal);
      const [bMin, bMax] = project(b, normal);
      if (aMax - bMin <= TOUCH_MM || bMax - aMin <= TOUCH_MM) return false;
    }
  }
  return true;
}

function project(poly: readonly Point2[], axis: Point2): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const p of poly) {
    const d = p[0] * axis[0] + p[1] * axis[1];
    lo = Math.min(lo, d);
    hi = Math.max(hi, d);
  }
  return [lo, hi];
}
