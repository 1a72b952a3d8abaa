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
    within(part(r, 'left-side').lengthMm, 739.775);
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

describe('buildPiece (dresser), web frames worked by hand', () => {
  // The default dresser's web frames: 3/4 in stock behind each 2 in face-frame rail between rows,
  // top flush with the opening above; 3 in rails, 1-1/2 in side runners, 1/4 in grooves 1/4 in
  // deep, tenons and panel edges 1/16 in short of the groove bottoms (common practice, no
  // published source); 1/4 in plywood dust panels (7/32 in = 5.556 mm actual); the frame let
  // 1/4 in into a dado across each side.
  const r = dresser();

  it('runs the rails from dado to dado, the front rail behind the face frame and the back rail against the back', () => {
    // Inside the sides: 1422.4 − 2 × 18.256 = 1385.888; plus two 6.35 dadoes = 1398.588 mm.
    const front = part(r, 'web-frame-front-rail');
    within(front.lengthMm, 1398.588);
    within(front.widthMm, 3 * IN);
    within(front.thicknessMm, 0.75 * IN);
    expect(front.quantity).toBe(2);
    expect(part(r, 'web-frame-back-rail').quantity).toBe(2);
  });

  it('sets each frame under the opening above it, in dadoes at those heights in both sides', () => {
    // Carcass from the 4 in plinth (101.6) up; openings start under the 1-1/2 in top rail at
    // 841.375 − 38.1 = 803.275: row 1 bottom 803.275 − 161.925 = 641.35, so frame 1 is
    // 622.3–641.35; row 2 bottom 641.35 − 50.8 − 187.325 = 403.225, frame 2 384.175–403.225.
    for (const id of ['left-side', 'right-side']) {
      const dadoes = part(r, id).features.filter((f) => f.id.startsWith('dado-web-frame'));
      expect(dadoes).toHaveLength(2);
      expect(dadoes.every((f) => f.type === 'dado' && Math.abs(f.widthMm - 0.75 * IN) < MM_TOLERANCE && Math.abs(f.depthMm - 0.25 * IN) < MM_TOLERANCE)).toBe(true);
    }
    const frontRails = r.placements.filter((pl) => pl.partId === 'web-frame-front-rail').map((pl) => pl.positionMm[2]).sort((a, b) => a - b);
    within(frontRails[0], 384.175);
    within(frontRails[1], 622.3);
  });

  it('tenons the runners into the rails and floats a dust panel in each bay', () => {
    // Runners: from 95.25 − 6.35 + 1.5875 to 426.244 + 6.35 − 1.5875 (back rail from the back's
    // front face 502.444 less 76.2) = 340.519 mm; a side runner 38.1 + 6.35 in its dado = 44.45 wide.
    const runners = r.parts.filter((p) => p.role === 'runner');
    expect(runners.reduce((n, p) => n + p.quantity, 0)).toBe(6);
    runners.forEach((p) => within(p.lengthMm, 340.519));
    // The left and right side runners are one part turned end for end: four of them.
    within(part(r, 'web-frame-runner').widthMm, 44.45);
    expect(part(r, 'web-frame-runner').quantity).toBe(4);
    // The runner under the divider reaches under both drawers' sides: 18.256 + 2 × (12.7 + 12.7) = 69.056.
    within(part(r, 'web-frame-centre-runner').widthMm, 69.056);
    // Panel: bay 56.356–676.672 (the centre runner at 711.2 ± 34.528), plus 2 × (6.35 − 1.5875) = 629.841 by 340.519.
    const panel = part(r, 'dust-panel');
    expect(panel.quantity).toBe(4);
    within(panel.lengthMm, 629.841);
    within(panel.widthMm, 340.519);
    within(panel.thicknessMm, (7 / 32) * IN);
    expect(r.joints.filter((j) => j.type === 'panel-in-groove' && j.members[0].partId === 'dust-panel').every((j) => j.floating && !j.glued)).toBe(true);
  });

  it('stops the divider on each frame: one piece per row, screwed through the runner under it', () => {
    // Top piece from frame 1's top (641.35) into the stretchers' dado (841.375 − 12.7 − 18.256 + 6.35
    // = 816.769): 175.419; row 2 from 403.225 to 622.3: 219.075; row 3 from the bottom's dado
    // (101.6 + 12.7 + 18.256 − 6.35 = 126.206) to 384.175: 257.969.
    within(part(r, 'row-1-divider').lengthMm, 175.419);
    within(part(r, 'row-2-divider').lengthMm, 219.075);
    within(part(r, 'row-3-divider').lengthMm, 257.969);
    expect(r.joints.filter((j) => j.type === 'butt-screwed' && j.members[0].partId.endsWith('-divider')).reduce((n, j) => n + j.count, 0)).toBe(4);
  });

  it('glues each web frame flat, then into the sides with the carcass', () => {
    const flat = r.derived.glueUp.find((s) => s.steps.some((st) => st.title.startsWith('Glue up each web frame')));
    expect(flat?.floatingPartIds).toContain('dust-panel');
    const carcass = r.derived.glueUp.find((s) => s.title === 'The carcass');
    expect(carcass?.steps[0]!.partIds).toContain('web-frame-front-rail');
  });
});

describe('buildPiece (dresser) web-frame options', () => {
  it('builds open frames without dust panels, and none at all when asked', () => {
    const open = dresser({ webFrames: 'open' });
    expect(open.parts.some((p) => p.id === 'dust-panel')).toBe(false);
    expect(open.parts.some((p) => p.id === 'web-frame-front-rail')).toBe(true);
    const none = dresser({ webFrames: 'none' });
    expect(none.parts.some((p) => p.id.startsWith('web-frame'))).toBe(false);
    // Without frames the divider runs bottom to top in one piece: 816.769 − 126.206 = 690.563 mm.
    within(part(none, 'divider').lengthMm, 690.563);
    expect(none.parts.some((p) => p.id === 'case-side')).toBe(true);
  });

  it('rides the drawers over a web frame on its runners', () => {
    const r = dresser({ slideType: 'wood-runners' });
    const rides = r.joints.filter((j) => j.type === 'drawer-slide' && j.members[0].partId === 'row-1-drawer-side');
    expect(rides.length).toBeGreaterThan(0);
    expect(rides.every((j) => /^web-frame-(centre-)?runner$/.test(j.members[1].partId))).toBe(true);
    expect(r.checks.filter((c) => c.severity === 'error' || c.severity === 'warning')).toEqual([]);
  });

  it('builds no web frames in a frameless carcass', () => {
    expect(dresser({ faceFrame: false }).parts.some((p) => p.id.startsWith('web-frame'))).toBe(false);
  });

  it('refuses a rail between rows too narrow to hide a web frame, naming faceFrameMidRail', () => {
    try {
      dresser({ faceFrameMidRail: 15 });
      expect.unreachable();
    } catch (error) {
      expect(isInputError(error)).toBe(true);
      expect((error as { field: string }).field).toBe('faceFrameMidRail');
    }
    expect(dresser({ faceFrameMidRail: 15, webFrames: 'none' }).parts.length).toBeGreaterThan(0);
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

  it('flags overlay fronts that overlap across a rail narrower than two overlays, with the overlap', () => {
    // A 3/4 in rail between rows under 1/2 in overlays: 19.05 − 2 × 12.7 = −6.35 mm.
    const r = dresser({ faceFrameMidRail: 0.75 * IN });
    const c = r.checks.find((x) => x.id.startsWith('fronts-collide'));
    expect(c?.severity).toBe('error');
    within(c?.numbers.gapMm, -6.35);
    expect(dresser().checks.some((x) => x.id.startsWith('fronts-collide'))).toBe(false);
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

  it('builds its defaults clean: no error or warning, no caution but the tip-over one', () => {
    const d = dresser({ caseConstruction: 'frame-and-panel', slideType: 'wood-runners' });
    expect(d.checks.filter((c) => c.severity === 'error' || c.severity === 'warning')).toEqual([]);
    expect(d.checks.filter((c) => c.severity === 'caution').map((c) => c.id)).toEqual(['tip-over']);
  });

  it('meets overlay fronts over the rails between rows, the reveals even: worked by hand', () => {
    // Default 1/2 in overlay on 3/4 in rails: the top and bottom rails show 19.05 − 12.7 = 6.35;
    // between rows each front laps (19.05 − 6.35) / 2 = 6.35, so that rail shows 6.35 too. The
    // legs show 44.45 − 12.7 = 31.75; the 2 in mullion is lapped (50.8 − 31.75) / 2 = 9.525 a side.
    const d = dresser({ caseConstruction: 'frame-and-panel', slideType: 'wood-runners' });
    // Rows 204.258, 229.658, 255.058 (see above): fronts 204.258 + 12.7 + 6.35 = 223.308,
    // 229.658 + 2 × 6.35 = 242.358, 255.058 + 6.35 + 12.7 = 274.108 tall.
    within(part(d, 'row-1-drawer-front').widthMm, 223.308);
    within(part(d, 'row-2-drawer-front').widthMm, 242.358);
    within(part(d, 'row-3-drawer-front').widthMm, 274.108);
    // Columns (1422.4 − 2 × 44.45 − 50.8) / 2 = 641.35 wide: front 641.35 + 12.7 + 9.525 = 663.575.
    within(part(d, 'row-1-drawer-front').lengthMm, 663.575);
    expect(d.checks.some((c) => c.id.startsWith('fronts-collide') || c.id === 'reveals-uneven')).toBe(false);
  });

  it('never overlaps fronts however large the overlay, but says when the reveals come out uneven', () => {
    const d = dresser({ caseConstruction: 'frame-and-panel', slideType: 'wood-runners', overlay: 0.75 * IN });
    expect(d.checks.some((c) => c.id.startsWith('fronts-collide'))).toBe(false);
    const c = d.checks.find((x) => x.id === 'reveals-uneven');
    expect(c?.severity).toBe('warning');
    // Top rail covered (19.05 − 19.05 = 0); between rows the fronts keep the 1/8 in gap.
    within(c?.numbers.topRailShowsMm, 0);
    within(c?.numbers.midRailShowsMm, 3.175);
  });

});

describe('buildPiece (dresser) built like the chest, on side-mount slides', () => {
  // The default dresser with only the case switched: 56 × 20 × 34 in, 1-3/4 in legs, 3/4 in side
  // rails centred on them, a 2 in mullion, 1/2 in overlay fronts, 1/2 in drawer stock, 1/4 in
  // clearance below the box, 1/2 in above, 1 in behind; side-mount slides (the form's default).
  const r = dresser({ caseConstruction: 'frame-and-panel' });

  it('fills the step from the side frames to the legs with spacers: worked by hand', () => {
    // The side rails are centred on the legs, so their inner face stands (44.45 − 19.05) / 2
    // = 12.7 mm back from the legs' inner faces: the spacer is 12.7 mm (1/2 in) thick, its face
    // flush with the opening. Six, one each side of three rows; 2 in tall (Casewright's
    // choice to cover a slide's cabinet member; common practice, no published source).
    const spacer = part(r, 'slide-spacer');
    within(spacer.thicknessMm, 12.7);
    within(spacer.widthMm, 50.8);
    expect(spacer.quantity).toBe(6);
    // Behind the mullion a block as wide as it: 50.8 mm, one a row.
    within(part(r, 'centre-slide-spacer').thicknessMm, 50.8);
    expect(part(r, 'centre-slide-spacer').quantity).toBe(3);
    const rows = r.derived.cutList.flatMap((g) => g.rows);
    expect(rows.find((x) => x.partId === 'slide-spacer')?.quantity).toBe(6);
    expect(rows.find((x) => x.partId === 'centre-slide-spacer')?.quantity).toBe(3);
  });

  it('sizes the drawer boxes from the opening for the slides\' clearance: worked by hand', () => {
    // Openings (1422.4 − 2 × 44.45 − 50.8) / 2 = 641.35 mm wide; side-mount slides take 1/2 in
    // each side (common practice, from memory, approximate, as the carcass dresser): the box is
    // 641.35 − 2 × 12.7 = 615.95 mm wide, so its front runs between the two 12.7 mm sides with a
    // tongue 6.35 mm (half the side) into each: 615.95 − 2 × 12.7 + 2 × 6.35 = 603.25.
    const sides = r.parts.filter((x) => x.id.endsWith('drawer-side'));
    expect(sides).toHaveLength(3);
    within(part(r, 'row-1-drawer-box-front').lengthMm, 603.25);
    // Depth: the back wall's inner face is 508 − 12.7 − 19.05 = 476.25 mm from the front, less 1 in
    // behind the box leaves 450.85; the longest slide in 2 in steps that fits is 16 in = 406.4 mm,
    // and the box is as long as the slide.
    sides.forEach((s) => within(s.lengthMm, 406.4));
    // Row 1: the 204.258 mm opening less 1/4 in below and 1/2 in above = 185.208 mm.
    within(part(r, 'row-1-drawer-side').widthMm, 185.208);
    // The side spacer runs from the back of the 44.45 mm front leg to the slide's end:
    // 406.4 − 44.45 = 361.95; the centre block from behind the 19.05 mm mullion: 387.35.
    within(part(r, 'slide-spacer').lengthMm, 361.95);
    within(part(r, 'centre-slide-spacer').lengthMm, 387.35);
  });

  it('glues and screws every spacer to its runner, and hangs each drawer side on a spacer', () => {
    const onRunners = r.joints.filter((j) => j.members[0].partId.includes('slide-spacer'));
    expect(onRunners.map((j) => j.type)).toEqual(onRunners.map(() => 'butt-screwed'));
    expect(onRunners.every((j) => j.glued && j.members[1].partId.startsWith('web-frame'))).toBe(true);
    const slides = r.joints.filter((j) => j.type === 'drawer-slide');
    expect(slides.length).toBeGreaterThan(0);
    expect(slides.every((j) => j.members[1].partId.includes('slide-spacer'))).toBe(true);
    within(slides[0]!.clearanceMm, 12.7);
  });

  it('builds its defaults clean: no error or warning, no caution but the tip-over one', () => {
    expect(r.checks.filter((c) => c.severity === 'error' || c.severity === 'warning')).toEqual([]);
    expect(r.checks.filter((c) => c.severity === 'caution').map((c) => c.id)).toEqual(['tip-over']);
  });

  it('passes its drawer checks as the carcass dresser does, both on the default side-mount slides', () => {
    const carcass = dresser();
    expect(carcass.spec.params.slideType).toBe('side-mount');
    for (const d of [carcass, r]) {
      expect(d.checks.filter((c) => c.id.startsWith('drawer-') && c.severity !== 'info')).toEqual([]);
      expect(d.checks.find((c) => c.id === 'drawer-travel')?.message).toMatch(/side-mount slides/);
    }
  });

  it('takes undermount slides on the same spacers, warning when the bottoms sit too low', () => {
    const u = dresser({ caseConstruction: 'frame-and-panel', slideType: 'undermount' });
    expect(u.checks.filter((c) => c.severity === 'error')).toEqual([]);
    expect(part(u, 'slide-spacer').quantity).toBe(6);
    // Undermount slides take about 3/16 in each side (common practice, from memory, approximate):
    // the box is 641.35 − 2 × 4.7625 = 631.825 wide, its front 631.825 − 12.7 = 619.125 long.
    within(part(u, 'row-1-drawer-box-front').lengthMm, 619.125);
    const low = dresser({ caseConstruction: 'frame-and-panel', slideType: 'undermount', drawerBottomSetUp: 6 });
    expect(low.checks.find((c) => c.id === 'undermount-set-up')?.severity).toBe('warning');
  });

  it('has no spacers on wooden runners', () => {
    const w = dresser({ caseConstruction: 'frame-and-panel', slideType: 'wood-runners' });
    expect(w.parts.some((x) => x.id.includes('slide-spacer'))).toBe(false);
  });

  it('refuses a drawer depth too short to reach past the legs, naming drawerDepth', () => {
    try {
      dresser({ caseConstruction: 'frame-and-panel', drawerDepth: 60 });
      expect.unreachable();
    } catch (error) {
      expect(isInputError(error)).toBe(true);
      expect((error as { field: string }).field).toBe('drawerDepth');
    }
  });
});
