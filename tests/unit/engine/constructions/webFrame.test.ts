import { describe, expect, it } from 'vitest';
import { webFrame, type WebFrameOptions } from '../../../../shared/engine/constructions/webFrame.ts';
import type { Material } from '../../../../shared/engine/types.ts';

const MM_TOLERANCE = 1e-9;
const maple: Material = { kind: 'solid', speciesId: 'hard-maple', speciesName: 'maple' };
const ply: Material = { kind: 'sheet', sheetId: 'hardwood-plywood-1/4', sheetName: 'ply' };

// A frame 600 mm between the sides, 19 mm thick at z 100–119; 70 mm rails front (0–70) and back
// (430–500); 40 mm side runners; 6 mm grooves 6 mm deep, 1.5 mm end clearance, 6 mm shoulders.
function frame(options: Partial<WebFrameOptions> = {}) {
  return webFrame({
    index: 0, z: [100, 119], x: [0, 600], frontRailY: [0, 70], backRailY: [430, 500], ends: { kind: 'dado', depthMm: 6 },
    runnersX: [[-6, 40], [560, 606]], material: maple, grooveWidthMm: 6, grooveDepthMm: 6, tongueClearanceMm: 1.5, shoulderMm: 6, explodeMm: 0,
    ...options,
  });
}

describe('webFrame', () => {
  it('lets the rails into the sides\' dadoes: the inside width plus both dadoes, and no mortises', () => {
    const f = frame();
    expect(f.frontRail.size[0]).toBe(612);
    expect(f.mortises).toEqual([]);
    // The runners' groove runs through, so the side runners' tenons inside the dadoes sit in it.
    expect(f.frontRail.features.find((x) => x.id === 'groove-runners')?.removed[0]).toEqual({ min: [-6, 64, 106.5], max: [606, 70, 112.5] });
  });

  it('tenons the runners into both rails, the tenon 1.5 mm short of each groove bottom', () => {
    const f = frame();
    // Runner from 70 − 6 + 1.5 = 65.5 to 430 + 6 − 1.5 = 434.5.
    expect(f.runners[0]!.world.min[1]).toBe(65.5);
    expect(f.runners[0]!.world.max[1]).toBe(434.5);
    expect(f.joints.filter((j) => j.type === 'stub-tenon')).toHaveLength(4);
  });

  it('floats a dust panel in grooves round the bay, grooving each runner on its bay side', () => {
    const f = frame({ dustPanel: { material: ply } });
    expect(f.panels).toHaveLength(1);
    // Bay 40–560 by 70–430, plus 6 − 1.5 at each edge: 529 × 369 × 6.
    const p = f.panels[0]!;
    expect(p.size[0]).toBeCloseTo(529, 9);
    expect(p.size[1]).toBeCloseTo(369, 9);
    expect(Math.abs(p.size[2] - 6)).toBeLessThan(MM_TOLERANCE);
    expect(f.runners[0]!.features.some((x) => x.id === 'groove-right')).toBe(true);
    expect(f.runners[1]!.features.some((x) => x.id === 'groove-left')).toBe(true);
    const fits = f.joints.filter((j) => j.type === 'panel-in-groove');
    expect(fits).toHaveLength(4);
    expect(fits.every((j) => j.floating && !j.glued && j.clearanceMm === 1.5)).toBe(true);
  });

  it('tenons the rails into leg mortises in a leg case', () => {
    const f = frame({ x: [50, 550], runnersX: [[50, 90], [510, 550]], ends: { kind: 'tenon', mortiseDepthMm: 12, railTongueLengthMm: 10, backLegY: [450, 500] } });
    // 500 between the legs plus a 10 mm tenon each end.
    expect(f.frontRail.size[0]).toBe(520);
    expect(f.mortises).toHaveLength(4);
    expect(f.mortises.every((m) => m.groove.depthMm === 12)).toBe(true);
  });
});
