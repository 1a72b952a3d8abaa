import { describe, expect, it } from 'vitest';
import { SLIDE_RULES, slideLengthFor } from '../../../../shared/engine/constructions/slides.ts';

const IN = 25.4;

describe('slideLengthFor', () => {
  it('takes the longest slide that fits, in 2 in steps (common practice, no published source)', () => {
    expect(slideLengthFor('side-mount', 19.9 * IN)).toBeCloseTo(18 * IN, 9);
    expect(slideLengthFor('undermount', 22 * IN)).toBeCloseTo(22 * IN, 9);
  });

  it('answers null when even the shortest slide does not fit', () => {
    expect(slideLengthFor('side-mount', 9 * IN)).toBeNull();
  });

  it('lets wooden runners take any length', () => {
    expect(slideLengthFor('wood-runners', 333)).toBe(333);
  });

  it('leaves 1/2 in each side for side-mount slides (common practice, no published source)', () => {
    expect(SLIDE_RULES['side-mount'].sideClearanceMm).toBeCloseTo(IN / 2, 9);
  });
});
