/** Every placed part instance as a world box, the solid the overall views are drawn from. */
import { localBoxToWorld } from '../engine/geometry/placement.ts';
import type { Box3, Part, PieceResult, Placement } from '../engine/types.ts';

/** One placed instance of a part: its world box in mm, lid closed, optionally exploded. */
export interface Instance {
  part: Part;
  placement: Placement;
  box: Box3;
}

/**
 * The world boxes of every placement in `result` (mm). With `exploded`, each box is moved by
 * its placement's explode offset.
 */
export function instancesOf(result: PieceResult, opts: { exploded?: boolean; omitRoles?: readonly string[] } = {}): Instance[] {
  const parts = new Map(result.parts.map((p) => [p.id, p]));
  const out: Instance[] = [];
  for (const placement of result.placements) {
    const part = parts.get(placement.partId);
    if (!part || opts.omitRoles?.includes(part.role)) continue;
    const size = [part.lengthMm, part.widthMm, part.thicknessMm] as const;
    const world = localBoxToWorld({ min: [0, 0, 0], max: size }, size, placement.axes, placement.positionMm);
    const e = opts.exploded ? placement.explodeMm : ([0, 0, 0] as const);
    out.push({
      part,
      placement,
      box: { min: [world.min[0] + e[0], world.min[1] + e[1], world.min[2] + e[2]], max: [world.max[0] + e[0], world.max[1] + e[1], world.max[2] + e[2]] },
    });
  }
  return out;
}
