import { useEffect, useMemo, useState } from 'react';
import type { CutListGroup, Grain } from '../../shared/engine/types.ts';
import { noteSentences } from '../editor/noteSentences.ts';
import { cutListTable, type CutListSort, type CutListSortKey } from '../editor/cutListRows.ts';
import { useLength } from '../state/useLength.ts';
import { PartRow } from './PartRow.tsx';

const GRAIN: Record<Grain, string> = { length: '↔ along', width: '↕ across', none: '—' };

const COLUMNS: { key: CutListSortKey; label: string; numeric: boolean }[] = [
  { key: 'name', label: 'Part', numeric: false },
  { key: 'quantity', label: 'Qty', numeric: true },
  { key: 'length', label: 'Length', numeric: true },
  { key: 'width', label: 'Width', numeric: true },
  { key: 'thickness', label: 'Thick', numeric: true },
];

/** The cut list by material: finished and rough sizes, quantity, grain and board feet; sortable. */
export function CutListTable({ groups }: { groups: readonly CutListGroup[] }) {
  const [sort, setSort] = useState<CutListSort | null>(null);
  const length = useLength();
  const table = useMemo(() => cutListTable(groups, sort), [groups, sort]);
  const totalBf = table.reduce((sum, g) => sum + g.boardFeet, 0);
  // The editor benchmark measures from a parameter's `param-change` to this (and to the 3D view's marks).
  useEffect(() => {
    performance.mark('tables-drawn');
  }, [groups]);

  const header = (key: CutListSortKey, label: string, numeric: boolean) => {
    const active = sort?.key === key;
    const next: CutListSort = { key, direction: active && sort.direction === 'asc' ? 'desc' : 'asc' };
    return (
      <th scope="col" aria-sort={active ? (sort.direction === 'asc' ? 'ascending' : 'descending') : 'none'} className={`px-2 py-1.5 font-medium ${numeric ? 'text-right' : 'text-left'}`}>
        <button type="button" className="inline-flex items-center gap-1 hover:text-pencil" onClick={() => setSort(next)}>
          {label}
          <span aria-hidden="true" className="font-mono text-[10px] text-graphite-faint">{active ? (sort.direction === 'asc' ? '▲' : '▼') : '↕'}</span>
        </button>
      </th>
    );
  };

  return (
    <table className="w-full border-collapse text-[13px]" aria-label="Cut list">
      <thead className="sticky top-0 z-10 bg-sheet text-xs text-graphite-soft shadow-[0_1px_0_var(--color-rule)]">
        <tr>
          {COLUMNS.map((c) => header(c.key, c.label, c.numeric))}
          <th scope="col" className="px-2 py-1.5 text-right font-medium">Rough L × W × T</th>
          <th scope="col" className="px-2 py-1.5 text-left font-medium">Grain</th>
          {header('boardFeet', 'Bd ft', true)}
        </tr>
      </thead>
      {table.map((group) => (
        <tbody key={group.material}>
          <tr className="bg-paper-deep/60">
            <th scope="rowgroup" colSpan={7} className="px-2 py-1 text-left text-xs font-semibold uppercase tracking-wider text-graphite">
              {group.material}
            </th>
            <td className="dim whitespace-nowrap px-2 py-1 text-right text-xs font-semibold">{group.materialKind === 'solid' ? group.boardFeet.toFixed(2) : 'sheet'}</td>
          </tr>
          {group.rows.map((row) => (
            <PartRow key={row.partId} partId={row.partId} name={row.name}>
              <td className="px-2 py-1">
                {row.name}
                {row.notes.length > 0 && <span className="block text-[11px] text-graphite-faint">{noteSentences(row.notes)}</span>}
              </td>
              <td className="dim whitespace-nowrap px-2 py-1 text-right">{row.quantity}</td>
              <td className="dim whitespace-nowrap px-2 py-1 text-right" data-col="length">{length(row.finished[0])}</td>
              <td className="dim whitespace-nowrap px-2 py-1 text-right">{length(row.finished[1])}</td>
              <td className="dim whitespace-nowrap px-2 py-1 text-right">{length(row.finished[2])}</td>
              <td className="dim whitespace-nowrap px-2 py-1 text-right text-[11px] text-graphite-soft">{row.rough.map((n) => length(n)).join(' × ')}</td>
              <td className="whitespace-nowrap px-2 py-1 text-xs text-graphite-soft">{GRAIN[row.grain]}</td>
              <td className="dim whitespace-nowrap px-2 py-1 text-right">{group.materialKind === 'solid' ? row.boardFeet.toFixed(2) : '—'}</td>
            </PartRow>
          ))}
        </tbody>
      ))}
      <tfoot>
        <tr className="border-t-2 border-graphite">
          <th scope="row" colSpan={7} className="px-2 py-1.5 text-left text-xs font-semibold">Solid wood, rough, all species</th>
          <td className="dim px-2 py-1.5 text-right font-semibold">{totalBf.toFixed(2)}</td>
        </tr>
      </tfoot>
    </table>
  );
}
