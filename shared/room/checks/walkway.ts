/**
 * Clear floor in front of the piece with everything open: from the front of the open piece
 * (drawers out, doors at 90°, the lid at its stop) straight out to the nearest thing across the
 * piece's width — the bed, the facing wall — below head height.
 */
import type { CheckOutcome } from '../collision.ts';
import type { FitContext } from '../fitContext.ts';
import type { PieceEnvelope } from '../pieceEnvelope.ts';
import { mmText, roomCheck, tenth } from '../roomCheck.ts';
import { swungCorners } from '../swing.ts';
import { doorSwingAxis, DOOR_CHECK_ANGLE_DEG } from './doorsOpen.ts';
import { pulledOut } from './drawersOpen.ts';
import { lidSwingAxis } from './lidOpen.ts';

/**
 * Clear floor wanted in front of an open piece when the room does not say, mm: 30 in, room to
 * kneel at a chest or stand at an open drawer and step past (common practice, no published
 * source). Routes meant for wheelchair users need more — follow local codes.
 */
export const DEFAULT_WALKWAY_MM = 762;

/** Things whose underside is at least this high do not block a walkway, mm: about a doorway's head (common practice, no published source). */
export const WALKWAY_HEADROOM_MM = 2000;

/** How far forward of the piece's frame origin the open piece reaches: its smallest Y, mm. */
export function openFrontY(piece: PieceEnvelope): number {
  let front = piece.box.min[1];
  for (const drawer of piece.drawers) for (const p of drawer.parts) front = Math.min(front, pulledOut(p.box, drawer.travelMm).min[1]);
  for (const door of piece.doors) {
    const angle = Math.min(door.openAngleDeg, DOOR_CHECK_ANGLE_DEG);
    for (const p of door.parts) for (const c of swungCorners(p.box, doorSwingAxis(door), angle)) front = Math.min(front, c[1]);
  }
  if (piece.lid) {
    for (const p of piece.lid.parts) for (const c of swungCorners(p.box, lidSwingAxis(piece.lid), piece.lid.openAngleDeg)) front = Math.min(front, c[0]);
  }
  return front;
}

/** The walkway check, id `walkway`. */
export function walkwayCheck(ctx: FitContext): CheckOutcome {
  const { piece } = ctx;
  const minimum = ctx.room.clearances.walkway ?? DEFAULT_WALKWAY_MM;
  const front = openFrontY(piece);
  let walkway = Infinity;
  let nearestId = '';
  for (const solid of ctx.solids) {
    const b = solid.local;
    if (b.min[2] >= WALKWAY_HEADROOM_MM) continue;
    if (b.max[0] <= piece.box.min[0] || b.min[0] >= piece.box.max[0]) continue;
    if (b.min[1] >= front) continue;
    const gap = Math.max(0, front - b.max[1]);
    if (gap < walkway) [walkway, nearestId] = [gap, solid.id];
  }
  const nearest = ctx.solids.find((s) => s.id === nearestId)?.label ?? 'nothing';
  const passed = walkway >= minimum;
  const short = minimum - walkway;
  return {
    check: roomCheck({
      id: 'walkway',
      passed,
      failSeverity: 'warning',
      title: 'Walkway in front',
      message: passed
        ? `With everything open there is ${mmText(walkway)} of clear floor in front of the piece, up to ${nearest}; ${mmText(minimum)} is wanted.`
        : `With everything open only ${mmText(walkway)} of clear floor is left in front of the piece, up to ${nearest}; ${mmText(minimum)} is wanted.`,
      partIds: [],
      numbers: { walkwayMm: tenth(walkway), minimumMm: tenth(minimum), openReachMm: tenth(piece.box.max[1] - front) },
      ...(passed ? {} : { fix: `Find ${mmText(short)} more: make the piece ${mmText(short)} shallower, or move ${nearest} that much further away.` }),
    }),
    collisions: [],
  };
}
