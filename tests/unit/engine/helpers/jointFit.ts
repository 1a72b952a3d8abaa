/**
 * Does every tongue sit in its housing? For each joint of the given types, every placed tongue of
 * the first member must lie inside a placed groove or dado of the second, as thick as the housing
 * is wide, and short of its bottom by the joint's stated clearance.
 */
import { boxContains } from '../../../../shared/engine/geometry/box.ts';
import type { Box3, JointType, PieceResult } from '../../../../shared/engine/types.ts';
import { featureBoxToWorld } from './solids.ts';

/**
 * The assembly merges parts whose sizes agree to its 0.1 µm grid, and places every instance with
 * the first one's features, so a tongue or housing may stand up to 0.1 µm off: 1e-4 mm.
 */
const TOLERANCE_MM = 1e-4;

/** Problems found, in words; empty when every tongue fits. */
export function jointFitProblems(result: PieceResult, types: readonly JointType[]): string[] {
  const parts = new Map(result.parts.map((p) => [p.id, p]));
  const placementsOf = (id: string) => result.placements.filter((p) => p.partId === id);
  const problems: string[] = [];
  for (const joint of result.joints) {
    if (!types.includes(joint.type)) continue;
    const [a, b] = joint.members;
    const tonguePart = parts.get(a.partId)!;
    const housingPart = parts.get(b.partId)!;
    const housings: Box3[] = placementsOf(b.partId).flatMap((pl) =>
      housingPart.features.filter((f) => b.featureIds.includes(f.id)).map((f) => featureBoxToWorld(housingPart, pl, f.removed[0]!)));
    let fitted = 0;
    for (const pl of placementsOf(a.partId)) {
      for (const feature of tonguePart.features) {
        if (!a.featureIds.includes(feature.id) || feature.type !== 'tongue') continue;
        const tongue = featureBoxToWorld(tonguePart, pl, feature.tongue);
        const host = housings.find((g) => boxContains(g, tongue, TOLERANCE_MM));
        if (!host) continue;
        fitted += 1;
        const gaps = [0, 1, 2].map((axis) => ({ lo: tongue.min[axis]! - host.min[axis]!, hi: host.max[axis]! - tongue.max[axis]! }));
        if (!gaps.some(({ lo, hi }) => Math.abs(lo) < TOLERANCE_MM && Math.abs(hi) < TOLERANCE_MM)) problems.push(`${joint.id} ${pl.label}: tongue not as thick as its housing is wide`);
        const ends = gaps.flatMap(({ lo, hi }) => (Math.abs(lo) < TOLERANCE_MM ? [hi] : Math.abs(hi) < TOLERANCE_MM ? [lo] : []));
        if (!ends.some((g) => Math.abs(g - joint.clearanceMm) < TOLERANCE_MM)) problems.push(`${joint.id} ${pl.label}: no end gap equals the stated clearance ${joint.clearanceMm}`);
      }
    }
    if (fitted === 0) problems.push(`${joint.id}: no tongue lies in its housing`);
  }
  return problems;
}
