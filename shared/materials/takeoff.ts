/**
 * The materials takeoff of a piece: its solid parts laid out on boards (per species and stock
 * thickness) and its sheet parts on sheets (per sheet good), with board feet bought against
 * board feet in the finished parts, and sheets against the area lower bound.
 */
import type { PieceResult } from '../engine/types.ts';
import { boardLayoutSteps } from '../layout/boardOptimiser.ts';
import type { BoardLayout, BoardStock } from '../layout/boardTypes.ts';
import { DEFAULT_BOARD_SIZES } from '../layout/boardInput.ts';
import { runLayoutSteps, type LayoutControl, type LayoutProgress, type LayoutSteps } from '../layout/control.ts';
import { sheetLayoutSteps } from '../layout/sheetOptimiser.ts';
import { STANDARD_SHEET } from '../layout/sheetInput.ts';
import type { SheetLayout, SheetStock } from '../layout/sheetTypes.ts';
import { boardPartsFor, sheetPartFor } from './partsForLayout.ts';

/** Boards of one species at one stock thickness. */
export interface BoardTakeoff {
  speciesId: string;
  speciesName: string;
  quarters: number;
  layout: BoardLayout;
}

/** Sheets of one sheet good. */
export interface SheetTakeoff {
  sheetId: string;
  sheetName: string;
  layout: SheetLayout;
}

/** What to buy and how to cut it, for one piece. */
export interface MaterialsTakeoff {
  boards: BoardTakeoff[];
  sheets: SheetTakeoff[];
  boardFeetBought: number;
  boardFeetFinished: number;
  sheetsBought: number;
  cancelled: boolean;
}

/** Options of {@link materialsTakeoff}; lengths in mm. */
export interface TakeoffOptions {
  /** Board sizes for sale and boards in stock, per species id; default {@link DEFAULT_BOARD_SIZES}. */
  boardStock?: (speciesId: string, quarters: number) => readonly BoardStock[];
  /** Sheet sizes for sale and offcuts, per sheet-good id; default one 48 × 96 in sheet. */
  sheetStock?: (sheetId: string) => readonly SheetStock[];
  kerfMm?: number;
  trimMm?: number;
  sheetAttempts?: number;
  /** Orderings the board optimiser tries per species and thickness; default its own (6). */
  boardAttempts?: number;
}

/** Progress of a whole takeoff: the layout running (one per species and thickness, or sheet good) and its attempts. */
export interface TakeoffProgress extends LayoutProgress {
  /** 0-based index of the layout running, of `layouts`. */
  layout: number;
  layouts: number;
  /** What is being laid out, e.g. `White oak 4/4` or `Hardwood plywood, 1/2`. */
  label: string;
}

/** A stepwise takeoff: yields progress, receives `true` to stop, returns the takeoff. */
export type TakeoffSteps = Generator<TakeoffProgress, MaterialsTakeoff, boolean | undefined>;

/** Lays out every part of `result`; `control` sees progress and may stop each layout early. */
export function materialsTakeoff(result: PieceResult, options: TakeoffOptions = {}, control: LayoutControl = {}): MaterialsTakeoff {
  return runLayoutSteps(materialsTakeoffSteps(result, options), control);
}

/**
 * The same run as {@link materialsTakeoff}, one optimiser attempt per step, so a Web Worker can
 * step it in chunks between messages. Passing `true` to `next` stops the run: the layout under
 * way keeps its best so far, and each layout not yet started takes its first attempt only, so
 * every part is still placed or reported.
 */
export function* materialsTakeoffSteps(result: PieceResult, options: TakeoffOptions = {}): TakeoffSteps {
  const solid = new Map<string, { speciesId: string; speciesName: string; quarters: number; parts: PieceResult['parts'][number][] }>();
  const sheet = new Map<string, { sheetName: string; parts: PieceResult['parts'][number][] }>();
  for (const part of result.parts) {
    if (part.material.kind === 'solid') {
      const key = `${part.material.speciesId}:${part.rough.quarters}`;
      const group = solid.get(key) ?? { speciesId: part.material.speciesId, speciesName: part.material.speciesName, quarters: part.rough.quarters, parts: [] };
      group.parts.push(part);
      solid.set(key, group);
    } else {
      const group = sheet.get(part.material.sheetId) ?? { sheetName: part.material.sheetName, parts: [] };
      group.parts.push(part);
      sheet.set(part.material.sheetId, group);
    }
  }
  const kerf = options.kerfMm === undefined ? {} : { kerfMm: options.kerfMm };
  const layouts = solid.size + sheet.size;
  let index = 0;
  let stopped = false;
  // Runs one layout's steps, passing progress up and the stop down.
  function* run<T>(steps: LayoutSteps<T>, label: string): Generator<TakeoffProgress, T, boolean | undefined> {
    let next = steps.next();
    while (!next.done) {
      if (!stopped) stopped = (yield { ...next.value, layout: index, layouts, label }) === true;
      next = steps.next(stopped);
    }
    index++;
    return next.value;
  }

  const boards: BoardTakeoff[] = [];
  for (const g of solid.values()) {
    const stock = options.boardStock?.(g.speciesId, g.quarters) ?? DEFAULT_BOARD_SIZES;
    const widest = Math.max(...stock.map((s) => s.widthMm));
    const inputs = g.parts.flatMap((p) => boardPartsFor(p, widest));
    const boardOptions = { stock, quarters: g.quarters, ...kerf, ...(options.boardAttempts === undefined ? {} : { attempts: options.boardAttempts }) };
    const layout = yield* run(boardLayoutSteps(inputs, boardOptions), `${g.speciesName} ${g.quarters}/4`);
    boards.push({ speciesId: g.speciesId, speciesName: g.speciesName, quarters: g.quarters, layout });
  }
  const sheets: SheetTakeoff[] = [];
  for (const [sheetId, g] of sheet.entries()) {
    const stock = options.sheetStock?.(sheetId) ?? [STANDARD_SHEET];
    const sheetOptions = { stock, ...kerf, ...(options.trimMm === undefined ? {} : { trimMm: options.trimMm }), ...(options.sheetAttempts === undefined ? {} : { attempts: options.sheetAttempts }) };
    const layout = yield* run(sheetLayoutSteps(g.parts.map(sheetPartFor), sheetOptions), g.sheetName);
    sheets.push({ sheetId, sheetName: g.sheetName, layout });
  }
  return {
    boards,
    sheets,
    boardFeetBought: boards.reduce((s, b) => s + b.layout.boardFeetBought, 0),
    boardFeetFinished: boards.reduce((s, b) => s + b.layout.boardFeetFinished, 0),
    sheetsBought: sheets.reduce((s, b) => s + b.layout.sheetsBought, 0),
    cancelled: boards.some((b) => b.layout.cancelled) || sheets.some((s) => s.layout.cancelled),
  };
}
