/**
 * The engine draws in millimetres with Z up; three.js and its helpers (orbit controls, shadows,
 * the ground) expect Y up, and metres keep the depth buffer and shadow maps well conditioned.
 * PieceView turns the engine's world into three's once, on a parent group; these helpers do the
 * same for the few things placed outside that group (camera, section plane, lights).
 */
import type { Box3, Vec3 } from '../../shared/engine/types.ts';

/** Metres per millimetre. */
export const SCENE_SCALE = 0.001;
/** Rotation about three's X axis that stands the engine's Z up as three's Y. */
export const ENGINE_TO_THREE_ROTATION_X = -Math.PI / 2;

/**
 * An engine point (mm, Z up) in three's world (m, Y up): x stays x, the engine's height becomes
 * y, and its depth (front → back) runs toward −z, so the piece's front faces +z.
 */
export function engineToThree(p: Vec3): Vec3 {
  return [p[0] * SCENE_SCALE, p[2] * SCENE_SCALE, -p[1] * SCENE_SCALE];
}

/** Centre and radius (m, three's world) of an engine box. */
export function boxSphere(box: Box3): { centre: Vec3; radius: number } {
  const centre = engineToThree([(box.min[0] + box.max[0]) / 2, (box.min[1] + box.max[1]) / 2, (box.min[2] + box.max[2]) / 2]);
  const dx = box.max[0] - box.min[0];
  const dy = box.max[1] - box.min[1];
  const dz = box.max[2] - box.min[2];
  return { centre, radius: (Math.sqrt(dx * dx + dy * dy + dz * dz) / 2) * SCENE_SCALE };
}
