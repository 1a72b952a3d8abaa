/**
 * Where the piece stands: back to a wall, pulled out by the baseboard unless scribed, at a given
 * position or aligned in its niche.
 */
import { InputError } from '../errors.ts';
import type { PieceEnvelope } from './pieceEnvelope.ts';
import type { RoomSection } from './roomSchema.ts';
import { wallLengthMm, type PiecePose } from './roomFrame.ts';
import type { RoomSolid } from './roomSolids.ts';
import { nicheAround, type NicheSpan } from './niche.ts';

/** A placed piece: its pose, how far it stands off the wall and the niche it is in. */
export interface PlacedPiece {
  pose: PiecePose;
  /** Distance from the wall face to the piece's back (its largest Y), mm. */
  standoffMm: number;
  /** The free span of wall around `near` (or the piece's middle); null when something stands there. */
  niche: NicheSpan | null;
}

/**
 * Places `piece` in `room`. The piece is pulled out from the wall so that every part reaching
 * below the top of the baseboard clears its thickness; parts higher up (a lid overhanging at the
 * back) may reach over it. A scribed piece stands against the wall. `placement.gap` adds to both.
 * Throws an `InputError` on `room.placement.near` when the piece is to go in a niche at a point
 * where something already stands.
 */
export function placePiece(room: RoomSection, piece: PieceEnvelope, solids: readonly RoomSolid[]): PlacedPiece {
  const { placement, baseboard } = room;
  const backY = piece.box.max[1];
  const width = piece.box.max[0] - piece.box.min[0];
  const depth = backY - piece.box.min[1];
  const height = piece.box.max[2];

  let pullOut = 0;
  if (!placement.scribed && baseboard.height > 0) {
    for (const part of piece.parts) {
      if (part.box.min[2] >= baseboard.height) continue;
      pullOut = Math.max(pullOut, baseboard.thickness - (backY - part.box.max[1]));
    }
  }
  const standoffMm = pullOut + placement.gap;

  const length = wallLengthMm(room, placement.wall);
  const near = placement.near ?? (placement.position !== undefined ? placement.position + width / 2 : length / 2);
  const band = { distFromMm: standoffMm, distToMm: standoffMm + depth, heightMm: height };
  const found = nicheAround(room, placement.wall, solids, band, Math.min(Math.max(near, 0), length));
  const niche = 'takenBy' in found ? null : found;

  let left: number;
  if (placement.position !== undefined) left = placement.position;
  else if (niche === null) {
    const taken = 'takenBy' in found ? found.takenBy : 'something';
    throw new InputError('room.placement.near', `is ${round(near)} mm along the ${placement.wall} wall, where ${taken} stands`, `a free point along the ${placement.wall} wall`);
  }
  else if (placement.align === 'left') left = niche.fromMm;
  else if (placement.align === 'right') left = niche.toMm - width;
  else left = (niche.fromMm + niche.toMm - width) / 2;

  return {
    pose: { wall: placement.wall, alongMm: left - piece.box.min[0], offMm: standoffMm + backY },
    standoffMm,
    niche,
  };
}

const round = (n: number): number => Math.round(n * 10) / 10;
