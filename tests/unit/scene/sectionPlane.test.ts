import { describe, expect, it } from 'vitest';
import { keptBySection, sectionPlane } from '../../../src/scene/sectionPlane.ts';
import { engineToThree } from '../../../src/scene/sceneFrame.ts';
import { isInputError } from '../../../shared/errors.ts';
import type { Vec3 } from '../../../shared/engine/types.ts';

const kept = (axis: 'x' | 'y' | 'z', positionMm: number, engine: Vec3): boolean => keptBySection(sectionPlane({ axis, positionMm }), engineToThree(engine));

describe('sectionPlane', () => {
  it('takes away the front of the piece for a cut across its depth', () => {
    expect(kept('y', 240, [500, 100, 300])).toBe(false);
    expect(kept('y', 240, [500, 400, 300])).toBe(true);
  });

  it('takes away the right side for a cut across its width, and the top for a cut across its height', () => {
    expect(kept('x', 500, [700, 200, 300])).toBe(false);
    expect(kept('x', 500, [300, 200, 300])).toBe(true);
    expect(kept('z', 300, [500, 200, 450])).toBe(false);
    expect(kept('z', 300, [500, 200, 150])).toBe(true);
  });

  it('puts the plane exactly at the position given', () => {
    expect(kept('y', 240, [0, 240.01, 0])).toBe(true);
    expect(kept('y', 240, [0, 239.99, 0])).toBe(false);
  });

  it('refuses a position that is not a number, naming the field', () => {
    let caught: unknown;
    try {
      sectionPlane({ axis: 'y', positionMm: Number.NaN });
    } catch (error) {
      caught = error;
    }
    expect(isInputError(caught)).toBe(true);
    expect((caught as { field: string }).field).toBe('cutaway.positionMm');
  });
});
