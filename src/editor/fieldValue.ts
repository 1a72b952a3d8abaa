/**
 * Reading and writing one parameter as text in a form: lengths through `shared/units` in the
 * maker's unit, counts and ratings as plain numbers, choices checked against their list. A bad
 * value comes back as a reason (never a NaN) and never reaches the engine.
 */
import type { ParamDef } from '../../shared/engine/paramDef.ts';
import type { ParamValue } from '../../shared/engine/types.ts';
import { isInputError } from '../../shared/errors.ts';
import { formatLength, parseLength } from '../../shared/units/index.ts';
import { lengthFormat, type DisplayUnits } from './displayUnits.ts';
import { choicesFor } from './fieldChoices.ts';

/** The outcome of reading a field: a value the engine can take, or the reason it cannot. */
export type FieldParse =
  | { ok: true; value: ParamValue }
  | { ok: false; message: string; limit?: string };

// A plain decimal, optionally signed; `1e3` and `0x10` are not what a maker types.
const DECIMAL = /^[-+]?(?:\d+(?:\.\d*)?|\.\d+)$/;

/** Reads `text` typed into the field for `def`, in `units` when the text names no unit. */
export function parseFieldText(def: ParamDef, text: string, units: DisplayUnits): FieldParse {
  switch (def.kind) {
    case 'length':
      return parseLengthField(def, text, units);
    case 'number':
    case 'percent':
      return parseNumberField(def, text);
    case 'boolean':
      return parseBooleanField(text);
    case 'enum':
    case 'species':
    case 'sheet':
      return parseChoiceField(def, text);
  }
}

/** Writes `value` for the field of `def`: lengths in the maker's unit and precision. */
export function formatFieldValue(def: ParamDef, value: ParamValue, units: DisplayUnits): string {
  if (def.kind === 'length' && typeof value === 'number') return formatLength(value, lengthFormat(units));
  if (typeof value === 'number') return String(Number(value.toPrecision(10)));
  return String(value);
}

/** The accepted range in words, e.g. `11 13/16" to 94 1/2"`, or null when unlimited. */
export function rangeText(def: ParamDef, units: DisplayUnits): string | null {
  if (def.min === undefined && def.max === undefined) return null;
  const show = (n: number) => (def.kind === 'length' ? formatLength(n, lengthFormat(units)) : `${n}${def.unit ? ` ${def.unit}` : ''}`);
  if (def.min !== undefined && def.max !== undefined) return `${show(def.min)} to ${show(def.max)}`;
  return def.min !== undefined ? `at least ${show(def.min)}` : `at most ${show(def.max as number)}`;
}

function parseLengthField(def: ParamDef, text: string, units: DisplayUnits): FieldParse {
  try {
    const value = parseLength(text, {
      field: def.key,
      defaultUnit: units.unit,
      min: def.min,
      max: def.max,
      allowZero: def.min === undefined || def.min <= 0,
      allowNegative: def.min !== undefined && def.min < 0,
    });
    return { ok: true, value };
  } catch (error) {
    if (isInputError(error)) return { ok: false, message: error.message, limit: error.limit };
    throw error;
  }
}

function parseNumberField(def: ParamDef, text: string): FieldParse {
  const unit = def.unit ? ` ${def.unit}` : '';
  const trimmed = (def.kind === 'percent' ? text.replace(/%\s*$/, '') : text).trim();
  if (trimmed === '') return { ok: false, message: 'is empty; give a number', limit: 'a number' };
  if (!DECIMAL.test(trimmed)) return { ok: false, message: `"${text.trim()}" is not a number`, limit: 'a number' };
  const value = Number(trimmed);
  if (def.integer && !Number.isInteger(value)) return { ok: false, message: `must be a whole number (got ${trimmed})`, limit: 'a whole number' };
  if (def.min !== undefined && value < def.min) return { ok: false, message: `must be at least ${def.min}${unit} (got ${trimmed})`, limit: `at least ${def.min}${unit}` };
  if (def.max !== undefined && value > def.max) return { ok: false, message: `must be at most ${def.max}${unit} (got ${trimmed})`, limit: `at most ${def.max}${unit}` };
  return { ok: true, value };
}

function parseBooleanField(text: string): FieldParse {
  if (text === 'true') return { ok: true, value: true };
  if (text === 'false') return { ok: true, value: false };
  return { ok: false, message: `"${text}" is not yes or no`, limit: 'yes or no' };
}

function parseChoiceField(def: ParamDef, text: string): FieldParse {
  const choices = choicesFor(def);
  if (choices.some((choice) => choice.value === text)) return { ok: true, value: text };
  const list = choices.map((choice) => choice.value).join(', ');
  return { ok: false, message: `"${text}" is not one of the choices`, limit: list };
}
