/** Sizes written for messages a maker reads: inches with fractions, then millimetres. */
import { formatLength } from '../units/format.ts';

/** `lengthMm` × `widthMm` as `30 1/2" × 12" (774.7 × 304.8 mm)`. */
export function sizeText(lengthMm: number, widthMm: number): string {
  const inches = `${formatLength(lengthMm, { unit: 'in' })} × ${formatLength(widthMm, { unit: 'in' })}`;
  const mm = `${formatLength(lengthMm, { unit: 'mm', precision: 0.1 }).replace(' mm', '')} × ${formatLength(widthMm, { unit: 'mm', precision: 0.1 })}`;
  return `${inches} (${mm})`;
}
