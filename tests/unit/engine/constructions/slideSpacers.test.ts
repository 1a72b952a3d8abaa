import { describe, expect, it } from 'vitest';
import type { PartDraft } from '../../../../shared/engine/assembly.ts';
import { slideSpacers, type SlideSpacerPlacement } from '../../../../shared/engine/constructions/slideSpacers.ts';
import { plainPart, fixedName } from '../../../../shared/engine/constructions/plainPart.ts';
import { boxBetween } from '../../../../shared/engine/geometry/box.ts';
import type { Material } from '../../../../shared/engine/types.ts';

const maple: Material = { kind: 'solid', speciesId: 'hard-maple', speciesName: 'maple' };

function runner(x: [number, number]): PartDraft {
  return plainPart({
    group: 'runner', member: 'r', label: 'runner', role: 'runner', material: maple, grain: 'length', world: boxBetween([x[0], 0, 0], [x[1], 400, 19]),
    axes: { length: '+Y', width: '+X', thickness: '+Z' }, explodeMm: [0, 0, 0], name: fixedName('runner', 'Runner'),
  });
}

// One row of two drawers in a 600 mm case on 44 mm legs: side strips 12 mm thick (x 32–44 and
// 556–568), a 50 mm block between the columns (x 275–325), all 50 mm tall on the runners (z 19–69).
const placements: SlideSpacerPlacement[] = [
  { row: 0, boundary: 0, kind: 'side', x: [32, 44], y: [44, 406], z: [19, 69] },
  { row: 0, boundary: 1, kind: 'centre', x: [275, 325], y: [19, 406], z: [19, 69] },
  { row: 0, boundary: 2, kind: 'side', x: [556, 568], y: [44, 406], z: [19, 69] },
];
const runners = [runner([32, 80]), runner([260, 340]), runner([520, 568])];

describe('slideSpacers', () => {
  const built = slideSpacers({ spacers: placements, material: maple, runnerUnder: (_row, boundary) => runners[boundary]!, explodeMm: 10 });

  it('makes each spacer the size of its place, thick across the step, its grain front to back', () => {
    expect(built.drafts.map((d) => d.size)).toEqual([[362, 50, 12], [387, 50, 50], [362, 50, 12]]);
    expect(built.drafts.every((d) => d.grain === 'length' && d.axes.length.endsWith('Y'))).toBe(true);
    // The right strip is the left one turned end for end, so the two are one part.
    expect(built.drafts[2]!.axes).toEqual({ length: '-Y', width: '+Z', thickness: '-X' });
  });

  it('glues and screws each spacer to the runner under it', () => {
    expect(built.joints).toHaveLength(3);
    built.joints.forEach((j, i) => {
      expect(j.type).toBe('butt-screwed');
      expect(j.glued).toBe(true);
      expect(j.a.draft).toBe(built.drafts[i]);
      expect(j.b.draft).toBe(runners[i]);
    });
  });

  it('finds a spacer by row and column boundary, and refuses one that is not there', () => {
    expect(built.at(0, 1)).toBe(built.drafts[1]);
    expect(() => built.at(1, 0)).toThrow(/slide spacer in row 1/);
  });
});
