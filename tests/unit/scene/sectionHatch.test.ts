import { describe, expect, it } from 'vitest';
import { SECTION_HATCHES, sectionHatches } from '../../../src/scene/sectionHatch.ts';
import type { Joint, PieceResult } from '../../../shared/engine/types.ts';
import { frameSideResult } from './fixtures/frameSide.ts';

describe('sectionHatches', () => {
  it('never gives two parts that meet in a joint the same hatch', () => {
    const result = frameSideResult();
    const hatch = sectionHatches(result);
    expect(result.joints.length).toBeGreaterThan(0);
    for (const joint of result.joints) {
      expect(hatch.get(joint.members[0].partId)).not.toBe(hatch.get(joint.members[1].partId));
    }
  });

  it('gives parts that only touch different hatches too', () => {
    const result: PieceResult = { ...frameSideResult(), joints: [] };
    const hatch = sectionHatches(result);
    // The rails' tongues sit in the legs' grooves and the panel in the rails': all touch.
    expect(hatch.get('leg')).not.toBe(hatch.get('bottom-rail'));
    expect(hatch.get('bottom-rail')).not.toBe(hatch.get('panel'));
    expect(hatch.get('top-rail')).not.toBe(hatch.get('panel'));
  });

  it('hatches every part, with one of the known hatches', () => {
    const result = frameSideResult();
    const hatch = sectionHatches(result);
    for (const part of result.parts) {
      const h = hatch.get(part.id);
      expect(h).toBeGreaterThanOrEqual(0);
      expect(h).toBeLessThan(SECTION_HATCHES.length);
    }
  });

  it('gives a part joined to more parts than there are hatches the one its neighbours use least', () => {
    const base = frameSideResult();
    const hub = base.parts[0]!;
    // A hub joined to a chain of parts that, greedily coloured first, use every hatch once.
    const spokes = Array.from({ length: SECTION_HATCHES.length + 1 }, (_, i) => ({ ...base.parts[1]!, id: `spoke-${i}` }));
    const joints: Joint[] = [];
    const link = (a: string, b: string): Joint => ({ ...base.joints[0]!, id: `${a}:${b}`, members: [{ partId: a, featureIds: [] }, { partId: b, featureIds: [] }] });
    // Spokes form a clique so each takes its own hatch until the hatches run out.
    for (let i = 0; i < spokes.length; i++) for (let j = i + 1; j < spokes.length; j++) joints.push(link(spokes[i]!.id, spokes[j]!.id));
    for (const s of spokes) joints.push(link(s.id, hub.id));
    const result: PieceResult = { ...base, parts: [...spokes, hub], joints };
    const hatch = sectionHatches(result);
    const counts = new Array<number>(SECTION_HATCHES.length).fill(0);
    for (const s of spokes) counts[hatch.get(s.id)!]!++;
    expect(counts[hatch.get(hub.id)!]).toBe(Math.min(...counts));
  });
});
