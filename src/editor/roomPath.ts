/**
 * Reading and writing one field of a room section held as plain data, by its path
 * (`['doors', 0, 'width']`). Writes return new objects along the path and leave the rest
 * shared, so the editor's history keeps each step as an immutable value.
 */

/** A field's place in a room section: keys and array indexes. */
export type RoomPath = readonly (string | number)[];

/** The path as the room parser names fields: `doors[0].width`. */
export function pathText(path: RoomPath): string {
  return path.map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? p : `.${p}`)).join('');
}

/** The value at `path`, or undefined when any step is missing. */
export function valueAt(root: unknown, path: RoomPath): unknown {
  let node: unknown = root;
  for (const step of path) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string | number, unknown>)[step];
  }
  return node;
}

/** A copy of `root` with `value` at `path` (`undefined` removes an object key). */
export function withValueAt(root: unknown, path: RoomPath, value: unknown): unknown {
  if (path.length === 0) return value;
  const [step, ...rest] = path as [string | number, ...(string | number)[]];
  if (typeof step === 'number') {
    const list = Array.isArray(root) ? [...(root as unknown[])] : [];
    list[step] = withValueAt(list[step], rest, value);
    return list;
  }
  const object = root !== null && typeof root === 'object' && !Array.isArray(root) ? { ...(root as Record<string, unknown>) } : {};
  const next = withValueAt(object[step], rest, value);
  if (next === undefined) delete object[step];
  else object[step] = next;
  return object;
}
