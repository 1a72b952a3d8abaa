import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec } from '../../../../shared/engine/index.ts';
import type { Part, PieceResult } from '../../../../shared/engine/types.ts';

const MM_TOLERANCE = 0.1;
const IN = 25.4;

/** The engine must match hand arithmetic to 0.1 mm. */
function withinTolerance(actual: number | false | undefined, expected: number): void {
  expect(typeof actual).toBe('number');
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(MM_TOLERANCE);
}

function chest(params: Record<string, unknown> = {}): PieceResult {
  const spec = defaultSpec('chest');
  return buildPiece({ ...spec, params: { ...spec.params, ...params } });
}

function part(result: PieceResult, id: string): Part {
  const found = result.parts.find((p) => p.id === id);
  if (!found) throw new Error(`no part ${id}; parts: ${result.parts.map((p) => p.id).join(', ')}`);
  return found;
}

describe('buildPiece (chest), worked by hand', () => {
  // A 40 × 19 × 23 in chest with the defaults (trade sizes, common practice, no published source):
  // legs 1-3/4 in square, 3/4 in rails and stiles, 1/4 in grooves 1/2 in deep in the legs and
  // 3/8 in deep in rails and stiles, rail tongues 7/16 in, stile tongues 1/16 in short of the
  // groove, 3 in top rail, 4 in bottom rail, 3 in foot, one centre stile 2-1/2 in wide front and
  // back, 3/4 in lid, panels of 1/2 in hardwood plywood (15/32 in actual, PS 1 category) that get
  // the wood library's 1/32 in fit gap at every edge, bottom the same plywood with 1/16 in
  // clearance all round.
  const r = chest({ width: 40 * IN, depth: 19 * IN, height: 23 * IN });

  it('makes the legs run from the floor to the underside of the lid', () => {
    // 23 in − 3/4 in lid = 22-1/4 in = 565.15 mm
    withinTolerance(part(r, 'leg').lengthMm, 565.15);
    expect(part(r, 'leg').quantity).toBe(4);
  });

  it('cuts the rails to the span between the legs plus a tongue at each end', () => {
    // front/back: 40 − 2 × 1-3/4 + 2 × 7/16 = 37-3/8 in = 949.325 mm
    withinTolerance(part(r, 'front-back-bottom-rail').lengthMm, 949.325);
    withinTolerance(part(r, 'front-top-rail').lengthMm, 949.325);
    // sides: 19 − 3-1/2 + 7/8 = 16-3/8 in = 415.925 mm
    withinTolerance(part(r, 'side-top-rail').lengthMm, 415.925);
    expect(part(r, 'side-bottom-rail').widthMm).toBeCloseTo(4 * IN, 6);
  });

  it('sizes the panels to the openings plus the grooves, less the fit gap', () => {
    // Opening height: 22-1/4 leg − 3 top rail − (3 foot + 4 bottom rail) = 12-1/4 in = 311.15 mm.
    // Panel height: 311.15 + 2 × 9.525 (3/8 in grooves) − 2 × 0.79375 (1/32 in) = 328.6125 mm.
    // Front bay: (40 − 3-1/2 − 2-1/2) / 2 = 17 in = 431.8 mm; into a 1/2 in leg groove on one
    // side and a 3/8 in stile groove on the other: 431.8 + 12.7 + 9.525 − 1.5875 = 452.4375 mm.
    const front = part(r, 'front-back-panel');
    expect(front.quantity).toBe(4);
    withinTolerance(front.lengthMm, 452.4375);
    withinTolerance(front.widthMm, 328.6125);
    expect(front.thicknessMm).toBeCloseTo((15 / 32) * IN, 6);
    // Side bay: 19 − 3-1/2 = 15-1/2 in = 393.7 mm; + 2 × 12.7 − 1.5875 = 417.5125 mm.
    const side = part(r, 'side-panel');
    withinTolerance(side.lengthMm, 417.5125);
    withinTolerance(side.widthMm, 328.6125);
  });

  it('rabbets a 1/2 in plywood panel to a 1/4 in tongue that fits the 1/4 in groove', () => {
    // 15/32 in − 1/4 in = 7/32 in = 5.556 mm deep rabbet (common practice, no published source)
    const front = part(r, 'front-back-panel');
    const rabbet = front.features.find((f) => f.type === 'rabbet');
    const tongue = front.features.find((f) => f.type === 'tongue');
    expect(rabbet?.type === 'rabbet' && rabbet.depthMm).toBeCloseTo((7 / 32) * IN, 3);
    expect(tongue?.type === 'tongue' && tongue.thicknessMm).toBeCloseTo(0.25 * IN, 6);
  });

  it('fits the centre stiles between the rail grooves, 1/16 in short at each end', () => {
    // 311.15 + 2 × (9.525 − 1.5875) = 327.025 mm
    withinTolerance(part(r, 'front-back-stile').lengthMm, 327.025);
    expect(part(r, 'front-back-stile').quantity).toBe(2);
  });

  it('notches the bottom around the legs and leaves 1/16 in all round', () => {
    // Rail inner faces: 1-3/4 / 2 + 3/4 / 2 = 1-1/4 in = 31.75 mm in from the outside.
    // Bottom: 1016 − 2 × 31.75 − 2 × 1.5875 = 949.325 mm by 482.6 − 63.5 − 3.175 = 415.925 mm.
    // Notch: from 31.75 + 1.5875 to 44.45 + 1.5875 = 12.7 mm each way.
    const bottom = part(r, 'bottom');
    withinTolerance(bottom.lengthMm, 949.325);
    withinTolerance(bottom.widthMm, 415.925);
    const notches = bottom.features.filter((f) => f.type === 'notch');
    expect(notches).toHaveLength(4);
    for (const n of notches) {
      withinTolerance(n.type === 'notch' && n.lengthMm, 12.7);
      withinTolerance(n.type === 'notch' && n.widthMm, 12.7);
    }
  });

  it('makes the lid the case plus its overhangs', () => {
    // (40 + 2 × 1) × (19 + 1 + 1/4) in = 1066.8 × 514.35 mm
    const lid = part(r, 'lid');
    withinTolerance(lid.lengthMm, 1066.8);
    withinTolerance(lid.widthMm, 514.35);
    // 514.35 / 5 in boards → 5 boards
    expect(lid.glueUp?.boards).toBe(5);
  });

  it('stops the leg grooves 1/2 in inside the rail edges', () => {
    // From 3 in foot + 1/2 in = 88.9 mm to 565.15 − 12.7 = 552.45 mm along the leg.
    const groove = part(r, 'leg').features.find((f) => f.type === 'stopped-groove');
    withinTolerance(groove?.type === 'stopped-groove' && groove.startMm, 88.9);
    withinTolerance(groove?.type === 'stopped-groove' && groove.stopMm, 552.45);
  });
});

describe('buildPiece (chest) exact sizes', () => {
  it('measures the case over the legs at the width and depth asked, the lid adding its overhangs', () => {
    const r = chest({ width: 1000, depth: 450, height: 600, lidOverhangFront: 20, lidOverhangSide: 15, lidOverhangBack: 5 });
    expect(r.bboxMm[0]).toBeCloseTo(1000 + 30, 6);
    expect(r.bboxMm[1]).toBeCloseTo(450 + 25, 6);
    expect(r.bboxMm[2]).toBeCloseTo(600, 6);
    const legs = r.placements.filter((p) => p.partId === 'leg');
    const xs = legs.map((p) => p.positionMm[0]);
    expect(Math.min(...xs)).toBeCloseTo(0, 9);
    expect(Math.max(...xs) + part(r, 'leg').widthMm).toBeCloseTo(1000, 6);
  });

  it('raises the lid by both hinge leaves when they are not let in, and says so', () => {
    const r = chest({ hingeRecess: 'none', hingeLeafThickness: 2 });
    expect(r.bboxMm[2]).toBeCloseTo(23 * IN + 4, 6);
    const c = r.checks.find((x) => x.id === 'hinges-not-recessed');
    expect(c?.severity).toBe('error');
    expect(c?.numbers.gapMm).toBeCloseTo(4, 9);
  });
});
