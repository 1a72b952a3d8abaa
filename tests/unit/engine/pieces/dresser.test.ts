import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec, paramDefs } from '../../../../shared/engine/index.ts';
import type { Part, PieceResult } from '../../../../shared/engine/types.ts';
import { isInputError } from '../../../../shared/errors.ts';

const MM_TOLERANCE = 0.1;
const IN = 25.4;

function within(actual: number | undefined, expected: number): void {
  expect(typeof actual).toBe('number');
  expect(Math.abs(actual! - expected)).toBeLessThanOrEqual(MM_TOLERANCE);
}

function dresser(params: Record<string, unknown> = {}): PieceResult {
  const spec = defaultSpec('dresser');
  return buildPiece({ ...spec, params: { ...spec.params, ...params } });
}

function part(result: PieceResult, id: string): Part {
  const found = result.parts.find((p) => p.id === id);
  if (!found) throw new Error(`no part ${id}; parts: ${result.parts.map((p) => p.id).join(', ')}`);
  return found;
}

describe('buildPiece (dresser), worked by hand', () => {
  // The default six-drawer dresser, 56 × 20 × 34 in: 3/4 in hardwood plywood carcass (23/32 in
  // actual, PS 1 category) with a 1/4 in back (7/32 in actual); a 3/4 in face frame with
  // 1-1/2 in stiles and outer rails, 2 in rails between rows and a 2 in mullion; a 7/8 in top;
  // a 4 in plinth; 1/2 in overlay fronts; side-mount slides (1/2 in each side, common practice).
  const r = dresser();

  it('shares the carcass height among the rows, each row 1 in taller than the one above', () => {
    // Carcass: 34 − 4 plinth − 7/8 top = 29-1/8 in = 739.775 mm.
    within(part(r, 'case-side').lengthMm, 739.775);
    // Rows share 739.775 − 2 × 38.1 − 2 × 50.8 = 561.975 mm; h0 = (561.975 − 3 × 25.4) / 3 = 161.925.
    // Mullions fill each row's opening: 161.925, 187.325, 212.725 mm.
    const mullions = r.parts.filter((p) => p.id.startsWith('row-') && p.id.endsWith('face-frame-mullion')).map((p) => p.lengthMm).sort((a, b) => a - b);
    expect(mullions).toHaveLength(3);
    [161.925, 187.325, 212.725].forEach((h, i) => within(mullions[i], h));
  });

  it('overlays each drawer front 1/2 in on the frame all round', () => {
    // Column: (1422.4 − 2 × 38.1 − 50.8) / 2 = 647.7 mm; front 647.7 + 2 × 12.7 = 673.1 mm.
    // Top row: 161.925 + 25.4 = 187.325 mm tall.
    const front = part(r, 'row-1-drawer-front');
    within(front.lengthMm, 673.1);
    within(front.widthMm, 187.325);
    expect(front.quantity).toBe(2);
    within(part(r, 'row-3-drawer-front').widthMm, 238.125);
  });

  it('sizes the boxes for side-mount slides and the longest slide that fits', () => {
    // Box 647.7 − 2 × 12.7 = 622.3 mm wide; 161.925 − 12.7 above − 6.35 below = 142.875 mm tall.
    // Depth: back's front face at 508 − 5.556 = 502.444; less 1 in behind = 477.04 → 18 in slide (457.2).
    const side = part(r, 'row-1-drawer-side');
    within(side.lengthMm, 457.2);
    within(side.widthMm, 142.875);
    expect(side.quantity).toBe(4);
    // Box front between the sides plus a 1/4 in tongue each end: 622.3 − 25.4 + 12.7 = 609.6.
    within(part(r, 'row-1-drawer-box-front').lengthMm, 609.6);
    // Back sits on the bottom: 142.875 − 12.7 set-up − 5.556 bottom = 124.619.
    within(part(r, 'row-1-drawer-back').widthMm, 124.619);
  });

  it('cuts the drawer bottom to the grooves, less 1/32 in at each edge', () => {
    // Across: 609.6 − 2 × 0.794 = 608.0125; front to back: from 19.05 − 6.35 + 0.794 = 13.494 to
    // the back's back face at 457.2 − 6.35 = 450.85 → 437.356 mm.
    const bottom = part(r, 'drawer-bottom');
    within(bottom.lengthMm, 608.0125);
    within(bottom.widthMm, 437.356);
    expect(bottom.quantity).toBe(6);
  });

  it('joins the box with tongues as thick as the dadoes are wide', () => {
    const side = part(r, 'row-1-drawer-side');
    const dado = side.features.find((f) => f.type === 'dado');
    const tongue = part(r, 'row-1-drawer-box-front').features.find((f) => f.type === 'tongue');
    expect(dado?.type === 'dado' && tongue?.type === 'tongue' && Math.abs(dado.widthMm - tongue.thicknessMm)).toBeLessThan(1e-9);
    expect(dado?.type === 'dado' && tongue?.type === 'tongue' && Math.abs(dado.depthMm - tongue.lengthMm)).toBeLessThan(1e-9);
  });

  it('screws the solid top through round holes at the front and slots at the back', () => {
    const front = part(r, 'front-stretcher');
    const back = part(r, 'back-stretcher');
    const screws = front.features.filter((f) => f.id.startsWith('screw-'));
    expect(screws.length).toBeGreaterThanOrEqual(2);
    expect(screws.every((f) => f.type === 'hole')).toBe(true);
    expect(back.features.some((f) => f.type === 'slot')).toBe(true);
    const topJoint = r.joints.find((j) => j.type === 'top-fastened' && j.members[0].partId === 'back-stretcher');
    expect(topJoint?.floating).toBe(true);
  });

  it('measures the top of the top at the height asked, the top overhanging as asked', () => {
    expect(r.bboxMm[2]).toBeCloseTo(34 * IN, 6);
    expect(r.bboxMm[0]).toBeCloseTo(56 * IN + 2 * 0.75 * IN, 6);
    expect(r.bboxMm[1]).toBeCloseTo(20 * IN + 1 * IN, 6);
  });

  it('glues up in stages: flat work, the carcass, what hangs on it, then the top and fronts', () => {
    const stages = r.derived.glueUp;
    expect(stages.map((s) => s.stage)).toEqual([1, 2, 3, 4]);
    expect(stages[0]!.floatingPartIds).toContain('drawer-bottom');
    expect(stages[3]!.floatingPartIds).toEqual(['top']);
    expect(r.derived.cutList.find((g) => g.materialKind === 'sheet')?.rows.length).toBeGreaterThan(0);
  });

  it('says how far the drawers open, for room fit: the whole 18 in box on full-extension slides', () => {
    within(r.checks.find((c) => c.id === 'drawer-travel')?.numbers.travelMm, 457.2);
  });

  it('cautions that the dresser can tip over, naming ASTM F2057', () => {
    const c = r.checks.find((x) => x.id === 'tip-over');
    expect(c?.severity).toBe('caution');
    expect(c?.message).toMatch(/ASTM F2057/);
    expect(c?.message).toMatch(/do not make the piece compliant or certify it safe/);
  });

  it('gives every parameter a label, group, default and (lengths and numbers) a range', () => {
    for (const def of paramDefs('dresser')) {
      expect(def.label.length).toBeGreaterThan(0);
      expect(def.group.length).toBeGreaterThan(0);
      if (def.kind === 'length' || def.kind === 'number') expect(def.min !== undefined && def.max !== undefined).toBe(true);
    }
  });
});

describe('buildPiece (dresser) options', () => {
  it('makes inset fronts the opening less the reveal all round', () => {
    // 647.7 − 2 × 1.5875 = 644.525 mm
    const r = dresser({ frontMount: 'inset' });
    within(part(r, 'row-1-drawer-front').lengthMm, 644.525);
    within(part(r, 'row-1-drawer-front').widthMm, 161.925 - 3.175);
  });

  it('takes listed heights from the top, the bottom row taking the rest', () => {
    // 5 in and 6 in listed; the bottom row gets 561.975 − 127 − 152.4 = 282.575 mm; fronts 1 in taller.
    const r = dresser({ drawerGraduation: 'listed', rowHeight1: 5 * IN, rowHeight2: 6 * IN, rowHeight3: 1 * IN });
    within(part(r, 'row-1-drawer-front').widthMm, 6 * IN);
    within(part(r, 'row-2-drawer-front').widthMm, 7 * IN);
    within(part(r, 'row-3-drawer-front').widthMm, 282.575 + IN);
  });

  it('bands the front edges of a frameless carcass and says how much', () => {
    const r = dresser({ faceFrame: false });
    expect(part(r, 'case-side').notes.join(' ')).toMatch(/Edge-band the front edge \(740 mm\)/);
  });

  it('rides wooden runners level with the face-frame rails', () => {
    const r = dresser({ slideType: 'wood-runners' });
    expect(r.parts.some((p) => p.role === 'runner')).toBe(true);
    // 1/32 in each side: 647.7 − 1.5875 = 646.1125 mm box, so the front is 646.1125 − 25.4 + 12.7.
    within(part(r, 'row-1-drawer-box-front').lengthMm, 646.1125 - 12.7);
  });

  it('warns that uneven rails show uneven reveals around overlay fronts, and says which widths even them', () => {
    const r = dresser({ faceFrameMidRail: 1.5 * IN });
    const c = r.checks.find((x) => x.id === 'reveals-uneven');
    expect(c?.severity).toBe('warning');
    within(c?.numbers.midRailShowsMm, 12.7);
    expect(c?.fix).toMatch(/50\.8 mm/);
  });

  it('flags a drawer deeper than the case as an error with the numbers', () => {
    const r = dresser({ drawerDepth: 22 * IN });
    const c = r.checks.find((x) => x.id.startsWith('drawer-too-deep'));
    expect(c?.severity).toBe('error');
    within(c?.numbers.boxDepthMm, 558.8);
  });

  it('flags boxes too tall for the slide when the clearances are too small', () => {
    const r = dresser({ slideType: 'undermount', drawerTopClearance: 3, drawerBottomClearance: 3 });
    expect(r.checks.some((x) => x.id.startsWith('drawer-too-tall') && x.severity === 'error')).toBe(true);
  });

  it('warns when undermount slides have no room under a low-set bottom', () => {
    const c = dresser({ slideType: 'undermount', drawerBottomSetUp: 6 }).checks.find((x) => x.id === 'undermount-set-up');
    expect(c?.severity).toBe('warning');
    within(c?.numbers.neededMm, 12.7);
    expect(dresser({ slideType: 'undermount' }).checks.some((x) => x.id === 'undermount-set-up')).toBe(false);
  });

  it('refuses wooden runners without a face frame, naming slideType', () => {
    try {
      dresser({ faceFrame: false, slideType: 'wood-runners' });
      expect.unreachable();
    } catch (error) {
      expect(isInputError(error)).toBe(true);
      expect((error as { field: string }).field).toBe('slideType');
    }
  });

  it('refuses a graduation that leaves a row too short, naming the graduation parameter', () => {
    try {
      dresser({ drawerRows: 6, drawerColumns: 1, drawerGraduation: 'geometric', graduationRatio: 1.5 });
      expect.unreachable();
    } catch (error) {
      expect(isInputError(error)).toBe(true);
      expect((error as { field: string }).field).toBe('graduationRatio');
    }
  });
});

describe('buildPiece (dresser) built like the chest', () => {
  // Frame-and-panel case: the chest's legs (1-3/4 in), 3/4 in rails 3 in (top) and 4 in
  // (bottom) wide, 1/2 in leg grooves, 7/16 in rail tongues, a 3 in foot; 3/4 in web frames with
  // 3 in rails; inset fronts 1/16 in reveal; wooden runners.
  const r = dresser({ caseConstruction: 'frame-and-panel', slideType: 'wood-runners', frontMount: 'inset' });

  it('runs the legs from the floor to the underside of the top', () => {
    // 34 − 7/8 = 33-1/8 in = 841.375 mm
    within(part(r, 'front-left-leg').lengthMm, 841.375);
  });

  it('makes the sides with the chest\'s frame-and-panel face: rails the span plus a tongue each end', () => {
    // 20 − 2 × 1-3/4 + 2 × 7/16 = 17-3/8 in = 441.325 mm, as the chest's side rails are worked.
    within(part(r, 'side-top-rail').lengthMm, 441.325);
    expect(part(r, 'side-panel').quantity).toBe(2);
  });

  it('tenons the web-frame rails into the legs and shares the height among the rows', () => {
    // 56 − 3-1/2 + 7/8 = 53-3/8 in = 1355.725 mm.
    within(part(r, 'web-frame-front-rail').lengthMm, 1355.725);
    // Rows share 841.375 − 76.2 foot − 4 × 19.05 frames = 688.975; h0 = (688.975 − 76.2) / 3 = 204.258.
    within(part(r, 'row-1-mullion').lengthMm, 204.258);
    // Inset front: 204.258 − 2 × 1.5875 = 201.083 tall.
    within(part(r, 'row-1-drawer-front').widthMm, 201.083);
  });

  it('has no errors, and every leg carries a mortise for each web frame', () => {
    expect(r.checks.filter((c) => c.severity === 'error')).toEqual([]);
    expect(part(r, 'front-left-leg').features.filter((f) => f.type === 'mortise')).toHaveLength(4);
  });

  it('glues the sides on their legs first, the panels floating', () => {
    const first = r.derived.glueUp[0]!;
    expect(first.title).toMatch(/sides on their legs/);
    expect(first.floatingPartIds).toContain('side-panel');
  });

  it('refuses slides other than wooden runners, naming slideType', () => {
    try {
      dresser({ caseConstruction: 'frame-and-panel', slideType: 'side-mount' });
      expect.unreachable();
    } catch (error) {
      expect(isInputError(error)).toBe(true);
      expect((error as { field: string }).field).toBe('slideType');
    }
  });
});
