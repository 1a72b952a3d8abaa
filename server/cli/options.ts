/**
 * Reading option values on the command line: lengths in a maker's notation, percentages and
 * temperatures with their unit. Each reader throws an `InputError` naming the option, so the
 * command line prints one clear line and exits with code 2.
 */
import { InputError } from '../../shared/errors.ts';
import type { Mm } from '../../shared/units/length.ts';
import { parseLength, type ParseLengthOptions } from '../../shared/units/parse.ts';

/** Reads a length such as `15in`, `1 3/4"`, `2' 6"` or `44.5 mm`; bare numbers are inches. */
export function lengthOption(text: string | undefined, option: string, opts: Omit<ParseLengthOptions, 'field'> = {}): Mm {
  if (text === undefined) throw missing(option, 'a length such as 15in or 381mm');
  return parseLength(text, { defaultUnit: 'in', ...opts, field: option });
}

/** Limits for {@link percentOption}, inclusive. */
export interface PercentLimits {
  min?: number;
  max?: number;
}

/** Reads a percentage such as `50` or `50%`, within `limits` (default 0–100). */
export function percentOption(text: string | undefined, option: string, limits: PercentLimits = {}): number {
  const min = limits.min ?? 0;
  const max = limits.max ?? 100;
  const limit = `between ${min} % and ${max} %`;
  if (text === undefined) throw missing(option, `a percentage ${limit}`);
  const match = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+))\s*%?\s*$/.exec(text);
  const value = match ? Number(match[1]) : Number.NaN;
  if (!Number.isFinite(value)) throw new InputError(option, `"${text}" is not a percentage; write it like 50 or 50%`, limit);
  if (value < min || value > max) throw new InputError(option, `must be ${limit} (got ${text})`, limit);
  return value;
}

/** A temperature with its unit, as read by {@link temperatureOption}. */
export interface TemperatureValue {
  temperature: number;
  temperatureUnit: 'F' | 'C';
}

/** Reads a temperature with its unit: `70F`, `70 °F`, `21C`, `-5 C`. A bare number is refused. */
export function temperatureOption(text: string | undefined, option: string): TemperatureValue {
  const examples = 'write it like 70F or 21C';
  if (text === undefined) throw missing(option, 'a temperature such as 70F or 21C');
  const match = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+))\s*°?\s*([FC])\s*$/i.exec(text);
  if (!match) {
    const reason = /^\s*[+-]?[\d.]+\s*$/.test(text) ? `"${text}" has no unit; ${examples}` : `"${text}" is not a temperature; ${examples}`;
    throw new InputError(option, reason, 'a temperature in F or C');
  }
  return { temperature: Number(match[1]), temperatureUnit: (match[2] ?? 'F').toUpperCase() as 'F' | 'C' };
}

/** Reads one of `choices`, naming them all when the value is not one. */
export function choiceOption<T extends string>(text: string | undefined, option: string, choices: readonly T[], fallback?: T): T {
  if (text === undefined) {
    if (fallback !== undefined) return fallback;
    throw missing(option, `one of ${choices.join(', ')}`);
  }
  if ((choices as readonly string[]).includes(text)) return text as T;
  throw new InputError(option, `must be one of ${choices.join(', ')} (got "${text}")`, choices.join(', '));
}

/** Writes `value` as JSON on stdout, alone, for `--json`. */
export function printJson(value: unknown): void {
  process.stdout.write(`${JSON.stringify(value, null, 2)}\n`);
}

/** Writes lines of text for a human on stdout. */
export function printLines(lines: readonly string[]): void {
  process.stdout.write(`${lines.join('\n')}\n`);
}

function missing(option: string, what: string): InputError {
  return new InputError(option, `is required: give ${what}`, what);
}
