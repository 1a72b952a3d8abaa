import { describe, expect, it } from 'vitest';
import { areaLowerBound, oneDimensionalBound } from '../../../shared/layout/lowerBound.ts';

describe('areaLowerBound', () => {
  it('is the total area over the sheet area, rounded up (L0, Martello & Vigo 1998)', () => {
    expect(areaLowerBound([50, 50], 100)).toBe(1);
    expect(areaLowerBound([50, 50, 1], 100)).toBe(2);
    expect(areaLowerBound([], 100)).toBe(0);
  });

  it('does not round a total that is whole up to the next sheet because of float noise', () => {
    // 0.1 + 0.2 = 0.30000000000000004 in binary floating point.
    expect(areaLowerBound([0.1, 0.2], 0.3)).toBe(1);
  });
});

describe('oneDimensionalBound', () => {
  it('counts items above half the capacity one to a bin (L2, Martello & Toth 1990)', () => {
    // Three items of 60 in bins of 100: the area bound says 2, but no two share a bin.
    expect(oneDimensionalBound([60, 60, 60], 100)).toBe(3);
  });

  it('adds the small items that cannot fit beside the large ones', () => {
    // Two items of 70 leave 30 each; 40 + 40 + 40 of small items need 2 more bins at least.
    expect(oneDimensionalBound([70, 70, 40, 40, 40], 100)).toBe(4);
  });
});
