/**
 * The engine as the client runs it: check the spec, build the piece, and turn a bad value into
 * a reason naming the parameter instead of an exception. Specs are immutable, so each outcome
 * is cached on its spec object and a re-render never builds twice.
 */
import { buildPiece } from '../../shared/engine/index.ts';
import { validateSpec } from '../../shared/engine/params.ts';
import type { PieceResult, PieceSpec } from '../../shared/engine/types.ts';
import { isInputError } from '../../shared/errors.ts';

/** A built piece, or the parameter that stopped it and why. */
export type BuildOutcome =
  | { ok: true; result: PieceResult }
  | { ok: false; field: string; message: string; limit?: string };

const outcomes = new WeakMap<PieceSpec, BuildOutcome>();

/** Builds `spec`, or says which field stops it; cached per spec object. */
export function buildOutcome(spec: PieceSpec): BuildOutcome {
  const cached = outcomes.get(spec);
  if (cached) return cached;
  let outcome: BuildOutcome;
  try {
    outcome = { ok: true, result: buildPiece(validateSpec(spec)) };
  } catch (error) {
    if (!isInputError(error)) throw error;
    outcome = { ok: false, field: error.field, message: error.message, ...(error.limit ? { limit: error.limit } : {}) };
  }
  outcomes.set(spec, outcome);
  return outcome;
}
