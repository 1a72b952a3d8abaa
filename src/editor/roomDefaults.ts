/**
 * The rows a maker adds to a room: a whole room to start from, and a door, a window or an
 * obstacle. The sizes are everyday North American ones (a 12 ft × 11 ft room with an 8 ft
 * ceiling, a 30 in × 80 in door, a window with its sill at 30 in) — a starting point to measure
 * over, common practice, no published source. Lengths are millimetres, as the spec stores them.
 */
import { ROOM_SCHEMA_VERSION, type RoomSectionInput, type Wall } from '../../shared/room/roomSchema.ts';

const IN = 25.4;

type Row = { id: string };

/** A room to start from: the piece against the back wall, centred in its niche. */
export function newRoom(): RoomSectionInput {
  return {
    schemaVersion: ROOM_SCHEMA_VERSION,
    name: 'Bedroom',
    width: 144 * IN,
    depth: 132 * IN,
    ceiling: 96 * IN,
    baseboard: { height: 3.5 * IN, thickness: 0.5 * IN },
    doors: [newDoor([])],
    windows: [],
    obstacles: [],
    placement: { wall: 'back', align: 'centre', scribed: false, gap: 0 },
    clearances: {},
  };
}

/** A door on the front wall near its left corner. */
export function newDoor(existing: readonly Row[]): NonNullable<RoomSectionInput['doors']>[number] {
  return { id: freeId('door', existing), wall: 'front', position: 12 * IN, width: 30 * IN, height: 80 * IN, swing: 'in', hinge: 'left' };
}

/** A window on `wall` (the piece's wall, where a sill matters most). */
export function newWindow(existing: readonly Row[], wall: Wall): NonNullable<RoomSectionInput['windows']>[number] {
  return { id: freeId('window', existing), wall, position: 24 * IN, width: 36 * IN, sillHeight: 30 * IN, headHeight: 80 * IN, sillDepth: 1.5 * IN, sillThickness: 1 * IN };
}

/** A box on the floor in the room's front-left corner, to be moved and sized. */
export function newObstacle(existing: readonly Row[]): NonNullable<RoomSectionInput['obstacles']>[number] {
  return { id: freeId('obstacle', existing), label: 'bed', x: 0, y: 0, z: 0, width: 60 * IN, depth: 80 * IN, height: 24 * IN };
}

/** `stem-1`, `stem-2`, … — the first not yet used among `existing`. */
export function freeId(stem: string, existing: readonly Row[]): string {
  const used = new Set(existing.map((row) => row.id));
  for (let n = 1; ; n++) if (!used.has(`${stem}-${n}`)) return `${stem}-${n}`;
}
