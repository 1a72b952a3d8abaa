/** Can the bottom drop in square once the case is glued up? */
import type { Check } from '../types.ts';
import { both, check } from './check.ts';

/** Less than this all round and a sheet bottom binds as it goes in: 1/64 in. Casewright's rule. */
export const MIN_BOTTOM_CLEARANCE_MM = 25.4 / 64;

/** A bottom with no clearance to the rails and legs cannot be dropped in square. */
export function bottomFitCheck(partIds: readonly string[], clearanceMm: number, bottomWidthMm: number, bottomDepthMm: number): Check[] {
  if (clearanceMm >= MIN_BOTTOM_CLEARANCE_MM) return [];
  return [check({
    id: 'bottom-no-room', severity: 'warning', title: 'The bottom has no room to go in square', partIds,
    numbers: { clearanceMm, minClearanceMm: MIN_BOTTOM_CLEARANCE_MM, bottomWidthMm, bottomDepthMm },
    message: `A ${both(bottomWidthMm)} × ${both(bottomDepthMm)} bottom with ${both(clearanceMm)} clearance touches the rails and legs on every side: it will bind before it reaches the cleats.`,
    fix: 'Leave about 1/16 in all round (bottom fit clearance).',
  })];
}
