import { describe, expect, it } from 'vitest';
import { getSheetGood, SHEET_GOODS } from '../../../shared/wood/sheetGoods.ts';

const THICKNESS_TOLERANCE_MM = 1e-9;

describe('SHEET_GOODS', () => {
  // NIST PS 1 performance categories, secondary: sold as 1/2 and 3/4, commonly 15/32 and 23/32 in actual.
  it.each([
    ['hardwood-plywood-1/2', 11.90625],
    ['hardwood-plywood-3/4', 18.25625],
    ['softwood-plywood-1/2', 11.90625],
    ['softwood-plywood-3/4', 18.25625],
  ])('gives %s its actual thickness, %f mm', (id, thicknessMm) => {
    expect(Math.abs(getSheetGood(id).thicknessMm - thicknessMm)).toBeLessThan(THICKNESS_TOLERANCE_MM);
  });

  it('falls within the PS 1 "1/2" and "3/4" thickness categories (secondary)', () => {
    // The categories are printed to 0.001 in (15/32 in = 0.46875 prints as 0.469).
    const printed = (id: string) => Number(getSheetGood(id).thicknessIn.toFixed(3));
    expect(printed('softwood-plywood-1/2')).toBeGreaterThanOrEqual(0.469);
    expect(printed('softwood-plywood-1/2')).toBeLessThanOrEqual(0.531);
    expect(printed('softwood-plywood-3/4')).toBeGreaterThanOrEqual(0.719);
    expect(printed('softwood-plywood-3/4')).toBeLessThanOrEqual(0.781);
  });

  it('gives 1/4 hardwood plywood 7/32 in, about 5.5 mm (common practice, no published source)', () => {
    expect(getSheetGood('hardwood-plywood-1/4').thicknessIn).toBe(7 / 32);
    expect(getSheetGood('hardwood-plywood-1/4').source.thickness.ref).toMatch(/common practice/);
  });

  it('states negligible movement as the model, with the reason', () => {
    for (const sheet of Object.values(SHEET_GOODS)) {
      expect(sheet.movement).toBe('negligible');
      expect(sheet.movementNote).toMatch(/negligible/);
    }
  });

  it('rejects an unknown id, listing the valid ones', () => {
    expect(() => getSheetGood('particleboard')).toThrow(/mdf-3\/4/);
  });
});
