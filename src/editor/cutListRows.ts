/**
 * The cut list as a table: the engine's groups by material, each row with its board feet, and
 * rows sorted within their group by the column a maker clicks.
 */
import type { CutListGroup, CutListRow } from '../../shared/engine/types.ts';
import { MM_PER_INCH } from '../../shared/units/index.ts';

/** Columns a cut list can be sorted by. */
export type CutListSortKey = 'name' | 'quantity' | 'length' | 'width' | 'thickness' | 'boardFeet';

export interface CutListSort {
  key: CutListSortKey;
  direction: 'asc' | 'desc';
}

/** A cut-list row with the board feet its rough stock takes (0 for sheet goods). */
export interface CutListTableRow extends CutListRow {
  boardFeet: number;
}

export interface CutListTableGroup {
  material: string;
  materialKind: 'solid' | 'sheet';
  rows: CutListTableRow[];
  boardFeet: number;
}

/**
 * Board feet of `quantity` pieces of rough stock `rough` (length, width, thickness in mm):
 * T(in) × W(in) × L(in) / 144 per piece, stock under 1 in counted as 1 in (National Hardwood
 * Lumber Association rules, secondary).
 */
export function roughBoardFeet(rough: readonly [number, number, number], quantity: number): number {
  const [length, width, thickness] = rough.map((mm) => mm / MM_PER_INCH) as [number, number, number];
  return (Math.max(1, thickness) * width * length * quantity) / 144;
}

const VALUE: Record<CutListSortKey, (row: CutListTableRow) => number | string> = {
  name: (row) => row.name,
  quantity: (row) => row.quantity,
  length: (row) => row.finished[0],
  width: (row) => row.finished[1],
  thickness: (row) => row.finished[2],
  boardFeet: (row) => row.boardFeet,
};

/** The cut list's groups with board feet, rows sorted by `sort` (engine order when null). */
export function cutListTable(groups: readonly CutListGroup[], sort: CutListSort | null): CutListTableGroup[] {
  return groups.map((group) => {
    const rows = group.rows.map((row) => ({ ...row, boardFeet: group.materialKind === 'solid' ? roughBoardFeet(row.rough, row.quantity) : 0 }));
    if (sort) {
      const value = VALUE[sort.key];
      const sign = sort.direction === 'asc' ? 1 : -1;
      rows.sort((a, b) => {
        const x = value(a);
        const y = value(b);
        const order = typeof x === 'string' && typeof y === 'string' ? x.localeCompare(y) : Number(x) - Number(y);
        return sign * order || a.name.localeCompare(b.name);
      });
    }
    return { material: group.material, materialKind: group.materialKind, rows, boardFeet: rows.reduce((sum, row) => sum + row.boardFeet, 0) };
  });
}
