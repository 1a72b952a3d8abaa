/**
 * Plain data in and out of the sheet layout. Sizes are in mm. On a sheet, x runs along its
 * length (the way its face grain runs, on plywood) and y across its width, from the corner
 * before trimming; a drawing can place every part and saw cut to scale from these numbers.
 */
import type { Rect } from './rect.ts';

/**
 * Which of a part's axes its face grain must follow: `length` lays the part's length along the
 * sheet's length, `width` lays its width along it, `none` lets the optimiser turn it either way
 * (MDF, hidden parts).
 */
export type FaceGrain = 'length' | 'width' | 'none';

/** A part to cut from sheets: finished length × width, mm, with its quantity. */
export interface SheetPartInput {
  id: string;
  /** The cut-list name a drawing labels the part with. */
  name: string;
  lengthMm: number;
  widthMm: number;
  quantity: number;
  grain: FaceGrain;
}

/** A sheet size in stock or for sale. */
export interface SheetStock {
  id: string;
  name: string;
  /** Length along the face grain, mm. */
  lengthMm: number;
  widthMm: number;
  /** How many there are; null for sheets bought as needed. */
  count: number | null;
  /** True for an offcut already in the workshop: used before sheets are bought. */
  offcut: boolean;
}

/** One part instance on a sheet; `x`, `y` include the edge trim. */
export interface PlacedSheetPart extends Rect {
  partId: string;
  name: string;
  /** 0-based among the part's quantity. */
  instance: number;
  /** True when the part's length runs across the sheet (along y). */
  rotated: boolean;
}

/**
 * One straight saw cut from edge to edge of the piece it divides, in the order the saw makes
 * them. The line runs from `from` to `to` (one coordinate is shared); the kerf lies on the side
 * of higher coordinates.
 */
export interface SawCut {
  axis: 'x' | 'y';
  /** Where the line crosses its axis: x for a cut along y (`axis: 'x'`), y otherwise. */
  atMm: number;
  /** The cut's extent along the other axis. */
  fromMm: number;
  toMm: number;
}

/** One sheet of the layout with its parts and cuts. */
export interface SheetPlan {
  stockId: string;
  stockName: string;
  offcut: boolean;
  lengthMm: number;
  widthMm: number;
  trimMm: number;
  parts: PlacedSheetPart[];
  cuts: SawCut[];
  /** Part area / sheet area. */
  yield: number;
}

/** A part instance the layout could not place, and why. */
export interface UnplacedPart {
  partId: string;
  name: string;
  instance: number;
  lengthMm: number;
  widthMm: number;
  reason: 'larger-than-stock' | 'out-of-stock' | 'group-too-large';
  /** The reason in a maker's words, with sizes. */
  message: string;
}

/** Options of {@link layoutSheets}. */
export interface SheetLayoutOptions {
  /** Offcuts and sheets for sale, used in this order; default one 48 × 96 in sheet bought as needed. */
  stock?: readonly SheetStock[];
  /** Saw kerf, mm; default 1/8 in. */
  kerfMm?: number;
  /** Trim taken off every edge of a sheet first (factory edges are often dented), mm; default 1/4 in. */
  trimMm?: number;
  /** Number of orderings and rules to try; more finds better layouts, slower. Default 60. */
  attempts?: number;
  /** Seed of the random restarts, so a layout repeats. */
  seed?: number;
}

/** The sheet layout of one sheet good. */
export interface SheetLayout {
  sheets: SheetPlan[];
  unplaced: UnplacedPart[];
  /** New sheets bought (offcuts not counted). */
  sheetsBought: number;
  offcutsUsed: number;
  /**
   * Area lower bound L0 = ⌈Σ part area / usable sheet area⌉ (Martello & Vigo 1998) for the
   * first sheet size for sale, usable meaning inside the trim; no layout can use fewer.
   */
  lowerBound: number;
  /** Part area / area of the sheets used. */
  yield: number;
  kerfMm: number;
  trimMm: number;
  attemptsRun: number;
  /** True when the run was stopped early; the layout is the best found so far. */
  cancelled: boolean;
}
