/**
 * Undo and redo of the editor's spec as a plain value: every change is a step, and successive
 * keystrokes in one field (the same `key`, not yet sealed by leaving the field) merge into one
 * step, so Ctrl+Z takes back a whole typed value rather than its last character.
 */

/** The past, the present and the undone future of a value. */
export interface History<T> {
  readonly past: readonly T[];
  readonly present: T;
  readonly future: readonly T[];
  /** The field still being typed in; its next change replaces the present step. */
  readonly openKey: string | null;
}

/** Steps kept; older ones fall off the bottom. */
export const HISTORY_LIMIT = 200;

/** A history holding only `present`. */
export function startHistory<T>(present: T): History<T> {
  return { past: [], present, future: [], openKey: null };
}

/**
 * Records `next` as a change made under `key` (a parameter key, or null for a one-off change
 * such as a climate preset). Clears the redo future.
 */
export function record<T>(history: History<T>, next: T, key: string | null): History<T> {
  if (key !== null && key === history.openKey) {
    return { ...history, present: next, future: [] };
  }
  const past = [...history.past, history.present].slice(-HISTORY_LIMIT);
  return { past, present: next, future: [], openKey: key };
}

/** Ends the open step, so the next change in the same field is a step of its own. */
export function seal<T>(history: History<T>): History<T> {
  return history.openKey === null ? history : { ...history, openKey: null };
}

/** Steps back one change; unchanged when there is nothing to undo. */
export function undo<T>(history: History<T>): History<T> {
  const previous = history.past.at(-1);
  if (history.past.length === 0 || previous === undefined) return history;
  return { past: history.past.slice(0, -1), present: previous, future: [history.present, ...history.future], openKey: null };
}

/** Steps forward one undone change; unchanged when there is nothing to redo. */
export function redo<T>(history: History<T>): History<T> {
  const next = history.future[0];
  if (history.future.length === 0 || next === undefined) return history;
  return { past: [...history.past, history.present], present: next, future: history.future.slice(1), openKey: null };
}
