/**
 * Two revisions side by side: every parameter and every part in one row each, the row marked
 * when the two sides read differently. Values are compared as the maker sees them — at the
 * precision the page writes them — so two widths that both read `40 1/16"` are not "changed";
 * such a row keeps the difference that lies below the shown precision, for a faint note.
 * Parameters missing from a stored spec read as their default.
 */
import type { ParamDef } from '../../shared/engine/paramDef.ts';
import type { ParamValue, Part, PieceResult, PieceSpec } from '../../shared/engine/types.ts';

/** Sizes closer than this are the same size (mm): below anything a maker can cut. */
export const SAME_SIZE_MM = 0.001;

/** Writes a parameter's value as the compare page shows it. */
export type ShowParam = (def: ParamDef, value: ParamValue) => string;

export interface ParamCompareRow {
  def: ParamDef;
  from: ParamValue;
  to: ParamValue;
  fromText: string;
  toText: string;
  /** The two sides read differently. */
  changed: boolean;
  /** How far apart two numbers are that read the same (mm for lengths); null when none is hidden. */
  hiddenDifference: number | null;
}

export type PartChange = 'added' | 'removed' | 'resized' | 'recounted' | 'same';

export interface PartCompareRow {
  partId: string;
  name: string;
  from: Part | null;
  to: Part | null;
  change: PartChange;
}

/** One row per parameter of the kind, in form order, each side written by `show`. */
export function paramCompareRows(defs: readonly ParamDef[], from: PieceSpec, to: PieceSpec, show: ShowParam): ParamCompareRow[] {
  return defs.map((def) => {
    const a = (from.params[def.key] as ParamValue | undefined) ?? def.default;
    const b = (to.params[def.key] as ParamValue | undefined) ?? def.default;
    const fromText = show(def, a);
    const toText = show(def, b);
    const changed = fromText !== toText;
    const gap = typeof a === 'number' && typeof b === 'number' ? Math.abs(a - b) : 0;
    return { def, from: a, to: b, fromText, toText, changed, hiddenDifference: !changed && gap > SAME_SIZE_MM ? gap : null };
  });
}

/**
 * One row per part in either piece: the `to` piece's order, then parts only the `from` piece
 * has. A part is resized only when one of its sizes reads differently through `showLength`.
 */
export function partCompareRows(from: PieceResult, to: PieceResult, showLength: (mm: number) => string): PartCompareRow[] {
  const before = new Map(from.parts.map((p) => [p.id, p]));
  const after = new Map(to.parts.map((p) => [p.id, p]));
  const rows: PartCompareRow[] = to.parts.map((part) => {
    const old = before.get(part.id) ?? null;
    return { partId: part.id, name: part.name, from: old, to: part, change: old ? changeOf(old, part, showLength) : 'added' };
  });
  for (const part of from.parts) {
    if (!after.has(part.id)) rows.push({ partId: part.id, name: part.name, from: part, to: null, change: 'removed' });
  }
  return rows;
}

function changeOf(a: Part, b: Part, showLength: (mm: number) => string): PartChange {
  const sizes = (p: Part) => [p.lengthMm, p.widthMm, p.thicknessMm];
  const [sa, sb] = [sizes(a), sizes(b)];
  const resized = sa.some((v, i) => Math.abs(v - sb[i]!) > SAME_SIZE_MM && showLength(v) !== showLength(sb[i]!));
  if (resized) return 'resized';
  return a.quantity !== b.quantity ? 'recounted' : 'same';
}
