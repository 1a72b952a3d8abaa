import { Fragment, type ReactNode } from 'react';
import type { BoardInStock, DefectKind, StockDefect } from '../../shared/materials/stockSettings.ts';
import { MAX_BOARD_WIDTH_MM, MAX_LABEL_CHARS, MAX_STOCK_LENGTH_MM, type StockProblem } from '../../shared/schemas/stock.ts';
import { SPECIES, SPECIES_IDS } from '../../shared/wood/species.ts';
import { lengthsInUserUnits } from '../editor/roomText.ts';
import { READ_ONLY_FIELDS } from '../materials/readOnlyFields.ts';
import { stockFieldName } from '../materials/stockFieldName.ts';
import { useLength } from '../state/useLength.ts';
import { LengthInput } from './LengthInput.tsx';

const IN = 25.4;
const QUARTERS = [4, 5, 6, 8, 10, 12, 16];
const KINDS: { value: DefectKind; label: string }[] = [
  { value: 'knot', label: 'Knot' },
  { value: 'check', label: 'Check' },
  { value: 'other', label: 'Other' },
];
const SPECIES_BY_NAME = [...SPECIES_IDS].sort((a, b) => SPECIES[a].name.localeCompare(SPECIES[b].name));

/** A new knot near the middle of `board`, an inch across, kept inside the board. */
function newDefect(board: BoardInStock): StockDefect {
  const lengthMm = Math.min(1 * IN, board.lengthMm);
  const widthMm = Math.min(1 * IN, board.widthMm);
  return { kind: 'knot', fromEndMm: Math.max(0, Math.round(board.lengthMm / 2 - lengthMm / 2)), fromEdgeMm: Math.max(0, Math.round(board.widthMm / 2 - widthMm / 2)), lengthMm, widthMm };
}

interface Props {
  boards: readonly BoardInStock[];
  onChange: (boards: BoardInStock[]) => void;
  /** Species and stock thickness a new row starts with (the design's first solid wood). */
  newBoard: { speciesId: string; quarters: number };
  /** What the last layout did with each row, by row index. */
  usage: ReadonlyMap<number, string>;
  problems: readonly StockProblem[];
  readOnly: boolean;
}

/**
 * The boards on hand, one row each, with their knots, checks and other defects below them:
 * where each starts from the board's end and edge, and its size. Lengths are typed in the
 * maker's unit; a defect that leaves its board is named on its row.
 */
export function StockBoardsTable({ boards, onChange, newBoard, usage, problems, readOnly }: Props) {
  const length = useLength();
  const setBoard = (i: number, patch: Partial<BoardInStock>) => onChange(boards.map((b, j) => (j === i ? { ...b, ...patch } : b)));
  const setDefect = (i: number, d: number, patch: Partial<StockDefect>) =>
    setBoard(i, { defects: boards[i]!.defects.map((x, k) => (k === d ? { ...x, ...patch } : x)) });
  const addBoard = () => onChange([...boards, { label: '', speciesId: newBoard.speciesId, quarters: newBoard.quarters, lengthMm: 72 * IN, widthMm: 6 * IN, defects: [] }]);
  const rowProblems = (i: number) => problems.filter((p) => p.path[0] === 'boardsInStock' && p.path[1] === i);

  return (
    <fieldset disabled={readOnly} className={`min-w-0 ${READ_ONLY_FIELDS}`}>
      <div className="overflow-x-auto rounded-sm border border-rule">
        <table className="w-full border-collapse text-[13px]" aria-label="Boards on hand">
          <thead className="bg-sheet text-xs text-graphite-soft shadow-[0_1px_0_var(--color-rule)]">
            <tr>
              <th className="w-8 px-2 py-1 text-left font-medium">#</th>
              <th className="px-2 py-1 text-left font-medium">Label</th>
              <th className="px-2 py-1 text-left font-medium">Species</th>
              <th className="px-2 py-1 text-left font-medium">Thickness</th>
              <th className="px-2 py-1 text-left font-medium">Length</th>
              <th className="px-2 py-1 text-left font-medium">Width</th>
              <th className="px-2 py-1 text-left font-medium">In this layout</th>
              {!readOnly && <th className="px-2 py-1"><span className="sr-only">Actions</span></th>}
            </tr>
          </thead>
          <tbody>
            {boards.length === 0 && (
              <tr><td colSpan={8} className="px-2 py-3 text-center text-graphite-soft">No boards on hand: every board is bought.</td></tr>
            )}
            {boards.map((board, i) => {
              const n = i + 1;
              const bad = rowProblems(i);
              const quarters = QUARTERS.includes(board.quarters) ? QUARTERS : [...QUARTERS, board.quarters].sort((a, b) => a - b);
              return (
                <Fragment key={i}>
                  <tr className={`border-t border-rule ${bad.length ? 'bg-pencil-soft/40' : ''}`} data-board-row={n}>
                    <td className="dim px-2 py-1 align-top text-graphite-soft">{n}</td>
                    <td className="px-1 py-0.5 align-top">
                      <input className="field w-36 font-sans" aria-label={`Board ${n} label`} placeholder="e.g. A1" maxLength={MAX_LABEL_CHARS} value={board.label ?? ''}
                        onChange={(e) => setBoard(i, { label: e.target.value })} />
                    </td>
                    <td className="px-1 py-0.5 align-top">
                      <select className="field font-sans" aria-label={`Board ${n} species`} value={board.speciesId} onChange={(e) => setBoard(i, { speciesId: e.target.value })}>
                        {SPECIES_BY_NAME.map((id) => <option key={id} value={id}>{SPECIES[id].name}</option>)}
                      </select>
                    </td>
                    <td className="px-1 py-0.5 align-top">
                      <select className="field w-20" aria-label={`Board ${n} thickness`} value={board.quarters} onChange={(e) => setBoard(i, { quarters: Number(e.target.value) })}>
                        {quarters.map((q) => <option key={q} value={q}>{q}/4</option>)}
                      </select>
                    </td>
                    <td className="w-28 px-1 py-0.5 align-top">
                      <LengthInput hideLabel label={`Board ${n} length`} valueMm={board.lengthMm} maxMm={MAX_STOCK_LENGTH_MM} onChange={(lengthMm) => setBoard(i, { lengthMm })} />
                    </td>
                    <td className="w-28 px-1 py-0.5 align-top">
                      <LengthInput hideLabel label={`Board ${n} width`} valueMm={board.widthMm} maxMm={MAX_BOARD_WIDTH_MM} onChange={(widthMm) => setBoard(i, { widthMm })} />
                    </td>
                    <td className="px-2 py-1 align-top text-xs text-graphite-soft" data-usage>{usage.get(i) ?? '—'}</td>
                    {!readOnly && (
                      <td className="whitespace-nowrap px-1 py-0.5 text-right align-top">
                        <button type="button" className="btn px-1.5 py-0 text-xs" onClick={() => setBoard(i, { defects: [...board.defects, newDefect(board)] })}>Add a defect</button>{' '}
                        <button type="button" className="btn px-1.5 py-0" aria-label={`Remove board ${n}`} onClick={() => onChange(boards.filter((_, j) => j !== i))}>✕</button>
                      </td>
                    )}
                  </tr>
                  {board.defects.map((d, k) => {
                    const at = `Board ${n} defect ${k + 1}`;
                    return (
                      <tr key={`d${k}`} className={bad.length ? 'bg-pencil-soft/40' : ''} data-defect-row={`${n}.${k + 1}`}>
                        <td />
                        <td colSpan={readOnly ? 6 : 7} className="px-1 pb-1">
                          <div className="grid grid-cols-[4.5rem_6rem_repeat(4,minmax(5.5rem,7rem))_auto] items-end gap-1 border-l-2 border-pencil/50 pl-2">
                            <span className="pb-1 text-xs text-graphite-soft">defect {k + 1}</span>
                            <Captioned caption="Kind">
                              <select className="field font-sans" aria-label={`${at} kind`} value={d.kind} onChange={(e) => setDefect(i, k, { kind: e.target.value as DefectKind })}>
                                {KINDS.map((x) => <option key={x.value} value={x.value}>{x.label}</option>)}
                              </select>
                            </Captioned>
                            <Captioned caption="From the end">
                              <LengthInput hideLabel label={`${at} from the end`} valueMm={d.fromEndMm} maxMm={MAX_STOCK_LENGTH_MM} allowZero onChange={(fromEndMm) => setDefect(i, k, { fromEndMm })} />
                            </Captioned>
                            <Captioned caption="From the edge">
                              <LengthInput hideLabel label={`${at} from the edge`} valueMm={d.fromEdgeMm} maxMm={MAX_BOARD_WIDTH_MM} allowZero onChange={(fromEdgeMm) => setDefect(i, k, { fromEdgeMm })} />
                            </Captioned>
                            <Captioned caption="Length (with the grain)">
                              <LengthInput hideLabel label={`${at} length`} valueMm={d.lengthMm} maxMm={MAX_STOCK_LENGTH_MM} onChange={(lengthMm) => setDefect(i, k, { lengthMm })} />
                            </Captioned>
                            <Captioned caption="Width (across)">
                              <LengthInput hideLabel label={`${at} width`} valueMm={d.widthMm} maxMm={MAX_BOARD_WIDTH_MM} onChange={(widthMm) => setDefect(i, k, { widthMm })} />
                            </Captioned>
                            {!readOnly && <button type="button" className="btn mb-0.5 justify-self-start px-1.5 py-0" aria-label={`Remove ${at.toLowerCase()}`} onClick={() => setBoard(i, { defects: board.defects.filter((_, j) => j !== k) })}>✕</button>}
                          </div>
                        </td>
                      </tr>
                    );
                  })}
                  {bad.length > 0 && (
                    <tr className="bg-pencil-soft/40">
                      <td />
                      <td colSpan={7} className="px-2 pb-1" role="alert">
                        {bad.map((p) => (
                          <p key={p.field} className="text-xs text-pencil">{stockFieldName(p.path)} {lengthsInUserUnits(p.message, length)}.</p>
                        ))}
                      </td>
                    </tr>
                  )}
                </Fragment>
              );
            })}
          </tbody>
        </table>
      </div>
      {!readOnly && <button type="button" className="btn mt-2 px-2 py-0.5 text-xs" onClick={addBoard}>Add a board</button>}
    </fieldset>
  );
}

/** A small caption over a field whose own label is for screen readers (it repeats on every row). */
function Captioned({ caption, children }: { caption: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <span aria-hidden className="block text-[11px] leading-tight text-graphite-soft">{caption}</span>
      {children}
    </div>
  );
}
