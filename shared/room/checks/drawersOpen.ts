/**
 * Each drawer pulled straight out to full extension, against the room. The drawer sweeps the
 * box from closed to open, so the open drawer's box stretched back to closed is what must be
 * clear; the fix names the travel that is clear.
 */
import { boxIntersection } from '../../engine/geometry/box.ts';
import type { Box3 } from '../../engine/types.ts';
import type { CheckOutcome, Collision } from '../collision.ts';
import type { FitContext } from '../fitContext.ts';
import { pieceBoxToRoom } from '../roomFrame.ts';
import { mmText, roomCheck, tenth } from '../roomCheck.ts';

/** `box` stretched toward −Y (out of the front) by `travelMm`. */
export function pulledOut(box: Box3, travelMm: number): Box3 {
  return { min: [box.min[0], box.min[1] - travelMm, box.min[2]], max: box.max };
}

/** One check per drawer of the piece, id `drawer-open:<id>`. */
export function drawerOpenChecks(ctx: FitContext): CheckOutcome[] {
  return ctx.piece.drawers.map((drawer) => {
    const id = `drawer-open:${drawer.id}`;
    const collisions: Collision[] = [];
    let clearTravel = drawer.travelMm;
    for (const solid of ctx.solids) {
      const partIds: string[] = [];
      for (const part of drawer.parts) {
        const swept = pulledOut(part.box, drawer.travelMm);
        const shared = boxIntersection(swept, solid.local);
        if (!shared) continue;
        partIds.push(part.partId);
        clearTravel = Math.min(clearTravel, Math.max(0, part.box.min[1] - solid.local.max[1]));
        collisions.push({ checkId: id, solidId: solid.id, partIds: [part.partId], overlapMm: pieceBoxToRoom(ctx.room, ctx.placed.pose, shared) });
      }
    }
    const passed = collisions.length === 0;
    const labels = [...new Set(collisions.map((c) => ctx.solids.find((s) => s.id === c.solidId)?.label ?? c.solidId))].join(' and ');
    return {
      check: roomCheck({
        id,
        passed,
        title: `Drawer ${drawer.id} open`,
        message: passed
          ? `Drawer ${drawer.id} pulls out its full ${mmText(drawer.travelMm)} clear of the room.`
          : `Drawer ${drawer.id} meets ${labels} after ${mmText(clearTravel)} of its ${mmText(drawer.travelMm)} travel.`,
        partIds: [...new Set(collisions.flatMap((c) => c.partIds))],
        numbers: { travelMm: tenth(drawer.travelMm), clearTravelMm: tenth(clearTravel), shortMm: tenth(drawer.travelMm - clearTravel) },
        ...(passed ? {} : { fix: `Leave ${mmText(drawer.travelMm - clearTravel)} more in front of the drawer: move ${labels} or make the piece that much shallower.` }),
      }),
      collisions,
    };
  });
}
