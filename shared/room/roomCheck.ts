/** A room-fit check: the engine's `Check` with whether it passed, so every check can be listed. */
import type { Check, Severity } from '../engine/types.ts';

/** One room-fit check. A passing check has severity `info`; numbers are mm unless named otherwise. */
export interface RoomCheck extends Check {
  passed: boolean;
  /** True when it failed for want of input (no door entered), not because of the piece's size. */
  needsInput?: boolean;
}

/** Builds a check; `severity` applies only when it fails. */
export function roomCheck(fields: Omit<RoomCheck, 'severity'> & { failSeverity?: Exclude<Severity, 'info'> }): RoomCheck {
  const { failSeverity = 'error', ...rest } = fields;
  return { ...rest, severity: rest.passed ? 'info' : failSeverity };
}

/** A length for a message, mm rounded to a tenth. */
export function mmText(valueMm: number): string {
  return `${Math.round(valueMm * 10) / 10} mm`;
}

/** Rounds to a tenth of a millimetre for `numbers`, so reports do not carry binary noise. */
export function tenth(valueMm: number): number {
  const r = Math.round(valueMm * 10) / 10;
  return r === 0 ? 0 : r;
}
