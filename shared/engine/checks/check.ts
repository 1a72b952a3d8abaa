/** Small helpers shared by the checks. */
import type { Check } from '../types.ts';

/** Rounds mm for messages: 0.1 mm is finer than a maker can mark. */
export const mm1 = (n: number): string => `${Math.round(n * 10) / 10} mm`;

/** Inches to 1/32 as a decimal, for messages beside millimetres. */
export const in3 = (n: number): string => `${Math.round((n / 25.4) * 1000) / 1000} in`;

/** Both units, e.g. `9.5 mm (0.375 in)`. */
export const both = (n: number): string => `${mm1(n)} (${in3(n)})`;

/** Builds a check, leaving out an empty fix. */
export function check(c: Check): Check {
  return c.fix ? c : { id: c.id, severity: c.severity, title: c.title, message: c.message, partIds: c.partIds, numbers: c.numbers };
}
