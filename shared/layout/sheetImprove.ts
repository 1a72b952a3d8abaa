/**
 * A local search after the constructive attempts: take the emptiest sheet and try to move each
 * of its parts onto another sheet, repacking that sheet from scratch with the part added. When
 * the emptiest sheet ends up empty, a sheet is saved; then the search starts again. The idea is
 * the usual one of emptying the weakest bin (for 2D bin packing see Lodi, Martello & Vigo
 * 1999, whose tabu search also aims at the weakest bin).
 */
import { GuillotineSheet } from './guillotineSheet.ts';
import { packSheetBySheet, type SheetFill } from './sheetBySheet.ts';
import type { SheetItem } from './sheetItems.ts';
import type { PackedSheet, PackingAttempt, PackingStock } from './sheetPacking.ts';

type Order = (items: readonly SheetItem[]) => SheetItem[];

const ORDERS: readonly Order[] = [
  (items) => items.slice().sort((a, b) => b.lengthMm * b.widthMm - a.lengthMm * a.widthMm),
  (items) => items.slice().sort((a, b) => Math.max(b.lengthMm, b.widthMm) - Math.max(a.lengthMm, a.widthMm)),
  (items) => items.slice().sort((a, b) => b.lengthMm - a.lengthMm || b.widthMm - a.widthMm),
  (items) => items.slice().sort((a, b) => b.widthMm - a.widthMm || b.lengthMm - a.lengthMm),
];

/** Repacks `items` onto one sheet of `stock` by any of `rules`, or null when none fits them all. */
export function packOneSheet(items: readonly SheetItem[], stock: PackingStock, kerf: number, rules: readonly SheetFill['rules'][]): PackedSheet | null {
  for (const order of ORDERS) {
    const ordered = order(items);
    for (const rule of rules) {
      const sheet = new GuillotineSheet(stock.usableLength, stock.usableWidth, kerf);
      let all = true;
      for (const item of ordered) {
        const fit = sheet.findFit(item.lengthMm, item.widthMm, item.orientations, rule.fit);
        if (fit === null) {
          all = false;
          break;
        }
        sheet.place(item.lengthMm, item.widthMm, fit, rule.split);
      }
      if (all) return { stockIndex: stock.stockIndex, sheet, items: ordered };
    }
  }
  return null;
}

/**
 * Tries to empty sheets of `attempt` one at a time, emptiest first, and returns the improved
 * attempt (the input is not changed). `budget` caps the single-sheet repacks tried.
 */
export function emptyWeakSheets(attempt: PackingAttempt, stock: readonly PackingStock[], kerf: number, rules: readonly SheetFill['rules'][], budget: number): PackingAttempt {
  let sheets = attempt.sheets.slice();
  let tries = 0;
  let improved = true;
  while (improved && sheets.length > 1 && tries < budget) {
    improved = false;
    const byFill = sheets.slice().sort((a, b) => fill(a, stock) - fill(b, stock));
    for (const weak of byFill) {
      const trial = sheets.filter((s) => s !== weak);
      const moving = weak.items.slice().sort((a, b) => b.lengthMm * b.widthMm - a.lengthMm * a.widthMm);
      let emptied = true;
      for (const item of moving) {
        const area = item.lengthMm * item.widthMm;
        let moved = false;
        for (let t = 0; t < trial.length && tries < budget; t++) {
          const target = trial[t] as PackedSheet;
          const s = stock[target.stockIndex] as PackingStock;
          if (s.usableLength * s.usableWidth - target.sheet.partArea() < area) continue;
          tries++;
          const repacked = packOneSheet([...target.items, item], s, kerf, rules);
          if (repacked) {
            trial[t] = repacked;
            moved = true;
            break;
          }
        }
        if (!moved) {
          emptied = false;
          break;
        }
      }
      if (emptied) {
        sheets = trial;
        improved = true;
        break;
      }
    }
  }
  return { sheets, unplaced: attempt.unplaced };
}

/**
 * Repacks the emptiest sheet together with each other sheet in turn, sheet by sheet with the
 * best of `fills`; keeps a repack that needs one sheet, or two of which the fuller is fuller
 * than before (parts drift toward full sheets, which lets {@link emptyWeakSheets} finish the
 * emptiest). Returns the new attempt and whether anything changed.
 */
export function concentrateWeakSheet(
  attempt: PackingAttempt,
  stock: readonly PackingStock[],
  kerf: number,
  fills: readonly SheetFill['rules'][],
): { attempt: PackingAttempt; changed: boolean } {
  const sheets = attempt.sheets;
  const byFill = sheets.slice().sort((a, b) => fill(a, stock) - fill(b, stock));
  const weak = byFill[0];
  if (weak === undefined) return { attempt, changed: false };
  for (const other of byFill.slice(1).reverse()) {
    if (other.stockIndex !== weak.stockIndex) continue;
    const s = stock[weak.stockIndex] as PackingStock;
    const items = [...weak.items, ...other.items];
    const before = Math.max(fill(weak, stock), fill(other, stock));
    const orders = ORDERS.map((order) => order(items));
    const repacked = packSheetBySheet(items, [{ ...s, count: 2 }], kerf, orders.flatMap((order) => fills.map((rules) => ({ order, rules }))));
    if (repacked.unplaced.length > 0 || repacked.sheets.length > 2) continue;
    const after = Math.max(...repacked.sheets.map((p) => fill(p, stock)));
    if (repacked.sheets.length === 1 || after > before + 1e-9) {
      const kept = sheets.filter((p) => p !== weak && p !== other);
      return { attempt: { sheets: [...kept, ...repacked.sheets], unplaced: attempt.unplaced }, changed: true };
    }
  }
  return { attempt, changed: false };
}

function fill(packed: PackedSheet, stock: readonly PackingStock[]): number {
  const s = stock[packed.stockIndex] as PackingStock;
  return packed.sheet.partArea() / (s.usableLength * s.usableWidth);
}
