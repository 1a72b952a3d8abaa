/**
 * The niche a piece stands in: the free stretch of a wall, between whatever stands in the band
 * the piece would fill (obstacles, the side walls, door landings, a projecting sill low enough
 * to meet it), around a point on the wall.
 */
import type { Box3 } from '../engine/types.ts';
import type { RoomSection, Wall } from './roomSchema.ts';
import { roomBoxToWall, wallLengthMm } from './roomFrame.ts';
import type { RoomSolid } from './roomSolids.ts';

/** A free stretch of wall, mm along the wall from its left corner. */
export interface NicheSpan {
  fromMm: number;
  toMm: number;
  /** The solids that bound it on the left and right, or null at nothing. */
  leftId: string | null;
  rightId: string | null;
}

/** The band in front of a wall a piece fills: from `distFromMm` to `distToMm` off the wall, up to `heightMm`. */
export interface WallBand {
  distFromMm: number;
  distToMm: number;
  heightMm: number;
}

/**
 * The free span of `wall` around `nearMm` for a piece filling `band`, or the solid standing at
 * that point when it is taken.
 */
export function nicheAround(room: RoomSection, wall: Wall, solids: readonly RoomSolid[], band: WallBand, nearMm: number): NicheSpan | { takenBy: string } {
  const blockers = solids
    // The piece is pulled out past its own wall's baseboard (or scribed over it), so neither bounds the niche.
    .filter((s) => s.id !== `wall:${wall}` && !s.id.startsWith(`baseboard:${wall}:`))
    .map((s) => ({ id: s.id, label: s.label, kind: s.kind, box: roomBoxToWall(room, wall, s.box) }))
    .filter(({ box }) => inBand(box, band));

  let span: NicheSpan = { fromMm: -Infinity, toMm: Infinity, leftId: null, rightId: null };
  for (const b of blockers) {
    const [lo, hi] = [b.box.min[0], b.box.max[0]];
    if (lo < nearMm && hi > nearMm) {
      // The opposite wall or the ceiling reaches the band only when the piece is too deep or
      // too tall for the room, and a sill only when it is too tall for its window; the checks
      // say so, and the niche is still bounded by what stands beside it.
      if (b.kind === 'wall' || b.kind === 'ceiling' || b.kind === 'sill') continue;
      return { takenBy: b.label };
    }
    if (hi <= nearMm && hi > span.fromMm) span = { ...span, fromMm: hi, leftId: b.id };
    if (lo >= nearMm && lo < span.toMm) span = { ...span, toMm: lo, rightId: b.id };
  }
  const length = wallLengthMm(room, wall);
  return { ...span, fromMm: Math.max(span.fromMm, 0), toMm: Math.min(span.toMm, length) };
}

function inBand(box: Box3, band: WallBand): boolean {
  return box.max[1] > band.distFromMm && box.min[1] < band.distToMm && box.min[2] < band.heightMm && box.max[2] > 0;
}
