/**
 * Two revisions side by side: every parameter and every part in one row each, the row marked
 * when the two sides differ. Parameters missing from a stored spec read as their default.
 */
import type { ParamDef } from '../../shared/engine/paramDef.ts';
import type { ParamValue, Part, PieceResult, PieceSpec } from '../../shared/engine/types.ts';

/** Sizes closer than this are the same size (mm): below anything a maker can cut. */
export const SAME_SIZE_MM = 0.001;

export interface ParamCompareRow {
  def: ParamDef;
  from: ParamValue;
  to: ParamValue;
  changed: boolean;
}

export type PartChange = 'added' | 'removed' | 'resized' | 'recounted' | 'same';

export interface PartCompareRow {
  partId: string;
  name: string;
  from: Part | null;
  to: Part | null;
  change: PartChange;
}

/** One row per parameter of the kind, in form order. */
export function paramCompareRows(defs: readonly ParamDef[], from: PieceSpec, to: PieceSpec): ParamCompareRow[] {
  return defs.map((def) => {
    const a = (from.params[def.key] as ParamValue | undefined) ?? def.default;
    const b = (to.params[def.key] as ParamValue | undefined) ?? def.default;
    return { def, from: a, to: b, changed: a !== b };
  });
}

/** One row per part in either piece: the `to` piece's order, then parts only the `from` piece has. */
export function partCompareRows(from: PieceResult, to: PieceResult): PartCompareRow[] {
  const before = new Map(from.parts.map((p) => [p.id, p]));
  const after = new Map(to.parts.map((p) => [p.id, p]));
  const rows: PartCompareRow[] = to.parts.map((part) => {
    const old = before.get(part.id) ?? null;
    return { partId: part.id, name: part.name, from: old, to: part, change: old ? changeOf(old, part) : 'added' };
  });
  for (const part of from.parts) {
    if (!after.has(part.id)) rows.push({ partId: part.id, name: part.name, from: part, to: null, change: 'removed' });
  }
  return rows;
}

function changeOf(a: Part, b: Part): PartChange {
  const resized = [a.lengthMm - b.lengthMm, a.widthMm - b.widthMm, a.thicknessMm - b.thicknessMm].some((d) => Math.abs(d) > SAME_SIZE_MM);
  if (resized) return 'resized';
  return a.quantity !== b.quantity ? 'recounted' : 'same';
}
