import { describe, expect, it } from 'vitest';
import { paramValuesDiffer } from '../../../shared/engine/compare.ts';
import { buildPiece, compareResults, defaultSpec, summarizeResult } from '../../../shared/engine/index.ts';

const MM_TOLERANCE = 1e-6;
const spec = defaultSpec('chest');

describe('summarizeResult', () => {
  it('gives the overall size, the pieces to cut and the checks by severity', () => {
    const s = summarizeResult(buildPiece(spec));
    expect(Math.abs(s.heightMm - 23 * 25.4)).toBeLessThan(MM_TOLERANCE);
    // 4 legs, 6 rails ×... counted from the parts: the sum of quantities.
    expect(s.partCount).toBe(buildPiece(spec).parts.reduce((n, p) => n + p.quantity, 0));
    expect(s.checkCounts.caution).toBe(1);
    expect(s.checkCounts.error).toBe(0);
  });
});

describe('compareResults', () => {
  it('lists the changed parameter and the parts that grew with it', () => {
    const a = buildPiece(spec);
    const b = buildPiece({ ...spec, params: { ...spec.params, width: (spec.params.width as number) + 38.1 } });
    const diff = compareResults(a, b);
    expect(diff.paramsChanged).toEqual([{ key: 'width', from: spec.params.width, to: (spec.params.width as number) + 38.1 }]);
    const rail = diff.partsResized.find((p) => p.id === 'front-top-rail')!;
    expect(rail.to[0] - rail.from[0]).toBeCloseTo(38.1, 6);
    expect(diff.partsResized.find((p) => p.id === 'leg')).toBeUndefined();
  });

  it('lists parts added and removed', () => {
    const a = buildPiece(spec);
    const b = buildPiece({ ...spec, params: { ...spec.params, frontStileCount: 0, sideStileCount: 1 } });
    const diff = compareResults(a, b);
    expect(diff.partsRemoved).toContain('front-back-stile');
    expect(diff.partsAdded).toContain('side-stile');
  });

  it('does not list a length that differs only by arithmetic noise', () => {
    const a = buildPiece(spec);
    // 40 in typed as 1016 mm and read back through inches can land a hair off.
    const b = buildPiece({ ...spec, params: { ...spec.params, width: (spec.params.width as number) + 1e-9 } });
    expect(compareResults(a, b).paramsChanged).toEqual([]);
  });
});

describe('paramValuesDiffer', () => {
  it('tells numbers apart only beyond a millionth of a millimetre, and other values exactly', () => {
    expect(paramValuesDiffer(1016, 1016 + 1e-9)).toBe(false);
    expect(paramValuesDiffer(1016, 1016.01)).toBe(true);
    expect(paramValuesDiffer('plywood', 'solid')).toBe(true);
    expect(paramValuesDiffer(true, true)).toBe(false);
    expect(paramValuesDiffer(undefined, 3)).toBe(true);
  });
});
