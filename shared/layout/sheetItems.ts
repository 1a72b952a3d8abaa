/**
 * Part instances as the sheet optimiser handles them: one entry per piece to cut, with the
 * orientations its face grain allows.
 */
import type { FaceGrain, SheetPartInput } from './sheetTypes.ts';

/** One piece to cut: a part instance, its size in mm and the orientations allowed. */
export interface SheetItem {
  /** Position in the optimiser's item list. */
  index: number;
  partId: string;
  name: string;
  instance: number;
  lengthMm: number;
  widthMm: number;
  /** `false` lays the part's length along the sheet's length; `true` turns it across. */
  orientations: readonly boolean[];
}

/** The orientations a part's face grain allows; a square part needs only one. */
export function orientationsFor(grain: FaceGrain, lengthMm: number, widthMm: number): readonly boolean[] {
  if (grain === 'length') return [false];
  if (grain === 'width') return [true];
  return lengthMm === widthMm ? [false] : [false, true];
}

/** One item per instance of every part, in input order. */
export function expandSheetParts(parts: readonly SheetPartInput[]): SheetItem[] {
  const items: SheetItem[] = [];
  for (const part of parts) {
    for (let instance = 0; instance < part.quantity; instance++) {
      items.push({
        index: items.length,
        partId: part.id,
        name: part.name,
        instance,
        lengthMm: part.lengthMm,
        widthMm: part.widthMm,
        orientations: orientationsFor(part.grain, part.lengthMm, part.widthMm),
      });
    }
  }
  return items;
}

/** True when `item` fits a usable area of `length` × `width` mm in an allowed orientation. */
export function itemFits(item: SheetItem, length: number, width: number): boolean {
  return item.orientations.some((rotated) =>
    rotated ? item.widthMm <= length && item.lengthMm <= width : item.lengthMm <= length && item.widthMm <= width,
  );
}
