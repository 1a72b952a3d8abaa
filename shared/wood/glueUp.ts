/**
 * Glue-up of a solid panel from boards: how many boards of at most a given width make the
 * panel, their widths, and how the glued panel moves. A glued panel moves as one board of its
 * full width (WH2010 Eq. 13-2 is linear in width), so narrower boards do not reduce movement;
 * they limit cupping and let the grain be matched.
 */
import { InputError } from '../errors.ts';
import { dual, type DualLength } from '../units/dual.ts';
import type { Climate } from './climate.ts';
import { checkWidth, seasonalSwing, type Sawn, type SeasonalSwing } from './movement.ts';
import type { SpeciesInput } from './resolve.ts';

/** How the widths are shared: all equal, or the widest boards in the middle. */
export type GlueUpArrangement = 'equal' | 'widest-middle';

/** Inputs for {@link planGlueUp}. */
export interface GlueUpInput {
  /** Finished panel width across the grain, mm. */
  panelWidthMm: number;
  /** Widest board to use, finished, mm. */
  maxBoardWidthMm: number;
  arrangement: GlueUpArrangement;
  species: SpeciesInput;
  sawn: Sawn;
  climate: Climate;
}

/** A glue-up plan. */
export interface GlueUpPlan {
  boardCount: number;
  /** Finished width of each board, edge to edge across the panel, mm. */
  boardWidthsMm: number[];
  boardWidths: DualLength[];
  arrangement: GlueUpArrangement;
  /** Seasonal movement of the whole panel. */
  movement: SeasonalSwing;
  note: string;
}

/**
 * Plans a panel `panelWidthMm` wide from boards no wider than `maxBoardWidthMm`: the fewest
 * boards, equal widths or the widest in the middle, and the panel's seasonal movement.
 */
export function planGlueUp(input: GlueUpInput): GlueUpPlan {
  const boardWidthsMm = glueUpBoardWidthsMm(input);
  const movement = seasonalSwing({ widthMm: input.panelWidthMm, species: input.species, sawn: input.sawn, climate: input.climate });
  return {
    boardCount: boardWidthsMm.length,
    boardWidthsMm,
    boardWidths: boardWidthsMm.map((width) => dual(width)),
    arrangement: input.arrangement,
    movement,
    note: 'Widths are finished sizes; add jointing and ripping allowance to each board. The panel moves as one board of its full width.',
  };
}

/**
 * Finished board widths (mm) of a {@link planGlueUp} plan, edge to edge across the panel,
 * without its movement or display text: what the engine reads on every rebuild.
 */
export function glueUpBoardWidthsMm(input: Pick<GlueUpInput, 'panelWidthMm' | 'maxBoardWidthMm' | 'arrangement'>): number[] {
  checkWidth(input.panelWidthMm, 'panelWidthMm');
  checkWidth(input.maxBoardWidthMm, 'maxBoardWidthMm');
  if (input.arrangement !== 'equal' && input.arrangement !== 'widest-middle') {
    throw new InputError('arrangement', `must be equal or widest-middle (got "${String(input.arrangement)}")`, 'equal, widest-middle');
  }
  const boardCount = Math.max(1, boardsFor(input.panelWidthMm / input.maxBoardWidthMm));
  return input.arrangement === 'equal'
    ? new Array<number>(boardCount).fill(input.panelWidthMm / boardCount)
    : widestInMiddle(input.panelWidthMm, input.maxBoardWidthMm, boardCount);
}

// Rounding to 9 places keeps 300 / 100 from counting as 3.0000000001 boards. Only a ratio
// within a millionth above a whole number can round down across it, so the text round trip of
// toFixed is spent on those alone.
function boardsFor(ratio: number): number {
  return ratio - Math.floor(ratio) > 1e-6 ? Math.ceil(ratio) : Math.ceil(Number(ratio.toFixed(9)));
}

// The middle board (or middle two, for an even count) takes the full board width; the others
// share the rest equally. With the fewest boards the others never exceed the full width.
function widestInMiddle(panelWidthMm: number, maxBoardWidthMm: number, count: number): number[] {
  if (count <= 2) return new Array<number>(count).fill(panelWidthMm / count);
  const middleCount = count % 2 === 1 ? 1 : 2;
  const otherWidth = (panelWidthMm - middleCount * maxBoardWidthMm) / (count - middleCount);
  const sideCount = (count - middleCount) / 2;
  return new Array<number>(count).fill(otherWidth).fill(maxBoardWidthMm, sideCount, sideCount + middleCount);
}
