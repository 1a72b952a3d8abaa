/** Parts longer or wider than the boards and sheets a maker can buy. */
import type { Check, Part } from '../types.ts';
import { both, check } from './check.ts';

/** A full sheet, 48 × 96 in. Common practice, no published source. */
export const SHEET_SIZE_MM = { length: 96 * 25.4, width: 48 * 25.4 } as const;

/** Solid parts longer than the longest board, or wider than the widest; sheet parts larger than a sheet. */
export function stockSizeChecks(parts: readonly Part[], maxBoardLengthMm: number, maxBoardWidthMm: number): Check[] {
  const out: Check[] = [];
  for (const part of parts) {
    if (part.material.kind === 'sheet') {
      const fits = (part.lengthMm <= SHEET_SIZE_MM.length && part.widthMm <= SHEET_SIZE_MM.width) || (part.lengthMm <= SHEET_SIZE_MM.width && part.widthMm <= SHEET_SIZE_MM.length);
      if (!fits) {
        out.push(check({
          id: `larger-than-sheet:${part.id}`, severity: 'error', title: `${part.name} is larger than a sheet`, partIds: [part.id],
          numbers: { lengthMm: part.lengthMm, widthMm: part.widthMm, sheetLengthMm: SHEET_SIZE_MM.length, sheetWidthMm: SHEET_SIZE_MM.width },
          message: `${both(part.lengthMm)} × ${both(part.widthMm)} does not fit on a 48 × 96 in sheet.`,
          fix: 'Make the piece smaller, or join the part from two pieces over a support.',
        }));
      }
      continue;
    }
    if (part.rough.lengthMm > maxBoardLengthMm) {
      out.push(check({
        id: `longer-than-stock:${part.id}`, severity: 'error', title: `${part.name} is longer than your boards`, partIds: [part.id],
        numbers: { roughLengthMm: part.rough.lengthMm, maxBoardLengthMm },
        message: `${part.name} needs ${both(part.rough.lengthMm)} of rough length; the longest board is ${both(maxBoardLengthMm)}.`,
        fix: 'Find longer stock, or make the piece shorter.',
      }));
    }
    if (!part.glueUp && part.rough.widthMm > maxBoardWidthMm) {
      const boards = Math.ceil(part.rough.widthMm / maxBoardWidthMm);
      out.push(check({
        id: `wider-than-stock:${part.id}`, severity: 'caution', title: `${part.name} is wider than your boards`, partIds: [part.id],
        numbers: { roughWidthMm: part.rough.widthMm, maxBoardWidthMm, boards },
        message: `${part.name} needs ${both(part.rough.widthMm)} of rough width; the widest board is ${both(maxBoardWidthMm)}.`,
        fix: `Glue it up from ${boards} boards, matching grain and colour.`,
      }));
    }
  }
  return out;
}
