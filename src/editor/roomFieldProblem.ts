/**
 * Whether a value typed into one room field can go into the room: the room section is read
 * with the value in place, and only a reason that names this very field stops it (a limit of
 * its own, or one tying it to another field, such as a window running past its wall's end).
 * Reasons for other fields do not hold this one back; they are shown at their own fields.
 */
import { roomSectionSchema } from '../../shared/room/roomSchema.ts';
import { readRoom } from './roomFitOutcome.ts';
import { pathText, type RoomPath } from './roomPath.ts';

/** The reason `candidate` (the room with the new value at `path`) is refused at `path`, or null. */
export function roomFieldProblem(candidate: unknown, path: RoomPath): string | null {
  const parsed = roomSectionSchema.safeParse(candidate);
  if (!parsed.success) {
    const own = parsed.error.issues.find((issue) => pathText(issue.path as RoomPath) === pathText(path));
    return own ? own.message : null;
  }
  const read = readRoom(candidate);
  return !read.ok && read.field === `room.${pathText(path)}` ? read.message : null;
}
