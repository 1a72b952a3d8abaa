/**
 * Turns the best packing attempt into the plain {@link SheetLayout} that tables, drawings and
 * the command line read: sheet coordinates with the trim added, yields and unplaced parts.
 */
import { cutsOf } from './guillotineSheet.ts';
import type { PackedSheet, PackingAttempt } from './sheetPacking.ts';
import type { SheetItem } from './sheetItems.ts';
import { sizeText } from './sizeText.ts';
import type { SheetPlan, SheetStock, UnplacedPart } from './sheetTypes.ts';

/** One packed sheet as a {@link SheetPlan}; coordinates shifted by `trimMm`. */
export function sheetPlanOf(packed: PackedSheet, stock: SheetStock, trimMm: number): SheetPlan {
  const parts = packed.sheet.placements.map((p, i) => {
    const item = packed.items[i] as SheetItem;
    return {
      partId: item.partId,
      name: item.name,
      instance: item.instance,
      x: p.x + trimMm,
      y: p.y + trimMm,
      length: p.length,
      width: p.width,
      rotated: p.rotated,
    };
  });
  const cuts = cutsOf(packed.sheet.placements, packed.sheet.kerf).map((c) => ({ axis: c.axis, atMm: c.atMm + trimMm, fromMm: c.fromMm + trimMm, toMm: c.toMm + trimMm }));
  return {
    stockId: stock.id,
    stockName: stock.name,
    offcut: stock.offcut,
    lengthMm: stock.lengthMm,
    widthMm: stock.widthMm,
    trimMm,
    parts,
    cuts,
    yield: packed.sheet.partArea() / (stock.lengthMm * stock.widthMm),
  };
}

/** An item that fits no sheet at all, reported with its size. */
export function tooLargeForSheets(item: SheetItem): UnplacedPart {
  return {
    partId: item.partId,
    name: item.name,
    instance: item.instance,
    lengthMm: item.lengthMm,
    widthMm: item.widthMm,
    reason: 'larger-than-stock',
    message: `${item.name} (${sizeText(item.lengthMm, item.widthMm)}) is larger than every sheet less its trim, in every orientation its grain allows`,
  };
}

/** An item that would fit a sheet, but every sheet of that size is used. */
export function outOfSheets(item: SheetItem): UnplacedPart {
  return {
    partId: item.partId,
    name: item.name,
    instance: item.instance,
    lengthMm: item.lengthMm,
    widthMm: item.widthMm,
    reason: 'out-of-stock',
    message: `${item.name} (${sizeText(item.lengthMm, item.widthMm)}) fits only stock that is used up; add a sheet size for sale`,
  };
}

/** Sheets bought, offcut area used and how evenly full the sheets are: the attempt's score. */
export function attemptScore(attempt: PackingAttempt, stock: readonly SheetStock[]): readonly number[] {
  let bought = 0;
  let offcutArea = 0;
  let fillSquares = 0;
  for (const packed of attempt.sheets) {
    const s = stock[packed.stockIndex] as SheetStock;
    const area = s.lengthMm * s.widthMm;
    if (s.offcut) offcutArea += area;
    else bought++;
    const fill = packed.sheet.partArea() / area;
    fillSquares += fill * fill;
  }
  // Fuller sheets and one nearly empty last sheet leave the largest usable offcut.
  return [attempt.unplaced.length, bought, offcutArea, -fillSquares];
}

/** True when score `a` is strictly better (lexicographically lower) than `b`. */
export function betterScore(a: readonly number[], b: readonly number[]): boolean {
  for (let i = 0; i < a.length; i++) {
    const x = a[i] as number;
    const y = b[i] as number;
    if (Math.abs(x - y) > 1e-12) return x < y;
  }
  return false;
}
