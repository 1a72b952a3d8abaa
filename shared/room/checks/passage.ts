/**
 * Getting the piece into the room through each of its doors: the whole piece upright or
 * tipped, and when it will not go whole, each of the subassemblies it comes apart into (the
 * case, the lid) carried on its own. The geometry is in `passage.ts`.
 */
import { boxSize } from '../../engine/geometry/box.ts';
import type { CheckOutcome } from '../collision.ts';
import type { FitContext } from '../fitContext.ts';
import { boxThroughDoor, type BoxPassage } from '../passage.ts';
import { mmText, roomCheck, tenth } from '../roomCheck.ts';

const WAY_WORDS = { upright: 'upright', tipped: 'tipped on its back or side', none: 'not at all' } as const;

/** One check per door of the room, id `passage:<door id>`; a warning when the room has no door. */
export function passageChecks(ctx: FitContext): CheckOutcome[] {
  const { room, piece } = ctx;
  if (room.doors.length === 0) {
    return [{
      check: roomCheck({
        id: 'passage', passed: false, failSeverity: 'warning', title: 'Through the door',
        message: 'The room has no door entered, so getting the piece in is not checked.',
        partIds: [], numbers: {}, fix: 'Enter the door the piece comes in through.', needsInput: true,
      }),
      collisions: [],
    }];
  }
  return room.doors.map((door) => {
    const opening = { widthMm: door.width, heightMm: door.height };
    const whole = boxThroughDoor(boxSize(piece.box), opening, room.ceiling);
    const parts = piece.subassemblies.map((s) => ({ sub: s, passage: boxThroughDoor(boxSize(s.box), opening, room.ceiling) }));
    const apart = piece.subassemblies.length > 1 && parts.every((p) => p.passage.way !== 'none');
    const passed = whole.way !== 'none' || apart;
    const doorText = `door ${door.id} (${mmText(door.width)} × ${mmText(door.height)} clear)`;
    const numbers: Record<string, number> = {
      doorWidthMm: tenth(door.width),
      doorHeightMm: tenth(door.height),
      smallestFaceMm: tenth(whole.smallestFaceMm[0]),
      smallestFaceOtherMm: tenth(whole.smallestFaceMm[1]),
      standUpDiagonalMm: tenth(whole.standUpDiagonalMm),
      ceilingMm: tenth(room.ceiling),
    };

    let message: string;
    let fix: string | undefined;
    if (whole.way !== 'none') {
      message = `The whole piece goes through ${doorText} ${WAY_WORDS[whole.way]}${whole.way === 'tipped' ? `, and stands up under the ceiling (diagonal ${mmText(whole.standUpDiagonalMm)})` : ''}.`;
    } else if (apart) {
      message = `The whole piece does not go through ${doorText} (${why(whole)}); taken apart it does: ${parts.map((p) => `${p.sub.label} ${WAY_WORDS[p.passage.way]}`).join(', ')}.`;
      fix = `Carry it in as ${parts.map((p) => p.sub.label).join(' and ')}, and assemble it in the room.`;
    } else {
      const stuck = parts.filter((p) => p.passage.way === 'none');
      const worst = stuck[0]?.passage ?? whole;
      const shortMm = Math.max(0, worst.smallestFaceMm[0] - Math.min(door.width, door.height));
      numbers['shortfallMm'] = tenth(shortMm);
      message = `The piece does not go through ${doorText}: ${why(whole)}${piece.subassemblies.length > 1 ? `, and taken apart ${stuck.map((p) => p.sub.label).join(' and ')} still does not` : ''}.`;
      fix = worst.blockedByCeiling
        ? `It goes through tipped but cannot be stood up: its diagonal is ${mmText(worst.standUpDiagonalMm)} under a ${mmText(room.ceiling)} ceiling; make it lower or shallower.`
        : `Its smallest face must come down to the door: make it ${mmText(shortMm)} smaller across its smallest face, or build it to be assembled in the room.`;
    }
    return {
      check: roomCheck({ id: `passage:${door.id}`, passed, title: `Through door ${door.id}`, message, partIds: [], numbers, ...(fix ? { fix } : {}) }),
      collisions: [],
    };
  });
}

function why(p: BoxPassage): string {
  const face = `${mmText(p.smallestFaceMm[0])} × ${mmText(p.smallestFaceMm[1])}`;
  return p.blockedByCeiling
    ? `tipped it would go through, but its ${mmText(p.standUpDiagonalMm)} diagonal cannot be stood up under the ceiling`
    : `upright it shows ${mmText(p.uprightFaceMm[0])} × ${mmText(p.uprightFaceMm[1])}, and even its smallest face is ${face}`;
}
