/**
 * Room-scale lengths in feet and inches, as a maker measures a wall with a tape: `12' 6-1/2"`,
 * `3' 0"`. Lengths under a foot read in inches alone (`1 3/4"`), as `formatLength` writes them.
 * `parseLength` reads all of these back (and `12ft 6.5in`, `12′ 6-1/2″`).
 */
import { formatLength, type InchPrecision } from './format.ts';
import { MM_PER_INCH } from './length.ts';

const INCHES_PER_FOOT = 12;

/**
 * Writes `valueMm` (mm) in feet and inches, the inches rounded to 1/`precision` in (default
 * 1/16); the rounding happens before the split, so 11' 11-31/32" at 1/16 reads `12' 0"`.
 */
export function formatFeetInches(valueMm: number, precision: InchPrecision = 16): string {
  const steps = Math.round(Number((Math.abs(valueMm / MM_PER_INCH) * precision).toFixed(9)));
  const stepsPerFoot = INCHES_PER_FOOT * precision;
  if (steps < stepsPerFoot) return formatLength(valueMm, { unit: 'in', precision });
  const sign = valueMm < 0 ? '-' : '';
  const feet = Math.floor(steps / stepsPerFoot);
  const restSteps = steps - feet * stepsPerFoot;
  const whole = Math.floor(restSteps / precision);
  const remainder = restSteps % precision;
  if (remainder === 0) return `${sign}${feet}' ${whole}"`;
  const divisor = gcd(remainder, precision);
  const fraction = `${remainder / divisor}/${precision / divisor}`;
  return `${sign}${feet}' ${whole === 0 ? fraction : `${whole}-${fraction}`}"`;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}
