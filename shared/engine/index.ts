/**
 * The piece engine: `buildPiece` turns a spec into parts, joints, placements, checks and the
 * outputs derived from them. Pure: plain data in, plain (frozen) data out, lengths in mm.
 */
import { InputError } from '../errors.ts';
import { deriveOutputs } from './derived/index.ts';
import { checkSpecForBuild } from './params.ts';
import { buildCabinet } from './pieces/cabinet.ts';
import { buildChest } from './pieces/chest.ts';
import { buildDresser } from './pieces/dresser.ts';
import type { PieceResult, PieceSpec } from './types.ts';

export * from './types.ts';
export { paramDefs, defaultSpec, validateSpec, PIECE_KINDS } from './params.ts';
export type { ParamDef, ParamKind } from './params.ts';
export { summarizeResult, compareResults } from './compare.ts';
export type { ResultSummary, ResultComparison } from './compare.ts';

/** Version of the engine's geometry and rules; stored beside each revision built with it. */
export const ENGINE_VERSION = '0.1.0';

// Only the last build is remembered. A WeakMap of every spec ever built cost more than the build
// itself: V8 keeps a WeakMap's values alive through young-generation collections even when
// their keys are garbage, so each ~100 kB result was promoted and swept by full collections,
// and most callers (the editor, fit to the niche, the server) pass a fresh spec every time.
let last: { spec: PieceSpec; result: PieceResult } | null = null;

/**
 * Checks `spec` (see `validateSpec`) and builds the piece. Throws an `InputError` naming the
 * parameter and its limit for bad input; the same spec object built twice in a row is built
 * once (callers that keep several specs cache their own results).
 */
export function buildPiece(spec: PieceSpec): PieceResult {
  if (last?.spec === spec) return last.result;
  const { spec: checked, chestLayout, dresserLayout, cabinetLayout } = checkSpecForBuild(spec);
  let built;
  switch (checked.kind) {
    case 'chest':
      built = buildChest(checked, chestLayout);
      break;
    case 'dresser':
      built = buildDresser(checked, dresserLayout);
      break;
    case 'cabinet':
      built = buildCabinet(checked, cabinetLayout);
      break;
    default:
      throw new InputError('kind', `the ${String(checked.kind)} is not built by this version of the engine yet; available: chest, dresser, cabinet`, 'chest, dresser, cabinet');
  }
  const result: PieceResult = Object.freeze({
    spec: checked,
    kind: checked.kind,
    engineVersion: ENGINE_VERSION,
    parts: Object.freeze(built.parts),
    joints: Object.freeze(built.joints),
    placements: Object.freeze(built.placements),
    checks: Object.freeze(built.checks),
    bboxMm: built.bboxMm,
    bboxMinMm: built.bboxMinMm,
    openings: Object.freeze(built.openings),
    derived: deriveOutputs(checked.kind, built.parts, built.joints),
  });
  last = { spec, result };
  return result;
}
