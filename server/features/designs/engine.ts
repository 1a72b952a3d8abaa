/**
 * The piece engine as the designs API uses it: build a spec once to check it and to store the
 * engine's own summary beside the revision, and compare two built pieces. Bad parameters throw
 * the engine's `InputError`, which the error middleware renders as 400 naming the parameter.
 */
import { ENGINE_VERSION, buildPiece, compareResults, summarizeResult, type ResultComparison } from '../../../shared/engine/index.ts';
import type { PieceSpec } from '../../../shared/engine/types.ts';

export interface BuiltRevision {
  engineVersion: string;
  summary: Record<string, unknown>;
}

/** Check `spec` and summarise what the engine builds from it (size, parts, board feet, checks). */
export function buildRevision(spec: PieceSpec): BuiltRevision {
  return { engineVersion: ENGINE_VERSION, summary: { ...summarizeResult(buildPiece(spec)) } };
}

/** The engine's comparison of the pieces two specs build (parts added, removed, resized). */
export function comparePieces(from: PieceSpec, to: PieceSpec): ResultComparison {
  return compareResults(buildPiece(from), buildPiece(to));
}
