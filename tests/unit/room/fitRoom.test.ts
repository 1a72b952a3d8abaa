import { describe, expect, it } from 'vitest';
import { fitRoom } from '../../../shared/room/fitRoom.ts';
import { envelopeFromResult } from '../../../shared/room/pieceEnvelope.ts';
import { boxChestResult } from './support/boxChest.ts';
import { coastalBedroom, plainRoom } from './support/rooms.ts';

const TOLERANCE_MM = 0.01;
const check = (fit: ReturnType<typeof fitRoom>, id: string) => {
  const found = fit.checks.find((c) => c.id === id);
  if (!found) throw new Error(`no check ${id}`);
  return found;
};

// The test chest: 1016 × 483 × 584 over the legs; lid 19 thick, overhanging 25 at the front and
// sides and 6 at the back, so the whole piece is 1066 × 514 × 584 and the lid's underside is at 565.
const demoChest = () => envelopeFromResult(boxChestResult({ width: 1016, depth: 483, height: 584 }));

describe('fitRoom', () => {
  it('stands the chest off the wall by the baseboard less the lid overhang, plus the gap', () => {
    // Legs reach below the 90 mm baseboard, so the case back stands 14 mm off the wall; the lid
    // overhangs the back by 6, so the piece's back is 14 − 6 = 8 off, and the 20 mm gap → 28.
    const fit = fitRoom(coastalBedroom(), demoChest());
    expect(fit.placed.standoffMm).toBeCloseTo(28, 6);
    expect(check(fit, 'footprint').passed).toBe(true);
  });

  it('finds the lid hitting the window sill when it opens, with the angle and the pull-out', () => {
    // Hinge line 28 + 6 = 34 mm off the wall at Z 565. The sill's front-bottom corner is 40 off
    // the wall at Z 760 − 25 = 735: from the hinge that is (−6, 170) in (Y toward the wall, Z).
    // The lid (19 thick) reaches it when that corner comes within 19 of the lid's underside:
    // 170 cos α − 6 sin α = 19 → √(170² + 6²) cos(α + 2.02°) = 19 → α = 83.59° − 2.02° = 81.57°,
    // first met at the 82° sample. Open at 90° its back face is 34 − 19 = 15 off the wall, so it
    // clears the 40 mm sill when the piece stands 40 − 15 = 25 mm further out (26 to the whole mm above).
    const fit = fitRoom(coastalBedroom(), demoChest());
    const lid = check(fit, 'lid-open');
    expect(lid.passed).toBe(false);
    expect(lid.severity).toBe('error');
    expect(lid.numbers['contactDeg']).toBe(82);
    expect(lid.numbers['pullOutMm']).toBe(26);
    expect(lid.partIds).toContain('lid');
    expect(fit.scene.collisions.some((c) => c.checkId === 'lid-open' && c.solidId === 'sill:sea')).toBe(true);
  });

  it('clears the sill once the piece stands far enough out', () => {
    const room = coastalBedroom();
    const moved = fitRoom({ ...room, placement: { ...room.placement, gap: 20 + 26 } }, demoChest());
    expect(check(moved, 'lid-open').passed).toBe(true);
  });

  it('says the closed chest sits under the sill, and warns when a taller one covers the window', () => {
    // Sill at 760: the 584 chest is 176 below it; a 900 chest is 140 above it.
    expect(check(fitRoom(coastalBedroom(), demoChest()), 'window-closed:sea').numbers['clearanceMm']).toBeCloseTo(176, 6);
    const tall = fitRoom(coastalBedroom(), envelopeFromResult(boxChestResult({ width: 1016, depth: 483, height: 900 })));
    const win = check(tall, 'window-closed:sea');
    expect(win.passed).toBe(false);
    expect(win.severity).toBe('warning');
    expect(win.numbers['clearanceMm']).toBeCloseTo(-140, 6);
  });

  it('measures the walkway from the open piece to the bed', () => {
    // Back wall at Y 3300; the piece's front is 28 + 514 = 542 off it, at Y 2758; the bed ends at
    // Y 322 + 1530 = 1852: 2758 − 1852 = 906, above the 762 wanted.
    const walk = check(fitRoom(coastalBedroom(), demoChest()), 'walkway');
    expect(walk.numbers['walkwayMm']).toBeCloseTo(906, 6);
    expect(walk.passed).toBe(true);
  });

  it('warns when the walkway is short, and names the shortfall', () => {
    const room = coastalBedroom();
    const fit = fitRoom({ ...room, clearances: { walkway: 1000 } }, demoChest());
    const walk = check(fit, 'walkway');
    expect(walk.passed).toBe(false);
    expect(walk.fix).toContain('94 mm');
  });

  it('passes a chest through a door only without its lid', () => {
    // Case over the legs 1000 × 690, lid top at 739 (case top at 720), lid overhanging 25 each
    // side, 40 front, 20 back: whole 1050 × 750 × 739. Door 700 × 2032.
    // Whole: upright min(1050, 750) = 750 > 700; tipped smallest face 739 × 750, 739 > 700 → no.
    // Case 1000 × 690 × 720: upright 690 ≤ 700 and 720 ≤ 2032 → yes.
    // Lid with its battens 1050 × 750 × (19 + 19): smallest face 38 × 750 → yes, tipped.
    const piece = envelopeFromResult(boxChestResult({ width: 1000, depth: 690, height: 739, lidOverhangFront: 40, lidOverhangBack: 20 }));
    const room = plainRoom({ doors: [{ id: 'd', wall: 'front', position: 200, width: 700, height: 2032 }] });
    const passage = check(fitRoom(room, piece), 'passage:d');
    expect(passage.passed).toBe(true);
    expect(passage.message).toContain('taken apart');
    expect(passage.fix).toContain('case without the lid and lid');
  });

  it('refuses a chest that will not go through even taken apart', () => {
    // Case 900 × 820 × 781: upright min(900, 820) = 820 > 760; smallest face 781 × 820, 781 > 760 → no.
    const piece = envelopeFromResult(boxChestResult({ width: 900, depth: 820, height: 800 }));
    const room = plainRoom({ doors: [{ id: 'd', wall: 'front', position: 200, width: 760, height: 2032 }] });
    const passage = check(fitRoom(room, piece), 'passage:d');
    expect(passage.passed).toBe(false);
    expect(passage.severity).toBe('error');
    // Whole piece 950 × 851 × 800 → smallest face 800 × 851; the case's 781 is 21 over the 760 door.
    expect(passage.numbers['shortfallMm']).toBeCloseTo(21, 6);
  });

  it('reports a piece pushed into an obstacle with the parts and the cheapest fix', () => {
    // A 300 mm cabinet against the back wall where the chest stands 100 mm into it along the wall.
    const room = plainRoom({
      obstacles: [{ id: 'cab', label: 'cabinet', x: 1100, y: 3700, width: 600, depth: 300, height: 900 }],
      placement: { wall: 'back', position: 100 },
    });
    const fit = fitRoom(room, demoChest());
    const footprint = check(fit, 'footprint');
    expect(footprint.passed).toBe(false);
    // The piece spans X 100 … 1166 (1066 wide); the cabinet starts at 1100: 66 mm along the wall.
    expect(footprint.numbers['worstOverlapMm']).toBeCloseTo(66, 6);
    expect(footprint.fix).toContain('66 mm');
    expect(footprint.partIds).toContain('lid');
    const hit = fit.scene.collisions.find((c) => c.solidId === 'obstacle:cab');
    expect(hit?.overlapMm?.min[0]).toBeCloseTo(1100, 6);
    expect(hit?.overlapMm?.max[0]).toBeCloseTo(1166, 6);
  });

  it('places the piece in the room for the 3D view', () => {
    const fit = fitRoom(coastalBedroom(), demoChest());
    // Niche between the bookcase (to 800) and the dresser (from 2800), centred: the 1066 piece's
    // left side at 1800 − 533 = 1267, so the piece origin (25 in from its lid's side) is at X 1292.
    expect(fit.scene.piece.rotationZDeg).toBe(0);
    expect(fit.scene.piece.originMm[0]).toBeCloseTo(1292, 6);
    expect(fit.scene.piece.originMm[1]).toBeCloseTo(3300 - 28 - 489, 6);
    expect(fit.scene.lid?.contactDeg).toBe(82);
    expect(fit.scene.solids.some((s) => s.id === 'sill:sea')).toBe(true);
    expect(Math.abs(fit.scene.windows[0]!.opening.min[2] - 760)).toBeLessThan(TOLERANCE_MM);
  });
});
