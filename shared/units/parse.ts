/**
 * Reads a length the way a maker types it: `1 3/4"`, `1-3/4 in`, `2' 6"`, `44.5 mm`, `4.45cm`,
 * `3/4in`, `40in`, `0.75 in`, or a bare number in a default unit. mathjs does the unit
 * conversion and the fraction arithmetic; only the maker's notation (mixed numbers, feet and
 * inches, quote marks) is read here, because mathjs reads `1 3/4 in` as 1 × 3/4 in.
 */
import { InputError } from '../errors.ts';
import { formatLength } from './format.ts';
import { mm, type LengthUnit, type Mm } from './length.ts';
import { unitMath } from './math.ts';

/** Options for {@link parseLength}. */
export interface ParseLengthOptions {
  /** Field name used in error messages, e.g. `width` or `lid.overhangFront`. Default `length`. */
  field?: string;
  /** Unit of a bare number such as `18`. Default `'in'`. */
  defaultUnit?: LengthUnit;
  /** Smallest accepted value, in mm (inclusive). */
  min?: number;
  /** Largest accepted value, in mm (inclusive). */
  max?: number;
  /** Accept 0. Default false: most lengths on a piece must be positive. */
  allowZero?: boolean;
  /** Accept values below 0 (offsets, for example). Default false. */
  allowNegative?: boolean;
}

type MathUnit = 'inch' | 'ft' | 'mm' | 'cm' | 'm';

const UNIT_WORDS: ReadonlyArray<readonly [RegExp, MathUnit]> = [
  [/^(?:"|''|inch(?:es)?\b|in\b\.?)/i, 'inch'],
  [/^(?:'|ft\b\.?|feet\b|foot\b)/i, 'ft'],
  [/^(?:mm\b|millimet(?:er|re)s?\b)/i, 'mm'],
  [/^(?:cm\b|centimet(?:er|re)s?\b)/i, 'cm'],
  [/^(?:m\b|met(?:er|re)s?\b)/i, 'm'],
];

// whole-and-fraction (`1 3/4`, `1-3/4`), fraction (`3/4`) or decimal (`44.5`, `.75`)
const QUANTITY = /^(?:(\d+)(?:\s+|\s*-\s*)(\d+)\s*\/\s*(\d+)|(\d+)\s*\/\s*(\d+)|(\d+(?:\.\d*)?|\.\d+))/;

interface Term {
  value: number;
  unit: MathUnit | null;
}

const EXAMPLES = `1 3/4", 1-3/4 in, 2' 6", 44.5 mm or 4.45 cm`;

/**
 * Parses `text` to millimetres. Throws an {@link InputError} naming `opts.field` when the text
 * is not a length, has a zero denominator, or breaks the sign, zero, min or max limits.
 */
export function parseLength(text: string, opts: ParseLengthOptions = {}): Mm {
  const field = opts.field ?? 'length';
  const defaultUnit: MathUnit = (opts.defaultUnit ?? 'in') === 'in' ? 'inch' : 'mm';
  const normalised = normalise(text);
  const shown = normalised.length > 40 ? `${normalised.slice(0, 40)}…` : normalised;
  if (normalised === '') throw new InputError(field, 'is empty; give a length such as ' + EXAMPLES, 'a length');

  const negative = normalised.startsWith('-');
  const body = negative ? normalised.slice(1).trimStart() : normalised;
  const terms = readTerms(body, field, shown);
  const valueMm = (negative ? -1 : 1) * sumTerms(terms, defaultUnit, field, shown);

  if (!Number.isFinite(valueMm)) throw new InputError(field, `"${shown}" is too large to be a length`, 'a finite length');
  const typedUnit = terms[0]?.unit ?? defaultUnit;
  checkLimits(valueMm, opts, field, shown, typedUnit === 'inch' || typedUnit === 'ft' ? 'in' : 'mm');
  // 12 significant digits drop binary noise (1 3/4 in → 44.45, not 44.449999999999996).
  const clean = Number(valueMm.toPrecision(12));
  return mm(clean === 0 ? 0 : clean);
}

function normalise(text: string): string {
  return String(text)
    .replace(/[\u2033\u201d\u201c]/g, '"')
    .replace(/[\u2032\u2019\u2018]/g, "'")
    .replace(/[\u2212\u2013\u2014]/g, '-')
    .trim();
}

function readTerms(body: string, field: string, original: string): Term[] {
  const terms: Term[] = [];
  let rest = body;
  while (rest.length > 0) {
    const quantity = QUANTITY.exec(rest);
    if (!quantity) throw notALength(field, original);
    const value = quantityValue(quantity, field, original);
    rest = rest.slice(quantity[0].length).trimStart();

    let unit: MathUnit | null = null;
    for (const [pattern, name] of UNIT_WORDS) {
      const match = pattern.exec(rest);
      if (match) {
        unit = name;
        rest = rest.slice(match[0].length).trimStart();
        break;
      }
    }
    terms.push({ value, unit });
    // `2'-6"` writes a dash between feet and inches
    if (unit === 'ft' && rest.startsWith('-')) rest = rest.slice(1).trimStart();
  }
  return terms;
}

function quantityValue(match: RegExpExecArray, field: string, original: string): number {
  const [, whole, mixedNumerator, mixedDenominator, numerator, denominator, decimal] = match;
  if (decimal !== undefined) return Number(decimal);
  const top = Number(mixedNumerator ?? numerator);
  const bottom = Number(mixedDenominator ?? denominator);
  if (bottom === 0) {
    throw new InputError(field, `"${original}" has a fraction with a zero denominator`, 'a denominator above 0');
  }
  const fraction = unitMath.fraction(top, bottom);
  const total = whole === undefined ? fraction : fraction.add(unitMath.fraction(Number(whole), 1));
  return total.valueOf();
}

function sumTerms(terms: Term[], defaultUnit: MathUnit, field: string, original: string): number {
  const [first, second] = terms;
  if (first === undefined) throw notALength(field, original);
  if (terms.length === 1) return toMm(first.value, first.unit ?? defaultUnit);
  // Two terms are feet then inches (`2' 6"`, `2 ft 6`); nothing else combines.
  if (terms.length === 2 && second !== undefined && first.unit === 'ft' && (second.unit === 'inch' || second.unit === null)) {
    return toMm(first.value, 'ft') + toMm(second.value, 'inch');
  }
  throw new InputError(field, `"${original}" mixes parts that do not combine; only feet and inches combine, as in 2' 6"`, 'one length');
}

function toMm(value: number, unit: MathUnit): number {
  return unitMath.unit(value, unit).toNumber('mm');
}

function notALength(field: string, original: string): InputError {
  return new InputError(field, `"${original}" is not a length; write it like ${EXAMPLES}`, 'a length');
}

// Limits are shown in the unit the maker typed, so the message reads in their terms.
function checkLimits(valueMm: number, opts: ParseLengthOptions, field: string, original: string, unit: LengthUnit): void {
  const show = (limitMm: number) => formatLength(limitMm, { unit, precision: unit === 'in' ? 64 : 0.1 });
  if (valueMm < 0 && !opts.allowNegative) {
    throw new InputError(field, `must be positive (got "${original}")`, opts.allowZero ? 'at least 0' : 'greater than 0');
  }
  if (valueMm === 0 && !opts.allowZero) {
    throw new InputError(field, `must be greater than zero (got "${original}")`, 'greater than 0');
  }
  if (opts.min !== undefined && valueMm < opts.min) {
    throw new InputError(field, `must be at least ${show(opts.min)} (got "${original}")`, `at least ${show(opts.min)}`);
  }
  if (opts.max !== undefined && valueMm > opts.max) {
    throw new InputError(field, `must be at most ${show(opts.max)} (got "${original}")`, `at most ${show(opts.max)}`);
  }
}
