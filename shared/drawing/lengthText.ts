/** Lengths as a drawing writes them: one unit per plan set, inches to 1/32 or mm to 0.5. */
import { formatLength } from '../units/format.ts';
import type { Part } from '../engine/types.ts';

/** Drawing units. */
export type DrawingUnits = 'in' | 'mm';

/**
 * Writes `valueMm` (mm) in `units`: fractional inches to 1/32 in (joinery is cut to that), or
 * millimetres to 0.5 mm.
 */
export function lengthText(valueMm: number, units: DrawingUnits): string {
  return units === 'in' ? formatLength(valueMm, { unit: 'in', precision: 32 }) : formatLength(valueMm, { unit: 'mm', precision: 0.5 });
}

/** A part's finished size as the cut list and its drawing write it: `L × W × T`. */
export function partSizeText(part: Pick<Part, 'lengthMm' | 'widthMm' | 'thicknessMm'>, units: DrawingUnits): string {
  return [part.lengthMm, part.widthMm, part.thicknessMm].map((v) => lengthText(v, units)).join(' × ');
}
