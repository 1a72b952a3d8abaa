/** The cut list: every part with finished and rough sizes, grouped by material. */
import type { CutListGroup, CutListRow, Part, PartRole } from '../types.ts';

const ROLE_ORDER: readonly PartRole[] = [
  'leg', 'rail', 'stile', 'panel', 'lid', 'batten', 'cleat', 'bottom',
  'top', 'face-frame', 'door-frame', 'door-panel', 'door', 'drawer-front', 'drawer-side', 'drawer-end', 'drawer-bottom', 'runner', 'edge-strip',
  'case-side', 'case-top', 'case-bottom', 'stretcher', 'divider', 'shelf', 'back', 'base',
];

// Rank of each role in the cut list, looked up rather than searched for in every comparison.
const ROLE_RANK = new Map(ROLE_ORDER.map((role, i) => [role, i]));
const roleRank = (role: PartRole): number => ROLE_RANK.get(role) ?? -1;

/** The material a part is bought as, e.g. `White oak 4/4` or a sheet good's name. */
export function materialLabel(part: Part): string {
  return part.material.kind === 'solid' ? `${part.material.speciesName} ${part.rough.quarters}/4` : part.material.sheetName;
}

/**
 * The cut-list note of a part cut in runs from one board, e.g. `grain-matched: drawer fronts,
 * column 1 and column 2; cut each in order, top first, from one board`.
 */
export function grainMatchNotes(part: Part): string[] {
  if (!part.grainMatch || part.grainMatch.length === 0) return [];
  const names = [...new Set(part.grainMatch.map((m) => m.note ?? m.group))];
  return [`grain-matched (${names.join('; ')}): cut each run in order from one board, first part at the board's end`];
}

/** Groups parts by material (solid wood by species and stock thickness first, then sheets). */
export function cutList(parts: readonly Part[]): CutListGroup[] {
  const groups = new Map<string, { kind: 'solid' | 'sheet'; quarters: number; rows: CutListRow[] }>();
  const sorted = [...parts].sort((a, b) => roleRank(a.role) - roleRank(b.role));
  for (const part of sorted) {
    const label = materialLabel(part);
    const group = groups.get(label) ?? { kind: part.material.kind, quarters: part.rough.quarters, rows: [] };
    group.rows.push({
      partId: part.id, name: part.name, quantity: part.quantity,
      finished: [part.lengthMm, part.widthMm, part.thicknessMm],
      rough: [part.rough.lengthMm, part.rough.widthMm, part.rough.thicknessMm],
      grain: part.grain,
      notes: [...part.notes, ...(part.glueUp ? [`rough width allows for jointing ${part.glueUp.boards} boards`] : []), ...grainMatchNotes(part)],
    });
    groups.set(label, group);
  }
  return [...groups.entries()]
    .sort(([, a], [, b]) => (a.kind === b.kind ? a.quarters - b.quarters : a.kind === 'solid' ? -1 : 1))
    .map(([material, g]) => ({ material, materialKind: g.kind, rows: g.rows }));
}
