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
});
