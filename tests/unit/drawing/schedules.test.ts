import { describe, expect, it } from 'vitest';
import { featureSizeText } from '../../../shared/drawing/featureText.ts';
import { joineryBlock } from '../../../shared/drawing/schedules.ts';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';

describe('joineryBlock', () => {
  it.each(['in', 'mm'] as const)('writes every joint\'s cuts from the parts\' features in the drawing\'s units (%s)', (units) => {
    const result = buildPiece(defaultSpec('chest'));
    expect(result.derived.joinery.length).toBeGreaterThan(0);
    const block = joineryBlock(result, units);
    const cuts = block.head.indexOf('Cuts');
    result.derived.joinery.forEach((j, i) => {
      const cell = block.rows[i]![cuts]!;
      for (const f of j.features) {
        const feature = result.parts.find((p) => p.id === f.partId)?.features.find((x) => x.id === f.featureId);
        expect(feature, `${f.partId}/${f.featureId}`).toBeDefined();
        expect(cell).toContain(featureSizeText(feature!, units));
      }
    });
  });

  it('names the parts of each joint in words, the first into the second, with no arrow a PDF font cannot draw', () => {
    const result = buildPiece(defaultSpec('chest'));
    const block = joineryBlock(result, 'in');
    const names = new Map(result.parts.map((p) => [p.id, p.name]));
    result.derived.joinery.forEach((j, i) => {
      expect(block.rows[i]![1]).toBe(`${names.get(j.parts[0])} into ${names.get(j.parts[1])}`);
    });
    expect(block.rows.flat().some((cell) => /→|->/.test(cell))).toBe(false);
  });
});
