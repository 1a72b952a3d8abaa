/**
 * What a workshop cuts from, as plain data a form edits, the server stores per workshop and a
 * Web Worker receives: the sheet size for sale, offcuts kept in stock, board lengths and widths
 * for sale, the boards on hand with their knots and checks, the saw's kerf and the edge trim.
 * Turned into the takeoff's options by {@link takeoffOptionsFor}, which checks every value first
 * (`stockSettingsSchema` in shared/schemas/stock.ts).
 *
 * Milling allowances are not here: they are a design's parameters (the engine's rough sizes),
 * so every view of a design agrees on them.
 */
import { InputError } from '../errors.ts';
import type { BoardDefect, BoardStock } from '../layout/boardTypes.ts';
import { DEFAULT_BOARD_SIZES } from '../layout/boardInput.ts';
import { DEFAULT_KERF_MM, DEFAULT_TRIM_MM, STANDARD_SHEET } from '../layout/sheetInput.ts';
import type { SheetStock } from '../layout/sheetTypes.ts';
import { stockProblem } from '../schemas/stock.ts';
import { formatLength } from '../units/format.ts';
import { MM_PER_INCH } from '../units/length.ts';
import type { TakeoffOptions } from './takeoff.ts';

/** An offcut of one sheet good kept in the workshop, mm. */
export interface OffcutStock {
  sheetId: string;
  lengthMm: number;
  widthMm: number;
  count: number;
}

/** What a marked defect is: a knot, a check (a split along the grain), or anything else to cut around. */
export type DefectKind = 'knot' | 'check' | 'other';

/** A defect marked on a board in stock: where it starts from the board's end and edge, and its size, mm. */
export interface StockDefect {
  kind: DefectKind;
  /** From the board's end to the near side of the defect, along the length. */
  fromEndMm: number;
  /** From the board's edge to the near side of the defect, across the width. */
  fromEdgeMm: number;
  /** Its size along the length (with the grain) and across the width. */
  lengthMm: number;
  widthMm: number;
}

/** One board on hand, mm: its species and stock thickness, its size and its defects. */
export interface BoardInStock {
  /** The maker's own mark for the board (chalk on its end), shown on its diagram. */
  label?: string;
  speciesId: string;
  /** Stock thickness in quarters of an inch, 4 for 4/4. */
  quarters: number;
  lengthMm: number;
  widthMm: number;
  defects: StockDefect[];
}

/** How many attempts the optimisers make: quick, the usual, or thorough. */
export type LayoutEffort = 'quick' | 'standard' | 'thorough';

/** Sheet attempts and board orderings per effort. */
export const EFFORT_ATTEMPTS: Readonly<Record<LayoutEffort, { sheet: number; board: number }>> = {
  quick: { sheet: 40, board: 6 },
  standard: { sheet: 200, board: 24 },
  thorough: { sheet: 2000, board: 400 },
};

/** The stock a takeoff draws from; lengths in mm. */
export interface StockSettings {
  /** The sheet size for sale, length along the face grain. */
  sheetLengthMm: number;
  sheetWidthMm: number;
  offcuts: OffcutStock[];
  /** Board lengths and widths for sale: every length in every width. */
  boardLengthsMm: number[];
  boardWidthsMm: number[];
  /** Boards on hand, used before any board is bought. */
  boardsInStock: BoardInStock[];
  kerfMm: number;
  trimMm: number;
}

/** The defaults: 48 × 96 in sheets, 6 and 8 ft boards 4, 6 and 8 in wide, 1/8 in kerf, 1/4 in trim, nothing on hand. */
export const DEFAULT_STOCK_SETTINGS: StockSettings = {
  sheetLengthMm: STANDARD_SHEET.lengthMm,
  sheetWidthMm: STANDARD_SHEET.widthMm,
  offcuts: [],
  boardLengthsMm: [...new Set(DEFAULT_BOARD_SIZES.map((b) => b.lengthMm))],
  boardWidthsMm: [...new Set(DEFAULT_BOARD_SIZES.map((b) => b.widthMm))],
  boardsInStock: [],
  kerfMm: DEFAULT_KERF_MM,
  trimMm: DEFAULT_TRIM_MM,
};

/** What the diagrams call each kind of defect. */
export const DEFECT_NAMES: Readonly<Record<DefectKind, string>> = { knot: 'knot', check: 'check', other: 'defect' };

/** The stock id the takeoff gives the board on hand at `index` of `boardsInStock`, so a page can tell which were used. */
export const stockBoardId = (index: number) => `stock-${index + 1}`;

const inches = (mm: number) => Number((mm / MM_PER_INCH).toFixed(3));

// Settings hold millimetres only, so a size is named in the unit it reads whole in: whole
// inches (48 × 96 in), else whole millimetres (a metric 1220 × 2440 mm sheet), else inches to 1/16.
const SIZE_TOLERANCE = 1e-6;
const whole = (n: number) => Math.abs(n - Math.round(n)) < SIZE_TOLERANCE;

/** Names a sheet or offcut `aMm` × `bMm` (mm) in the unit its sizes read whole in. */
export function sheetSizeName(aMm: number, bMm: number): string {
  if (whole(aMm / MM_PER_INCH) && whole(bMm / MM_PER_INCH)) return `${Math.round(aMm / MM_PER_INCH)} × ${Math.round(bMm / MM_PER_INCH)} in`;
  if (whole(aMm) && whole(bMm)) return `${Math.round(aMm)} × ${Math.round(bMm)} mm`;
  const sixteenths = (mm: number) => formatLength(mm, { unit: 'in', precision: 16 }).replace(/"$/, '');
  return `${sixteenths(aMm)} × ${sixteenths(bMm)} in`;
}

/** The region the board layout cuts around for a marked defect, mm from the board's end and edge. */
export function boardDefectFor(defect: StockDefect): BoardDefect {
  return {
    startMm: defect.fromEndMm,
    endMm: defect.fromEndMm + defect.lengthMm,
    fromEdgeMm: defect.fromEdgeMm,
    toEdgeMm: defect.fromEdgeMm + defect.widthMm,
    note: DEFECT_NAMES[defect.kind],
  };
}

/**
 * The takeoff options for `settings` at `effort`; throws an {@link InputError} naming the first
 * bad field (e.g. `boardsInStock[2].defects[0].lengthMm`) and its limit.
 */
export function takeoffOptionsFor(settings: StockSettings, effort: LayoutEffort = 'standard'): TakeoffOptions {
  const problem = stockProblem(settings);
  if (problem) throw new InputError(problem.field, problem.message, problem.limit);
  const attempts = EFFORT_ATTEMPTS[effort];
  if (!attempts) throw new InputError('effort', `must be quick, standard or thorough (got ${String(effort)})`, 'quick, standard or thorough');
  const sale: SheetStock = {
    id: 'sheet-for-sale',
    name: `Sheet ${sheetSizeName(Math.min(settings.sheetLengthMm, settings.sheetWidthMm), Math.max(settings.sheetLengthMm, settings.sheetWidthMm))}`,
    lengthMm: settings.sheetLengthMm,
    widthMm: settings.sheetWidthMm,
    count: null,
    offcut: false,
  };
  const forSale: BoardStock[] = settings.boardLengthsMm.flatMap((lengthMm) =>
    settings.boardWidthsMm.map((widthMm) => ({
      id: `board-${lengthMm.toFixed(1)}x${widthMm.toFixed(1)}`,
      name: `Board ${inches(lengthMm) % 12 === 0 ? `${inches(lengthMm) / 12} ft` : `${inches(lengthMm)} in`} × ${inches(widthMm)} in`,
      lengthMm,
      widthMm,
      count: null,
      inStock: false,
      defects: [],
    })),
  );
  const onHand: (BoardStock & { speciesId: string; quarters: number })[] = settings.boardsInStock.map((b, i) => {
    const size = `${inches(b.lengthMm)} × ${inches(b.widthMm)} in`;
    const label = b.label?.trim() ?? '';
    return {
      id: stockBoardId(i),
      name: label === '' ? `Board in stock ${size}` : `Board in stock “${label}” ${size}`,
      lengthMm: b.lengthMm,
      widthMm: b.widthMm,
      count: 1,
      inStock: true,
      defects: b.defects.map(boardDefectFor),
      speciesId: b.speciesId,
      quarters: b.quarters,
    };
  });
  return {
    kerfMm: settings.kerfMm,
    trimMm: settings.trimMm,
    sheetAttempts: attempts.sheet,
    boardAttempts: attempts.board,
    sheetStock: (sheetId) => [
      ...settings.offcuts
        .filter((o) => o.sheetId === sheetId)
        .map((o, i) => ({ id: `offcut-${i + 1}`, name: `Offcut ${sheetSizeName(o.widthMm, o.lengthMm)}`, lengthMm: o.lengthMm, widthMm: o.widthMm, count: o.count, offcut: true })),
      sale,
    ],
    boardStock: (speciesId, quarters) => [
      ...onHand.filter((b) => b.speciesId === speciesId && b.quarters === quarters).map(({ speciesId: _s, quarters: _q, ...board }) => board),
      ...forSale,
    ],
  };
}
