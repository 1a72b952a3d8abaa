/**
 * Plain data in and out of the board layout. Sizes in mm. On a board, x runs along its length
 * (with the grain) and y across its width, from one end and one edge; solid parts always run
 * with the grain, so they are never turned.
 */
import type { Rect } from './rect.ts';
import type { UnplacedPart } from './sheetTypes.ts';

/** A solid part to cut from boards: finished sizes, and rough sizes when already known. */
export interface BoardPartInput {
  id: string;
  /** The cut-list name a drawing labels the part with. */
  name: string;
  quantity: number;
  /** Finished length (with the grain), width and thickness, mm. */
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  /** Rough length and width; when absent, the milling allowance is added to the finished size. */
  roughLengthMm?: number;
  roughWidthMm?: number;
  /**
   * Parts with the same group id come from one board so their grain and colour match (the
   * boards of a lid, a bank of drawer fronts). Each instance of the part joins the group.
   */
  matchGroup?: string;
  /**
   * A run cut end to end from one board, in order along its length, so the grain runs on from
   * part to part (a column of drawer fronts). Parts at the same order share one crosscut length,
   * ripped side by side (the boards of a glued-up front); every instance of the part joins the
   * run at this order. A part takes `matchGroup` or `grainMatch`, not both.
   */
  grainMatch?: GrainRun;
  /** Number of the part's first instance, for a part split over several inputs; default 0. */
  firstInstance?: number;
}

/** A part's place in a grain-matched run; see {@link BoardPartInput.grainMatch}. */
export interface GrainRun {
  /** Shared by the parts of one run. */
  group: string;
  /** Position along the board, lowest at the board's end; ties keep the input order. */
  order: number;
  /** The run in the maker's words for diagrams and warnings, e.g. `drawer fronts, column 1`. */
  note?: string;
}

/** A knot, check or split to cut around: a region of the board, mm from its end and edge. */
export interface BoardDefect {
  /** From and to along the board's length. */
  startMm: number;
  endMm: number;
  /** From and to across its width; default the whole width. */
  fromEdgeMm?: number;
  toEdgeMm?: number;
  /** What it is, e.g. `loose knot`. */
  note?: string;
}

/** A board size for sale, or a board in the workshop's stock. */
export interface BoardStock {
  id: string;
  name: string;
  lengthMm: number;
  widthMm: number;
  /** How many there are; null for boards bought as needed. */
  count: number | null;
  /** True for a board already in the workshop: used before any is bought. */
  inStock: boolean;
  defects: readonly BoardDefect[];
}

/** Extra length and width left on each part for jointing, planing and squaring the ends, mm. */
export interface MillingAllowance {
  lengthMm: number;
  widthMm: number;
}

/** One part instance on a board; the rectangle is its rough size. */
export interface PlacedBoardPart extends Rect {
  partId: string;
  name: string;
  instance: number;
  matchGroup: string | null;
  /** 1-based place in its grain-matched run along the board; null when not in a run. */
  matchOrder: number | null;
  /** The run in the maker's words, e.g. `drawer fronts, column 1`; null when not in a run. */
  matchLabel: string | null;
  /** Finished length, width and thickness, mm. */
  finished: readonly [number, number, number];
}

/** One board of the layout. */
export interface BoardPlan {
  stockId: string;
  stockName: string;
  inStock: boolean;
  lengthMm: number;
  widthMm: number;
  defects: readonly BoardDefect[];
  parts: PlacedBoardPart[];
  /** Where the saw crosscuts the board into lengths, mm from its end. */
  crosscutsMm: number[];
  boardFeet: number;
  /** Rough part area / board area. */
  yield: number;
}

/** Options of {@link layoutBoards}. */
export interface BoardLayoutOptions {
  /** Boards in stock and sizes for sale; in-stock boards are used first. Default 6 and 8 ft lengths, 4–8 in widths. */
  stock?: readonly BoardStock[];
  /** Stock thickness in quarters of an inch (4 for 4/4), for board feet. Default 4. */
  quarters?: number;
  kerfMm?: number;
  /** Added to finished sizes of parts that give no rough size. Default 1 in and 1/4 in. */
  allowance?: MillingAllowance;
  /** Orderings to try. Default 6. */
  attempts?: number;
}

/** The board layout of one species at one stock thickness. */
export interface BoardLayout {
  boards: BoardPlan[];
  unplaced: UnplacedPart[];
  /** Match groups that would not fit on any one board and were spread over several. */
  splitGroups: string[];
  /** Why each group of `splitGroups` was split, in the same order. */
  splitWarnings: SplitGroupWarning[];
  quarters: number;
  /** Board feet of the boards used (NHLA rules: under 1 in counts as 1 in). */
  boardFeetBought: number;
  /** Board feet of the boards bought (in-stock boards left out). */
  boardFeetToBuy: number;
  /** Board feet of the rough parts at the stock thickness. */
  boardFeetRough: number;
  /** Board feet in the finished parts: their true volume / 144 in³. */
  boardFeetFinished: number;
  kerfMm: number;
  attemptsRun: number;
  cancelled: boolean;
}

/** A grain-match group no board could hold whole, and what it would have needed, mm. */
export interface SplitGroupWarning {
  group: string;
  /** The group in the maker's words (the run's note, or its id). */
  label: string;
  /** A run's length end to end with kerfs and its widest length (or an unordered group's longest and widest part). */
  lengthNeededMm: number;
  widthNeededMm: number;
  /** Starts with `label`, e.g. `drawer fronts, column 1: its 3 parts end to end need one board…`. */
  message: string;
}

