/**
 * Writes a length in millimetres the way a maker reads it: fractional inches (`1 3/4"`,
 * `23 1/2"`, `3/8"`) to 1/16, 1/32 or 1/64 in, or millimetres (`44.5 mm`) to 1, 0.5 or 0.1 mm.
 */
import { assertNever } from '../assert.ts';
import { MM_PER_INCH, type LengthUnit } from './length.ts';

/** Inch precision is a denominator (1/16 in …); millimetre precision is a step in mm. */
export type InchPrecision = 1 | 2 | 4 | 8 | 16 | 32 | 64;
export type MmPrecision = 1 | 0.5 | 0.1;

/** Options for {@link formatLength}. */
export interface FormatLengthOptions {
  unit: LengthUnit;
  /**
   * For inches, the denominator (default 16; 1 gives whole inches); for millimetres, the step
   * in mm (default 0.5). A precision that does not belong to the unit falls back to its default.
   */
  precision?: InchPrecision | MmPrecision;
}

/** Default inch denominator: a maker's tape reads to 1/16 in. */
export const DEFAULT_INCH_PRECISION: InchPrecision = 16;
/** Default millimetre step: half a millimetre is what a rule reads. */
export const DEFAULT_MM_PRECISION: MmPrecision = 0.5;

/** Formats `valueMm` (a length in mm) in `opts.unit`, rounded to `opts.precision`. */
export function formatLength(valueMm: number, opts: FormatLengthOptions): string {
  switch (opts.unit) {
    case 'in':
      return formatInches(valueMm / MM_PER_INCH, inchDenominator(opts.precision));
    case 'mm':
      return formatMillimetres(valueMm, mmStep(opts.precision));
    default:
      return assertNever(opts.unit, 'length unit');
  }
}

/** Rounds `value` to the nearest multiple of `step`, immune to binary noise such as 44.449999… */
export function roundTo(value: number, step: number): number {
  const steps = Math.round(Number((value / step).toFixed(9)));
  // steps × 0.1 carries noise of its own (444 × 0.1 = 44.400000000000006); 12 digits clear it.
  const rounded = Number((steps * step).toPrecision(12));
  return rounded === 0 ? 0 : rounded;
}

function inchDenominator(precision: FormatLengthOptions['precision']): InchPrecision {
  const allowed: readonly number[] = [1, 2, 4, 8, 16, 32, 64];
  return precision !== undefined && allowed.includes(precision) ? (precision as InchPrecision) : DEFAULT_INCH_PRECISION;
}

function mmStep(precision: FormatLengthOptions['precision']): MmPrecision {
  const allowed: readonly number[] = [1, 0.5, 0.1];
  return precision !== undefined && allowed.includes(precision) ? (precision as MmPrecision) : DEFAULT_MM_PRECISION;
}

function formatInches(valueIn: number, denominator: InchPrecision): string {
  const steps = Math.round(Number((Math.abs(valueIn) * denominator).toFixed(9)));
  const sign = valueIn < 0 && steps !== 0 ? '-' : '';
  const whole = Math.floor(steps / denominator);
  const remainder = steps % denominator;
  if (remainder === 0) return `${sign}${whole}"`;
  const divisor = gcd(remainder, denominator);
  const fraction = `${remainder / divisor}/${denominator / divisor}`;
  return whole === 0 ? `${sign}${fraction}"` : `${sign}${whole} ${fraction}"`;
}

function formatMillimetres(valueMm: number, step: MmPrecision): string {
  const rounded = roundTo(valueMm, step);
  const decimals = step === 1 ? 0 : 1;
  const text = rounded.toFixed(decimals).replace(/\.0$/, '');
  return `${text} mm`;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}
