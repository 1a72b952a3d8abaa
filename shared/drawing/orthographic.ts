/**
 * Third-angle orthographic views of the assembled piece. Front: seen from the front, X to the
 * right and Z up. Side: seen from the right, Y (front to back) to the right and Z up, so the
 * piece's front is on the left, toward the front view. Top: seen from above, X to the right and
 * Y up, so the front is at the bottom, toward the front view.
 */
import type { Box3 } from '../engine/types.ts';
import type { DepthRect } from './hiddenLines.ts';

/** The orthographic views of the piece. */
export type OrthoViewId = 'front' | 'side' | 'top';

/** World axis index and sign for a view's horizontal (u), vertical (v) and depth axes. */
interface ViewAxes {
  u: readonly [number, 1 | -1];
  v: readonly [number, 1 | -1];
  /** Depth grows away from the viewer. */
  depth: readonly [number, 1 | -1];
}

/** How each view maps the world (X width, Y depth, Z height) onto the paper. */
export const ORTHO_AXES: Readonly<Record<OrthoViewId, ViewAxes>> = {
  front: { u: [0, 1], v: [2, 1], depth: [1, 1] },
  side: { u: [1, 1], v: [2, 1], depth: [0, -1] },
  top: { u: [0, 1], v: [1, 1], depth: [2, -1] },
};

function span(box: Box3, [axis, sign]: readonly [number, 1 | -1]): [number, number] {
  return sign > 0 ? [box.min[axis]!, box.max[axis]!] : [-box.max[axis]!, -box.min[axis]!];
}

/** The rectangle (view mm, y up) and nearest depth of a world box seen in `view`. */
export function projectBox(box: Box3, view: OrthoViewId): DepthRect {
  const axes = ORTHO_AXES[view];
  const [u0, u1] = span(box, axes.u);
  const [v0, v1] = span(box, axes.v);
  const [near] = span(box, axes.depth);
  return { rect: { x: u0, y: v0, w: u1 - u0, h: v1 - v0 }, near };
}
