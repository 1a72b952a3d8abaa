import { describe, expect, it } from 'vitest';
import { CHEST_PARAMS } from '../../../shared/engine/pieces/chestParams.ts';
import type { ParamDef } from '../../../shared/engine/paramDef.ts';
import { formatFieldValue, parseFieldText, rangeText } from '../../../src/editor/fieldValue.ts';
import type { DisplayUnits } from '../../../src/editor/displayUnits.ts';

// 1 in = 25.4 mm exactly (international inch, 1959); every expected mm below follows from it.
const TOLERANCE_MM = 1e-9;
const INCHES: DisplayUnits = { unit: 'in', inchPrecision: 16, mmPrecision: 0.5 };
const MILLIMETRES: DisplayUnits = { unit: 'mm', inchPrecision: 16, mmPrecision: 0.5 };

function def(key: string): ParamDef {
  const found = CHEST_PARAMS.find((d) => d.key === key);
  if (!found) throw new Error(`no chest parameter ${key}`);
  return found;
}

function valueOf(result: ReturnType<typeof parseFieldText>): number {
  if (!result.ok || typeof result.value !== 'number') throw new Error(`expected a number, got ${JSON.stringify(result)}`);
  return result.value;
}

describe('parseFieldText', () => {
  it('reads a mixed fraction of inches into millimetres', () => {
    expect(valueOf(parseFieldText(def('width'), '41 1/2"', INCHES))).toBeCloseTo(41.5 * 25.4, 9);
  });

  it('reads millimetres and feet-and-inches whatever the display unit', () => {
    expect(Math.abs(valueOf(parseFieldText(def('width'), '2\' 6"', MILLIMETRES)) - 762)).toBeLessThan(TOLERANCE_MM);
    expect(Math.abs(valueOf(parseFieldText(def('legSize'), '44.5 mm', INCHES)) - 44.5)).toBeLessThan(TOLERANCE_MM);
  });

  it('reads a bare number in the display unit', () => {
    expect(Math.abs(valueOf(parseFieldText(def('width'), '40', INCHES)) - 1016)).toBeLessThan(TOLERANCE_MM);
    expect(Math.abs(valueOf(parseFieldText(def('width'), '1016', MILLIMETRES)) - 1016)).toBeLessThan(TOLERANCE_MM);
  });

  it('gives the reason and the limit when a length is below the parameter minimum', () => {
    const result = parseFieldText(def('width'), '4', INCHES);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.message).toMatch(/at least/);
    expect(result.limit).toMatch(/at least 11 13\/16"/);
  });

  it('refuses text that is not a length, naming what to write', () => {
    const result = parseFieldText(def('depth'), 'wide', INCHES);
    expect(result).toMatchObject({ ok: false });
    if (!result.ok) expect(result.message).toContain('is not a length');
  });

  it('accepts zero and negative offsets only where the parameter allows them', () => {
    expect(valueOf(parseFieldText(def('backGrooveOffset'), '-1/8"', INCHES))).toBeCloseTo(-3.175, 9);
    expect(valueOf(parseFieldText(def('footHeight'), '0', INCHES))).toBe(0);
    expect(parseFieldText(def('legSize'), '0', INCHES).ok).toBe(false);
  });

  it('refuses a fractional count and a count above its maximum', () => {
    const fractional = parseFieldText(def('frontStileCount'), '1.5', INCHES);
    expect(fractional).toMatchObject({ ok: false, limit: 'a whole number' });
    const tooMany = parseFieldText(def('frontStileCount'), '7', INCHES);
    expect(tooMany).toMatchObject({ ok: false, limit: 'at most 6' });
    expect(parseFieldText(def('frontStileCount'), '2', INCHES)).toEqual({ ok: true, value: 2 });
  });

  it('refuses numbers written in forms a maker does not type', () => {
    expect(parseFieldText(def('hingeCount'), '1e1', INCHES).ok).toBe(false);
    expect(parseFieldText(def('hingeCount'), '', INCHES)).toMatchObject({ ok: false, limit: 'a number' });
  });

  it('accepts only the listed choices', () => {
    expect(parseFieldText(def('panelMaterial'), 'solid', INCHES)).toEqual({ ok: true, value: 'solid' });
    expect(parseFieldText(def('panelMaterial'), 'glass', INCHES).ok).toBe(false);
    expect(parseFieldText(def('species'), 'black-cherry', INCHES)).toEqual({ ok: true, value: 'black-cherry' });
    expect(parseFieldText(def('species'), 'teak', INCHES).ok).toBe(false);
  });
});

describe('formatFieldValue', () => {
  it('writes a length in fractional inches at the chosen precision', () => {
    expect(formatFieldValue(def('width'), 41.5 * 25.4, INCHES)).toBe('41 1/2"');
    expect(formatFieldValue(def('railTongueLength'), (7 / 16) * 25.4, INCHES)).toBe('7/16"');
    expect(formatFieldValue(def('width'), 1016 + 25.4 / 64, { ...INCHES, inchPrecision: 64 })).toBe('40 1/64"');
  });

  it('writes a length in millimetres at the chosen step', () => {
    expect(formatFieldValue(def('legSize'), 44.45, MILLIMETRES)).toBe('44.5 mm');
    expect(formatFieldValue(def('legSize'), 44.45, { ...MILLIMETRES, mmPrecision: 0.1 })).toBe('44.5 mm');
    expect(formatFieldValue(def('legSize'), 44.42, { ...MILLIMETRES, mmPrecision: 0.1 })).toBe('44.4 mm');
  });

  it('reads back what it writes', () => {
    const shown = formatFieldValue(def('height'), 23 * 25.4, INCHES);
    expect(valueOf(parseFieldText(def('height'), shown, INCHES))).toBeCloseTo(23 * 25.4, 9);
  });
});

describe('rangeText', () => {
  it('states a length range in the display unit', () => {
    expect(rangeText(def('lidThickness'), MILLIMETRES)).toBe('12 mm to 50 mm');
  });

  it('states a number range with its unit', () => {
    expect(rangeText(def('hingeTorqueRatingNm'), INCHES)).toBe('0 N·m to 200 N·m');
  });
});
