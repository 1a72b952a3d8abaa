/**
 * The piece in its room, for the 3D room view: every part instance carried from the piece's own
 * frame into room coordinates (turned and moved by the room placement), lids and doors swung
 * open about their hinge lines and drawers pulled out to the positions the room checks tested,
 * and which parts and room solids the checks found meeting. Pure data; all lengths mm, Z up.
 */
import { Matrix4, Vector3 } from 'three';
import { boxUnion } from '../../shared/engine/geometry/box.ts';
import type { Box3 } from '../../shared/engine/types.ts';
import type { RoomScene } from '../../shared/room/roomScene.ts';
import type { SceneMesh, SceneModel } from './sceneModel.ts';

/** The room data PieceView's `room` prop takes: shared/room's scene for a fitted piece. */
export type RoomSceneData = RoomScene;

/** What the room view draws of the piece. */
export interface RoomPieceModel {
  /** The piece's meshes, with `matrixElements` and `worldBox` in room coordinates. */
  meshes: SceneMesh[];
  /** Parts some room check found running into something. */
  collidingPartIds: ReadonlySet<string>;
  /** Room solids (sills, obstacles ...) something runs into. */
  collidingSolidIds: ReadonlySet<string>;
}

const degToRad = (deg: number): number => (deg * Math.PI) / 180;

/** The piece frame → room: turn about Z, then move the piece's origin to its place. */
function poseMatrix(room: RoomScene): Matrix4 {
  return new Matrix4().makeRotationZ(degToRad(room.piece.rotationZDeg)).premultiply(new Matrix4().makeTranslation(...room.piece.originMm));
}

/** A right-handed turn by `angleDeg` about the line from `from` to `to` (room coordinates). */
function swingMatrix(from: readonly number[], to: readonly number[], angleDeg: number): Matrix4 {
  const a = new Vector3(from[0], from[1], from[2]);
  const axis = new Vector3(to[0], to[1], to[2]).sub(a).normalize();
  return new Matrix4()
    .makeTranslation(-a.x, -a.y, -a.z)
    .premultiply(new Matrix4().makeRotationAxis(axis, degToRad(angleDeg)))
    .premultiply(new Matrix4().makeTranslation(a.x, a.y, a.z));
}

function boxThrough(box: Box3, m: Matrix4): Box3 {
  const min = [Infinity, Infinity, Infinity];
  const max = [-Infinity, -Infinity, -Infinity];
  for (const x of [box.min[0], box.max[0]]) for (const y of [box.min[1], box.max[1]]) for (const z of [box.min[2], box.max[2]]) {
    const p = new Vector3(x, y, z).applyMatrix4(m).toArray();
    for (let i = 0; i < 3; i++) {
      min[i] = Math.min(min[i]!, p[i]!);
      max[i] = Math.max(max[i]!, p[i]!);
    }
  }
  return { min: min as [number, number, number], max: max as [number, number, number] };
}

/** Places the assembled piece's meshes (`model`, built with explode 0) in `room`, opened. */
export function placeInRoom(model: SceneModel, room: RoomScene): RoomPieceModel {
  const pose = poseMatrix(room);
  const moves = new Map<string, Matrix4>();
  for (const swing of [...(room.lid ? [room.lid] : []), ...room.pieceDoors]) {
    const m = swingMatrix(swing.axisFromMm, swing.axisToMm, swing.angleDeg);
    for (const id of swing.partIds) moves.set(id, m);
  }
  for (const drawer of room.drawers) {
    const m = new Matrix4().makeTranslation(...drawer.offsetMm);
    for (const id of drawer.partIds) moves.set(id, m);
  }
  const meshes = model.meshes.map((mesh): SceneMesh => {
    // Instance → piece world → room, then the opening move, all in room coordinates.
    const toRoom = pose.clone();
    const move = moves.get(mesh.partId);
    if (move) toRoom.premultiply(move);
    return {
      ...mesh,
      matrixElements: new Matrix4().fromArray(mesh.matrixElements).premultiply(toRoom).toArray(),
      worldBox: boxThrough(mesh.worldBox, toRoom),
    };
  });
  return {
    meshes,
    collidingPartIds: new Set(room.collisions.flatMap((c) => c.partIds)),
    collidingSolidIds: new Set(room.collisions.map((c) => c.solidId)),
  };
}

/**
 * Room kept in view around the opened piece (mm): enough to see the wall behind it, a sill
 * above a lid, the floor in front of pulled drawers. A choice of framing, not a clearance rule.
 */
export const ROOM_FOCUS_MARGIN_MM = 450;

/**
 * The box the room view frames by default (room coordinates, mm): the placed piece with its
 * lid, doors and drawers open as checked, and every place a check found something meeting it,
 * grown by `marginMm` on every side, from the floor up, and kept inside the room.
 */
export function roomFocusBox(placed: RoomPieceModel, room: RoomScene, marginMm = ROOM_FOCUS_MARGIN_MM): Box3 {
  const boxes = [...placed.meshes.map((m) => m.worldBox), ...room.collisions.flatMap((c) => (c.overlapMm ? [c.overlapMm] : []))];
  if (boxes.length === 0) return room.roomBox;
  const { min, max } = boxUnion(boxes);
  const inRoom = (k: number, v: number) => Math.min(room.roomBox.max[k]!, Math.max(room.roomBox.min[k]!, v));
  return {
    min: [inRoom(0, min[0] - marginMm), inRoom(1, min[1] - marginMm), room.roomBox.min[2]],
    max: [inRoom(0, max[0] + marginMm), inRoom(1, max[1] + marginMm), inRoom(2, max[2] + marginMm)],
  };
}
