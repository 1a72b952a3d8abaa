import { describe, expect, it } from 'vitest';
import type { Box3 } from '../../../shared/engine/types.ts';
import { fitRoom } from '../../../shared/room/fitRoom.ts';
import type { EnvelopePart, PieceEnvelope } from '../../../shared/room/pieceEnvelope.ts';
import { plainRoom } from './support/rooms.ts';

const TOLERANCE_MM = 1e-6;

const part = (partId: string, box: Box3): EnvelopePart => ({ partId, instance: 0, label: partId, role: 'panel', box });

// A cabinet 800 wide, 500 deep, 900 tall: one door 400 wide hinged on the left at the front
// face (Y 0), and one drawer whose 450 deep box slides out its full 450.
function cabinet(): PieceEnvelope {
  const carcass = part('case-side', { min: [0, 0, 0], max: [800, 500, 900] });
  const door = part('door', { min: [0, -19, 100], max: [400, 0, 700] });
  const drawer = part('drawer-front', { min: [400, -19, 100], max: [800, 450, 280] });
  return {
    kind: 'cabinet',
    box: { min: [0, -19, 0], max: [800, 500, 900] },
    parts: [carcass, door, drawer],
    lid: null,
    doors: [{ id: 'left', parts: [door], hinge: 'left', hingeXMm: 0, hingeYMm: 0, openAngleDeg: 110 }],
    drawers: [{ id: 'top', parts: [drawer], travelMm: 450 }],
    subassemblies: [{ id: 'whole', label: 'whole piece', partIds: ['case-side', 'door', 'drawer-front'], box: { min: [0, -19, 0], max: [800, 500, 900] } }],
    assumptions: [],
  };
}

describe('fitRoom with doors and drawers', () => {
  it('opens the door to 90° and the drawer to full extension in an open room', () => {
    const fit = fitRoom(plainRoom({ doors: [{ id: 'd', wall: 'front', position: 100, width: 800, height: 2032 }] }), cabinet());
    expect(fit.checks.find((c) => c.id === 'door-open:left')?.passed).toBe(true);
    expect(fit.checks.find((c) => c.id === 'drawer-open:top')?.passed).toBe(true);
    // Open reach: the drawer front goes from Y −19 to −19 − 450 = −469, beyond the door's
    // 400 at 90° (−400 at its free edge): 500 + 469 = 969 from the back.
    expect(fit.checks.find((c) => c.id === 'walkway')?.numbers['openReachMm']).toBeCloseTo(969, 6);
    expect(fit.scene.drawers[0]!.offsetMm[1]).toBeCloseTo(-450, 6);
  });

  it('finds the door hitting an obstacle beside the piece as it swings', () => {
    // The piece stands 20 off the back wall (Y 4000), left side at X 1000, so piece (x, y) is
    // room (1000 + x, 3480 + y). A radiator at room X 800 … 990, Y 3180 … 3380 is piece
    // x −200 … −10, y −300 … −100: beside the piece, in front of the wall next to it.
    // The door turns about (0, 0); its outer face, s from the hinge, lies at
    // (s cos α − 19 sin α, −s sin α − 19 cos α). It meets the radiator's corner (−10, −100) when
    // 100 cos α + 10 sin α = 19 → √(100² + 10²) cos(α − 5.71°) = 19 → α = 79.10° + 5.71° = 84.81°,
    // first met at the 85° sample.
    const room = plainRoom({
      obstacles: [{ id: 'rad', label: 'radiator', x: 800, y: 3180, width: 190, depth: 200, height: 600 }],
      placement: { wall: 'back', position: 1000, gap: 20 },
      doors: [{ id: 'd', wall: 'front', position: 100, width: 800, height: 2032 }],
    });
    const fit = fitRoom(room, cabinet());
    const door = fit.checks.find((c) => c.id === 'door-open:left')!;
    expect(door.passed).toBe(false);
    expect(door.numbers['contactDeg']).toBe(85);
    expect(door.partIds).toEqual(['door']);
    expect(fit.checks.find((c) => c.id === 'footprint')?.passed).toBe(true);
    expect(fit.scene.pieceDoors[0]?.contactDeg).toBe(85);
  });

  it('stops the drawer at a bed in front and names the clear travel', () => {
    // Piece y = room Y − 3480 (see above). The bed's side at Y 3180 is piece y −300; the drawer
    // front's face is at y −19, so it travels 300 − 19 = 281 before it meets the bed: 450 − 281 = 169 short.
    const room = plainRoom({
      obstacles: [{ id: 'bed', label: 'bed', x: 1000, y: 1500, width: 1500, depth: 1680, height: 600 }],
      placement: { wall: 'back', position: 1000, gap: 20 },
      doors: [{ id: 'd', wall: 'front', position: 100, width: 800, height: 2032 }],
    });
    const drawer = fitRoom(room, cabinet()).checks.find((c) => c.id === 'drawer-open:top')!;
    expect(drawer.passed).toBe(false);
    expect(Math.abs(drawer.numbers['clearTravelMm']! - 281)).toBeLessThan(TOLERANCE_MM);
    expect(Math.abs(drawer.numbers['shortMm']! - 169)).toBeLessThan(TOLERANCE_MM);
  });
});
