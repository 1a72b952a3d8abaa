/** The parameters that differ between two specs, for the compare view. */
import type { PieceSpec } from '../../../shared/engine/types.ts';

export interface ParamChange {
  key: string;
  from: unknown;
  to: unknown;
}

/** JSON with object keys sorted, so equal values always serialise the same way. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
      : v,
  );
}

/**
 * Every parameter whose value differs, by key (`params.width`, and `climate`/`room` as a
 * whole); a key missing on one side shows as `null` there. Sorted by key.
 */
export function paramDiff(from: PieceSpec, to: PieceSpec): ParamChange[] {
  const changes: ParamChange[] = [];
  const keys = new Set([...Object.keys(from.params), ...Object.keys(to.params)]);
  for (const key of [...keys].sort()) {
    const a = from.params[key];
    const b = to.params[key];
    if (canonical(a) !== canonical(b)) changes.push({ key: `params.${key}`, from: a ?? null, to: b ?? null });
  }
  for (const key of ['climate', 'room'] as const) {
    if (canonical(from[key]) !== canonical(to[key])) changes.push({ key, from: from[key] ?? null, to: to[key] ?? null });
  }
  return changes;
}
