import { describe, expect, it } from 'vitest';
import { dual } from '../../../shared/units/dual.ts';
import { inchesFromMm, MM_PER_INCH, mmFromInches } from '../../../shared/units/length.ts';

const MM_TOLERANCE = 1e-9;

describe('mmFromInches and inchesFromMm', () => {
  it('use the international inch of exactly 25.4 mm', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(mmFromInches(1)).toBe(25.4);
  });

  it('undo each other', () => {
    expect(Math.abs(mmFromInches(inchesFromMm(123.456)) - 123.456)).toBeLessThan(MM_TOLERANCE);
  });
});

describe('dual', () => {
  it('gives a length in both units with display text', () => {
    expect(dual(44.45)).toEqual({ mm: 44.45, in: 1.75, text: { mm: '44.5 mm', in: '1 3/4"' } });
  });

  it('drops binary noise from the numbers', () => {
    expect(dual(19.049999999999997).mm).toBe(19.05);
    expect(dual(19.049999999999997).in).toBe(0.75);
  });

  it('honours the chosen precisions', () => {
    const value = dual((5 / 32) * MM_PER_INCH, { inchPrecision: 32, mmPrecision: 0.1 });
    expect(value.text).toEqual({ mm: '4 mm', in: '5/32"' });
  });
});
