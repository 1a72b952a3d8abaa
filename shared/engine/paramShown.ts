/** Whether a form shows a parameter, from its `shownWhen` conditions and the other values. */
import type { ParamCondition, ParamDef, ParamShownEntry } from './paramDef.ts';

/** True when `condition` holds for `params` (a missing value holds no condition). */
export function conditionHolds(condition: ParamCondition, params: Readonly<Record<string, unknown>>): boolean {
  const value = params[condition.param];
  if (value === undefined) return false;
  if ('is' in condition) return condition.is.includes(value as string | number | boolean);
  return typeof value === 'number' && value >= condition.atLeast;
}

/** True when `entry` holds for `params`: its condition, or every condition of one of its `anyOf` lists. */
export function entryHolds(entry: ParamShownEntry, params: Readonly<Record<string, unknown>>): boolean {
  if ('anyOf' in entry) return entry.anyOf.some((conditions) => conditions.every((condition) => conditionHolds(condition, params)));
  return conditionHolds(entry, params);
}

/**
 * True when a form should show `def` for the values `params` (defaults merged in by the
 * caller): every one of its `shownWhen` entries holds, or it has none.
 */
export function paramShown(def: ParamDef, params: Readonly<Record<string, unknown>>): boolean {
  return (def.shownWhen ?? []).every((entry) => entryHolds(entry, params));
}
