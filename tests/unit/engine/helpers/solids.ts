/**
 * World geometry of a built piece for tests: every part instance as a box minus the boxes its
 * features remove, and the volume two instances share after those cuts.
 */
import { boxIntersection, boxVolume } from '../../../../shared/engine/geometry/box.ts';
import { localBoxToWorld, worldSize } from '../../../../shared/engine/geometry/placement.ts';
import type { Box3, Feature, Part, PieceResult, Placement } from '../../../../shared/engine/types.ts';

export interface Solid {
  part: Part;
  placement: Placement;
  box: Box3;
  removed: Box3[];
}

export function worldBoxOf(part: Part, placement: Placement): Box3 {
  const size = worldSize(placement.axes, [part.lengthMm, part.widthMm, part.thicknessMm]);
  const min = placement.positionMm;
  return { min, max: [min[0] + size[0], min[1] + size[1], min[2] + size[2]] };
}

export function featureBoxToWorld(part: Part, placement: Placement, box: Box3): Box3 {
  return localBoxToWorld(box, [part.lengthMm, part.widthMm, part.thicknessMm], placement.axes, placement.positionMm);
}

export function solidsOf(result: PieceResult): Solid[] {
  const parts = new Map(result.parts.map((p) => [p.id, p]));
  return result.placements.map((placement) => {
    const part = parts.get(placement.partId)!;
    return {
      part,
      placement,
      box: worldBoxOf(part, placement),
      removed: part.features.flatMap((f: Feature) => f.removed.map((b) => featureBoxToWorld(part, placement, b))),
    };
  });
}

/** Volume of the union of `boxes` (mm³), by splitting space at every box face. */
export function unionVolume(boxes: readonly Box3[]): number {
  if (boxes.length === 0) return 0;
  const cuts = [0, 1, 2].map((axis) => [...new Set(boxes.flatMap((b) => [b.min[axis]!, b.max[axis]!]))].sort((a, b) => a - b));
  let volume = 0;
  const [xs, ys, zs] = cuts as [number[], number[], number[]];
  for (let i = 0; i + 1 < xs.length; i++) {
    for (let j = 0; j + 1 < ys.length; j++) {
      for (let k = 0; k + 1 < zs.length; k++) {
        const c = [(xs[i]! + xs[i + 1]!) / 2, (ys[j]! + ys[j + 1]!) / 2, (zs[k]! + zs[k + 1]!) / 2];
        if (boxes.some((b) => c.every((v, a) => v > b.min[a]! && v < b.max[a]!))) {
          volume += (xs[i + 1]! - xs[i]!) * (ys[j + 1]! - ys[j]!) * (zs[k + 1]! - zs[k]!);
        }
      }
    }
  }
  return volume;
}

/** Solid volume two instances share once each one's cuts are taken away (mm³). */
export function sharedSolidVolume(a: Solid, b: Solid): number {
  const common = boxIntersection(a.box, b.box);
  if (!common) return 0;
  const cuts = [...a.removed, ...b.removed].map((r) => boxIntersection(r, common)).filter((r): r is Box3 => r !== null);
  return boxVolume(common) - unionVolume(cuts);
}

/** Every pair of instances whose solids overlap by more than `toleranceMm3`. */
export function overlappingPairs(result: PieceResult, toleranceMm3 = 1e-3): { a: string; b: string; volumeMm3: number }[] {
  const solids = solidsOf(result);
  const out: { a: string; b: string; volumeMm3: number }[] = [];
  for (let i = 0; i < solids.length; i++) {
    for (let j = i + 1; j < solids.length; j++) {
      const v = sharedSolidVolume(solids[i]!, solids[j]!);
      if (v > toleranceMm3) out.push({ a: solids[i]!.placement.label, b: solids[j]!.placement.label, volumeMm3: v });
    }
  }
  return out;
}
