/**
 * The front of a case as a grid: rows of openings (top row first) and columns in each row,
 * either in a face frame (openings between its stiles, rails and mullions) or frameless (cells
 * that divide the carcass front), and the doors or drawer fronts that close them: inset in the
 * opening with a reveal all round, overlaid on the frame by an overlay amount, or, frameless,
 * covering the carcass edges with an even gap between fronts.
 */
import { assert } from '../../assert.ts';
import type { GrainMatch } from '../types.ts';

/** How fronts sit: inside the openings or over the frame. */
export type FrontMount = 'inset' | 'overlay';

/** A face frame's member widths (mm). */
export interface FrameWidths {
  stileMm: number;
  topRailMm: number;
  bottomRailMm: number;
  midRailMm: number;
  mullionMm: number;
}

/** Options for {@link frontGrid}; world X and Z in mm. */
export interface FrontGridOptions {
  x: readonly [number, number];
  /** Height range of the carcass front (or face frame). */
  z: readonly [number, number];
  frame: FrameWidths | null;
  /** Row heights, top row first: openings (with a frame) or cells (frameless). Sum: {@link availableHeight}. */
  rowHeightsMm: readonly number[];
  columns: number;
  /** Fronts per opening: 1, or 2 for a pair of doors. */
  leaves: 1 | 2;
  mount: FrontMount;
  /** Inset: gap all round each front. */
  revealMm: number;
  /** Overlay on a face frame: how far a front laps the frame at each edge. */
  overlayMm: number;
  /** Between the two leaves of a pair, and (frameless) between neighbouring fronts. */
  gapMm: number;
  /** Front thickness, for its place in Y. */
  frontThicknessMm: number;
}

/** One front (a door leaf or a drawer front), world ranges in mm. */
export interface FrontBox {
  row: number;
  col: number;
  /** 0 for a single front or the left leaf of a pair, 1 for the right leaf. */
  leaf: number;
  x: [number, number];
  z: [number, number];
  y: [number, number];
  /** The side a door leaf hangs on. */
  hinge: 'left' | 'right';
}

/** One opening of the grid and its fronts. */
export interface GridCell {
  row: number;
  col: number;
  /** The frame opening, or (frameless) the cell. */
  x: [number, number];
  z: [number, number];
  fronts: FrontBox[];
}

/** The grid: rows and columns in world terms, and the cells with their fronts. */
export interface FrontGrid {
  rows: [number, number][];
  columns: [number, number][];
  cells: GridCell[];
  /** Centres of the column boundaries (mullion or divider centres), world X. */
  columnBoundariesX: number[];
}

/** Height the rows share: the frame's inside height less its rails, or the whole front frameless (mm). */
export function availableHeight(z: readonly [number, number], rows: number, frame: FrameWidths | null): number {
  const h = z[1] - z[0];
  return frame ? h - frame.topRailMm - frame.bottomRailMm - (rows - 1) * frame.midRailMm : h;
}

/** Width each column gets (mm). */
export function columnWidth(x: readonly [number, number], columns: number, frame: FrameWidths | null): number {
  const w = x[1] - x[0];
  return frame ? (w - 2 * frame.stileMm - (columns - 1) * frame.mullionMm) / columns : w / columns;
}

/** Lays out the openings and fronts. */
export function frontGrid(o: FrontGridOptions): FrontGrid {
  assert(o.rowHeightsMm.length >= 1 && o.columns >= 1, 'a front grid has at least one row and one column');
  const f = o.frame;
  const colW = columnWidth(o.x, o.columns, f);
  const columns: [number, number][] = Array.from({ length: o.columns }, (_, c) => {
    const a = o.x[0] + (f ? f.stileMm + c * (colW + f.mullionMm) : c * colW);
    return [a, a + colW];
  });
  const rows: [number, number][] = [];
  let top = o.z[1] - (f ? f.topRailMm : 0);
  o.rowHeightsMm.forEach((h, i) => {
    rows.push([top - h, top]);
    top -= h + (f && i < o.rowHeightsMm.length - 1 ? f.midRailMm : 0);
  });
  const y: [number, number] = o.mount === 'inset' ? [0, o.frontThicknessMm] : [-o.frontThicknessMm, 0];
  // How far a front reaches past its opening at each edge: negative when inset.
  const reach = !f ? -o.gapMm / 2 : o.mount === 'inset' ? -o.revealMm : o.overlayMm;
  const cells: GridCell[] = [];
  rows.forEach((rz, r) => columns.forEach((cx, c) => {
    const x: [number, number] = [cx[0] - reach, cx[1] + reach];
    const z: [number, number] = [rz[0] - reach, rz[1] + reach];
    const fronts: FrontBox[] = o.leaves === 1
      ? [{ row: r, col: c, leaf: 0, x, z, y, hinge: c < o.columns / 2 || o.columns === 1 ? 'left' : 'right' }]
      : [
        { row: r, col: c, leaf: 0, x: [x[0], (x[0] + x[1]) / 2 - o.gapMm / 2], z, y, hinge: 'left' },
        { row: r, col: c, leaf: 1, x: [(x[0] + x[1]) / 2 + o.gapMm / 2, x[1]], z, y, hinge: 'right' },
      ];
    cells.push({ row: r, col: c, x: [cx[0], cx[1]], z: [rz[0], rz[1]], fronts });
  }));
  const columnBoundariesX = columns.slice(1).map((col, c) => (columns[c]![1] + col[0]) / 2);
  return { rows, columns, cells, columnBoundariesX };
}

/**
 * The grain-match run of a solid drawer front: each column of the bank is cut top to bottom from
 * one board, so the figure runs on from drawer to drawer (common practice, no published source).
 * `columns` is the bank's column count, for the run's name.
 */
export function frontGrainMatch(front: Pick<FrontBox, 'row' | 'col'>, columns: number): GrainMatch {
  return {
    group: `drawer-fronts-column-${front.col + 1}`,
    order: front.row + 1,
    note: columns > 1 ? `drawer fronts, column ${front.col + 1}` : 'drawer fronts',
  };
}
