import { describe, expect, it } from 'vitest';
import { isInputError, type InputError } from '../../../shared/errors.ts';
import { parseRoomSection } from '../../../shared/room/parseRoom.ts';
import { DEFAULT_SILL_THICKNESS_MM, ROOM_SCHEMA_VERSION } from '../../../shared/room/roomSchema.ts';

const TOLERANCE_MM = 1e-9;
const base = { schemaVersion: ROOM_SCHEMA_VERSION, width: 3000, depth: 3000, ceiling: 2400, placement: { wall: 'back' } };

function errorOf(input: unknown): InputError {
  try {
    parseRoomSection(input);
  } catch (error) {
    if (isInputError(error)) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('parseRoomSection', () => {
  it('fills the defaults: no baseboard, no openings, centred, not scribed, no gap', () => {
    const room = parseRoomSection(base);
    expect(room.baseboard).toEqual({ height: 0, thickness: 0 });
    expect(room.doors).toEqual([]);
    expect(room.placement).toMatchObject({ wall: 'back', align: 'centre', scribed: false, gap: 0 });
  });

  it("reads lengths the way a maker types them, bare numbers in text as mm", () => {
    // 12' = 3657.6 mm; 8' = 2438.4 mm; 1 3/4" = 44.45 mm.
    const room = parseRoomSection({
      ...base, width: "12'", ceiling: "8'", depth: '3000',
      windows: [{ id: 'w', wall: 'back', position: '2 ft', width: '36 in', sillHeight: '30"', headHeight: '80"', sillDepth: '1 3/4"' }],
    });
    expect(Math.abs(room.width - 3657.6)).toBeLessThan(TOLERANCE_MM);
    expect(Math.abs(room.ceiling - 2438.4)).toBeLessThan(TOLERANCE_MM);
    expect(room.depth).toBe(3000);
    expect(Math.abs(room.windows[0]!.sillDepth - 44.45)).toBeLessThan(TOLERANCE_MM);
    expect(room.windows[0]!.sillThickness).toBe(DEFAULT_SILL_THICKNESS_MM);
  });

  it('names the field of a length it cannot read', () => {
    const error = errorOf({ ...base, doors: [{ id: 'd', wall: 'front', position: 100, width: 'wide', height: 2032 }] });
    expect(error.field).toBe('room.doors[0].width');
    expect(error.message).toContain('not a length');
  });

  it('refuses a negative or zero room size with the limit', () => {
    const error = errorOf({ ...base, depth: -5 });
    expect(error.field).toBe('room.depth');
    expect(error.limit).toContain('at least 300 mm');
  });

  it('refuses a door that runs past the end of its wall', () => {
    // Front wall 3000 long: 2500 + 900 = 3400 > 3000.
    const error = errorOf({ ...base, doors: [{ id: 'd', wall: 'front', position: 2500, width: 900, height: 2032 }] });
    expect(error.field).toBe('room.doors[0].width');
    expect(error.limit).toBe('within 3000 mm');
  });

  it('refuses a window head below its sill', () => {
    const error = errorOf({ ...base, windows: [{ id: 'w', wall: 'back', position: 0, width: 900, sillHeight: 900, headHeight: 800 }] });
    expect(error.field).toBe('room.windows[0].headHeight');
  });

  it('refuses an obstacle outside the room and ids used twice', () => {
    expect(errorOf({ ...base, obstacles: [{ id: 'b', label: 'bed', x: 2000, y: 0, width: 1500, depth: 2000, height: 600 }] }).field).toBe('room.obstacles[0].width');
    const twice = errorOf({ ...base, obstacles: [{ id: 'b', label: 'bed', x: 0, y: 0, width: 100, depth: 100, height: 100 }], doors: [{ id: 'b', wall: 'left', position: 0, width: 800, height: 2000 }] });
    expect(twice.field).toBe('room.obstacles[0].id');
  });

  it('refuses another schema version', () => {
    expect(errorOf({ ...base, schemaVersion: 2 }).field).toBe('room.schemaVersion');
  });
});
