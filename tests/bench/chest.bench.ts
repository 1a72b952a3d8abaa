/**
 * Chest build time: `buildPiece` from a fresh spec object (so the per-spec cache never
 * answers), for the default chest and a few sizes and constructions. A figure for the README,
 * not a test: nothing here asserts speed.
 */
import { buildPiece, defaultSpec } from '../../shared/engine/index.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';

interface BenchRow {
  name: string;
  medianMs: number;
  p95Ms: number;
  runs: number;
}

const WARM_UP = 50;
const RUNS = 500;
const IN = 25.4;

function variant(params: Record<string, unknown>): PieceSpec {
  const spec = defaultSpec('chest');
  return { ...spec, params: { ...spec.params, ...params } };
}

const CASES: { name: string; spec: PieceSpec }[] = [
  { name: 'default chest 40 × 19 × 23 in', spec: variant({}) },
  { name: 'toy chest 30 × 16 × 18 in, no centre stiles', spec: variant({ width: 30 * IN, depth: 16 * IN, height: 18 * IN, frontStileCount: 0 }) },
  { name: 'long chest 72 × 22 × 26 in, 3 + 1 stiles, solid panels', spec: variant({ width: 72 * IN, depth: 22 * IN, height: 26 * IN, frontStileCount: 3, sideStileCount: 1, panelMaterial: 'solid', panelThickness: 0.375 * IN, battenCount: 3, hingeCount: 3 }) },
];

function percentile(sorted: readonly number[], p: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

/** Times `buildPiece` over many runs for each case; median and 95th percentile in ms. */
export async function benchChest(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  for (const c of CASES) {
    // A copy per call: buildPiece caches by spec object, and the bench must measure the build.
    for (let i = 0; i < WARM_UP; i++) buildPiece({ ...c.spec });
    const times: number[] = [];
    for (let i = 0; i < RUNS; i++) {
      const spec = { ...c.spec };
      const t0 = performance.now();
      buildPiece(spec);
      times.push(performance.now() - t0);
    }
    times.sort((a, b) => a - b);
    rows.push({ name: c.name, medianMs: percentile(times, 50), p95Ms: percentile(times, 95), runs: RUNS });
  }
  return rows;
}
