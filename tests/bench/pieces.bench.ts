/**
 * Piece engine build times for the case pieces: a six-drawer dresser (three rows of two) and a
 * two-door base cabinet, each from its defaults. Every run builds a fresh spec object, so the
 * engine's last-build cache never answers.
 */
import { defaultSpec } from '../../shared/engine/index.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { timeBuilds, type BuildTiming } from './buildTiming.ts';

function fresh(spec: PieceSpec, params: Record<string, unknown>): () => PieceSpec {
  return () => ({ ...spec, params: { ...spec.params, ...params } });
}

/** Median and p95 build times of the dresser and the cabinet (see `timeBuilds`). */
export async function benchPieces(): Promise<BuildTiming[]> {
  return timeBuilds([
    { name: 'six-drawer dresser (3 rows × 2)', make: fresh(defaultSpec('dresser'), { drawerRows: 3, drawerColumns: 2 }) },
    { name: 'two-door base cabinet', make: fresh(defaultSpec('cabinet'), { cabinetType: 'base', doorCount: 2 }) },
  ]);
}
