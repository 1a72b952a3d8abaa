/** Checks on the lid: hinge recesses, batten slots, and how far the lid moves. */
import type { SeasonalSwingMm } from '../../wood/movement.ts';
import type { Check } from '../types.ts';
import { both, check } from './check.ts';

/** Hinge leaves that are not let in hold the lid open by both leaves' thickness. */
export function hingeRecessCheck(partIds: readonly string[], recess: string, leafThicknessMm: number): Check[] {
  if (recess !== 'none') return [];
  const gapMm = 2 * leafThicknessMm;
  return [check({
    id: 'hinges-not-recessed', severity: 'error', title: 'The lid will not close', partIds,
    numbers: { gapMm, leafThicknessMm },
    message: `With the hinge leaves on the surface the lid stands ${both(gapMm)} open at the back, the chest is ${both(gapMm)} taller than asked, and the gap pinches fingers.`,
    fix: `Let the leaves into the lid, the back rail, or one leaf into each (${both(leafThicknessMm)} deep each).`,
  })];
}

/** Battens screwed through round holes fight the lid's movement across its grain. */
export function battenSlotCheck(partIds: readonly string[], battenCount: number, slots: boolean, lidDepthMm: number, swing: SeasonalSwingMm, longestSlotMm: number): Check[] {
  const numbers = { lidDepthMm, swellMm: swing.swellMm, shrinkMm: swing.shrinkMm, totalMovementMm: swing.totalMm, longestSlotMm };
  if (battenCount === 0) {
    return [check({
      id: 'lid-no-battens', severity: 'caution', title: 'Lid without battens', partIds, numbers,
      message: `A solid lid ${both(lidDepthMm)} deep moves ${both(swing.totalMm)} across its grain through the year and may cup with nothing holding it flat.`,
      fix: 'Add two cross battens screwed through slots.',
    })];
  }
  if (!slots) {
    return [check({
      id: 'battens-without-slots', severity: 'warning', title: 'Lid battens fastened without slots', partIds, numbers,
      message: `The lid moves ${both(swing.totalMm)} across its grain between the driest and the most humid season; screws in round holes hold it back and it will crack or push the battens off.`,
      fix: `Screw the battens through slots (the longest ${both(longestSlotMm)}), fixed only at the back screw.`,
    })];
  }
  return [check({
    id: 'lid-movement', severity: 'info', title: 'Lid movement', partIds, numbers,
    message: `The lid moves ${both(swing.totalMm)} across its grain through the year (${both(swing.shrinkMm)} narrower at the driest, ${both(swing.swellMm)} wider at the most humid); the batten slots, up to ${both(longestSlotMm)} long, let it.`,
  })];
}
