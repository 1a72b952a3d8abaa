/** One line per feature for tables and drawings, in mm. */
import type { Feature } from '../types.ts';

// The small nudge keeps 6.35 from showing as 6.3 when binary noise leaves it at 6.3499999.
const f1 = (n: number): string => `${Math.round(n * 10 + 1e-6) / 10}`;

/** A short description of `feature` with its sizes, e.g. `groove 6.4 wide × 9.5 deep, 6.4 from edge-a side`. */
export function featureSummary(feature: Feature): string {
  switch (feature.type) {
    case 'groove':
      return `groove in ${feature.face}: ${f1(feature.widthMm)} wide × ${f1(feature.depthMm)} deep, ${f1(feature.offsetMm)} from the reference side, full length`;
    case 'stopped-groove':
      return `stopped groove in ${feature.face}: ${f1(feature.widthMm)} wide × ${f1(feature.depthMm)} deep, ${f1(feature.offsetMm)} from the reference side, from ${f1(feature.startMm)} to ${f1(feature.stopMm)}`;
    case 'tongue':
      return `tongue on ${feature.face}: ${f1(feature.thicknessMm)} thick × ${f1(feature.lengthMm)} long × ${f1(feature.widthMm)} wide`;
    case 'rabbet':
      return `rabbet along ${feature.face}: ${f1(feature.widthMm)} wide × ${f1(feature.depthMm)} deep`;
    case 'notch':
      return `notch in ${feature.face}: ${f1(feature.lengthMm)} × ${f1(feature.widthMm)} × ${f1(feature.depthMm)} at ${f1(feature.atMm[0])}, ${f1(feature.atMm[1])}`;
    case 'recess':
    case 'mortise':
      return `${feature.type} in ${feature.face}: ${f1(feature.lengthMm)} × ${f1(feature.widthMm)} × ${f1(feature.depthMm)} deep at ${f1(feature.atMm[0])}, ${f1(feature.atMm[1])}`;
    case 'dado':
      return `dado in ${feature.face}: ${f1(feature.widthMm)} wide × ${f1(feature.depthMm)} deep, ${f1(feature.offsetMm)} from end-a`;
    case 'hole':
      return `hole in ${feature.face}: ⌀${f1(feature.diameterMm)} × ${f1(feature.depthMm)} deep at ${f1(feature.atMm[0])}, ${f1(feature.atMm[1])}`;
    case 'slot':
      return `slot in ${feature.face}: ${f1(feature.slotLengthMm)} long × ⌀${f1(feature.diameterMm)}, along the ${feature.along}, centred at ${f1(feature.atMm[0])}, ${f1(feature.atMm[1])}`;
  }
}
