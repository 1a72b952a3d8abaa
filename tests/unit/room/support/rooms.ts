/** Rooms for room-fit tests, read through the same parser as room files. */
import { readFileSync } from 'node:fs';
import { parseRoomSection } from '../../../../shared/room/parseRoom.ts';
import type { RoomSection, RoomSectionInput } from '../../../../shared/room/roomSchema.ts';

/** The invented coastal bedroom of the fixtures. */
export function coastalBedroom(): RoomSection {
  return parseRoomSection(JSON.parse(readFileSync(new URL('../../../fixtures/rooms/coastal-bedroom.json', import.meta.url), 'utf8')));
}

/**
 * A plain room: walls, ceiling and what `extra` adds, the piece against the back wall with a
 * 20 mm gap, enough for a 19 mm lid to stand open at 90° in front of the wall.
 */
export function plainRoom(extra: Partial<RoomSectionInput> = {}): RoomSection {
  return parseRoomSection({
    schemaVersion: 1,
    width: 4000,
    depth: 4000,
    ceiling: 2400,
    placement: { wall: 'back', gap: 20 },
    ...extra,
  });
}
