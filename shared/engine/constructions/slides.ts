/**
 * How a drawer box is sized from its opening for each way of hanging it. The figures are the
 * usual rules of thumb (common practice, from memory, approximate); a slide maker's own
 * instructions govern the slide you buy.
 */

/** How a drawer runs. */
export type SlideType = 'side-mount' | 'undermount' | 'wood-runners';

/** The sizing rule for one kind of slide. */
export interface SlideRule {
  /** Gap each side between the box and the opening (the slide's own thickness), mm. */
  sideClearanceMm: number;
  /** Least total gap above and below the box for the slide to fit and the box to lift out, mm. */
  minVerticalClearanceMm: number;
  /** Slides come in set lengths; wooden runners take any length. */
  lengthsMm: readonly number[] | null;
  /** How the box meets the slide, in words. */
  note: string;
}

const IN = 25.4;
/** Ball-bearing slides are sold in 2 in steps from 10 to 28 in: common practice, no published source. */
const SLIDE_LENGTHS_MM = Array.from({ length: 10 }, (_, i) => (10 + 2 * i) * IN);

/** Sizing rules by slide type. Common practice, from memory, approximate: check your slide's instructions. */
export const SLIDE_RULES: Readonly<Record<SlideType, SlideRule>> = {
  'side-mount': {
    sideClearanceMm: IN / 2,
    minVerticalClearanceMm: IN / 4,
    lengthsMm: SLIDE_LENGTHS_MM,
    note: 'Side-mount ball-bearing slides: 1/2 in each side between box and opening; box as long as the slide.',
  },
  undermount: {
    sideClearanceMm: (3 / 16) * IN,
    minVerticalClearanceMm: (3 / 4) * IN,
    lengthsMm: SLIDE_LENGTHS_MM,
    note: 'Undermount slides: about 3/16 in each side; the bottom is set up 1/2 in in the sides so the slide hides under it; box as long as the slide.',
  },
  'wood-runners': {
    sideClearanceMm: IN / 32,
    minVerticalClearanceMm: IN / 16,
    lengthsMm: null,
    note: 'Wooden runners: 1/32 in each side; the box rides on its sides on runners screwed inside the case, waxed.',
  },
};

/** The longest slide no longer than `availableMm`, or null when even the shortest does not fit; runners take `availableMm`. */
export function slideLengthFor(type: SlideType, availableMm: number): number | null {
  const lengths = SLIDE_RULES[type].lengthsMm;
  if (!lengths) return availableMm;
  const fits = lengths.filter((l) => l <= availableMm + 1e-9);
  return fits.length ? fits[fits.length - 1]! : null;
}
