/**
 * Checks and defaults for the sheet layout's input, so bad values are named before any work.
 */
import { InputError } from '../errors.ts';
import { MM_PER_INCH } from '../units/length.ts';
import type { FaceGrain, SheetLayoutOptions, SheetPartInput, SheetStock } from './sheetTypes.ts';

/** The usual sheet size, 48 × 96 in (NIST PS 1 panels are commonly this size; common practice). */
export const STANDARD_SHEET: SheetStock = Object.freeze({
  id: 'sheet-48x96',
  name: 'Sheet 48 × 96 in',
  lengthMm: 96 * MM_PER_INCH,
  widthMm: 48 * MM_PER_INCH,
  count: null,
  offcut: false,
});

/** Default saw kerf, 1/8 in: a full-kerf table-saw or panel-saw blade (common practice). */
export const DEFAULT_KERF_MM = 0.125 * MM_PER_INCH;
/** Default edge trim, 1/4 in: factory edges are often dented or out of square (common practice). */
export const DEFAULT_TRIM_MM = 0.25 * MM_PER_INCH;
/** Default number of attempts of the sheet optimiser. */
export const DEFAULT_SHEET_ATTEMPTS = 200;

/** The longest side accepted for a part or stock, mm (about 20 m): beyond it input is a mistake. */
export const MAX_SIZE_MM = 20_000;
/** The widest kerf accepted, mm: no blade cuts wider. */
export const MAX_KERF_MM = 20;
/** The widest edge trim accepted, mm. */
export const MAX_TRIM_MM = 100;
/** The most instances of one part accepted. */
export const MAX_QUANTITY = 10_000;

const GRAINS: readonly FaceGrain[] = ['length', 'width', 'none'];

/** Options with defaults filled in. */
export interface SheetSettings {
  stock: readonly SheetStock[];
  kerfMm: number;
  trimMm: number;
  attempts: number;
  seed: number;
}

/** Checks `value` is a finite length in (0, {@link MAX_SIZE_MM}] mm, naming `field` if not. */
export function checkSize(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0 || value > MAX_SIZE_MM) {
    throw new InputError(field, `must be a length above 0 and at most ${MAX_SIZE_MM} mm (got ${String(value)})`, `0 < ${field} ≤ ${MAX_SIZE_MM} mm`);
  }
  return value;
}

/** Checks `value` is a whole number in [`min`, `max`], naming `field` if not. */
export function checkCount(value: unknown, field: string, min: number, max: number): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) {
    throw new InputError(field, `must be a whole number from ${min} to ${max} (got ${String(value)})`, `${min}–${max}`);
  }
  return value;
}

/** Checks `value` is a length in [0, `max`] mm, naming `field` if not. */
export function checkAllowance(value: unknown, field: string, max: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0 || value > max) {
    throw new InputError(field, `must be from 0 to ${max} mm (got ${String(value)})`, `0–${max} mm`);
  }
  return value;
}

/** Checks every part; throws an {@link InputError} naming the first bad field. */
export function checkSheetParts(parts: readonly SheetPartInput[]): void {
  parts.forEach((part, i) => {
    const at = `parts[${i}]`;
    if (typeof part.id !== 'string' || part.id === '') throw new InputError(`${at}.id`, 'must be a non-empty id', 'non-empty');
    checkSize(part.lengthMm, `${at}.lengthMm`);
    checkSize(part.widthMm, `${at}.widthMm`);
    checkCount(part.quantity, `${at}.quantity`, 0, MAX_QUANTITY);
    if (!GRAINS.includes(part.grain)) throw new InputError(`${at}.grain`, `must be one of ${GRAINS.join(', ')}`, GRAINS.join(', '));
  });
}

/** Merges `options` over the defaults and checks them. */
export function sheetSettings(options: SheetLayoutOptions): SheetSettings {
  const stock = options.stock ?? [STANDARD_SHEET];
  if (stock.length === 0) throw new InputError('stock', 'needs at least one sheet size', 'one or more sheets');
  const kerfMm = checkAllowance(options.kerfMm ?? DEFAULT_KERF_MM, 'kerfMm', MAX_KERF_MM);
  const trimMm = checkAllowance(options.trimMm ?? DEFAULT_TRIM_MM, 'trimMm', MAX_TRIM_MM);
  stock.forEach((s, i) => {
    checkSize(s.lengthMm, `stock[${i}].lengthMm`);
    checkSize(s.widthMm, `stock[${i}].widthMm`);
    if (s.count !== null) checkCount(s.count, `stock[${i}].count`, 0, MAX_QUANTITY);
    if (2 * trimMm >= Math.min(s.lengthMm, s.widthMm)) {
      throw new InputError('trimMm', `leaves nothing of the ${s.name} (trim ${trimMm} mm on each edge)`, 'less than half the smaller side of every sheet');
    }
  });
  const attempts = checkCount(options.attempts ?? DEFAULT_SHEET_ATTEMPTS, 'attempts', 1, 100_000);
  const seed = checkCount(options.seed ?? 1, 'seed', 0, 2 ** 32 - 1);
  return { stock, kerfMm, trimMm, attempts, seed };
}
