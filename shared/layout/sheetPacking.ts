/**
 * One attempt at packing sheet items: a fixed order of items and fixed rules. The optimiser
 * runs many attempts and keeps the best.
 *
 * Three ways to choose where an item goes, all common in the bin-packing literature:
 * `first-fit` (the first open sheet it fits), `best-fit` (the open sheet where it fits best)
 * and `fill-sheet` (fill one sheet at a time with whichever remaining item fits best, a
 * sheet-oriented rule that often saves a sheet).
 */
import { GuillotineSheet, type FitRule, type SplitRule } from './guillotineSheet.ts';
import { itemFits, type SheetItem } from './sheetItems.ts';

/** The rules of one attempt. */
export interface PackingRules {
  mode: 'first-fit' | 'best-fit' | 'fill-sheet';
  fit: FitRule;
  split: SplitRule;
}

/** A stock sheet as the packer sees it: usable size (inside the trim) and how many there are. */
export interface PackingStock {
  stockIndex: number;
  usableLength: number;
  usableWidth: number;
  /** null: as many as needed. */
  count: number | null;
}

/** A filled sheet of an attempt: which stock it came from, its free space and its items. */
export interface PackedSheet {
  stockIndex: number;
  sheet: GuillotineSheet;
  items: SheetItem[];
}

/** The outcome of one attempt; items that found no stock are left in `unplaced`. */
export interface PackingAttempt {
  sheets: PackedSheet[];
  unplaced: SheetItem[];
}

/** Packs `items` in the given order by `rules` onto `stock` (used in the order given). */
export function packSheets(items: readonly SheetItem[], stock: readonly PackingStock[], kerf: number, rules: PackingRules): PackingAttempt {
  const left = stock.map((s) => s.count);
  const sheets: PackedSheet[] = [];
  const unplaced: SheetItem[] = [];

  const openSheet = (item: SheetItem): PackedSheet | null => {
    const s = stock.find((candidate, i) => left[i] !== 0 && itemFits(item, candidate.usableLength, candidate.usableWidth));
    if (!s) return null;
    const count = left[s.stockIndex];
    if (count !== null && count !== undefined) left[s.stockIndex] = count - 1;
    const packed = { stockIndex: s.stockIndex, sheet: new GuillotineSheet(s.usableLength, s.usableWidth, kerf), items: [] };
    sheets.push(packed);
    return packed;
  };

  if (rules.mode === 'fill-sheet') {
    fillSheetBySheet(items, rules, openSheet, unplaced);
  } else {
    for (const item of items) {
      const target = chooseOpenSheet(sheets, item, rules) ?? openSheet(item);
      if (target === null) unplaced.push(item);
      else placeOn(target, item, rules);
    }
  }
  return { sheets, unplaced };
}

function chooseOpenSheet(sheets: readonly PackedSheet[], item: SheetItem, rules: PackingRules): PackedSheet | null {
  let best: PackedSheet | null = null;
  let bestScore = Infinity;
  for (const packed of sheets) {
    const fit = packed.sheet.findFit(item.lengthMm, item.widthMm, item.orientations, rules.fit);
    if (fit === null) continue;
    if (rules.mode === 'first-fit') return packed;
    if (fit.score < bestScore) {
      best = packed;
      bestScore = fit.score;
    }
  }
  return best;
}

function placeOn(packed: PackedSheet, item: SheetItem, rules: PackingRules): boolean {
  const fit = packed.sheet.findFit(item.lengthMm, item.widthMm, item.orientations, rules.fit);
  if (fit === null) return false;
  packed.sheet.place(item.lengthMm, item.widthMm, fit, rules.split);
  packed.items.push(item);
  return true;
}

function fillSheetBySheet(
  items: readonly SheetItem[],
  rules: PackingRules,
  openSheet: (item: SheetItem) => PackedSheet | null,
  unplaced: SheetItem[],
): void {
  let remaining = items.slice();
  while (remaining.length > 0) {
    const first = remaining[0] as SheetItem;
    const packed = openSheet(first);
    if (packed === null) {
      unplaced.push(first);
      remaining = remaining.slice(1);
      continue;
    }
    placeOn(packed, first, rules);
    remaining = remaining.slice(1);
    for (;;) {
      let bestAt = -1;
      let bestScore = Infinity;
      let bestTie = Infinity;
      for (let i = 0; i < remaining.length; i++) {
        const item = remaining[i] as SheetItem;
        const fit = packed.sheet.findFit(item.lengthMm, item.widthMm, item.orientations, rules.fit);
        if (fit === null) continue;
        // Earlier items in the order win ties, so the order still steers the attempt.
        if (fit.score < bestScore || (fit.score === bestScore && fit.tie < bestTie)) {
          bestAt = i;
          bestScore = fit.score;
          bestTie = fit.tie;
        }
      }
      if (bestAt < 0) break;
      placeOn(packed, remaining[bestAt] as SheetItem, rules);
      remaining.splice(bestAt, 1);
    }
  }
}
