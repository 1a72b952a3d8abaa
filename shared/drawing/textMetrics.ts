/**
 * Text sizes on paper. Dimensions are set in a monospaced face, so a text's width is its length
 * times one advance: JetBrains Mono's advance is 600 of 1000 units per em. Sans widths are
 * estimated at the same advance, which is wider than Helvetica's average and so errs on room.
 */

/** Millimetres per typographic point (1 pt = 1/72 in). */
export const MM_PER_PT = 25.4 / 72;
/** Advance width of one character as a fraction of the font size (JetBrains Mono: 600/1000). */
export const MONO_ADVANCE = 0.6;
/** Cap height as a fraction of the font size (about 0.73 for JetBrains Mono). */
export const CAP_HEIGHT = 0.73;

/** Font size of dimension texts, pt: about 2 mm capitals, readable on a shop print. */
export const DIM_TEXT_PT = 7.5;
/** Font size of view titles, pt. */
export const VIEW_TITLE_PT = 9;

/** Width of `text` set at `sizePt`, mm. */
export function textWidthMm(text: string, sizePt: number): number {
  return text.length * MONO_ADVANCE * sizePt * MM_PER_PT;
}

/** Height of capitals at `sizePt`, mm. */
export function capHeightMm(sizePt: number): number {
  return CAP_HEIGHT * sizePt * MM_PER_PT;
}
