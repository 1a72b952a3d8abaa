/**
 * Length types. Casewright keeps every length in millimetres inside the engine; inches exist
 * only at the edges (forms, command line, plan set). The brands make the two impossible to mix
 * by accident: a plain `number` must pass through `mm()` or `inches()` to become either.
 */

/** A length in millimetres, the engine's one internal unit. */
export type Mm = number & { readonly __unit: 'mm' };

/** A length in inches, used only where a maker reads or types it. */
export type Inches = number & { readonly __unit: 'in' };

/** The units a maker chooses to read lengths in. */
export type LengthUnit = 'in' | 'mm';

/** Millimetres in one inch: exact by definition (international inch, 1959). */
export const MM_PER_INCH = 25.4;

/** Brands a number of millimetres as {@link Mm}. */
export function mm(n: number): Mm {
  return n as Mm;
}

/** Brands a number of inches as {@link Inches}. */
export function inches(n: number): Inches {
  return n as Inches;
}

/** Converts inches to millimetres. */
export function mmFromInches(n: number): Mm {
  return mm(n * MM_PER_INCH);
}

/** Converts millimetres to inches. */
export function inchesFromMm(n: number): Inches {
  return inches(n / MM_PER_INCH);
}
