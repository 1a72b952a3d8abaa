/**
 * Section hatching, as on a drawing: each part's cut faces get a hatch, and two parts that meet
 * in a joint never get the same one, so a tongue reads against the groove it sits in.
 */
import type { PieceResult } from '../../shared/engine/types.ts';

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
 * A hatch index for every part: greedy colouring of the graph whose edges are the result's
 * joints, in part order. A part joined to more parts than there are hatches takes the hatch its
 * neighbours use least.
 */
export function sectionHatches(result: PieceResult): Map<string, number> {
  const neighbours = new Map<string, Set<string>>(result.parts.map((p) => [p.id, new Set<string>()]));
  for (const joint of result.joints) {
    const [a, b] = [joint.members[0].partId, joint.members[1].partId];
    if (a === b) continue;
    neighbours.get(a)?.add(b);
    neighbours.get(b)?.add(a);
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
