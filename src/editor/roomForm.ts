/**
 * What every field of the room form shares: the room section being edited (plain data from
 * the spec), whether it may be changed, and the reason the whole room is refused, if any,
 * which is shown at the field it names.
 */
import { pathText, type RoomPath } from './roomPath.ts';

export interface RoomFormState {
  room: unknown;
  readOnly: boolean;
  /** The first bad field of the stored room (`room.doors[0].width`) and why. */
  invalid: { field: string; message: string } | null;
}

/** The stored room's reason when it names the field at `path`. */
export function storedProblemAt(state: RoomFormState, path: RoomPath): string | null {
  return state.invalid?.field === `room.${pathText(path)}` ? state.invalid.message : null;
}

/** A stable DOM id for the field at `path`. */
export function roomFieldId(path: RoomPath): string {
  return `room-${path.join('-')}`;
}
