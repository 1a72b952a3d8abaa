/** Parameter metadata: what a form needs to show, check and explain one parameter. */
import type { ParamValue } from './types.ts';

/** How a parameter is entered and checked. */
export type ParamKind = 'length' | 'number' | 'percent' | 'enum' | 'boolean' | 'species' | 'sheet';

/**
 * One condition on another parameter of the same piece: its value is one of `is`, or (numbers)
 * at least `atLeast`. Plain data, so definitions stay serialisable.
 */
export type ParamCondition =
  | { param: string; is: readonly (string | number | boolean)[] }
  | { param: string; atLeast: number };

/**
 * Either-or: holds while every condition of at least one of the lists holds, e.g. a shelf
 * setting shown with fixed shelves or with adjustable ones:
 * `{ anyOf: [[{ param: 'fixedShelves', atLeast: 1 }], [{ param: 'adjustableShelves', atLeast: 1 }]] }`.
 * Plain data like a condition; the lists hold plain conditions only.
 */
export interface ParamAnyOf {
  anyOf: readonly (readonly ParamCondition[])[];
}

/** One entry of `shownWhen`: a condition, or an either-or of lists of conditions. */
export type ParamShownEntry = ParamCondition | ParamAnyOf;

/** One parameter of a piece kind. Lengths are in mm (defaults, min and max alike). */
export interface ParamDef {
  key: string;
  /** The label a form shows, e.g. `Leg size (square)`. */
  label: string;
  /** The form group, e.g. `Size`, `Legs`, `Lid`. */
  group: string;
  kind: ParamKind;
  default: ParamValue;
  /** Inclusive limits for lengths (mm) and numbers. */
  min?: number;
  max?: number;
  /** Whole numbers only (counts). */
  integer?: boolean;
  /** Unit shown beside a `number`, e.g. `N·m`; lengths carry their own unit. */
  unit?: string;
  /** Choices of an `enum`, with the words a form shows. */
  options?: readonly { value: string; label: string }[];
  /** One sentence on what it does and a sensible value. */
  help?: string;
  /**
   * When the parameter means anything: a form shows it only while every entry holds (e.g.
   * the listed row heights only when the heights are listed); an `anyOf` entry holds when one
   * of its lists does, for settings needed by either of two choices. Absent: always shown. A
   * hidden parameter keeps its value and is still checked by the engine's range check.
   */
  shownWhen?: readonly ParamShownEntry[];
}
