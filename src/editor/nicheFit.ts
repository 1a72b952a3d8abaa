/**
 * Fit to the niche as the editor asks for it: one request (the spec with its room, and which
 * sizes to keep) and one plain answer, so it can run in a Web Worker and cross to the page by
 * structured clone. About a second on a chest, so it never runs on the page's thread while
 * the maker types.
 */
import { buildPiece } from '../../shared/engine/index.ts';
import { validateSpec } from '../../shared/engine/params.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { isInputError } from '../../shared/errors.ts';
import { fitToNiche, type SizeChange, type SizeKey } from '../../shared/room/fitToNiche.ts';
import { parseRoomSection } from '../../shared/room/parseRoom.ts';

/** What the page asks: `id` pairs the answer with the question. */
export interface NicheFitRequest {
  id: number;
  spec: PieceSpec;
  pinned: readonly SizeKey[];
  keepProportions: boolean;
}

/** A proposal (found or not), or the field that stopped it. */
export type NicheFitAnswer =
  | { id: number; ok: true; found: boolean; params: Record<string, unknown>; changes: readonly SizeChange[]; message: string }
  | { id: number; ok: false; field: string; message: string };

/** Runs fit to the niche for `request`; bad input is an answer, never a throw. */
export function answerNicheFit(request: NicheFitRequest): NicheFitAnswer {
  const { id, spec } = request;
  try {
    const room = parseRoomSection(spec.room);
    const build = (s: PieceSpec) => buildPiece(validateSpec(s));
    const fit = fitToNiche(spec, room, build, { pinned: request.pinned, keepProportions: request.keepProportions });
    return { id, ok: true, found: fit.found, params: { ...fit.params }, changes: fit.changes, message: fit.message };
  } catch (error) {
    if (!isInputError(error)) throw error;
    return { id, ok: false, field: error.field, message: error.message };
  }
}
