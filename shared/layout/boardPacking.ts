/**
 * One attempt at the board layout: boards are filled one at a time. For each next board every
 * available size is tried, filled greedily down the order, and the one that uses its wood best
 * is kept (boards already in stock come first, whatever they yield). A grain-match group goes
 * onto a board whole or not at all; a grain-matched run, end to end in its order.
 */
import { BoardFill } from './boardFill.ts';
import type { BoardItem } from './boardInput.ts';
import type { BoardStock } from './boardTypes.ts';

/**
 * A single part instance, or a grain-match group that must share a board: a run (items with an
 * order, sorted by it) goes end to end, an unordered group anywhere on the board.
 */
export type BoardUnit = readonly BoardItem[];

/** The boards of an attempt and the units no available board could take. */
export interface BoardAttempt {
  boards: BoardFill[];
  unplaced: BoardItem[];
}

/** Places every item of `unit` on `board`, or none of them; mutates `board` on success. */
export function placeUnit(board: BoardFill, unit: BoardUnit): BoardFill | null {
  if (unit.length === 1) return board.tryPlace(unit[0] as BoardItem) ? board : null;
  const trial = board.clone();
  if (unit[0]!.order !== null) return trial.tryPlaceRun(unit) ? trial : null;
  for (const item of unit) if (!trial.tryPlace(item)) return null;
  return trial;
}

/** Packs `units` in order onto boards from `stock` (in-stock boards first). */
export function packBoards(units: readonly BoardUnit[], stock: readonly BoardStock[], kerf: number): BoardAttempt {
  const left = stock.map((s) => s.count);
  let remaining = units.slice();
  const boards: BoardFill[] = [];
  while (remaining.length > 0) {
    const available = stock.map((s, i) => ({ s, i })).filter(({ i }) => left[i] !== 0);
    const inStock = available.filter(({ s }) => s.inStock);
    let choice: { board: BoardFill; placed: Set<BoardUnit>; value: number } | null = null;
    for (const group of [inStock, available.filter(({ s }) => !s.inStock)]) {
      for (const { s, i } of group) {
        const { board, placed } = fillBoard(new BoardFill(i, s, kerf), remaining);
        if (placed.size === 0) continue;
        // In-stock boards are already paid for: take the one that holds the most. Bought boards
        // are judged by the share of the board that becomes parts.
        const value = s.inStock ? board.area() : board.area() / (s.lengthMm * s.widthMm) + board.area() * 1e-12;
        if (choice === null || value > choice.value) choice = { board, placed, value };
      }
      if (choice !== null) break;
    }
    if (choice === null) break;
    boards.push(choice.board);
    const count = left[choice.board.stockIndex];
    if (count !== null && count !== undefined) left[choice.board.stockIndex] = count - 1;
    const placed = choice.placed;
    remaining = remaining.filter((unit) => !placed.has(unit));
  }
  return { boards, unplaced: remaining.flat() };
}

function fillBoard(start: BoardFill, units: readonly BoardUnit[]): { board: BoardFill; placed: Set<BoardUnit> } {
  let board = start;
  const placed = new Set<BoardUnit>();
  for (const unit of units) {
    const next = placeUnit(board, unit);
    if (next) {
      board = next;
      placed.add(unit);
    }
  }
  return { board, placed };
}
