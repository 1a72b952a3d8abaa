/**
 * The lid swung up and back about its hinge line to its stop, against the walls, sills,
 * ceiling and obstacles. When it meets something the fix says how much further from the wall
 * the piece must stand (found by halving, to {@link PULL_OUT_RESOLUTION_MM}) for the lid to
 * clear, if any distance within the room does.
 */
import type { CheckOutcome } from '../collision.ts';
import type { FitContext, LocalSolid } from '../fitContext.ts';
import type { LidOpening } from '../pieceEnvelope.ts';
import { roomSpanOffWallMm } from '../roomFrame.ts';
import { mmText, roomCheck, tenth } from '../roomCheck.ts';
import { sweepSwing, type SwingAxis, type SwingResult } from '../swing.ts';

/** How finely the pull-out fix is found, mm. */
export const PULL_OUT_RESOLUTION_MM = 1;

/** The lid's swing: about X through its hinge line, the front edge rising toward the back (clockwise in Y–Z). */
export function lidSwingAxis(lid: LidOpening): SwingAxis {
  return { axis: 'x', pivot: [lid.hingeYMm, lid.hingeZMm], sense: -1 };
}

/** The open-lid check, id `lid-open`; none for a piece without a lid. */
export function lidOpenCheck(ctx: FitContext): CheckOutcome | null {
  const lid = ctx.piece.lid;
  if (!lid) return null;
  const result = swingAt(ctx.solids, lid, 0);
  const passed = result.firstContactDeg === null;
  const radius = Math.max(...lid.parts.flatMap((p) => [p.box.min[1], p.box.max[1]].flatMap((y) => [p.box.min[2], p.box.max[2]].map((z) => Math.hypot(y - lid.hingeYMm, z - lid.hingeZMm)))));
  const numbers: Record<string, number> = {
    openAngleDeg: lid.openAngleDeg,
    hingeYMm: tenth(lid.hingeYMm),
    hingeZMm: tenth(lid.hingeZMm),
    swingRadiusMm: tenth(radius),
  };
  const labelOf = (id: string) => ctx.solids.find((s) => s.id === id)?.label ?? id;

  let message: string;
  let fix: string | undefined;
  if (passed) {
    message = `The lid opens to its ${lid.openAngleDeg}° stop clear of the walls, sills, ceiling and obstacles.`;
  } else {
    const first = result.firstContactDeg!;
    const what = [...new Set(result.hits.filter((h) => h.atDeg === first).map((h) => labelOf(h.solidId)))].join(' and ');
    numbers['contactDeg'] = first;
    message = `The lid meets ${what} at ${first}° of its ${lid.openAngleDeg}° opening.`;
    const hitIds = new Set(result.hits.map((h) => h.solidId));
    const pullOut = pullOutToClear(ctx.solids.filter((s) => hitIds.has(s.id)), lid, roomSpanOffWallMm(ctx.room, ctx.room.placement.wall));
    const resize = 'size the piece to its niche (fit) so the open lid clears';
    if (pullOut !== null) {
      numbers['pullOutMm'] = pullOut;
      fix = `Stand the piece ${mmText(pullOut)} further from the wall (${mmText(ctx.placed.standoffMm + pullOut)} off it), or ${resize}.`;
    } else {
      fix = `Standing it further out does not clear it; ${resize}.`;
    }
  }
  return {
    check: roomCheck({ id: 'lid-open', passed, title: 'Lid open', message, partIds: [...new Set(result.hits.map((h) => h.partId))], numbers, ...(fix ? { fix } : {}) }),
    collisions: result.hits.map((h) => ({ checkId: 'lid-open', solidId: h.solidId, partIds: [h.partId], atDeg: h.atDeg })),
  };
}

function swingAt(solids: readonly LocalSolid[], lid: LidOpening, extraMm: number): SwingResult {
  const moved = solids.map((s) => ({ id: s.id, box: { min: [s.local.min[0], s.local.min[1] + extraMm, s.local.min[2]], max: [s.local.max[0], s.local.max[1] + extraMm, s.local.max[2]] } as const }));
  return sweepSwing(lid.parts, lidSwingAxis(lid), lid.openAngleDeg, moved);
}

/**
 * The least extra distance from the wall (mm, whole) at which the lid clears the solids it met,
 * or null when no distance up to `spanMm` does. Whether the piece then meets something in front
 * is for the checks to say at the new place.
 */
function pullOutToClear(hit: readonly LocalSolid[], lid: LidOpening, spanMm: number): number | null {
  // Moving the piece out by e moves every room solid by +e along the piece's Y (toward its back).
  let hi = spanMm;
  if (swingAt(hit, lid, hi).firstContactDeg !== null) return null;
  let lo = 0;
  while (hi - lo > PULL_OUT_RESOLUTION_MM) {
    const mid = (lo + hi) / 2;
    if (swingAt(hit, lid, mid).firstContactDeg === null) hi = mid;
    else lo = mid;
  }
  return Math.ceil(hi);
}
