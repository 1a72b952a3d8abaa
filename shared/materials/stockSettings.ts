/**
 * What a workshop cuts from, as plain data a form edits and a Web Worker receives: the sheet
 * size for sale, offcuts kept in stock, board lengths and widths for sale, boards in stock with
 * their defects, the saw's kerf, the edge trim, and how hard the optimiser tries. Turned into
 * the takeoff's options by {@link takeoffOptionsFor}, which checks every value first.
 */
import { InputError } from '../errors.ts';
import type { BoardDefect, BoardStock } from '../layout/boardTypes.ts';
import { DEFAULT_BOARD_SIZES } from '../layout/boardInput.ts';
import { DEFAULT_KERF_MM, DEFAULT_TRIM_MM, STANDARD_SHEET } from '../layout/sheetInput.ts';
import type { SheetStock } from '../layout/sheetTypes.ts';
import { MM_PER_INCH } from '../units/length.ts';
import type { TakeoffOptions } from './takeoff.ts';

/** An offcut of one sheet good kept in the workshop, mm. */
export interface OffcutStock {
  sheetId: string;
  lengthMm: number;
  widthMm: number;
  count: number;
}

/** Boards of one species and thickness already in the workshop, mm, with knots or checks to cut around. */
export interface BoardInStock {
  speciesId: string;
  quarters: number;
  lengthMm: number;
  widthMm: number;
  count: number;
  defects: BoardDefect[];
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
  boardsInStock: BoardInStock[];
  kerfMm: number;
  trimMm: number;
  effort: LayoutEffort;
}

/** The defaults: 48 × 96 in sheets, 6 and 8 ft boards 4, 6 and 8 in wide, 1/8 in kerf, 1/4 in trim. */
export const DEFAULT_STOCK_SETTINGS: StockSettings = {
  sheetLengthMm: STANDARD_SHEET.lengthMm,
  sheetWidthMm: STANDARD_SHEET.widthMm,
  offcuts: [],
  boardLengthsMm: [...new Set(DEFAULT_BOARD_SIZES.map((b) => b.lengthMm))],
  boardWidthsMm: [...new Set(DEFAULT_BOARD_SIZES.map((b) => b.widthMm))],
  boardsInStock: [],
  kerfMm: DEFAULT_KERF_MM,
  trimMm: DEFAULT_TRIM_MM,
  effort: 'standard',
};

const inches = (mm: number) => Number((mm / MM_PER_INCH).toFixed(3));

/** The takeoff options for `settings`; throws an {@link InputError} naming the first bad field. */
export function takeoffOptionsFor(settings: StockSettings): TakeoffOptions {
  if (settings.boardLengthsMm.length === 0) throw new InputError('boardLengthsMm', 'needs at least one board length for sale', 'one or more lengths');
  if (settings.boardWidthsMm.length === 0) throw new InputError('boardWidthsMm', 'needs at least one board width for sale', 'one or more widths');
  const attempts = EFFORT_ATTEMPTS[settings.effort];
  if (!attempts) throw new InputError('effort', `must be quick, standard or thorough (got ${String(settings.effort)})`, 'quick, standard or thorough');
  const sale: SheetStock = {
    id: 'sheet-for-sale',
    name: `Sheet ${inches(Math.min(settings.sheetLengthMm, settings.sheetWidthMm))} × ${inches(Math.max(settings.sheetLengthMm, settings.sheetWidthMm))} in`,
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
  return {
    kerfMm: settings.kerfMm,
    trimMm: settings.trimMm,
    sheetAttempts: attempts.sheet,
    boardAttempts: attempts.board,
    sheetStock: (sheetId) => [
      ...settings.offcuts
        .filter((o) => o.sheetId === sheetId)
        .map((o, i) => ({ id: `offcut-${i + 1}`, name: `Offcut ${inches(o.widthMm)} × ${inches(o.lengthMm)} in`, lengthMm: o.lengthMm, widthMm: o.widthMm, count: o.count, offcut: true })),
      sale,
    ],
    boardStock: (speciesId, quarters) => [
      ...settings.boardsInStock
        .filter((b) => b.speciesId === speciesId && b.quarters === quarters)
        .map((b, i) => ({ id: `stock-${i + 1}`, name: `Board in stock ${inches(b.lengthMm)} × ${inches(b.widthMm)} in`, lengthMm: b.lengthMm, widthMm: b.widthMm, count: b.count, inStock: true, defects: b.defects })),
      ...forSale,
    ],
  };
}
