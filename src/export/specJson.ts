/**
 * A design's spec as a JSON file: the engine's own `PieceSpec` with its `schemaVersion`, so the
 * file re-imports through `validateSpec` and the command line reads it as `plan spec.json`.
 */
import type { PieceSpec } from '../../shared/engine/types.ts';

/** `spec` as pretty-printed JSON, keys in a stable order. */
export function specJson(spec: PieceSpec): string {
  const ordered: PieceSpec = { schemaVersion: spec.schemaVersion, kind: spec.kind, params: spec.params };
  if (spec.climate) ordered.climate = spec.climate;
  if (spec.room !== undefined) ordered.room = spec.room;
  return `${JSON.stringify(ordered, null, 2)}\n`;
}
