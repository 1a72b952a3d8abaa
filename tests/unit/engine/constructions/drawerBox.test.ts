import { describe, expect, it } from 'vitest';
import { assemble } from '../../../../shared/engine/assembly.ts';
import { drawerBox } from '../../../../shared/engine/constructions/drawerBox.ts';
import { boxBetween } from '../../../../shared/engine/geometry/box.ts';
import type { Material } from '../../../../shared/engine/types.ts';

const MM_TOLERANCE = 1e-6;
const maple: Material = { kind: 'solid', speciesId: 'hard-maple', speciesName: 'Hard maple' };
const ply: Material = { kind: 'sheet', sheetId: 'hardwood-plywood-1/4', sheetName: 'Hardwood plywood 1/4' };
const rough = () => ({ lengthMm: 1, widthMm: 1, thicknessMm: 1, quarters: 4 });

describe('drawerBox', () => {
  // A 400 × 450 × 150 mm box of 12 mm stock, rabbet-and-dado: tongues 6 mm thick and 6 mm long
  // in 6 mm dadoes set 6 mm from the sides' ends; a 5.5 mm bottom in 6 mm grooves 12 mm up.
  const built = drawerBox({
    box: boxBetween([0, 0, 0], [400, 450, 150]), row: 1, where: 'test', stock: maple, sideThicknessMm: 12, endThicknessMm: 12,
    joinery: 'rabbet-and-dado', bottom: { sheet: ply, thicknessMm: 5.5 }, bottomGrooveDepthMm: 6, bottomSetUpMm: 12, bottomClearanceMm: 0.5, explodeMm: 0,
  });
  const parts = assemble(built.drafts, built.joints, rough).parts;
  const get = (id: string) => parts.find((p) => p.id === id)!;

  it('makes two identical sides, the box\'s full depth', () => {
    expect(get('row-1-drawer-side').quantity).toBe(2);
    expect(get('row-1-drawer-side').lengthMm).toBeCloseTo(450, 9);
  });

  it('cuts the front between the sides plus a tongue each end: 400 − 24 + 12 = 388', () => {
    const front = get('row-1-drawer-box-front');
    expect(Math.abs(front.lengthMm - 388)).toBeLessThan(MM_TOLERANCE);
    const tongue = front.features.find((f) => f.type === 'tongue');
    expect(tongue?.type === 'tongue' && tongue.thicknessMm).toBeCloseTo(6, 9);
    expect(tongue?.type === 'tongue' && tongue.lengthMm).toBeCloseTo(6, 9);
  });

  it('sits the back on the bottom: 150 − 12 − 5.5 = 132.5 tall', () => {
    expect(Math.abs(get('row-1-drawer-back').widthMm - 132.5)).toBeLessThan(MM_TOLERANCE);
  });

  it('sizes the bottom into the grooves less the clearance: 376 + 12 − 1 = 387 across', () => {
    // Across: between the sides 376, plus 6 into each groove, less 0.5 each side.
    // Front to back: from the front's inner face (6 + 12 = 18) less 6 plus 0.5 = 12.5, to the back's back face 444.
    const bottom = get('row-1-drawer-bottom');
    expect(Math.abs(bottom.lengthMm - 387)).toBeLessThan(MM_TOLERANCE);
    expect(Math.abs(bottom.widthMm - 431.5)).toBeLessThan(MM_TOLERANCE);
  });
});
