/** Test helpers: reading a plan set PDF's text (as `pdftotext -layout` gives it) part by part. */
import type { DrawingUnits } from '../../../../shared/drawing/lengthText.ts';
import { partLetters } from '../../../../shared/drawing/partLetters.ts';
import type { PieceResult } from '../../../../shared/engine/index.ts';
import { definingSizes, writes } from '../../drawing/support/definingSizes.ts';

/**
 * Each defining size of each part that the PDF does not write on the part's pages, as
 * `part name: what (texts)`. A part's pages are every page carrying its drawing heading
 * (`Part B: Side`), so a cut table continued onto the next page is read with its drawing.
 */
export function sizesMissingFromPdf(result: PieceResult, pages: readonly string[], units: DrawingUnits): string[] {
  const letters = partLetters(result);
  return result.parts.flatMap((part) => {
    const heading = `Part ${letters.get(part.id)}: ${part.name}`;
    const text = pages.filter((p) => p.includes(heading)).join('\n');
    return definingSizes(part, units).filter((need) => !need.texts.some((t) => writes(text, t))).map((need) => `${part.name}: ${need.what} (${need.texts.join(' or ')})`);
  });
}
