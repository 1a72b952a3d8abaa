/**
 * Chest build time: `buildPiece` from a fresh spec object (so the last-build cache never
 * answers), for the default chest and a few sizes and constructions. A figure for the README,
 * not a test: nothing here asserts speed.
 */
import { defaultSpec } from '../../shared/engine/index.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { timeBuilds, type BuildCase, type BuildTiming } from './buildTiming.ts';

const IN = 25.4;

function variant(params: Record<string, unknown>): () => PieceSpec {
  const spec = defaultSpec('chest');
  const merged = { ...spec, params: { ...spec.params, ...params } };
  return () => ({ ...merged });
}

const CASES: BuildCase[] = [
  { name: 'default chest 40 × 19 × 23 in', make: variant({}) },
  { name: 'toy chest 30 × 16 × 18 in, no centre stiles', make: variant({ width: 30 * IN, depth: 16 * IN, height: 18 * IN, frontStileCount: 0 }) },
  { name: 'long chest 72 × 22 × 26 in, 3 + 1 stiles, solid panels', make: variant({ width: 72 * IN, depth: 22 * IN, height: 26 * IN, frontStileCount: 3, sideStileCount: 1, panelMaterial: 'solid', panelThickness: 0.375 * IN, battenCount: 3, hingeCount: 3 }) },
];

/** Times `buildPiece` for each case (see `timeBuilds`); median and 95th percentile in ms. */
export async function benchChest(): Promise<BuildTiming[]> {
  return timeBuilds(CASES);
}
