/**
 * A length in a room file: a number of millimetres, or text a maker types (`12' 6"`, `2032 mm`,
 * `80 in`), read by the same parser as the design editor so a room is entered like a piece.
 * A bare number in text is millimetres, as in the stored file.
 */
import { z } from 'zod';
import { isInputError } from '../errors.ts';
import { parseLength } from '../units/parse.ts';

/** Limits of one length field, mm. */
export interface LengthFieldLimits {
  /** Smallest accepted value, mm (inclusive). Default: greater than 0. */
  min?: number;
  /** Largest accepted value, mm (inclusive). */
  max?: number;
  /** Accept 0 (a baseboard that is not there, a window sill that does not project). */
  allowZero?: boolean;
}

/** Rooms larger than this are a typing slip (100 m), not a room. */
export const ROOM_LENGTH_MAX_MM = 100_000;

/** A zod schema for one length: number (mm) or maker's text, checked against `limits`. */
export function lengthField(limits: LengthFieldLimits = {}) {
  const max = limits.max ?? ROOM_LENGTH_MAX_MM;
  return z.union([z.number(), z.string()]).transform((value, ctx): number => {
    if (typeof value === 'string') {
      try {
        return parseLength(value, { defaultUnit: 'mm', min: limits.min, max, allowZero: limits.allowZero });
      } catch (error) {
        if (!isInputError(error)) throw error;
        ctx.addIssue({ code: 'custom', message: error.message, params: { limit: error.limit } });
        return z.NEVER;
      }
    }
    const limit = limitWords(limits, max);
    const belowMin = limits.min !== undefined ? value < limits.min : limits.allowZero ? value < 0 : value <= 0;
    if (!Number.isFinite(value) || belowMin || value > max) {
      ctx.addIssue({ code: 'custom', message: `must be ${limit} (got ${value})`, params: { limit } });
      return z.NEVER;
    }
    return value;
  });
}

function limitWords(limits: LengthFieldLimits, max: number): string {
  const low = limits.min !== undefined ? `at least ${limits.min} mm` : limits.allowZero ? 'at least 0 mm' : 'greater than 0 mm';
  return `${low} and at most ${max} mm`;
}
