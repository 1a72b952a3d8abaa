/**
 * Reads a room section from untrusted data (a file, a request, a stored spec): shape and units
 * through the zod schema, then the limits that tie fields together (an opening inside its
 * wall, a sill below its head, an obstacle inside the room). Bad input is an `InputError`
 * naming the field as a dotted path under `room`.
 */
import { InputError } from '../errors.ts';
import { roomSectionSchema, type RoomSection } from './roomSchema.ts';
import { wallLengthMm } from './roomFrame.ts';

/** Parses and checks a room section; throws an `InputError` naming the first bad field. */
export function parseRoomSection(input: unknown, field = 'room'): RoomSection {
  const parsed = roomSectionSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    const path = [field, ...issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : String(p)))].join('.').replace(/\.\[/g, '[');
    const limit = 'params' in issue && issue.params && typeof issue.params.limit === 'string' ? issue.params.limit : undefined;
    throw new InputError(path, issue.message, limit);
  }
  checkRoomLimits(parsed.data, field);
  return parsed.data;
}

function checkRoomLimits(room: RoomSection, field: string): void {
  const ids = new Set<string>();
  const unique = (id: string, at: string) => {
    if (ids.has(id)) throw new InputError(`${at}.id`, `"${id}" is used twice; every door, window and obstacle needs its own id`, 'a unique id');
    ids.add(id);
  };

  room.doors.forEach((door, i) => {
    const at = `${field}.doors[${i}]`;
    unique(door.id, at);
    withinWall(room, door.wall, door.position, door.width, at);
    if (door.height > room.ceiling) throw new InputError(`${at}.height`, `is ${door.height} mm, above the ${room.ceiling} mm ceiling`, `at most ${room.ceiling} mm`);
  });

  room.windows.forEach((win, i) => {
    const at = `${field}.windows[${i}]`;
    unique(win.id, at);
    withinWall(room, win.wall, win.position, win.width, at);
    if (win.headHeight <= win.sillHeight) {
      throw new InputError(`${at}.headHeight`, `is ${win.headHeight} mm, not above the ${win.sillHeight} mm sill`, `above ${win.sillHeight} mm`);
    }
    if (win.headHeight > room.ceiling) throw new InputError(`${at}.headHeight`, `is ${win.headHeight} mm, above the ${room.ceiling} mm ceiling`, `at most ${room.ceiling} mm`);
    if (win.sillDepth > 0 && win.sillThickness > win.sillHeight) {
      throw new InputError(`${at}.sillThickness`, `is ${win.sillThickness} mm, more than the ${win.sillHeight} mm sill height`, `at most ${win.sillHeight} mm`);
    }
  });

  room.obstacles.forEach((ob, i) => {
    const at = `${field}.obstacles[${i}]`;
    unique(ob.id, at);
    inside(`${at}.width`, ob.x + ob.width, room.width, 'the room width');
    inside(`${at}.depth`, ob.y + ob.depth, room.depth, 'the room depth');
    inside(`${at}.height`, ob.z + ob.height, room.ceiling, 'the ceiling');
  });

  const { placement } = room;
  const length = wallLengthMm(room, placement.wall);
  if (placement.position !== undefined) inside(`${field}.placement.position`, placement.position, length, `the ${placement.wall} wall`);
  if (placement.near !== undefined) inside(`${field}.placement.near`, placement.near, length, `the ${placement.wall} wall`);
}

function withinWall(room: RoomSection, wall: RoomSection['placement']['wall'], position: number, width: number, at: string): void {
  inside(`${at}.width`, position + width, wallLengthMm(room, wall), `the ${wall} wall`);
}

function inside(path: string, reachMm: number, limitMm: number, what: string): void {
  if (reachMm > limitMm) {
    throw new InputError(path, `reaches ${round(reachMm)} mm, past the end of ${what} (${round(limitMm)} mm)`, `within ${round(limitMm)} mm`);
  }
}

const round = (n: number): number => Math.round(n * 10) / 10;
