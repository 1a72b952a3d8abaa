import { describe, expect, it } from 'vitest';
import { isInputError } from '../../../shared/errors.ts';
import { envelopeFromResult } from '../../../shared/room/pieceEnvelope.ts';
import { placePiece } from '../../../shared/room/placement.ts';
import { roomSolids } from '../../../shared/room/roomSolids.ts';
import type { RoomSection } from '../../../shared/room/roomSchema.ts';
import { boxChestResult } from './support/boxChest.ts';
import { plainRoom } from './support/rooms.ts';

// The test chest: whole piece 1066 × 514 × 584, lid overhanging 25 at the sides and 6 at the back.
const chest = () => envelopeFromResult(boxChestResult({ width: 1016, depth: 483, height: 584 }));
const place = (room: RoomSection) => placePiece(room, chest(), roomSolids(room));
const withBaseboard = (placement: Record<string, unknown>) =>
  plainRoom({
    baseboard: { height: 100, thickness: 20 },
    obstacles: [{ id: 'cab', label: 'cabinet', x: 0, y: 3600, width: 1000, depth: 400, height: 900 }],
    placement: { wall: 'back', ...placement },
  } as never);

describe('placePiece', () => {
  it('pulls the piece out by the baseboard, less what overhangs above it', () => {
    // Legs reach below the 100 mm baseboard: the case back stands 20 off; the lid above it
    // overhangs 6, so the piece's back is 20 − 6 = 14 off the wall.
    expect(place(withBaseboard({})).standoffMm).toBeCloseTo(14, 9);
  });

  it('stands a scribed piece against the wall, plus any gap', () => {
    expect(place(withBaseboard({ scribed: true })).standoffMm).toBe(0);
    expect(place(withBaseboard({ scribed: true, gap: 5 })).standoffMm).toBe(5);
  });

  it('finds the niche between the cabinet and the side wall and aligns the piece in it', () => {
    // The cabinet ends at X 1000; the right wall's baseboard starts at 4000 − 20 = 3980.
    const left = place(withBaseboard({ align: 'left' }));
    expect(left.niche).toMatchObject({ fromMm: 1000, toMm: 3980, leftId: 'obstacle:cab' });
    // The piece's left side (its lid, 25 left of the legs) at 1000: legs' origin at along 1025.
    expect(left.pose.alongMm).toBeCloseTo(1025, 9);
    const right = place(withBaseboard({ align: 'right' }));
    // Right side at 3980: left side at 3980 − 1066 = 2914, origin at 2939.
    expect(right.pose.alongMm).toBeCloseTo(2939, 9);
  });

  it('refuses a niche point where something already stands, naming the field', () => {
    try {
      place(withBaseboard({ near: 500 }));
      expect.unreachable();
    } catch (error) {
      expect(isInputError(error) && error.field).toBe('room.placement.near');
    }
  });
});
