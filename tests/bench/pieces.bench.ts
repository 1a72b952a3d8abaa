/**
 * Piece engine build times for the case pieces: a six-drawer dresser (three rows of two) and a
 * two-door base cabinet, each from its defaults. Every run builds a fresh spec object, so the
 * engine's per-spec cache never answers.
 */
import { buildPiece, defaultSpec } from '../../shared/engine/index.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';

const WARM_UP = 50;
const RUNS = 1000;

function time(make: () => PieceSpec): { medianMs: number; p95Ms: number } {
  for (let i = 0; i < WARM_UP; i++) buildPiece(make());
  const samples: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const spec = make();
    const t0 = performance.now();
    buildPiece(spec);
    samples.push(performance.now() - t0);
  }
  samples.sort((a, b) => a - b);
  return { medianMs: samples[Math.floor(RUNS / 2)]!, p95Ms: samples[Math.floor(RUNS * 0.95)]! };
}

/** Median and p95 build times of the dresser and the cabinet. */
export async function benchPieces(): Promise<{ name: string; medianMs: number; p95Ms: number; runs: number }[]> {
  const dresser = defaultSpec('dresser');
  const cabinet = defaultSpec('cabinet');
  const fresh = (spec: PieceSpec, params: Record<string, unknown>) => (): PieceSpec => ({ ...spec, params: { ...spec.params, ...params } });
  return [
    { name: 'six-drawer dresser (3 rows × 2)', ...time(fresh(dresser, { drawerRows: 3, drawerColumns: 2 })), runs: RUNS },
    { name: 'two-door base cabinet', ...time(fresh(cabinet, { cabinetType: 'base', doorCount: 2 })), runs: RUNS },
  ];
}
