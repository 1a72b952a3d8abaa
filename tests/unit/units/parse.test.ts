import { describe, expect, it } from 'vitest';
import { isInputError, type InputError } from '../../../shared/errors.ts';
import { parseLength } from '../../../shared/units/parse.ts';

const MM_TOLERANCE = 1e-9;

function errorOf(run: () => unknown): InputError {
  try {
    run();
  } catch (error) {
    if (isInputError(error)) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('parseLength', () => {
  it.each([
    ['1 3/4"', 44.45],
    ['1-3/4 in', 44.45],
    [`2' 6"`, 762],
    [`2'6"`, 762],
    [`2'-6 1/2"`, 774.7],
    ['2 ft 6 in', 762],
    ['44.5 mm', 44.5],
    ['4.45cm', 44.5],
    ['3/4in', 19.05],
    ['40in', 1016],
    ['0.75 in', 19.05],
    ['.5"', 12.7],
    ['1/2 inch', 12.7],
    ['3 ft', 914.4],
    ['1.2 m', 1200],
    ['1 1/2"', 38.1],
  ])('reads %s as %f mm', (text, expectedMm) => {
    expect(parseLength(text)).toBeCloseTo(expectedMm, 9);
  });

  it('reads typographic quote marks and a minus sign as the plain ones', () => {
    expect(parseLength('2\u2032 6\u2033')).toBeCloseTo(762, 9);
    expect(parseLength('\u22122 in', { allowNegative: true })).toBeCloseTo(-50.8, 9);
  });

  it('reads a bare number in the default unit, inches unless told otherwise', () => {
    expect(parseLength('18')).toBeCloseTo(457.2, 9);
    expect(parseLength('18', { defaultUnit: 'mm' })).toBeCloseTo(18, 9);
    expect(parseLength('1 3/4', { defaultUnit: 'in' })).toBeCloseTo(44.45, 9);
  });

  it('reads feet followed by a bare number as feet and inches', () => {
    expect(Math.abs(parseLength(`2' 6`) - 762)).toBeLessThan(MM_TOLERANCE);
  });

  it('returns millimetres without binary noise', () => {
    expect(parseLength('1 3/4"')).toBe(44.45);
    expect(parseLength('3/4in')).toBe(19.05);
  });

  it('rejects a zero denominator, naming the field', () => {
    const error = errorOf(() => parseLength('3/0 in', { field: 'panelWidth' }));
    expect(error.field).toBe('panelWidth');
    expect(error.message).toMatch(/zero denominator/);
  });

  it('rejects text that is not a length, with examples of what is', () => {
    const error = errorOf(() => parseLength('abc', { field: 'width' }));
    expect(error.field).toBe('width');
    expect(error.message).toMatch(/not a length/);
    expect(error.message).toContain('44.5 mm');
  });

  it('rejects a negative length where it must be positive', () => {
    const error = errorOf(() => parseLength('-2 in', { field: 'depth' }));
    expect(error.field).toBe('depth');
    expect(error.message).toMatch(/positive/);
    expect(error.limit).toBe('greater than 0');
  });

  it('accepts a negative length only when allowed', () => {
    expect(parseLength('-2 in', { allowNegative: true })).toBeCloseTo(-50.8, 9);
  });

  it('rejects zero unless allowed', () => {
    expect(errorOf(() => parseLength('0 in')).limit).toBe('greater than 0');
    expect(parseLength('0 in', { allowZero: true })).toBe(0);
  });

  it('rejects a value under the minimum, showing the limit in the unit typed', () => {
    const inches = errorOf(() => parseLength('1/8"', { field: 'groove', min: 6.35 }));
    expect(inches.limit).toBe('at least 1/4"');
    const millimetres = errorOf(() => parseLength('3 mm', { field: 'groove', min: 6.35 }));
    expect(millimetres.limit).toBe('at least 6.4 mm');
  });

  it('rejects a value over the maximum', () => {
    expect(errorOf(() => parseLength('200 in', { max: 2438.4 })).limit).toBe('at most 96"');
  });

  it.each(['', '   ', '2 6', '1 mm 2', '1e5', 'in', '3 inches wide', '1//2"', '2 ft 3 mm'])('rejects "%s" with an InputError', (text) => {
    expect(errorOf(() => parseLength(text)).field).toBe('length');
  });

  it('rejects a number too large to be finite instead of returning Infinity', () => {
    expect(errorOf(() => parseLength('9'.repeat(400))).message).toMatch(/too large/);
  });
});
