/**
 * The cut-away: a section plane across one engine axis. It takes away the part of the piece
 * between the plane and the preset view that looks along that axis — the front for `y`, the
 * right side for `x`, the top for `z` — so that view looks straight at the cut faces.
 */
import { InputError } from '../../shared/errors.ts';
import type { Vec3 } from '../../shared/engine/types.ts';
import { SCENE_SCALE } from './sceneFrame.ts';

/** A section plane across the engine's x, y or z axis at `positionMm` (engine world, mm). */
export interface Cutaway {
  axis: 'x' | 'y' | 'z';
  positionMm: number;
}

/**
 * The kept half-space `normal · p + constant ≥ 0` in three's world (m), the form of
 * `THREE.Plane` (three hides the other side when clipping).
 */
export function sectionPlane(cutaway: Cutaway): { normal: Vec3; constant: number } {
  if (!Number.isFinite(cutaway.positionMm)) throw new InputError('cutaway.positionMm', 'must be a number of millimetres', 'a finite length');
  const c = cutaway.positionMm * SCENE_SCALE;
  switch (cutaway.axis) {
    // Keep x ≤ c (the right side goes): −x + c ≥ 0.
    case 'x': return { normal: [-1, 0, 0], constant: c };
    // Keep engine y ≥ c, the back; engine y is three's −z, so keep −z ≥ c: −z − c ≥ 0.
    case 'y': return { normal: [0, 0, -1], constant: -c };
    // Keep engine z ≤ c, below the plane; engine z is three's y: −y + c ≥ 0.
    case 'z': return { normal: [0, -1, 0], constant: c };
    default: throw new InputError('cutaway.axis', 'must be x, y or z', 'x, y or z');
  }
}

/** True when a point (m, three's world) is on the kept side of the section plane. */
export function keptBySection(plane: { normal: Vec3; constant: number }, point: Vec3): boolean {
  return plane.normal[0] * point[0] + plane.normal[1] * point[1] + plane.normal[2] * point[2] + plane.constant >= 0;
}
