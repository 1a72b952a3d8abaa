/** Where the camera stands for each preset view, framed on the piece. */
import { assert } from '../../shared/assert.ts';
import type { Box3, Vec3 } from '../../shared/engine/types.ts';
import { engineToThree } from './sceneFrame.ts';

/** The preset views a maker asks for. */
export type PresetView = 'front' | 'side' | 'top' | 'three-quarter';

/** The camera's vertical field of view, degrees: narrow, so the piece reads nearly as a drawing. */
export const CAMERA_FOV_DEG = 30;
/** Room left around the piece when it is framed: it fills about 1/1.2 of the view. */
const FRAME_MARGIN = 1.2;

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

const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const unit = (a: Vec3): Vec3 => {
  const l = Math.hypot(a[0], a[1], a[2]);
  return [a[0] / l, a[1] / l, a[2] / l];
};

/**
 * Camera position and the point it looks at (m, three's world) for `view`, framing `bounds`
 * (engine mm) in a view `aspect` wide per unit high. Each corner of the box must lie inside both
 * the vertical and the horizontal field of view: a corner `s` across the view and `f` toward the
 * camera from the centre needs the camera at least f + s / tan(half angle) away.
 */
export function presetCamera(view: PresetView, bounds: Box3, aspect = 1, fovDeg = CAMERA_FOV_DEG): { position: Vec3; target: Vec3 } {
  const d = DIRECTION[view];
  assert(d, `unknown preset view "${String(view)}"; use front, side, top or three-quarter`);
  return fitCamera(d, bounds, aspect, fovDeg);
}

/**
 * Camera position and target (m, three's world) looking from `direction` (toward the camera,
 * three's world, any length) that frame `bounds` (engine mm): {@link presetCamera} for any
 * direction, such as the one the maker has orbited to.
 */
export function fitCamera(direction: Vec3, bounds: Box3, aspect = 1, fovDeg = CAMERA_FOV_DEG): { position: Vec3; target: Vec3 } {
  assert(Math.hypot(...direction) > 0, 'camera direction must not be zero');
  assert(aspect > 0 && Number.isFinite(aspect), `view aspect must be a positive number, got ${aspect}`);
  const toward = unit(direction);
  // Straight down (or up) has no horizontal right-hand side; take the x axis.
  const side = cross([0, 1, 0], toward);
  const right = Math.hypot(...side) > 1e-9 ? unit(side) : ([1, 0, 0] as Vec3);
  const up = cross(toward, right);
  const lo = engineToThree(bounds.min);
  const hi = engineToThree(bounds.max);
  const target: Vec3 = [(lo[0] + hi[0]) / 2, (lo[1] + hi[1]) / 2, (lo[2] + hi[2]) / 2];
  const tanV = Math.tan(((fovDeg / 2) * Math.PI) / 180);
  const tanH = tanV * aspect;
  let distance = 1e-3;
  for (const x of [lo[0], hi[0]]) for (const y of [lo[1], hi[1]]) for (const z of [lo[2], hi[2]]) {
    const c = sub([x, y, z], target);
    const f = dot(c, toward);
    distance = Math.max(distance, f + (Math.abs(dot(c, right)) * FRAME_MARGIN) / tanH, f + (Math.abs(dot(c, up)) * FRAME_MARGIN) / tanV);
  }
  return { position: [target[0] + toward[0] * distance, target[1] + toward[1] * distance, target[2] + toward[2] * distance], target };
}
