/**
 * A length ready for the editor, the plan set and the command line: the number in both units
 * and the text a maker reads in each.
 */
import { formatLength, roundTo, type InchPrecision, type MmPrecision } from './format.ts';
import { MM_PER_INCH } from './length.ts';

/** A length in millimetres and inches, with display text for each. */
export interface DualLength {
  /** Millimetres, rounded to 0.01 mm to drop binary noise. */
  mm: number;
  /** Inches, rounded to 0.0001 in. */
  in: number;
  text: { mm: string; in: string };
}

/** Display precisions for {@link dual}; defaults 1/16 in and 0.5 mm. */
export interface DualOptions {
  inchPrecision?: InchPrecision;
  mmPrecision?: MmPrecision;
}

/** Returns `valueMm` (mm) in both units, with text such as `44.5 mm` and `1 3/4"`. */
export function dual(valueMm: number, opts: DualOptions = {}): DualLength {
  return {
    mm: roundTo(valueMm, 0.01),
    in: roundTo(valueMm / MM_PER_INCH, 0.0001),
    text: {
      mm: formatLength(valueMm, { unit: 'mm', precision: opts.mmPrecision ?? 0.5 }),
      in: formatLength(valueMm, { unit: 'in', precision: opts.inchPrecision ?? 16 }),
    },
  };
}
