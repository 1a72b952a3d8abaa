/**
 * The closed piece stands clear of the walls, ceiling, baseboards, projecting sills, door
 * landings and obstacles. Each meeting comes with how far it goes on the piece's cheapest axis:
 * along the wall (move it or make it narrower), out from the wall (shallower) or up (lower).
 */
import type { Box3 } from '../../engine/types.ts';
import { boxIntersection, boxSize, boxUnion } from '../../engine/geometry/box.ts';
import type { Collision, CheckOutcome } from '../collision.ts';
import type { FitContext } from '../fitContext.ts';
import { pieceBoxToRoom } from '../roomFrame.ts';
import { mmText, roomCheck, tenth } from '../roomCheck.ts';

const AXIS_FIX = [
  (n: string) => `move it ${n} along the wall or make it ${n} narrower`,
  (n: string) => `make it ${n} shallower`,
  (n: string) => `make it ${n} lower`,
] as const;

/** The footprint check, id `footprint`. */
export function footprintCheck(ctx: FitContext): CheckOutcome {
  const { piece, placed, room } = ctx;
  const size = boxSize(piece.box);
  const collisions: Collision[] = [];
  const fixes: string[] = [];
  let worstMm = 0;
  for (const solid of ctx.solids) {
    const partIds = new Set<string>();
    const shared: Box3[] = [];
    for (const part of piece.parts) {
      const overlap = boxIntersection(part.box, solid.local);
      if (!overlap) continue;
      partIds.add(part.partId);
      shared.push(overlap);
    }
    if (shared.length === 0) continue;
    // The whole piece must come clear, so the move is read off everything it shares with the solid.
    const overlap = boxUnion(shared);
    const s = boxSize(overlap);
    const axis = s.indexOf(Math.min(...s)) as 0 | 1 | 2;
    collisions.push({ checkId: 'footprint', solidId: solid.id, partIds: [...partIds], overlapMm: pieceBoxToRoom(room, placed.pose, overlap) });
    fixes.push(`${solid.label}: ${AXIS_FIX[axis](mmText(s[axis]))}`);
    worstMm = Math.max(worstMm, s[axis]);
  }

  const sizeText = size.map(mmText).join(' × ');
  const passed = collisions.length === 0;
  const nicheWidth = placed.niche ? placed.niche.toMm - placed.niche.fromMm : 0;
  return {
    check: roomCheck({
      id: 'footprint',
      passed,
      title: 'Footprint',
      message: passed
        ? `The closed piece (${sizeText}) stands clear of the walls, ceiling, baseboards, sills, door landings and obstacles, ${mmText(placed.standoffMm)} off the ${room.placement.wall} wall.`
        : `The closed piece (${sizeText}) meets ${collisions.map((c) => ctx.solids.find((s) => s.id === c.solidId)!.label).join(', ')}.`,
      partIds: [...new Set(collisions.flatMap((c) => c.partIds))],
      numbers: {
        widthMm: tenth(size[0]),
        depthMm: tenth(size[1]),
        heightMm: tenth(size[2]),
        standoffMm: tenth(placed.standoffMm),
        nicheWidthMm: tenth(nicheWidth),
        worstOverlapMm: tenth(worstMm),
      },
      ...(passed ? {} : { fix: `${fixes.join('; ')}.` }),
    }),
    collisions,
  };
}
