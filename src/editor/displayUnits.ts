/**
 * The maker's reading preference — inches or millimetres, and how fine — and the options that
 * `shared/units` needs to write a length that way.
 */
import type { FormatLengthOptions, InchPrecision, LengthUnit, MmPrecision } from '../../shared/units/index.ts';

/** Inch denominators a maker can choose in the editor. */
export const INCH_PRECISIONS = [16, 32, 64] as const satisfies readonly InchPrecision[];
/** Millimetre steps a maker can choose in the editor. */
export const MM_PRECISIONS = [0.5, 0.1] as const satisfies readonly MmPrecision[];

export type EditorInchPrecision = (typeof INCH_PRECISIONS)[number];
export type EditorMmPrecision = (typeof MM_PRECISIONS)[number];

/** How lengths are read and written across the client. */
export interface DisplayUnits {
  unit: LengthUnit;
  inchPrecision: EditorInchPrecision;
  mmPrecision: EditorMmPrecision;
}

/** Inches to the sixteenth: what a tape measure reads. */
export const DEFAULT_DISPLAY_UNITS: DisplayUnits = { unit: 'in', inchPrecision: 16, mmPrecision: 0.5 };

/** The `formatLength` options for `units`. */
export function lengthFormat(units: DisplayUnits): FormatLengthOptions {
  return { unit: units.unit, precision: units.unit === 'in' ? units.inchPrecision : units.mmPrecision };
}

/** Words for a precision choice, e.g. `1/32"` or `0.1 mm`. */
export function precisionLabel(unit: LengthUnit, precision: number): string {
  return unit === 'in' ? `1/${precision}"` : `${precision} mm`;
}
