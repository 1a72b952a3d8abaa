/**
 * What every room-fit check reads: the parsed room, the piece's envelope, where it stands, and
 * the room's solids both in room coordinates and in the piece's frame (where the lid, doors and
 * drawers move).
 */
import type { Box3 } from '../engine/types.ts';
import type { PieceEnvelope } from './pieceEnvelope.ts';
import { placePiece, type PlacedPiece } from './placement.ts';
import { roomBoxToPiece } from './roomFrame.ts';
import type { RoomSection } from './roomSchema.ts';
import { roomSolids, type RoomSolid } from './roomSolids.ts';

/** A room solid seen from the piece: its box in the piece's frame, mm. */
export interface LocalSolid extends RoomSolid {
  local: Box3;
}

/** The shared inputs of the room-fit checks. */
export interface FitContext {
  room: RoomSection;
  piece: PieceEnvelope;
  placed: PlacedPiece;
  solids: readonly LocalSolid[];
}

/** Places `piece` in `room` and sees the room from it. */
export function fitContext(room: RoomSection, piece: PieceEnvelope): FitContext {
  const inRoom = roomSolids(room);
  const placed = placePiece(room, piece, inRoom);
  const solids = inRoom.map((s) => ({ ...s, local: roomBoxToPiece(room, placed.pose, s.box) }));
  return { room, piece, placed, solids };
}

/** The solid with `id`, for its label. */
export function solidById(ctx: FitContext, id: string): LocalSolid | undefined {
  return ctx.solids.find((s) => s.id === id);
}
