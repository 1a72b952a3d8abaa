/**
 * What room fit needs to know about a piece, read from the engine's result: the world box of
 * every part instance, what opens and how (a lid about its hinge line, doors about their hinge
 * edges, drawers straight out), and which subassemblies come apart for carrying.
 *
 * This is the one adapter between the engine and room fit. Facts the result does not carry yet
 * are derived here and said so in `assumptions`:
 *  - the lid's hinge line: taken at the back face of the case (the largest Y of the parts that
 *    are not the lid) and the underside of the lid, running along X;
 *  - the lid's opening angle: the spec's `lidOpenAngle` parameter (degrees) when present, else
 *    {@link DEFAULT_LID_OPEN_ANGLE_DEG};
 *  - doors: each group of touching `door`, `door-frame` and `door-panel` instances is one leaf,
 *    hinged on the side away from the piece's middle (left when it is at or left of the middle,
 *    the engine's own rule for laying out leaves), about its edge on its front face;
 *  - drawers: each group of touching drawer parts is one drawer, on full-extension slides: it
 *    travels the length of its sides.
 */
import { boxAt, boxUnion, boxVolume } from '../engine/geometry/box.ts';
import { worldSize } from '../engine/geometry/placement.ts';
import type { Box3, PieceKind, PieceResult } from '../engine/types.ts';
import { assert } from '../assert.ts';
import { touchingGroups } from './partClusters.ts';

/**
 * Lid opening angle when the design does not give one, degrees from closed: upright, where a
 * lid-support hinge or stay commonly stops it (common practice, no published source).
 */
export const DEFAULT_LID_OPEN_ANGLE_DEG = 90;

/** One placed part instance, its world box in the piece's frame (mm). */
export interface EnvelopePart {
  partId: string;
  label: string;
  role: string;
  box: Box3;
}

/** A lid that swings up and back about a hinge line parallel to X. */
export interface LidOpening {
  /** The lid and what is fixed to it (battens), mm in the piece's frame, closed. */
  parts: readonly EnvelopePart[];
  /** Hinge line: Y and Z of the axis, mm. */
  hingeYMm: number;
  hingeZMm: number;
  /** How far it opens to its stop, degrees from closed. */
  openAngleDeg: number;
}

/** A door that swings out about a vertical hinge line at its front face. */
export interface DoorOpening {
  id: string;
  parts: readonly EnvelopePart[];
  /** Hinge side as you face the piece. */
  hinge: 'left' | 'right';
  /** Hinge line: X and Y of the vertical axis, mm. */
  hingeXMm: number;
  hingeYMm: number;
  /** Degrees from closed; room fit checks doors at 90°. */
  openAngleDeg: number;
}

/** A drawer that slides straight out toward −Y. */
export interface DrawerOpening {
  id: string;
  parts: readonly EnvelopePart[];
  /** How far it travels at full extension, mm. */
  travelMm: number;
}

/** A group of parts carried on its own when the piece is taken apart for a doorway. */
export interface Subassembly {
  id: string;
  label: string;
  partIds: readonly string[];
  /** World box of the group, mm. */
  box: Box3;
}

/** A piece as room fit sees it. Lengths in mm, in the engine's piece frame. */
export interface PieceEnvelope {
  kind: PieceKind;
  /** The closed piece's box. */
  box: Box3;
  parts: readonly EnvelopePart[];
  lid: LidOpening | null;
  doors: readonly DoorOpening[];
  drawers: readonly DrawerOpening[];
  /** The pieces it comes apart into for carrying, largest first; one entry when it does not. */
  subassemblies: readonly Subassembly[];
  /** What was assumed because the result does not say it, in words. */
  assumptions: readonly string[];
}

const LID_ROLES: ReadonlySet<string> = new Set(['lid', 'batten']);
const DOOR_ROLES: ReadonlySet<string> = new Set(['door', 'door-frame', 'door-panel']);
const DRAWER_ROLES: ReadonlySet<string> = new Set(['drawer-front', 'drawer-side', 'drawer-end', 'drawer-bottom']);

/** Degrees a door of the piece opens to when the result does not say: room fit checks 90°. */
const DOOR_OPEN_ANGLE_DEG = 90;

/** Reads the envelope of an engine result. */
export function envelopeFromResult(result: PieceResult): PieceEnvelope {
  const parts = placedParts(result);
  assert(parts.length > 0, 'a piece result has at least one placed part');
  const lidParts = parts.filter((p) => LID_ROLES.has(p.role));
  const caseParts = parts.filter((p) => !LID_ROLES.has(p.role) && !DOOR_ROLES.has(p.role) && !DRAWER_ROLES.has(p.role));
  const box = boxUnion(parts.map((p) => p.box));
  const assumptions: string[] = [];

  let lid: LidOpening | null = null;
  if (lidParts.length > 0 && caseParts.length > 0) {
    const lidBoards = lidParts.filter((p) => p.role === 'lid');
    const hingeZMm = Math.min(...(lidBoards.length > 0 ? lidBoards : lidParts).map((p) => p.box.min[2]));
    const hingeYMm = Math.max(...caseParts.map((p) => p.box.max[1]));
    const angle = result.spec.params['lidOpenAngle'];
    const openAngleDeg = typeof angle === 'number' && angle > 0 && angle <= 180 ? angle : DEFAULT_LID_OPEN_ANGLE_DEG;
    lid = { parts: lidParts, hingeYMm, hingeZMm, openAngleDeg };
    assumptions.push(`lid hinge line taken at the back of the case (Y ${round(hingeYMm)} mm) and the underside of the lid (Z ${round(hingeZMm)} mm)`);
    if (openAngleDeg === DEFAULT_LID_OPEN_ANGLE_DEG && typeof angle !== 'number') {
      assumptions.push(`lid opening angle not given; ${DEFAULT_LID_OPEN_ANGLE_DEG}° assumed (common practice, no published source)`);
    }
  }

  const doors = doorsOf(parts, box);
  const drawers = drawersOf(parts);
  if (doors.length > 0) assumptions.push('doors hinged on the side away from the middle of the piece, about their outer front edge');
  if (drawers.length > 0) assumptions.push('drawers on full-extension slides: each travels the length of its sides');

  const subassemblies: Subassembly[] = [];
  const removable = lidParts.length + doors.length + drawers.length > 0 && caseParts.length > 0;
  if (removable) {
    subassemblies.push(group('case', lid ? 'case without the lid' : 'case without its doors and drawers', caseParts));
    if (lidParts.length > 0) subassemblies.push(group('lid', 'lid', lidParts));
    for (const door of doors) subassemblies.push(group(door.id, door.id.replace('-', ' '), door.parts));
    for (const drawer of drawers) subassemblies.push(group(drawer.id, drawer.id.replace('-', ' '), drawer.parts));
    subassemblies.sort((a, b) => boxVolume(b.box) - boxVolume(a.box));
  } else {
    subassemblies.push(group('whole', 'whole piece', parts));
  }

  return { kind: result.kind, box, parts, lid, doors, drawers, subassemblies, assumptions };
}

function doorsOf(parts: readonly EnvelopePart[], piece: Box3): DoorOpening[] {
  const middle = (piece.min[0] + piece.max[0]) / 2;
  return touchingGroups(parts.filter((p) => DOOR_ROLES.has(p.role)))
    .map((leaf) => ({ leaf, box: boxUnion(leaf.map((p) => p.box)) }))
    .sort((a, b) => a.box.min[0] - b.box.min[0] || b.box.max[2] - a.box.max[2])
    .map(({ leaf, box }, i) => {
      const hinge = (box.min[0] + box.max[0]) / 2 <= middle + 1e-6 ? 'left' : 'right';
      return { id: `door-${i + 1}`, parts: leaf, hinge, hingeXMm: hinge === 'left' ? box.min[0] : box.max[0], hingeYMm: box.min[1], openAngleDeg: DOOR_OPEN_ANGLE_DEG };
    });
}

function drawersOf(parts: readonly EnvelopePart[]): DrawerOpening[] {
  return touchingGroups(parts.filter((p) => DRAWER_ROLES.has(p.role)))
    .map((drawer) => ({ drawer, box: boxUnion(drawer.map((p) => p.box)) }))
    .sort((a, b) => b.box.max[2] - a.box.max[2] || a.box.min[0] - b.box.min[0])
    .map(({ drawer, box }, i) => {
      const sides = drawer.filter((p) => p.role === 'drawer-side');
      const travelMm = sides.length > 0 ? Math.max(...sides.map((p) => p.box.max[1] - p.box.min[1])) : box.max[1] - box.min[1];
      return { id: `drawer-${i + 1}`, parts: drawer, travelMm };
    });
}

function placedParts(result: PieceResult): EnvelopePart[] {
  const byId = new Map(result.parts.map((p) => [p.id, p]));
  return result.placements.map((placement) => {
    const part = byId.get(placement.partId);
    assert(part !== undefined, `placement ${placement.label} names a part that exists (${placement.partId})`);
    const size = worldSize(placement.axes, [part.lengthMm, part.widthMm, part.thicknessMm]);
    return { partId: part.id, label: placement.label, role: part.role, box: boxAt(placement.positionMm, size) };
  });
}

function group(id: string, label: string, parts: readonly EnvelopePart[]): Subassembly {
  return { id, label, partIds: [...new Set(parts.map((p) => p.partId))], box: boxUnion(parts.map((p) => p.box)) };
}

const round = (n: number): number => Math.round(n * 10) / 10;
