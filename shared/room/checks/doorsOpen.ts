/**
 * Each of the piece's doors swung open to 90° about its hinge edge, against the room.
 */
import type { CheckOutcome } from '../collision.ts';
import type { FitContext } from '../fitContext.ts';
import type { DoorOpening } from '../pieceEnvelope.ts';
import { roomCheck } from '../roomCheck.ts';
import { sweepSwing, type SwingAxis } from '../swing.ts';

/** Room fit checks doors open this far, degrees from closed. */
export const DOOR_CHECK_ANGLE_DEG = 90;

/** A door's swing: about Z through its hinge line; a left-hinged door turns clockwise seen from above. */
export function doorSwingAxis(door: DoorOpening): SwingAxis {
  return { axis: 'z', pivot: [door.hingeXMm, door.hingeYMm], sense: door.hinge === 'left' ? -1 : 1 };
}

/** One check per door of the piece, id `door-open:<id>`. */
export function doorOpenChecks(ctx: FitContext): CheckOutcome[] {
  const solids = ctx.solids.map((s) => ({ id: s.id, box: s.local }));
  return ctx.piece.doors.map((door) => {
    const angle = Math.min(door.openAngleDeg, DOOR_CHECK_ANGLE_DEG);
    const result = sweepSwing(door.parts, doorSwingAxis(door), angle, solids);
    const passed = result.firstContactDeg === null;
    const id = `door-open:${door.id}`;
    const what = passed ? '' : [...new Set(result.hits.filter((h) => h.atDeg === result.firstContactDeg).map((h) => ctx.solids.find((s) => s.id === h.solidId)?.label ?? h.solidId))].join(' and ');
    return {
      check: roomCheck({
        id,
        passed,
        title: `Door ${door.id} open`,
        message: passed
          ? `Door ${door.id} (hinged ${door.hinge}) opens to ${angle}° clear of the room.`
          : `Door ${door.id} (hinged ${door.hinge}) meets ${what} at ${result.firstContactDeg}° of ${angle}°.`,
        partIds: [...new Set(result.hits.map((h) => h.partId))],
        numbers: passed ? { openAngleDeg: angle } : { openAngleDeg: angle, contactDeg: result.firstContactDeg! },
        ...(passed ? {} : { fix: `Move the piece along the wall away from ${what}, or hinge door ${door.id} on the other side.` }),
      }),
      collisions: result.hits.map((h) => ({ checkId: id, solidId: h.solidId, partIds: [h.partId], atDeg: h.atDeg })),
    };
  });
}
