/**
 * Room fit as the editor runs it: read the spec's room section, and when it is good, place the
 * built piece in it and run every check. A bad room is a reason naming its field, never an
 * exception. Specs and results are immutable, so each outcome is cached on the room object
 * and the result, and the tables, the tab badge and the 3D view share one computation.
 */
import type { PieceResult } from '../../shared/engine/types.ts';
import { isInputError } from '../../shared/errors.ts';
import { envelopeFromResult, type PieceEnvelope } from '../../shared/room/pieceEnvelope.ts';
import { fitRoom, type RoomFit } from '../../shared/room/fitRoom.ts';
import { parseRoomSection } from '../../shared/room/parseRoom.ts';
import type { RoomSection } from '../../shared/room/roomSchema.ts';

/** No room entered, a room with a bad field, or the piece fitted to a good room. */
export type RoomFitOutcome =
  | { kind: 'none' }
  | { kind: 'invalid'; field: string; message: string }
  | { kind: 'fit'; room: RoomSection; fit: RoomFit };

const NONE: RoomFitOutcome = { kind: 'none' };
const envelopes = new WeakMap<PieceResult, PieceEnvelope>();
const outcomes = new WeakMap<object, WeakMap<PieceResult, RoomFitOutcome>>();

/** The room section read on its own: parsed, or the field that stops it. */
export function readRoom(room: unknown): { ok: true; room: RoomSection } | { ok: false; field: string; message: string } {
  try {
    return { ok: true, room: parseRoomSection(room) };
  } catch (error) {
    if (!isInputError(error)) throw error;
    return { ok: false, field: error.field, message: error.message };
  }
}

/** Fits `result` into the spec's `room` section; cached per room object and result. */
export function roomFitOutcome(room: unknown, result: PieceResult | null): RoomFitOutcome {
  if (room === undefined || room === null || result === null) return NONE;
  if (typeof room !== 'object') return { kind: 'invalid', field: 'room', message: 'is not a room section' };
  let byResult = outcomes.get(room);
  if (!byResult) outcomes.set(room, (byResult = new WeakMap()));
  const cached = byResult.get(result);
  if (cached) return cached;

  const read = readRoom(room);
  let outcome: RoomFitOutcome;
  if (!read.ok) outcome = { kind: 'invalid', field: read.field, message: read.message };
  else {
    try {
      outcome = { kind: 'fit', room: read.room, fit: fitRoom(read.room, envelopeOf(result)) };
    } catch (error) {
      if (!isInputError(error)) throw error;
      outcome = { kind: 'invalid', field: error.field, message: error.message };
    }
  }
  byResult.set(result, outcome);
  return outcome;
}

function envelopeOf(result: PieceResult): PieceEnvelope {
  let envelope = envelopes.get(result);
  if (!envelope) envelopes.set(result, (envelope = envelopeFromResult(result)));
  return envelope;
}
