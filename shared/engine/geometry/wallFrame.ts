/**
 * A wall of a case seen from outside: u runs to the viewer's right, v up, w toward the viewer
 * (out of the case). Frame-and-panel faces are drawn in these coordinates and then turned into
 * the world, so one construction serves the front, back and both sides of any piece.
 */
import type { Box3, Vec3, WorldAxis } from '../types.ts';
import { axisVector, oppositeAxis } from './placement.ts';

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
  // wallPointToWorld for both corners, written out: this runs for every cut of every wall on
  // each rebuild, and the corner arrays were garbage.
  const o = frame.origin;
  const u = axisVector(frame.u);
  const w = axisVector(frame.w);
  const p = box.min;
  const q = box.max;
  const ax = o[0] + p[0] * u[0] + p[2] * w[0];
  const ay = o[1] + p[0] * u[1] + p[2] * w[1];
  const az = o[2] + p[1] + p[0] * u[2] + p[2] * w[2];
  const bx = o[0] + q[0] * u[0] + q[2] * w[0];
  const by = o[1] + q[0] * u[1] + q[2] * w[1];
  const bz = o[2] + q[1] + q[0] * u[2] + q[2] * w[2];
  return {
    min: [Math.min(ax, bx), Math.min(ay, by), Math.min(az, bz)],
    max: [Math.max(ax, bx), Math.max(ay, by), Math.max(az, bz)],
  };
}

/**
 * `wallBoxToWorld` of the wall box between corners (u0, v0, w0) and (u1, v1, w1) in any order
 * (mm), without making the wall box first: walls draw dozens of boxes on each rebuild.
 */
export function wallBoxBetweenToWorld(frame: WallFrame, u0: number, u1: number, v0: number, v1: number, w0: number, w1: number): Box3 {
  const o = frame.origin;
  const u = axisVector(frame.u);
  const w = axisVector(frame.w);
  const pu = Math.min(u0, u1);
  const pv = Math.min(v0, v1);
  const pw = Math.min(w0, w1);
  const qu = Math.max(u0, u1);
  const qv = Math.max(v0, v1);
  const qw = Math.max(w0, w1);
  const ax = o[0] + pu * u[0] + pw * w[0];
  const ay = o[1] + pu * u[1] + pw * w[1];
  const az = o[2] + pv + pu * u[2] + pw * w[2];
  const bx = o[0] + qu * u[0] + qw * w[0];
  const by = o[1] + qu * u[1] + qw * w[1];
  const bz = o[2] + qv + qu * u[2] + qw * w[2];
  return {
    min: [Math.min(ax, bx), Math.min(ay, by), Math.min(az, bz)],
    max: [Math.max(ax, bx), Math.max(ay, by), Math.max(az, bz)],
  };
}

/** The world direction of a wall direction. */
export function wallDirToWorld(frame: WallFrame, dir: '+u' | '-u' | '+v' | '-v' | '+w' | '-w'): WorldAxis {
  switch (dir) {
    case '+u': return frame.u;
    case '-u': return oppositeAxis(frame.u);
    case '+v': return '+Z';
    case '-v': return '-Z';
    case '+w': return frame.w;
    case '-w': return oppositeAxis(frame.w);
  }
}
