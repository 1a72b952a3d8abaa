import { describe, expect, it } from 'vitest';
import { carcassBox } from '../../../../shared/engine/constructions/carcassBox.ts';
import { shelves } from '../../../../shared/engine/constructions/shelves.ts';
import { boxBetween } from '../../../../shared/engine/geometry/box.ts';
import type { Material } from '../../../../shared/engine/types.ts';

const MM_TOLERANCE = 1e-9;
const ply: Material = { kind: 'sheet', sheetId: 'hardwood-plywood-3/4', sheetName: 'ply' };
const back: Material = { kind: 'sheet', sheetId: 'hardwood-plywood-1/4', sheetName: 'back' };

function box(options: Partial<Parameters<typeof carcassBox>[0]> = {}) {
  // A 600 × 500 × 800 mm carcass of 18 mm sheet, 6 mm dadoes set 12 mm from the ends, a 6 mm back.
  return carcassBox({
    box: boxBetween([0, 0, 0], [600, 500, 800]), sheet: ply, thicknessMm: 18, joinery: 'dado', jointDepthMm: 6, dadoEndWallMm: 12,
    top: 'panel', stretcherWidthMm: 0, back: { sheet: back, thicknessMm: 6, fit: 'rabbet', grooveSetInMm: 10 }, dividerXs: [], extraFeatures: [],
    edgeBanded: false, explodeMm: 0, ...options,
  });
}

describe('carcassBox', () => {
  it('lets the bottom and top into dadoes: their length is the inside width plus both dadoes', () => {
    const c = box();
    // 600 − 2 × 18 + 2 × 6 = 576
    expect(c.bottom.size[0]).toBe(576);
    expect(c.left.features.filter((f) => f.type === 'dado')).toHaveLength(2);
  });

  it('stops the top and bottom at the back\'s rabbet and gives the clear inside', () => {
    const c = box();
    expect(c.bottom.size[1]).toBe(494);
    // Inside: X 18–582, Y 0–494, Z from 12 + 18 = 30 to 800 − 30 = 770.
    expect(c.inside).toEqual({ min: [18, 0, 30], max: [582, 494, 770] });
  });

  it('slides a grooved back between the top and bottom grooves', () => {
    const c = box({ back: { sheet: back, thicknessMm: 6, fit: 'groove', grooveSetInMm: 10 } });
    // Back from the bottom's top (30) less 6 to the top's underside (770) plus 6; groove 10 mm in from the back.
    expect(c.back.world.min[2]).toBe(24);
    expect(c.back.world.max[2]).toBe(776);
    expect(c.back.world.max[1]).toBe(490);
    expect(c.tops[0]!.features.some((f) => f.id === 'groove-back')).toBe(true);
  });

  it('houses dividers in dadoes in the bottom and top', () => {
    const c = box({ dividerXs: [300] });
    expect(c.dividers).toHaveLength(1);
    expect(Math.abs(c.dividers[0]!.size[0] - (770 + 6 - (30 - 6)))).toBeLessThan(MM_TOLERANCE);
    expect(c.bottom.features.some((f) => f.type === 'dado')).toBe(true);
  });

  it('gives the sides the shelves\' cuts: centred pin-hole rows on the spacing asked for', () => {
    const inside = box().inside;
    const s = shelves({
      inside, frontYMm: 6, backYMm: 494, material: ply, thicknessMm: 18, edgeStrip: null, endClearanceMm: 1, dadoDepthMm: 6,
      fixedZ: [], adjustableZ: [400], holes: { spacingMm: 32, setbackMm: 37, diameterMm: 5, depthMm: 10, endMarginMm: 76 }, explodeMm: 0,
    });
    // Rows: floor((740 − 152) / 32) + 1 = 19, centred on 400: from 400 − 9 × 32 = 112 to 688.
    expect(s.holeRowsZ).toHaveLength(19);
    expect(Math.abs(s.holeRowsZ[0]! - 112)).toBeLessThan(MM_TOLERANCE);
    const c = box({ extraFeatures: s.sideFeatures });
    expect(c.left.features.filter((f) => f.type === 'hole')).toHaveLength(38);
    // The shelf rests on the pins' shanks at the nearest row: 400 − 2.5 → row 400, shelf at 402.5.
    expect(s.drafts[0]!.world.min[2]).toBe(402.5);
    expect(s.shelves[0]!.spanMm).toBe(562);
  });

  it('breaks each divider at the web-frame bands: one piece per row, the end pieces in the dadoes', () => {
    // Divider at x = 300 from the bottom's dado (30 − 6 = 24) to the top's (770 + 6 = 776), broken
    // at the bands 300–320 and 520–540: pieces 540–776, 320–520 and 24–300.
    const c = box({ dividerXs: [300], dividerBreaksZ: [[300, 320], [520, 540]] });
    expect(c.dividers.map((d) => [d.world.min[2], d.world.max[2]])).toEqual([[540, 776], [320, 520], [24, 300]]);
    expect(c.dividerAt(0, 400)).toBe(c.dividers[1]);
    const dadoJoints = c.joints.filter((j) => j.type === 'dado' && c.dividers.includes(j.a.draft));
    expect(dadoJoints.map((j) => [c.dividers.indexOf(j.a.draft), j.b.draft === c.bottom ? 'bottom' : 'top'])).toEqual([[2, 'bottom'], [0, 'top']]);
  });
});
