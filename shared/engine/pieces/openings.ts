/**
 * The openings of a piece, written by its builder from what it laid out: the lid's hinge line,
 * each door's hinge edge, each drawer's travel. Lengths mm, angles degrees, world frame.
 */
import type { Assembled, PartDraft } from '../assembly.ts';
import type { DoorOpening, DrawerOpening, LidOpening, PartInstanceRef } from '../types.ts';

/**
 * How far a lid opens when nothing says otherwise, degrees from closed: upright, where a
 * lid-support hinge or stay commonly stops it (common practice, no published source).
 */
export const LID_OPEN_ANGLE_DEG = 90;

/** How far a door swings open, degrees from closed: square to the case (common practice, no published source). */
export const DOOR_SWING_DEG = 90;

/** Drawers pull straight out toward the viewer. */
const PULL_DIRECTION = [0, -1, 0] as const;

/** The placed instances of `drafts`, in draft order. */
export function instanceRefs(assembled: Pick<Assembled, 'partIdOf' | 'instanceOf'>, drafts: readonly PartDraft[]): PartInstanceRef[] {
  return drafts.map((d) => ({ partId: assembled.partIdOf.get(d)!, instance: assembled.instanceOf.get(d)! }));
}

/** A lid hinged along X at the line (`hingeYMm`, `hingeZMm`). */
export function lidOpening(parts: readonly PartInstanceRef[], hingeYMm: number, hingeZMm: number): LidOpening {
  return { kind: 'lid', parts, hingeAxis: { origin: [0, hingeYMm, hingeZMm], direction: [1, 0, 0] }, openAngleDeg: LID_OPEN_ANGLE_DEG };
}

/** A door leaf spanning `x` (mm) with its front face at `frontYMm`, hung on `side`. */
export function doorOpening(id: string, parts: readonly PartInstanceRef[], side: 'left' | 'right', x: readonly [number, number], frontYMm: number, bottomZMm: number): DoorOpening {
  return { kind: 'door', id, parts, side, hingeAxis: { origin: [side === 'left' ? x[0] : x[1], frontYMm, bottomZMm], direction: [0, 0, 1] }, swingDeg: DOOR_SWING_DEG };
}

/** A drawer that comes out `travelMm`. */
export function drawerOpening(id: string, parts: readonly PartInstanceRef[], travelMm: number): DrawerOpening {
  return { kind: 'drawer', id, parts, travelMm, direction: PULL_DIRECTION };
}
