/**
 * A group of parts swinging about an axis (a lid about its hinge line, a door about its hinge
 * edge), checked against the room's solids at angles from closed to the stop. The turn keeps the
 * coordinate along the axis, so each test is a turned rectangle against a rectangle in the plane
 * across the axis, for the solids that overlap the part along the axis.
 *
 * The swing is sampled every {@link SWING_STEP_DEG} and at the stop; between samples a point at
 * radius r moves at most r × step (0.5° is 8.7 mm per metre of radius), so a solid thinner than
 * that could slip between two samples. Room solids are far thicker.
 */
import type { Box3 } from '../engine/types.ts';
import { convexOverlap, rectCorners, rotateAbout, type Point2 } from './convexOverlap.ts';
import type { EnvelopePart } from './pieceEnvelope.ts';

/** Angle between sampled positions of a swing, degrees. */
export const SWING_STEP_DEG = 0.5;

/** A solid as the swing sees it: an id and a box in the piece's frame, mm. */
export interface SwingSolid {
  id: string;
  box: Box3;
}

/** How a swing turns: about X (a lid, in the Y–Z plane) or Z (a door, in the X–Y plane). */
export interface SwingAxis {
  axis: 'x' | 'z';
  /** The axis's position in the plane across it, mm: (Y, Z) for X, (X, Y) for Z. */
  pivot: Point2;
  /** +1 turns counter-clockwise in that plane, −1 clockwise. */
  sense: 1 | -1;
}

/** One part meeting one solid during a swing. */
export interface SwingHit {
  partId: string;
  solidId: string;
  /** The first sampled angle at which they meet, degrees from closed. */
  atDeg: number;
}

/** The outcome of a swing: where it first meets something (null: never) and every meeting. */
export interface SwingResult {
  firstContactDeg: number | null;
  hits: SwingHit[];
}

const PLANE: Record<SwingAxis['axis'], { u: number; v: number; along: number }> = {
  x: { u: 1, v: 2, along: 0 },
  z: { u: 0, v: 1, along: 2 },
};

/** Swings `parts` about `swing` from 0 to `toDeg` against `solids` and lists the meetings. */
export function sweepSwing(parts: readonly EnvelopePart[], swing: SwingAxis, toDeg: number, solids: readonly SwingSolid[]): SwingResult {
  const { u, v, along } = PLANE[swing.axis];
  const angles = sampleAngles(toDeg);
  const hits: SwingHit[] = [];
  for (const part of parts) {
    const corners = rectCorners([part.box.min[u]!, part.box.min[v]!], [part.box.max[u]!, part.box.max[v]!]);
    const reach = Math.max(...corners.map((p) => Math.hypot(p[0] - swing.pivot[0], p[1] - swing.pivot[1])));
    for (const solid of solids) {
      if (solid.box.max[along]! <= part.box.min[along]! || solid.box.min[along]! >= part.box.max[along]!) continue;
      const lo: Point2 = [solid.box.min[u]!, solid.box.min[v]!];
      const hi: Point2 = [solid.box.max[u]!, solid.box.max[v]!];
      // Every point of the part stays within `reach` of the pivot; a solid further off is never met.
      if (distanceToRect(swing.pivot, lo, hi) >= reach) continue;
      const target = rectCorners(lo, hi);
      const atDeg = angles.find((deg) => {
        const rad = (swing.sense * deg * Math.PI) / 180;
        return convexOverlap(corners.map((p) => rotateAbout(p, swing.pivot, rad)), target);
      });
      if (atDeg !== undefined) hits.push({ partId: part.partId, solidId: solid.id, atDeg });
    }
  }
  const firstContactDeg = hits.length === 0 ? null : Math.min(...hits.map((h) => h.atDeg));
  return { firstContactDeg, hits };
}

/** The corners of `box` across the swing's axis when turned by `deg`, mm: what a plan or section draws. */
export function swungCorners(box: Box3, swing: SwingAxis, deg: number): Point2[] {
  const { u, v } = PLANE[swing.axis];
  const rad = (swing.sense * deg * Math.PI) / 180;
  return rectCorners([box.min[u]!, box.min[v]!], [box.max[u]!, box.max[v]!]).map((p) => rotateAbout(p, swing.pivot, rad));
}

function distanceToRect(p: Point2, lo: Point2, hi: Point2): number {
  const du = Math.max(lo[0] - p[0], 0, p[0] - hi[0]);
  const dv = Math.max(lo[1] - p[1], 0, p[1] - hi[1]);
  return Math.hypot(du, dv);
}

function sampleAngles(toDeg: number): number[] {
  const angles: number[] = [];
  for (let deg = 0; deg < toDeg; deg += SWING_STEP_DEG) angles.push(deg);
  angles.push(toDeg);
  return angles;
}
