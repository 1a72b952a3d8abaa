/**
 * The room and the placed, opened piece as plain data a 3D view draws (room coordinates, mm):
 * the room's box, its door and window openings in the wall planes, baseboards, sills, door
 * landings and obstacles, the transform that puts the piece in the room, and how its lid,
 * doors and drawers stand open at their checked positions.
 */
import type { Box3, Vec3 } from '../engine/types.ts';
import { DOOR_CHECK_ANGLE_DEG } from './checks/doorsOpen.ts';
import type { Collision } from './collision.ts';
import type { FitContext } from './fitContext.ts';
import { pieceRotationZDeg, piecePointToRoom, wallBoxToRoom } from './roomFrame.ts';
import type { RoomSolid } from './roomSolids.ts';

/** A hinged part turned open: turn its parts by `angleDeg` about the line from `axisFromMm` to `axisToMm` (right-hand rule). */
export interface SceneSwing {
  id: string;
  partIds: readonly string[];
  axisFromMm: Vec3;
  axisToMm: Vec3;
  angleDeg: number;
  /** Where it first meets something, degrees; null when it opens clear. */
  contactDeg: number | null;
}

/** A drawer pulled out: move its parts by `offsetMm`. */
export interface SceneSlide {
  id: string;
  partIds: readonly string[];
  offsetMm: Vec3;
}

/** Everything a 3D room view needs, room coordinates in mm. */
export interface RoomScene {
  roomBox: Box3;
  doors: readonly { id: string; opening: Box3; swing: 'in' | 'out' | 'none'; hinge: 'left' | 'right' }[];
  windows: readonly { id: string; opening: Box3 }[];
  /** Baseboards, sills, door landings and obstacles (walls and ceiling are the room box). */
  solids: readonly RoomSolid[];
  /** Turn the piece by `rotationZDeg` about Z, then move its origin to `originMm`. */
  piece: { rotationZDeg: number; originMm: Vec3; boxMm: Box3 };
  lid: SceneSwing | null;
  pieceDoors: readonly SceneSwing[];
  drawers: readonly SceneSlide[];
  collisions: readonly Collision[];
}

/** Builds the scene for a fitted piece. */
export function roomScene(ctx: FitContext, collisions: readonly Collision[]): RoomScene {
  const { room, piece, placed } = ctx;
  const toRoom = (p: Vec3) => piecePointToRoom(room, placed.pose, p);
  const contact = (checkId: string) => {
    const hits = collisions.filter((c) => c.checkId === checkId && c.atDeg !== undefined).map((c) => c.atDeg!);
    return hits.length > 0 ? Math.min(...hits) : null;
  };

  let lid: SceneSwing | null = null;
  if (piece.lid) {
    const xs = piece.lid.parts.flatMap((p) => [p.box.min[0], p.box.max[0]]);
    const [y, z] = [piece.lid.hingeYMm, piece.lid.hingeZMm];
    // The lid turns clockwise about +X seen from +X, i.e. right-handed about −X: the axis runs from high X to low X.
    lid = {
      id: 'lid', partIds: ids(piece.lid.parts), angleDeg: piece.lid.openAngleDeg, contactDeg: contact('lid-open'),
      axisFromMm: toRoom([Math.max(...xs), y, z]), axisToMm: toRoom([Math.min(...xs), y, z]),
    };
  }
  const pieceDoors = piece.doors.map((door): SceneSwing => {
    const zs = door.parts.flatMap((p) => [p.box.min[2], p.box.max[2]]);
    const [low, high] = [Math.min(...zs), Math.max(...zs)];
    // A left-hinged door turns clockwise seen from above: right-handed about −Z, so its axis runs downward.
    const [from, to] = door.hinge === 'left' ? [high, low] : [low, high];
    return {
      id: door.id, partIds: ids(door.parts), angleDeg: Math.min(door.openAngleDeg, DOOR_CHECK_ANGLE_DEG), contactDeg: contact(`door-open:${door.id}`),
      axisFromMm: toRoom([door.hingeXMm, door.hingeYMm, from]), axisToMm: toRoom([door.hingeXMm, door.hingeYMm, to]),
    };
  });
  const origin = toRoom([0, 0, 0]);
  const drawers = piece.drawers.map((drawer): SceneSlide => {
    const out = toRoom([0, -drawer.travelMm, 0]);
    return { id: drawer.id, partIds: ids(drawer.parts), offsetMm: [out[0] - origin[0], out[1] - origin[1], 0] };
  });

  return {
    roomBox: { min: [0, 0, 0], max: [room.width, room.depth, room.ceiling] },
    doors: room.doors.map((d) => ({ id: d.id, swing: d.swing, hinge: d.hinge, opening: wallBoxToRoom(room, d.wall, { min: [d.position, 0, 0], max: [d.position + d.width, 0, d.height] }) })),
    windows: room.windows.map((w) => ({ id: w.id, opening: wallBoxToRoom(room, w.wall, { min: [w.position, 0, w.sillHeight], max: [w.position + w.width, 0, w.headHeight] }) })),
    solids: ctx.solids.filter((s) => s.kind !== 'wall' && s.kind !== 'ceiling').map(({ id, label, kind, box }) => ({ id, label, kind, box })),
    piece: { rotationZDeg: pieceRotationZDeg(placed.pose.wall), originMm: origin, boxMm: piece.box },
    lid,
    pieceDoors,
    drawers,
    collisions,
  };
}

function ids(parts: readonly { partId: string }[]): string[] {
  return [...new Set(parts.map((p) => p.partId))];
}

