import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boxThroughDoor } from '../../../shared/room/passage.ts';
import { rectFitsInRect } from '../../../shared/room/rectInRect.ts';

const TOLERANCE_MM = 0.05;

describe('boxThroughDoor', () => {
  it('passes a tall cabinet only tipped, and stands it up under the ceiling', () => {
    // Cabinet 700 W × 500 D × 2100 H; door 810 × 2030 clear; ceiling 2440.
    // Upright: narrower of W, D = 500 ≤ 810, but H = 2100 > 2030 → no.
    // Tipped: smallest face = 500 × 700; 500 ≤ 810 and 700 ≤ 2030 → through.
    // Standing it up: √(2100² + 500²) = √(4 410 000 + 250 000) = √4 660 000 = 2158.7 ≤ 2440 → yes.
    const p = boxThroughDoor([700, 500, 2100], { widthMm: 810, heightMm: 2030 }, 2440);
    expect(p.way).toBe('tipped');
    expect(p.smallestFaceMm).toEqual([500, 700]);
    expect(p.standUpDiagonalMm).toBeCloseTo(2158.7, 1);
  });

  it('turns the tall cabinet away when the ceiling is below its diagonal', () => {
    // Same cabinet under a 2150 ceiling: the 2158.7 diagonal does not clear it.
    const p = boxThroughDoor([700, 500, 2100], { widthMm: 810, heightMm: 2030 }, 2150);
    expect(p.way).toBe('none');
    expect(p.blockedByCeiling).toBe(true);
  });

  it('passes a low chest upright when its depth is under the door width', () => {
    // 1066.8 × 514.4 × 584.2 through 737 × 2032: 514.4 ≤ 737 and 584.2 ≤ 2032.
    expect(boxThroughDoor([1066.8, 514.4, 584.2], { widthMm: 737, heightMm: 2032 }, 2440).way).toBe('upright');
  });

  it('refuses a box whose smallest face is wider than the door every way', () => {
    // 900 × 850 × 800 through 760 × 2032: upright min(900, 850) = 850 > 760; tipped the smallest
    // face is 800 × 850 and even its short side 800 > 760, square or slanted → no.
    const p = boxThroughDoor([900, 850, 800], { widthMm: 760, heightMm: 2032 }, 2440);
    expect(p.way).toBe('none');
    expect(p.blockedByCeiling).toBe(false);
  });

  it('a box that passes also passes a wider, taller door under a higher ceiling', () => {
    const size = fc.tuple(fc.integer({ min: 100, max: 2500 }), fc.integer({ min: 100, max: 2500 }), fc.integer({ min: 100, max: 2500 }));
    fc.assert(
      fc.property(size, fc.integer({ min: 500, max: 1200 }), fc.integer({ min: 1800, max: 2400 }), fc.integer({ min: 0, max: 500 }), ([w, d, h], dw, dh, more) => {
        const before = boxThroughDoor([w, d, h], { widthMm: dw, heightMm: dh }, 2400);
        fc.pre(before.way !== 'none');
        const after = boxThroughDoor([w, d, h], { widthMm: dw + more, heightMm: dh + more }, 2400 + more);
        expect(after.way).not.toBe('none');
      }),
    );
  });
});

describe('rectFitsInRect', () => {
  // A p × q rectangle turned by t has a bounding box (p cos t + q sin t) × (p sin t + q cos t);
  // it fits in a × b exactly when some t in [0°, 90°] makes that box fit.
  function fitsBySearch(p: number, q: number, a: number, b: number): boolean {
    const steps = 20_000;
    for (let i = 0; i <= steps; i++) {
      const t = (i / steps) * (Math.PI / 2);
      if (p * Math.cos(t) + q * Math.sin(t) <= a + TOLERANCE_MM && p * Math.sin(t) + q * Math.cos(t) <= b + TOLERANCE_MM) return true;
    }
    return false;
  }

  it('fits a long thin board on a slant that does not fit square', () => {
    // 2200 × 100 into 2032 × 760: square, 2200 > 2032. Slanted (Carver's condition):
    // ((2032 + 760) / 2300)² + ((2032 − 760) / 2100)² = 1.4736 + 0.3669 = 1.8405 < 2 → no;
    // 2100 × 50: (2792 / 2150)² + (1272 / 2050)² = 1.6864 + 0.3850 = 2.0714 ≥ 2 → yes.
    expect(rectFitsInRect(2200, 100, 2032, 760)).toBe(false);
    expect(rectFitsInRect(2100, 50, 2032, 760)).toBe(true);
  });

  it('agrees with a direct search over slant angles', () => {
    fc.assert(
      fc.property(fc.integer({ min: 10, max: 3000 }), fc.integer({ min: 1, max: 900 }), fc.integer({ min: 300, max: 2500 }), fc.integer({ min: 300, max: 2500 }), (p, q, a, b) => {
        // Skip cases within the search's own tolerance of the boundary.
        const near = fitsBySearch(p - 1, q - 1, a, b) !== fitsBySearch(p + 1, q + 1, a, b);
        fc.pre(!near);
        expect(rectFitsInRect(p, q, a, b)).toBe(fitsBySearch(p, q, a, b));
      }),
      { numRuns: 150 },
    );
  });
});
