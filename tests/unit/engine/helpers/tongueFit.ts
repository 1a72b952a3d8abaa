/**
 * Does every tongue sit in its groove? For each tongue-and-groove joint, every placed tongue
 * must lie inside a placed groove of the receiving part, as thick as the groove is wide, and
 * short of its bottom by the joint's stated clearance.
 */
import { boxContains } from '../../../../shared/engine/geometry/box.ts';
import type { Box3, PieceResult } from '../../../../shared/engine/types.ts';
import { featureBoxToWorld } from './solids.ts';

export interface FitProblem {
  joint: string;
  instance: string;
  reason: string;
}

/** Parts merged as identical may differ by up to 0.1 µm (the engine's merge grid). */
const TOLERANCE_MM = 1e-4;

export function tongueFitProblems(result: PieceResult): FitProblem[] {
  const parts = new Map(result.parts.map((p) => [p.id, p]));
  const placementsOf = (id: string) => result.placements.filter((p) => p.partId === id);
  const problems: FitProblem[] = [];
  for (const joint of result.joints) {
    if (joint.type !== 'stub-tenon' && joint.type !== 'panel-in-groove') continue;
    const [a, b] = joint.members;
    const tonguePart = parts.get(a.partId)!;
    const groovePart = parts.get(b.partId)!;
    const grooves: Box3[] = placementsOf(b.partId).flatMap((pl) =>
      groovePart.features.filter((f) => b.featureIds.includes(f.id)).map((f) => featureBoxToWorld(groovePart, pl, f.removed[0]!)),
    );
    for (const pl of placementsOf(a.partId)) {
      for (const feature of tonguePart.features) {
        if (!a.featureIds.includes(feature.id) || feature.type !== 'tongue') continue;
        const tongue = featureBoxToWorld(tonguePart, pl, feature.tongue);
        const host = grooves.find((g) => boxContains(g, tongue, TOLERANCE_MM));
        if (!host) continue; // this tongue belongs to another joint of the same parts
        // The gap at the groove bottom is the difference along the axis where the tongue is shorter
        // than the groove at one end only.
        const gaps = [0, 1, 2].map((axis) => {
          const lo = tongue.min[axis]! - host.min[axis]!;
          const hi = host.max[axis]! - tongue.max[axis]!;
          return { lo, hi };
        });
        const widthOk = gaps.some(({ lo, hi }) => Math.abs(lo) < TOLERANCE_MM && Math.abs(hi) < TOLERANCE_MM);
        if (!widthOk) problems.push({ joint: joint.id, instance: pl.label, reason: 'tongue is not as thick as the groove is wide' });
        const endGaps = gaps.flatMap(({ lo, hi }) => (Math.abs(lo) < TOLERANCE_MM ? [hi] : Math.abs(hi) < TOLERANCE_MM ? [lo] : []));
        if (!endGaps.some((g) => Math.abs(g - joint.clearanceMm) < TOLERANCE_MM)) {
          problems.push({ joint: joint.id, instance: pl.label, reason: `no end gap equals the stated clearance ${joint.clearanceMm}` });
        }
      }
    }
    const fitted = placementsOf(a.partId).flatMap((pl) =>
      tonguePart.features.filter((f) => f.type === 'tongue' && a.featureIds.includes(f.id)).map((f) => f.type === 'tongue' ? featureBoxToWorld(tonguePart, pl, f.tongue) : null),
    ).filter((t) => t && grooves.some((g) => boxContains(g, t, TOLERANCE_MM)));
    if (fitted.length === 0) problems.push({ joint: joint.id, instance: '-', reason: 'no tongue of this joint lies in its groove' });
  }
  return problems;
}
