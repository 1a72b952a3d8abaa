import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatLength, roundTo, type InchPrecision, type MmPrecision } from '../../../shared/units/format.ts';
import { MM_PER_INCH } from '../../../shared/units/length.ts';
import { parseLength } from '../../../shared/units/parse.ts';

// Parsing what was formatted may differ from the value by half a display step, plus float noise.
const FLOAT_NOISE_MM = 1e-9;

describe('formatLength', () => {
  it.each([
    [44.45, '1 3/4"'],
    [23.5 * MM_PER_INCH, '23 1/2"'],
    [(3 / 8) * MM_PER_INCH, '3/8"'],
    [MM_PER_INCH * 30, '30"'],
    [0, '0"'],
    [-3.175, '-1/8"'],
  ])('writes %f mm as %s to 1/16 in', (valueMm, text) => {
    expect(formatLength(valueMm, { unit: 'in' })).toBe(text);
  });

  it('reduces fractions and rounds to the chosen denominator', () => {
    const valueMm = (11 / 32) * MM_PER_INCH;
    expect(formatLength(valueMm, { unit: 'in', precision: 32 })).toBe('11/32"');
    expect(formatLength(valueMm, { unit: 'in', precision: 64 })).toBe('11/32"');
    expect(formatLength((23 / 32) * MM_PER_INCH, { unit: 'in', precision: 16 })).toBe('3/4"');
    expect(formatLength((1 / 64) * MM_PER_INCH, { unit: 'in', precision: 64 })).toBe('1/64"');
  });

  it('writes millimetres to 0.5 mm by default, 0.1 or 1 mm when asked', () => {
    expect(formatLength(44.45, { unit: 'mm' })).toBe('44.5 mm');
    expect(formatLength(44.45, { unit: 'mm', precision: 0.1 })).toBe('44.5 mm');
    expect(formatLength(18.256, { unit: 'mm', precision: 0.1 })).toBe('18.3 mm');
    expect(formatLength(18.256, { unit: 'mm', precision: 1 })).toBe('18 mm');
    expect(formatLength(18.2, { unit: 'mm', precision: 0.5 })).toBe('18 mm');
  });

  it('never shows a negative zero', () => {
    expect(formatLength(-0.01, { unit: 'mm' })).toBe('0 mm');
    expect(formatLength(-0.01, { unit: 'in' })).toBe('0"');
  });

  it('reads back to the value within half its precision (property)', () => {
    const inchCases = fc.tuple(fc.double({ min: 0, max: 5000, noNaN: true }), fc.constantFrom<InchPrecision>(16, 32, 64));
    fc.assert(
      fc.property(inchCases, ([valueMm, denominator]) => {
        const back = parseLength(formatLength(valueMm, { unit: 'in', precision: denominator }), { allowZero: true });
        return Math.abs(back - valueMm) <= MM_PER_INCH / denominator / 2 + FLOAT_NOISE_MM;
      }),
    );
    const mmCases = fc.tuple(fc.double({ min: 0, max: 5000, noNaN: true }), fc.constantFrom<MmPrecision>(1, 0.5, 0.1));
    fc.assert(
      fc.property(mmCases, ([valueMm, step]) => {
        const back = parseLength(formatLength(valueMm, { unit: 'mm', precision: step }), { allowZero: true });
        return Math.abs(back - valueMm) <= step / 2 + FLOAT_NOISE_MM;
      }),
    );
  });
});

describe('roundTo', () => {
  it('rounds half-steps that binary arithmetic puts just below the half', () => {
    expect(roundTo(44.449999999999996, 0.1)).toBe(44.5);
    expect(roundTo(444 * 0.1, 0.1)).toBe(44.4);
  });
});

describe('formatLength in whole inches', () => {
  it('rounds to the nearest inch when the precision is 1', () => {
    expect(formatLength(30.6 * MM_PER_INCH, { unit: 'in', precision: 1 })).toBe('31"');
  });
});
