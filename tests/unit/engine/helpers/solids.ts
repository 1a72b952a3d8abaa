/**
 * World geometry of a built piece for tests: every part instance as a box minus the boxes its
 * features remove, and the volume two instances share after those cuts.
 */
import { boxIntersection } from '../../../../shared/engine/geometry/box.ts';
import { localBoxToWorld, worldSize } from '../../../../shared/engine/geometry/placement.ts';
import type { Box3, Feature, Part, PieceResult, Placement } from '../../../../shared/engine/types.ts';

/**
 * Overlap volume below which two solids are taken to touch, mm³: parts merged as identical may
 * differ by 0.1 µm, which along a panel edge in its groove adds up to about 1e-3 mm³. A real
 * collision of even 0.1 mm over a 6 mm tongue 10 mm long is 6 mm³.
 */
export const OVERLAP_TOLERANCE_MM3 = 0.01;

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

/**
 * Solid left in `region` once `cuts` are taken away: its volume (mm³) and the thickest cell of
 * it (mm), found by splitting space at every box face. A sliver from parts merged within the
 * engine's 0.1 µm grid has volume but no thickness.
 */
export function remainingSolid(region: Box3, cuts: readonly Box3[]): { volumeMm3: number; thicknessMm: number } {
  const boxes = [region, ...cuts];
  const cutsOnAxis = [0, 1, 2].map((axis) => [...new Set(boxes.flatMap((b) => [b.min[axis]!, b.max[axis]!]))].filter((v) => v >= region.min[axis]! && v <= region.max[axis]!).sort((a, b) => a - b));
  const [xs, ys, zs] = cutsOnAxis as [number[], number[], number[]];
  let volumeMm3 = 0;
  let thicknessMm = 0;
  for (let i = 0; i + 1 < xs.length; i++) {
    for (let j = 0; j + 1 < ys.length; j++) {
      for (let k = 0; k + 1 < zs.length; k++) {
        const c = [(xs[i]! + xs[i + 1]!) / 2, (ys[j]! + ys[j + 1]!) / 2, (zs[k]! + zs[k + 1]!) / 2];
        if (cuts.some((b) => c.every((v, a) => v > b.min[a]! && v < b.max[a]!))) continue;
        const size = [xs[i + 1]! - xs[i]!, ys[j + 1]! - ys[j]!, zs[k + 1]! - zs[k]!];
        volumeMm3 += size[0]! * size[1]! * size[2]!;
        thicknessMm = Math.max(thicknessMm, Math.min(...size));
      }
    }
  }
  return { volumeMm3, thicknessMm };
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

/** Solid two instances share once each one's cuts are taken away: volume (mm³) and thickness (mm). */
export function sharedSolid(a: Solid, b: Solid): { volumeMm3: number; thicknessMm: number } {
  const common = boxIntersection(a.box, b.box);
  if (!common) return { volumeMm3: 0, thicknessMm: 0 };
  const cuts = [...a.removed, ...b.removed].map((r) => boxIntersection(r, common)).filter((r): r is Box3 => r !== null);
  return remainingSolid(common, cuts);
}

/** Thinner than this, a shared solid is a sliver of the engine's merge grid, not a collision (mm). */
export const OVERLAP_THICKNESS_MM = 1e-3;

/** Every pair of instances whose solids overlap by more than the tolerances. */
export function overlappingPairs(result: PieceResult): { a: string; b: string; volumeMm3: number; thicknessMm: number }[] {
  const solids = solidsOf(result);
  const out: { a: string; b: string; volumeMm3: number; thicknessMm: number }[] = [];
  for (let i = 0; i < solids.length; i++) {
    for (let j = i + 1; j < solids.length; j++) {
      const s = sharedSolid(solids[i]!, solids[j]!);
      if (s.volumeMm3 > OVERLAP_TOLERANCE_MM3 && s.thicknessMm > OVERLAP_THICKNESS_MM) out.push({ a: solids[i]!.placement.label, b: solids[j]!.placement.label, ...s });
    }
  }
  return out;
}
