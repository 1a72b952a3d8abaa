import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatFeetInches, parseLength, type InchPrecision } from '../../../shared/units/index.ts';

const MM_PER_INCH = 25.4;
/** Parsing carries 12 significant digits; far below any inch fraction. */
const TOLERANCE_MM = 1e-6;
const PRECISIONS: InchPrecision[] = [16, 32, 64];
const readBack = (text: string) => parseLength(text, { allowZero: true, allowNegative: true });

describe('formatFeetInches', () => {
  it('writes a wall length in feet and inches with a dashed fraction', () => {
    // 12 ft 6 1/2 in = 150.5 in × 25.4 mm/in (the inch is exactly 25.4 mm, NIST SP 811 B.8).
    expect(formatFeetInches(150.5 * MM_PER_INCH)).toBe(`12' 6-1/2"`);
    expect(formatFeetInches(36 * MM_PER_INCH)).toBe(`3' 0"`);
    expect(formatFeetInches(12.25 * MM_PER_INCH)).toBe(`1' 1/4"`);
    expect(formatFeetInches(-26.5 * MM_PER_INCH)).toBe(`-2' 2-1/2"`);
  });

  it('writes a length under a foot in inches alone', () => {
    expect(formatFeetInches(1.75 * MM_PER_INCH)).toBe('1 3/4"');
    expect(formatFeetInches(0)).toBe('0"');
  });

  it('rounds before splitting, so a hair under a foot reads one foot', () => {
    expect(formatFeetInches(12 * MM_PER_INCH - 0.2)).toBe(`1' 0"`);
    expect(formatFeetInches(12 * MM_PER_INCH - 0.2, 64)).toBe('11 63/64"');
  });

  it('reads back what it writes, within half a step of the precision, and writes that again unchanged', () => {
    fc.assert(
      fc.property(fc.double({ min: -30_000, max: 30_000, noNaN: true }), fc.constantFrom(...PRECISIONS), (valueMm, precision) => {
        const text = formatFeetInches(valueMm, precision);
        const back = readBack(text);
        expect(Math.abs(back - valueMm)).toBeLessThanOrEqual(MM_PER_INCH / precision / 2 + TOLERANCE_MM);
        expect(formatFeetInches(back, precision)).toBe(text);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('parseLength of feet and inches', () => {
  it('reads the ways a maker writes a wall: marks, primes, words, decimals', () => {
    const expected = 150.5 * MM_PER_INCH;
    for (const text of [`12' 6-1/2"`, '12ft 6.5in', '12′ 6-1/2″', `12'-6 1/2"`, '12 ft 6-1/2 in']) {
      expect(Math.abs(readBack(text) - expected), text).toBeLessThan(TOLERANCE_MM);
    }
  });
});
