/**
 * The board optimiser: assigns solid parts, at their rough size, to boards in stock and boards
 * to buy, keeping grain-match groups on one board (runs end to end in their order), cutting around defects, and choosing the
 * ordering that buys the fewest board feet. Pure and deterministic.
 */
import { boardFeet } from '../engine/derived/boardFeet.ts';
import { formatLength } from '../units/format.ts';
import { MM_PER_INCH } from '../units/length.ts';
import { BoardFill, runSlots } from './boardFill.ts';
import { boardSettings, expandBoardParts, type BoardItem } from './boardInput.ts';
import { packBoards, placeUnit, type BoardAttempt, type BoardUnit } from './boardPacking.ts';
import type { BoardLayout, BoardLayoutOptions, BoardPartInput, BoardPlan, BoardStock, SplitGroupWarning } from './boardTypes.ts';
import { runLayoutSteps, type LayoutControl, type LayoutSteps } from './control.ts';
import { seededRandom, shuffled } from './prng.ts';
import { betterScore } from './sheetPlan.ts';
import { sizeText } from './sizeText.ts';
import type { UnplacedPart } from './sheetTypes.ts';

const IN3_PER_BOARD_FOOT = 144;

/** Lays `parts` out on boards, to the end unless `control` stops it. Sizes in mm. */
export function layoutBoards(parts: readonly BoardPartInput[], options: BoardLayoutOptions = {}, control: LayoutControl = {}): BoardLayout {
  return runLayoutSteps(boardLayoutSteps(parts, options), control);
}

/** The same run as {@link layoutBoards}, one ordering per step (see `sheetLayoutSteps`). */
export function* boardLayoutSteps(parts: readonly BoardPartInput[], options: BoardLayoutOptions = {}): LayoutSteps<BoardLayout> {
  const settings = boardSettings(options);
  const { stock, kerfMm, quarters } = settings;
  const items = expandBoardParts(parts, settings.allowance);
  const fitsAlone = (unit: BoardUnit) => stock.some((s, i) => placeUnit(new BoardFill(i, s, kerfMm), unit) !== null);
  const tooLarge = items.filter((item) => !fitsAlone([item]));
  const placeable = items.filter((item) => !tooLarge.includes(item));

  const groups = new Map<string, BoardItem[]>();
  const singles: BoardUnit[] = [];
  for (const item of placeable) {
    if (item.group === null) singles.push([item]);
    else groups.set(item.group, [...(groups.get(item.group) ?? []), item]);
  }
  const splitGroups: string[] = [];
  const splitWarnings: SplitGroupWarning[] = [];
  const groupUnits: BoardUnit[] = [];
  const runOrder = new Map<BoardItem, number>();
  for (const [id, members] of groups) {
    const isRun = members[0]!.order !== null;
    const unit = isRun
      ? members.slice().sort((a, b) => a.order! - b.order! || a.index - b.index)
      : members.slice().sort((a, b) => b.lengthMm - a.lengthMm || b.widthMm - a.widthMm);
    if (isRun) runSlots(unit, kerfMm).forEach((slot, i) => slot.items.forEach((item) => runOrder.set(item, i + 1)));
    if (fitsAlone(unit)) groupUnits.push(unit);
    else {
      splitGroups.push(id);
      splitWarnings.push(splitWarning(id, unit, stock, kerfMm));
      // A split run still keeps the boards of each glued-up part on one length where it can.
      const pieces: BoardUnit[] = isRun ? runSlots(unit, kerfMm).map((slot) => slot.items) : unit.map((item) => [item]);
      for (const piece of pieces) {
        if (piece.length > 1 && fitsAlone(piece)) groupUnits.push(piece);
        else singles.push(...piece.map((item) => [item]));
      }
    }
  }

  const orders = unitOrders(groupUnits, singles, settings.attempts);
  let best: BoardAttempt = { boards: [], unplaced: [] };
  let bestScore: readonly number[] | null = null;
  let done = 0;
  let cancelled = false;
  for (const order of orders) {
    const attempt = packBoards(order, stock, kerfMm);
    const score = boardScore(attempt, quarters);
    if (bestScore === null || betterScore(score, bestScore)) {
      best = attempt;
      bestScore = score;
    }
    done++;
    const stop = yield { done, total: orders.length, best: best.boards.length };
    if (stop) {
      cancelled = true;
      break;
    }
  }

  const boards = best.boards.map((b) => boardPlanOf(b, quarters, runOrder));
  const unplaced: UnplacedPart[] = [...tooLarge.map((item) => unplacedItem(item, 'larger-than-stock', stock)), ...best.unplaced.map((item) => unplacedItem(item, 'out-of-stock', stock))];
  const placedItems = best.boards.flatMap((b) => b.spots.map((s) => s.item));
  return {
    boards,
    unplaced,
    splitGroups,
    splitWarnings,
    quarters,
    boardFeetBought: sum(boards.map((b) => b.boardFeet)),
    boardFeetToBuy: sum(boards.filter((b) => !b.inStock).map((b) => b.boardFeet)),
    boardFeetRough: sum(placedItems.map((i) => boardFeet(quarters / 4, i.widthMm / MM_PER_INCH, i.lengthMm / MM_PER_INCH))),
    boardFeetFinished: sum(placedItems.map((i) => (i.finished[0] * i.finished[1] * i.finished[2]) / MM_PER_INCH ** 3 / IN3_PER_BOARD_FOOT)),
    kerfMm,
    attemptsRun: done,
    cancelled,
  };
}

// Groups go first in every order: they are the hardest to fit once boards fill up.
function unitOrders(groupUnits: readonly BoardUnit[], singles: readonly BoardUnit[], attempts: number): BoardUnit[][] {
  const length = (u: BoardUnit) => Math.max(...u.map((i) => i.lengthMm));
  const area = (u: BoardUnit) => sum(u.map((i) => i.lengthMm * i.widthMm));
  const width = (u: BoardUnit) => Math.max(...u.map((i) => i.widthMm));
  const keys = [
    (a: BoardUnit, b: BoardUnit) => length(b) - length(a) || width(b) - width(a),
    (a: BoardUnit, b: BoardUnit) => area(b) - area(a),
    (a: BoardUnit, b: BoardUnit) => width(b) - width(a) || length(b) - length(a),
  ];
  const groupsFirst = groupUnits.slice().sort(keys[1]);
  const orders = keys.slice(0, attempts).map((key) => [...groupsFirst, ...singles.slice().sort(key)]);
  const random = seededRandom(attempts);
  while (orders.length < attempts) orders.push([...groupsFirst, ...shuffled(singles, random)]);
  return orders;
}

// Fewest units left over, then fewest board feet bought, then in stock, then fewest boards.
function boardScore(attempt: BoardAttempt, quarters: number): number[] {
  let bought = 0;
  let fromStock = 0;
  for (const b of attempt.boards) {
    const bf = boardFeet(quarters / 4, b.stock.widthMm / MM_PER_INCH, b.stock.lengthMm / MM_PER_INCH);
    if (b.stock.inStock) fromStock += bf;
    else bought += bf;
  }
  return [attempt.unplaced.length, bought, fromStock, attempt.boards.length];
}

function boardPlanOf(board: BoardFill, quarters: number, runOrder: ReadonlyMap<BoardItem, number>): BoardPlan {
  const s = board.stock;
  return {
    stockId: s.id,
    stockName: s.name,
    inStock: s.inStock,
    lengthMm: s.lengthMm,
    widthMm: s.widthMm,
    defects: s.defects,
    parts: board.spots.map(({ item, x, y }) => ({
      partId: item.partId,
      name: item.name,
      instance: item.instance,
      matchGroup: item.group,
      matchOrder: runOrder.get(item) ?? null,
      matchLabel: item.label,
      finished: item.finished,
      x,
      y,
      length: item.lengthMm,
      width: item.widthMm,
    })),
    crosscutsMm: board.crosscuts(),
    boardFeet: boardFeet(quarters / 4, s.widthMm / MM_PER_INCH, s.lengthMm / MM_PER_INCH),
    yield: board.area() / (s.lengthMm * s.widthMm),
  };
}

function splitWarning(group: string, unit: BoardUnit, stock: readonly BoardStock[], kerfMm: number): SplitGroupWarning {
  const label = unit[0]!.label ?? unit[0]!.name;
  const slots = unit[0]!.order !== null ? runSlots(unit, kerfMm) : null;
  const lengthNeededMm = slots ? sum(slots.map((s) => s.length)) + kerfMm * (slots.length - 1) : Math.max(...unit.map((i) => i.lengthMm));
  const widthNeededMm = slots ? Math.max(...slots.map((s) => s.width)) : Math.max(...unit.map((i) => i.widthMm));
  const inches = (mm: number) => formatLength(mm, { unit: 'in' });
  const longest = Math.max(...stock.map((s) => s.lengthMm));
  const widest = Math.max(...stock.map((s) => s.widthMm));
  const need = slots
    ? `its ${slots.length} parts end to end need one board ${inches(lengthNeededMm)} long and ${inches(widthNeededMm)} wide, kerfs included`
    : `its ${unit.length} parts (longest ${inches(lengthNeededMm)}, widest ${inches(widthNeededMm)}) do not all fit on one board`;
  const message = `${label}: ${need}; no board on offer holds them clear of defects (longest ${inches(longest)}, widest ${inches(widest)}). They are laid out separately: pick boards of like colour and figure, or add a board that size to the stock.`;
  return { group, label, lengthNeededMm, widthNeededMm, message };
}

function unplacedItem(item: BoardItem, reason: 'larger-than-stock' | 'out-of-stock', stock: readonly BoardStock[]): UnplacedPart {
  const longest = Math.max(...stock.map((s) => s.lengthMm));
  const widest = Math.max(...stock.map((s) => s.widthMm));
  const size = sizeText(item.lengthMm, item.widthMm);
  const message =
    reason === 'larger-than-stock'
      ? `${item.name} needs ${size} rough; no board holds it clear of defects (longest board ${formatLength(longest, { unit: 'in' })}, widest ${formatLength(widest, { unit: 'in' })}). Glue it up from narrower boards or add a larger board.`
      : `${item.name} (${size} rough) fits only boards that are used up; add a board size for sale`;
  return { partId: item.partId, name: item.name, instance: item.instance, lengthMm: item.lengthMm, widthMm: item.widthMm, reason, message };
}

function sum(values: readonly number[]): number {
  let total = 0;
  for (const v of values) total += v;
  return total;
}
