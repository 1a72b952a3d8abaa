/**
 * A wall of a case seen from outside: u runs to the viewer's right, v up, w toward the viewer
 * (out of the case). Frame-and-panel faces are drawn in these coordinates and then turned into
 * the world, so one construction serves the front, back and both sides of any piece.
 */
import type { Box3, Vec3, WorldAxis } from '../types.ts';
import { axisVector } from './placement.ts';

/** Where a wall's (u, v, w) axes sit in the world; v is always +Z. */
export interface WallFrame {
  /** World point of u = 0, v = 0, w = 0 (mm). */
  origin: Vec3;
  /** World direction of u (the viewer's right). */
  u: WorldAxis;
  /** World direction of w (out of the case, toward the viewer). */
  w: WorldAxis;
}

/** Maps a point in wall coordinates to the world (mm). */
export function wallPointToWorld(frame: WallFrame, p: Vec3): Vec3 {
  const u = axisVector(frame.u);
  const w = axisVector(frame.w);
  return [
    frame.origin[0] + p[0] * u[0] + p[2] * w[0],
    frame.origin[1] + p[0] * u[1] + p[2] * w[1],
    frame.origin[2] + p[1] + p[0] * u[2] + p[2] * w[2],
  ];
}

/** Maps a box in wall coordinates to its world box (mm). */
export function wallBoxToWorld(frame: WallFrame, box: Box3): Box3 {
  const a = wallPointToWorld(frame, box.min);
  const b = wallPointToWorld(frame, box.max);
  return {
    min: [Math.min(a[0], b[0]), Math.min(a[1], b[1]), Math.min(a[2], b[2])],
    max: [Math.max(a[0], b[0]), Math.max(a[1], b[1]), Math.max(a[2], b[2])],
  };
}

/** The world direction of a wall direction. */
export function wallDirToWorld(frame: WallFrame, dir: '+u' | '-u' | '+v' | '-v' | '+w' | '-w'): WorldAxis {
  const flip = (axis: WorldAxis): WorldAxis => `${axis[0] === '+' ? '-' : '+'}${axis[1]}` as WorldAxis;
  switch (dir) {
    case '+u': return frame.u;
    case '-u': return flip(frame.u);
    case '+v': return '+Z';
    case '-v': return '-Z';
    case '+w': return frame.w;
    case '-w': return flip(frame.w);
  }
}
