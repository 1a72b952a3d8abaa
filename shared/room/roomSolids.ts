/**
 * Everything in a room a piece can run into, as boxes in room coordinates (mm): the walls and
 * ceiling (slabs outside the room), baseboards, projecting window sills, the floor space each
 * door needs, and the obstacles the maker entered.
 */
import type { Box3 } from '../engine/types.ts';
import type { RoomSection, Wall } from './roomSchema.ts';
import { WALLS } from './roomSchema.ts';
import { wallBoxToRoom, wallLengthMm } from './roomFrame.ts';

/** What kind of thing a solid is; a check's fix depends on it. */
export type SolidKind = 'wall' | 'ceiling' | 'baseboard' | 'sill' | 'door' | 'obstacle';

/** One thing in the room, mm in room coordinates. */
export interface RoomSolid {
  /** Stable id, e.g. `wall:back`, `sill:w1`, `door:d1`, `obstacle:bed`. */
  id: string;
  /** Words a maker reads, e.g. `the window sill (w1)`. */
  label: string;
  kind: SolidKind;
  box: Box3;
}

/** Thickness given to the wall and ceiling slabs: anything thicker than a piece can reach. */
const SLAB_MM = 10_000;

/**
 * The solids of `room`. A door's floor space is the square its leaf sweeps, width × width in
 * front of the opening: for an in-swinging door that is where the leaf goes (its quarter circle,
 * taken as the square, which keeps the corner behind the leaf free too); for any door it is the
 * landing a person steps onto. Baseboards stop at door openings; a piece scribed around the
 * baseboard stands over it, so that wall's baseboard is left out.
 */
export function roomSolids(room: RoomSection): RoomSolid[] {
  const solids: RoomSolid[] = [];
  for (const wall of WALLS) {
    const length = wallLengthMm(room, wall);
    solids.push({
      id: `wall:${wall}`,
      label: `the ${wall} wall`,
      kind: 'wall',
      box: wallBoxToRoom(room, wall, { min: [-SLAB_MM, -SLAB_MM, -SLAB_MM], max: [length + SLAB_MM, 0, room.ceiling + SLAB_MM] }),
    });
  }
  solids.push({
    id: 'ceiling',
    label: 'the ceiling',
    kind: 'ceiling',
    box: { min: [-SLAB_MM, -SLAB_MM, room.ceiling], max: [room.width + SLAB_MM, room.depth + SLAB_MM, room.ceiling + SLAB_MM] },
  });
  solids.push(...baseboards(room));

  for (const win of room.windows) {
    if (win.sillDepth <= 0) continue;
    solids.push({
      id: `sill:${win.id}`,
      label: `the window sill (${win.id})`,
      kind: 'sill',
      box: wallBoxToRoom(room, win.wall, {
        min: [win.position, 0, win.sillHeight - win.sillThickness],
        max: [win.position + win.width, win.sillDepth, win.sillHeight],
      }),
    });
  }
  for (const door of room.doors) {
    solids.push({
      id: `door:${door.id}`,
      label: door.swing === 'in' ? `the swing of door ${door.id}` : `the floor in front of door ${door.id}`,
      kind: 'door',
      box: wallBoxToRoom(room, door.wall, { min: [door.position, 0, 0], max: [door.position + door.width, door.width, door.height] }),
    });
  }
  for (const ob of room.obstacles) {
    solids.push({
      id: `obstacle:${ob.id}`,
      label: `the ${ob.label} (${ob.id})`,
      kind: 'obstacle',
      box: { min: [ob.x, ob.y, ob.z], max: [ob.x + ob.width, ob.y + ob.depth, ob.z + ob.height] },
    });
  }
  return solids;
}

function baseboards(room: RoomSection): RoomSolid[] {
  const { height, thickness } = room.baseboard;
  if (height <= 0 || thickness <= 0) return [];
  const out: RoomSolid[] = [];
  const scribedWall = room.placement.scribed ? room.placement.wall : null;
  for (const wall of WALLS) {
    if (wall === scribedWall) continue;
    for (const [from, to] of spansBetweenDoors(room, wall)) {
      out.push({
        id: `baseboard:${wall}:${Math.round(from)}`,
        label: `the baseboard on the ${wall} wall`,
        kind: 'baseboard',
        box: wallBoxToRoom(room, wall, { min: [from, 0, 0], max: [to, thickness, height] }),
      });
    }
  }
  return out;
}

function spansBetweenDoors(room: RoomSection, wall: Wall): [number, number][] {
  const doors = room.doors.filter((d) => d.wall === wall).sort((a, b) => a.position - b.position);
  const spans: [number, number][] = [];
  let from = 0;
  for (const door of doors) {
    if (door.position > from) spans.push([from, door.position]);
    from = Math.max(from, door.position + door.width);
  }
  const length = wallLengthMm(room, wall);
  if (length > from) spans.push([from, length]);
  return spans;
}
