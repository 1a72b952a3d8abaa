/**
 * Three frames, all in mm with Z up from the floor:
 *  - the room: X along its width, Y along its depth (see `roomSchema.ts`);
 *  - a wall: `along` from the wall's left corner (standing in the room, facing it) to its right,
 *    `dist` from the wall face into the room;
 *  - the piece: the engine's X (width, left to right as you face its front), Y (front to back).
 * A piece stands with its back to a wall, so its X runs along the wall and its Y points at the
 * wall. Every turn is a multiple of 90° about Z, so boxes stay boxes in every frame.
 */
import type { Box3, Vec3 } from '../engine/types.ts';
import { assertNever } from '../assert.ts';
import type { Wall } from './roomSchema.ts';

/** The room's plan size, all a frame needs. */
export interface RoomPlan {
  width: number;
  depth: number;
}

/** Where the piece stands: piece (x, y, z) lies at wall (along = alongMm + x, dist = offMm − y, z). */
export interface PiecePose {
  wall: Wall;
  /** Wall `along` of the piece's x = 0, mm. */
  alongMm: number;
  /** Wall `dist` of the piece's y = 0, mm. */
  offMm: number;
}

/** Length of `wall`, corner to corner, mm. */
export function wallLengthMm(room: RoomPlan, wall: Wall): number {
  return wall === 'front' || wall === 'back' ? room.width : room.depth;
}

/** Distance from `wall` to the wall facing it, mm. */
export function roomSpanOffWallMm(room: RoomPlan, wall: Wall): number {
  return wall === 'front' || wall === 'back' ? room.depth : room.width;
}

/** A room point (X, Y) in `wall` coordinates: [along, dist], mm. */
export function roomToWall(room: RoomPlan, wall: Wall, x: number, y: number): [number, number] {
  switch (wall) {
    case 'back': return [x, room.depth - y];
    case 'front': return [room.width - x, y];
    case 'left': return [y, x];
    case 'right': return [room.depth - y, room.width - x];
    default: return assertNever(wall, 'wall');
  }
}

/** A `wall` point (along, dist) in room coordinates: [X, Y], mm. */
export function wallToRoom(room: RoomPlan, wall: Wall, along: number, dist: number): [number, number] {
  switch (wall) {
    case 'back': return [along, room.depth - dist];
    case 'front': return [room.width - along, dist];
    case 'left': return [dist, along];
    case 'right': return [room.width - dist, room.depth - along];
    default: return assertNever(wall, 'wall');
  }
}

/** A box in room coordinates as a box in `wall` coordinates: (along, dist, z), mm. */
export function roomBoxToWall(room: RoomPlan, wall: Wall, box: Box3): Box3 {
  const [a1, d1] = roomToWall(room, wall, box.min[0], box.min[1]);
  const [a2, d2] = roomToWall(room, wall, box.max[0], box.max[1]);
  return ordered([a1, d1, box.min[2]], [a2, d2, box.max[2]]);
}

/** A box in `wall` coordinates (along, dist, z) as a box in room coordinates, mm. */
export function wallBoxToRoom(room: RoomPlan, wall: Wall, box: Box3): Box3 {
  const [x1, y1] = wallToRoom(room, wall, box.min[0], box.min[1]);
  const [x2, y2] = wallToRoom(room, wall, box.max[0], box.max[1]);
  return ordered([x1, y1, box.min[2]], [x2, y2, box.max[2]]);
}

/** A box in room coordinates, seen in the piece's frame at `pose`. */
export function roomBoxToPiece(room: RoomPlan, pose: PiecePose, box: Box3): Box3 {
  const [a1, d1] = roomToWall(room, pose.wall, box.min[0], box.min[1]);
  const [a2, d2] = roomToWall(room, pose.wall, box.max[0], box.max[1]);
  const x1 = a1 - pose.alongMm;
  const x2 = a2 - pose.alongMm;
  const y1 = pose.offMm - d1;
  const y2 = pose.offMm - d2;
  return ordered([x1, y1, box.min[2]], [x2, y2, box.max[2]]);
}

/** A box in the piece's frame at `pose`, in room coordinates. */
export function pieceBoxToRoom(room: RoomPlan, pose: PiecePose, box: Box3): Box3 {
  const [x1, y1] = wallToRoom(room, pose.wall, pose.alongMm + box.min[0], pose.offMm - box.min[1]);
  const [x2, y2] = wallToRoom(room, pose.wall, pose.alongMm + box.max[0], pose.offMm - box.max[1]);
  return ordered([x1, y1, box.min[2]], [x2, y2, box.max[2]]);
}

/** A point in the piece's frame at `pose`, in room coordinates. */
export function piecePointToRoom(room: RoomPlan, pose: PiecePose, p: Vec3): Vec3 {
  const [x, y] = wallToRoom(room, pose.wall, pose.alongMm + p[0], pose.offMm - p[1]);
  return [x, y, p[2]];
}

/**
 * The turn about Z (degrees, counter-clockwise seen from above) that takes the piece's axes to
 * the room's when its back is to `wall`; with {@link piecePointToRoom} of the origin it is
 * the whole transform a 3D view needs.
 */
export function pieceRotationZDeg(wall: Wall): number {
  switch (wall) {
    case 'back': return 0;
    case 'front': return 180;
    case 'left': return 90;
    case 'right': return -90;
    default: return assertNever(wall, 'wall');
  }
}

function ordered(a: Vec3, b: Vec3): Box3 {
  return {
    min: [Math.min(a[0], b[0]), Math.min(a[1], b[1]), Math.min(a[2], b[2])],
    max: [Math.max(a[0], b[0]), Math.max(a[1], b[1]), Math.max(a[2], b[2])],
  };
}
