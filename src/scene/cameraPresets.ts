/** Where the camera stands for each preset view, framed on the piece. */
import { assert } from '../../shared/assert.ts';
import type { Box3, Vec3 } from '../../shared/engine/types.ts';
import { boxSphere } from './sceneFrame.ts';

/** The preset views a maker asks for. */
export type PresetView = 'front' | 'side' | 'top' | 'three-quarter';

/** The camera's vertical field of view, degrees: narrow, so the piece reads nearly as a drawing. */
export const CAMERA_FOV_DEG = 30;
/** Room left around the piece's bounding sphere when it is framed. */
const FRAME_MARGIN = 1.15;

/**
 * Direction from the piece toward the camera in three's world (Y up, the front facing +z).
 * `side` looks from the piece's right, as a drafter's right-side view does; `top` leans a hair
 * toward the front so "up" on screen stays the back of the piece; `three-quarter` stands in front
 * and to the right, a little above.
 */
const DIRECTION: Record<PresetView, Vec3> = {
  front: [0, 0, 1],
  side: [1, 0, 0],
  top: [0, 1, 1e-3],
  'three-quarter': [0.62, 0.5, 1],
};

/** Camera position and the point it looks at (m, three's world) for `view`, framing `bounds` (engine mm). */
export function presetCamera(view: PresetView, bounds: Box3, fovDeg = CAMERA_FOV_DEG): { position: Vec3; target: Vec3 } {
  const { centre, radius } = boxSphere(bounds);
  const d = DIRECTION[view];
  assert(d, `unknown preset view "${String(view)}"; use front, side, top or three-quarter`);
  const length = Math.hypot(d[0], d[1], d[2]);
  const distance = (Math.max(radius, 1e-3) * FRAME_MARGIN) / Math.sin(((fovDeg / 2) * Math.PI) / 180);
  return {
    position: [centre[0] + (d[0] / length) * distance, centre[1] + (d[1] / length) * distance, centre[2] + (d[2] / length) * distance],
    target: centre,
  };
}
