/**
 * A closed piece standing in front of a window: its top against the sill. A piece whose top
 * rises past the sill covers the bottom of the window (a warning: it fits, but blocks light
 * and the sash); one that meets a projecting sill board is a footprint collision as well.
 */
import type { CheckOutcome } from '../collision.ts';
import type { FitContext } from '../fitContext.ts';
import { pieceBoxToRoom, roomBoxToWall } from '../roomFrame.ts';
import { mmText, roomCheck, tenth } from '../roomCheck.ts';

/** One check per window on the piece's wall that the piece stands in front of, id `window-closed:<id>`. */
export function windowClosedChecks(ctx: FitContext): CheckOutcome[] {
  const { room, piece, placed } = ctx;
  const wall = room.placement.wall;
  const onWall = roomBoxToWall(room, wall, pieceBoxToRoom(room, placed.pose, piece.box));
  const top = piece.box.max[2];
  const out: CheckOutcome[] = [];
  for (const win of room.windows) {
    if (win.wall !== wall) continue;
    if (onWall.max[0] <= win.position || onWall.min[0] >= win.position + win.width) continue;
    const clearance = win.sillHeight - top;
    const passed = clearance >= 0;
    out.push({
      check: roomCheck({
        id: `window-closed:${win.id}`,
        passed,
        failSeverity: 'warning',
        title: `Window ${win.id}, lid closed`,
        message: passed
          ? `The top of the piece is ${mmText(clearance)} below the ${mmText(win.sillHeight)} sill of window ${win.id}.`
          : `The top of the piece is ${mmText(-clearance)} above the ${mmText(win.sillHeight)} sill of window ${win.id} and covers the bottom of it.`,
        partIds: [],
        numbers: { sillHeightMm: tenth(win.sillHeight), topMm: tenth(top), clearanceMm: tenth(clearance) },
        ...(passed ? {} : { fix: `Make the piece ${mmText(-clearance)} lower, or move it along the wall clear of the window.` }),
      }),
      collisions: [],
    });
  }
  return out;
}
