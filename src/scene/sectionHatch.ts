/**
 * Section hatching, as on a drawing: each part's cut faces get a hatch, and two parts that meet
 * — in a joint, or just touching, as a lid rests on a rail — never get the same one, so a tongue
 * reads against the groove it sits in.
 */
import { localBoxToWorld } from '../../shared/engine/geometry/placement.ts';
import type { Box3, PieceResult } from '../../shared/engine/types.ts';

/** Parts whose assembled boxes come this close (mm) touch. */
const CONTACT_MM = 0.5;

function touching(a: Box3, b: Box3): boolean {
  for (let i = 0; i < 3; i++) {
    if (a.min[i]! > b.max[i]! + CONTACT_MM || b.min[i]! > a.max[i]! + CONTACT_MM) return false;
  }
  return true;
}

/** The hatches: 45° and 135° lines, wide and close spaced, and a cross-hatch at each spacing. */
export const SECTION_HATCHES = [
  { angleDeg: 45, spacingPx: 9, cross: false },
  { angleDeg: 135, spacingPx: 9, cross: false },
  { angleDeg: 45, spacingPx: 5, cross: false },
  { angleDeg: 135, spacingPx: 5, cross: false },
  { angleDeg: 45, spacingPx: 9, cross: true },
  { angleDeg: 0, spacingPx: 6, cross: false },
] as const;

/**
 * A hatch index for every part: greedy colouring, in part order, of the graph whose edges are
 * the result's joints and the pairs of parts whose assembled boxes touch. A part with more
 * neighbours than there are hatches takes the hatch its neighbours use least.
 */
export function sectionHatches(result: PieceResult): Map<string, number> {
  const neighbours = new Map<string, Set<string>>(result.parts.map((p) => [p.id, new Set<string>()]));
  for (const joint of result.joints) {
    const [a, b] = [joint.members[0].partId, joint.members[1].partId];
    if (a === b) continue;
    neighbours.get(a)?.add(b);
    neighbours.get(b)?.add(a);
  }
  const sizes = new Map(result.parts.map((p) => [p.id, [p.lengthMm, p.widthMm, p.thicknessMm] as const]));
  const boxes = result.placements.flatMap((pl) => {
    const size = sizes.get(pl.partId);
    return size ? [{ partId: pl.partId, box: localBoxToWorld({ min: [0, 0, 0], max: size }, size, pl.axes, pl.positionMm) }] : [];
  });
  for (let i = 0; i < boxes.length; i++) {
    for (let j = i + 1; j < boxes.length; j++) {
      const a = boxes[i]!;
      const b = boxes[j]!;
      if (a.partId === b.partId || !touching(a.box, b.box)) continue;
      neighbours.get(a.partId)!.add(b.partId);
      neighbours.get(b.partId)!.add(a.partId);
    }
  }
  const hatch = new Map<string, number>();
  for (const part of result.parts) {
    const used = new Array<number>(SECTION_HATCHES.length).fill(0);
    for (const n of neighbours.get(part.id)!) {
      const h = hatch.get(n);
      if (h !== undefined) used[h]!++;
    }
    const free = used.indexOf(0);
    hatch.set(part.id, free >= 0 ? free : used.indexOf(Math.min(...used)));
  }
  return hatch;
}
