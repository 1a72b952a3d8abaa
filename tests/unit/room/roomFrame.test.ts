import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Box3 } from '../../../shared/engine/types.ts';
import { pieceBoxToRoom, piecePointToRoom, pieceRotationZDeg, roomBoxToPiece, roomToWall, wallToRoom } from '../../../shared/room/roomFrame.ts';
import { WALLS } from '../../../shared/room/roomSchema.ts';

const TOLERANCE_MM = 1e-6;
const room = { width: 4000, depth: 3000 };

describe('roomToWall', () => {
  it('measures along each wall from its left corner as you face it', () => {
    // Facing the back wall (Y = 3000) its left corner is X = 0; facing the right wall (X = 4000)
    // its left corner is the back one (Y = 3000); facing the front wall, X = 4000; the left wall, Y = 0.
    expect(roomToWall(room, 'back', 100, 2900)).toEqual([100, 100]);
    expect(roomToWall(room, 'right', 3900, 2900)).toEqual([100, 100]);
    expect(roomToWall(room, 'front', 3900, 100)).toEqual([100, 100]);
    expect(roomToWall(room, 'left', 100, 100)).toEqual([100, 100]);
  });

  it('is undone by wallToRoom on every wall', () => {
    fc.assert(fc.property(fc.constantFrom(...WALLS), fc.double({ min: 0, max: 4000, noNaN: true }), fc.double({ min: 0, max: 3000, noNaN: true }), (wall, x, y) => {
      const [a, d] = roomToWall(room, wall, x, y);
      const [x2, y2] = wallToRoom(room, wall, a, d);
      expect(Math.abs(x2 - x)).toBeLessThan(TOLERANCE_MM);
      expect(Math.abs(y2 - y)).toBeLessThan(TOLERANCE_MM);
    }));
  });
});

describe('pieceBoxToRoom', () => {
  it('round-trips a box through the room and back for any wall and pose', () => {
    const coord = fc.double({ min: -500, max: 500, noNaN: true });
    fc.assert(fc.property(fc.constantFrom(...WALLS), coord, coord, coord, coord, (wall, alongMm, offMm, x, y) => {
      const pose = { wall, alongMm, offMm };
      const box: Box3 = { min: [x, y, 0], max: [x + 100, y + 50, 30] };
      const back = roomBoxToPiece(room, pose, pieceBoxToRoom(room, pose, box));
      for (let i = 0; i < 3; i++) {
        expect(Math.abs(back.min[i]! - box.min[i]!)).toBeLessThan(TOLERANCE_MM);
        expect(Math.abs(back.max[i]! - box.max[i]!)).toBeLessThan(TOLERANCE_MM);
      }
    }));
  });

  it('turns the piece so its +X follows the wall and its +Y points at it', () => {
    for (const wall of WALLS) {
      const pose = { wall, alongMm: 500, offMm: 400 };
      const origin = piecePointToRoom(room, pose, [0, 0, 0]);
      const xStep = piecePointToRoom(room, pose, [1, 0, 0]);
      const turn = (pieceRotationZDeg(wall) * Math.PI) / 180;
      expect(xStep[0] - origin[0]).toBeCloseTo(Math.cos(turn), 9);
      expect(xStep[1] - origin[1]).toBeCloseTo(Math.sin(turn), 9);
    }
  });
});
