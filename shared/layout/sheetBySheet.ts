/**
 * Sheet-by-sheet packing with a choice at every sheet: fill the next sheet several ways
 * (different item orders and rules) and keep the fill that covers the most area, then go on
 * with the items left. Greedy on each sheet's use, the usual idea of sequential heuristics for
 * cutting stock; it often saves a sheet where item-by-item rules spread large parts thinly.
 */
import { GuillotineSheet } from './guillotineSheet.ts';
import { itemFits, type SheetItem } from './sheetItems.ts';
import type { PackedSheet, PackingAttempt, PackingRules, PackingStock } from './sheetPacking.ts';

/** One way to fill a single sheet: an item order and the rules (first-fit down the order, or best fit). */
export interface SheetFill {
  order: readonly SheetItem[];
  rules: PackingRules;
}

/**
 * Fills `stock` sheets one at a time with the best of `fills`; every fill orders all `items`.
 * A fill's value is Σ (part area)^`power`: a power above 1 favours fills that take the large
 * parts early, before they are left to sheets of their own.
 */
export function packSheetBySheet(items: readonly SheetItem[], stock: readonly PackingStock[], kerf: number, fills: readonly SheetFill[], power = 1): PackingAttempt {
  // Items are marked by their own index, which is unique among the optimiser's items.
  const placed = new Uint8Array(items.reduce((most, item) => Math.max(most, item.index), 0) + 1);
  const left = stock.map((s) => s.count);
  const sheets: PackedSheet[] = [];
  const unplaced: SheetItem[] = [];
  let remaining = items.length;

  while (remaining > 0) {
    const first = items.find((item) => placed[item.index] === 0) as SheetItem;
    const s = stock.find((candidate, i) => left[i] !== 0 && itemFits(first, candidate.usableLength, candidate.usableWidth));
    if (!s) {
      placed[first.index] = 1;
      unplaced.push(first);
      remaining--;
      continue;
    }
    let best: PackedSheet | null = null;
    let bestArea = -1;
    for (const fill of fills) {
      const packed = fillOne(fill, s, kerf, placed);
      let area = 0;
      for (const item of packed.items) area += (item.lengthMm * item.widthMm) ** power;
      if (area > bestArea) {
        best = packed;
        bestArea = area;
      }
    }
    if (best === null || best.items.length === 0) {
      // The first remaining item fits this stock, so a fill that places nothing is a bug.
      throw new Error('Assertion failed: a sheet fill placed no item');
    }
    const count = left[s.stockIndex];
    if (count !== null && count !== undefined) left[s.stockIndex] = count - 1;
    for (const item of best.items) placed[item.index] = 1;
    remaining -= best.items.length;
    sheets.push(best);
  }
  return { sheets, unplaced };
}

function fillOne(fill: SheetFill, s: PackingStock, kerf: number, placed: Uint8Array): PackedSheet {
  const packed: PackedSheet = { stockIndex: s.stockIndex, sheet: new GuillotineSheet(s.usableLength, s.usableWidth, kerf), items: [] };
  const { fit: rule, split } = fill.rules;
  if (fill.rules.mode !== 'fill-sheet') {
    for (const item of fill.order) {
      if (placed[item.index] !== 0) continue;
      const fit = packed.sheet.findFit(item.lengthMm, item.widthMm, item.orientations, rule);
      if (fit === null) continue;
      packed.sheet.place(item.lengthMm, item.widthMm, fit, split);
      packed.items.push(item);
    }
    return packed;
  }
  const candidates = fill.order.filter((item) => placed[item.index] === 0);
  for (;;) {
    let bestAt = -1;
    let bestFit = null;
    for (let i = 0; i < candidates.length; i++) {
      const item = candidates[i] as SheetItem;
      const fit = packed.sheet.findFit(item.lengthMm, item.widthMm, item.orientations, rule);
      if (fit !== null && (bestFit === null || fit.score < bestFit.score || (fit.score === bestFit.score && fit.tie < bestFit.tie))) {
        bestAt = i;
        bestFit = fit;
      }
    }
    if (bestFit === null) return packed;
    const item = candidates[bestAt] as SheetItem;
    packed.sheet.place(item.lengthMm, item.widthMm, bestFit, split);
    packed.items.push(item);
    candidates.splice(bestAt, 1);
  }
}
