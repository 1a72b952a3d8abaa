/**
 * The caution for a chest a child can reach. The standards are named, not quoted: toy chests
 * fall under the toy-chest requirements of ASTM F963 (formerly ASTM F834, withdrawn 2016);
 * blanket and cedar chests under ASTM F2598. CPSC guidance asks for a lid support that holds the
 * lid open in any position without adjustment, ventilation a wall cannot block, and no latch.
 * Casewright states no numeric limits: they are for the standard to give.
 */
import type { Check } from '../types.ts';
import { check } from './check.ts';

/** The lid-support, ventilation and no-latch caution, deferring to the standards. */
export function childSafetyCheck(partIds: readonly string[], childAccess: boolean, hingeType: 'lid-support' | 'butt'): Check[] {
  if (!childAccess) return [];
  const support = hingeType === 'lid-support'
    ? 'Choose lid-support hinges rated for this lid that hold it open in any position with no adjustment.'
    : 'Butt hinges let the lid fall: add a lid support that holds the lid open in any position with no adjustment.';
  return [check({
    id: 'child-safety', severity: 'caution', title: 'A chest a child can reach', partIds,
    numbers: {},
    message:
      'A falling lid can trap or crush a child, and a child can be shut inside. ' +
      `${support} Give the chest ventilation openings that a wall or the floor cannot block, and fit no latch or lock that closes by itself. ` +
      'Toy chests are covered by the toy-chest requirements of ASTM F963; blanket and cedar chests by ASTM F2598. ' +
      'Follow the standard that applies and your local rules; these notes do not make a chest compliant or certify it safe.',
    fix: 'Read ASTM F963 (toy chests) or ASTM F2598 (blanket chests) and the lid-support maker\'s instructions before building.',
  })];
}
