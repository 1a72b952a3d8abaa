/**
 * The tip-over caution for dressers and tall cabinets. Named, not quoted: clothing storage units
 * fall under ASTM F2057 and the US federal rule that made stability requirements for them
 * mandatory. Casewright states no numeric limits; they are for the standard to give.
 */
import type { Check } from '../types.ts';
import { check } from './check.ts';

/** The anchoring caution for a piece that can tip over onto someone. */
export function tipOverCheck(partIds: readonly string[], what: 'dresser' | 'cabinet', heightMm: number, depthMm: number): Check {
  return check({
    id: 'tip-over', severity: 'caution', title: `A ${what} can tip over`, partIds,
    numbers: { heightMm, depthMm },
    message:
      `A ${what} with drawers or doors open, or climbed on by a child, can tip forward and crush someone. ` +
      'Anchor it to the wall with a tip-over restraint fastened into the framing, keep heavy things in the lowest drawers, and never put a television on it. ' +
      'Clothing storage units are covered by ASTM F2057 and the US federal rule that made stability requirements for them mandatory; follow the standard that applies and your local rules. ' +
      'These notes do not make the piece compliant or certify it safe.',
    fix: 'Fit a tip-over restraint into a wall stud or blocking, and read ASTM F2057 before building a piece for sale.',
  });
}
