/**
 * Room fit writes its messages in millimetres (the engine's one unit). Shown to a maker who
 * reads inches, each `<number> mm` in a message becomes a length in their unit, so a fix such
 * as "stand the piece 26 mm further out" reads `1"` with the rest of the editor.
 */

const MM_IN_TEXT = /(-?\d+(?:\.\d+)?) mm\b/g;
// The room schema's own limit messages end with the value typed, in mm, with no unit: "(got 250)".
const GOT_MM = /\(got (-?\d+(?:\.\d+)?)\)/g;

/** `text` with every millimetre length written by `length` (the maker's unit and precision). */
export function lengthsInUserUnits(text: string, length: (mm: number) => string): string {
  return text.replace(MM_IN_TEXT, (_, n: string) => length(Number(n))).replace(GOT_MM, (_, n: string) => `(got ${length(Number(n))})`);
}
