/**
 * Board feet: 1 board foot = 144 in³ (12 × 12 × 1 in); BF = T(in) × W(in) × L(ft) / 12, and
 * stock under 1 in thick counts as 1 in (National Hardwood Lumber Association rules,
 * secondary). Casewright counts rough sizes, the thickness already rounded up to the quarter.
 */
import type { BoardFeetRow, Part } from '../types.ts';

const MM_PER_IN = 25.4;

/** Board feet of one board `thicknessIn` × `widthIn` × `lengthIn` (inches); under 1 in thick counts as 1 in. */
export function boardFeet(thicknessIn: number, widthIn: number, lengthIn: number): number {
  return (Math.max(1, thicknessIn) * widthIn * lengthIn) / 144;
}

/** Board feet of the solid parts, per species and stock thickness, from rough sizes. */
export function boardFeetBySpecies(parts: readonly Part[]): { bySpecies: BoardFeetRow[]; total: number } {
  const rows = new Map<string, { speciesName: string; byThickness: Record<string, number>; total: number }>();
  for (const part of parts) {
    if (part.material.kind !== 'solid') continue;
    const bf = part.quantity * boardFeet(part.rough.quarters / 4, part.rough.widthMm / MM_PER_IN, part.rough.lengthMm / MM_PER_IN);
    const row = rows.get(part.material.speciesId) ?? { speciesName: part.material.speciesName, byThickness: {}, total: 0 };
    const key = `${part.rough.quarters}/4`;
    row.byThickness[key] = (row.byThickness[key] ?? 0) + bf;
    row.total += bf;
    rows.set(part.material.speciesId, row);
  }
  const bySpecies = [...rows.entries()].map(([speciesId, r]) => ({ speciesId, speciesName: r.speciesName, byThickness: r.byThickness, total: r.total }));
  return { bySpecies, total: bySpecies.reduce((s, r) => s + r.total, 0) };
}
