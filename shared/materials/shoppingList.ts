/**
 * The shopping list: what to buy, how many and what it costs. Boards are listed by size (the
 * boards already in stock are left off), sheets by the sheet, then hardware and finish; the
 * list prints as a table and exports as CSV (papaparse).
 */
import Papa from 'papaparse';
import { formatLength } from '../units/format.ts';
import type { CostReport } from './cost.ts';
import { centsText, costCents } from './money.ts';
import type { MaterialsTakeoff } from './takeoff.ts';

/** One line of the shopping list. */
export interface ShoppingRow {
  category: 'lumber' | 'sheet' | 'hardware' | 'finish';
  item: string;
  /** The size to ask for, e.g. `8 ft × 6 in, 4/4`; empty where size does not apply. */
  size: string;
  quantity: number;
  unit: string;
  /** Board feet of the boards on this line; null for anything else. */
  boardFeet: number | null;
  unitPriceCents: number | null;
  costCents: number | null;
}

/** The list and its total (cents) over the rows that have a price. */
export interface ShoppingList {
  currency: string;
  rows: ShoppingRow[];
  totalCents: number;
  /** Rows whose price is missing from the price list. */
  unpriced: number;
}

// Boards are sold by the foot: a whole number of feet reads as `8 ft`, anything else in inches.
const boardLength = (mm: number) => {
  const feet = mm / 25.4 / 12;
  return Math.abs(feet - Math.round(feet)) < 1e-6 ? `${Math.round(feet)} ft` : formatLength(mm, { unit: 'in' });
};

/** The shopping list of `takeoff` priced by `cost` (from `costOf` on the same takeoff). */
export function shoppingList(takeoff: MaterialsTakeoff, cost: CostReport): ShoppingList {
  const rows: ShoppingRow[] = [];
  const priceOf = (key: string) => cost.lines.find((l) => l.key === key)?.unitPriceCents ?? null;
  for (const b of takeoff.boards) {
    const unitPrice = priceOf(`lumber:${b.speciesId}:${b.quarters}`);
    const bySize = new Map<string, { count: number; boardFeet: number }>();
    for (const plan of b.layout.boards.filter((p) => !p.inStock)) {
      const size = `${boardLength(plan.lengthMm)} × ${formatLength(plan.widthMm, { unit: 'in' }).replace('"', ' in')}, ${b.quarters}/4`;
      const row = bySize.get(size) ?? { count: 0, boardFeet: 0 };
      row.count++;
      row.boardFeet += plan.boardFeet;
      bySize.set(size, row);
    }
    for (const [size, { count, boardFeet }] of bySize) {
      rows.push({ category: 'lumber', item: b.speciesName, size, quantity: count, unit: 'board', boardFeet, unitPriceCents: unitPrice, costCents: unitPrice === null ? null : costCents(boardFeet, unitPrice) });
    }
  }
  for (const s of takeoff.sheets) {
    const unitPrice = priceOf(`sheet:${s.sheetId}`);
    const bought = s.layout.sheetsBought;
    if (bought === 0) continue;
    const plan = s.layout.sheets.find((p) => !p.offcut);
    const size = plan ? `${formatLength(plan.widthMm, { unit: 'in' })} × ${formatLength(plan.lengthMm, { unit: 'in' })}` : '';
    rows.push({ category: 'sheet', item: s.sheetName, size, quantity: bought, unit: 'sheet', boardFeet: null, unitPriceCents: unitPrice, costCents: unitPrice === null ? null : costCents(bought, unitPrice) });
  }
  for (const line of cost.lines.filter((l) => l.category === 'hardware' || l.category === 'finish')) {
    rows.push({ category: line.category, item: line.description, size: '', quantity: line.quantity, unit: line.unit, boardFeet: null, unitPriceCents: line.unitPriceCents, costCents: line.costCents });
  }
  return {
    currency: cost.currency,
    rows,
    totalCents: rows.reduce((s, r) => s + (r.costCents ?? 0), 0),
    unpriced: rows.filter((r) => r.costCents === null).length,
  };
}

/** The list as CSV text with a header row; prices in the list's currency with two decimals. */
export function shoppingListCsv(list: ShoppingList): string {
  const data = list.rows.map((r) => ({
    category: r.category,
    item: r.item,
    size: r.size,
    quantity: r.quantity,
    unit: r.unit,
    board_feet: r.boardFeet === null ? '' : r.boardFeet.toFixed(2),
    [`unit_price_${list.currency}`]: r.unitPriceCents === null ? '' : centsText(r.unitPriceCents),
    [`cost_${list.currency}`]: r.costCents === null ? 'no price' : centsText(r.costCents),
  }));
  const total = { category: 'total', item: '', size: '', quantity: '', unit: '', board_feet: '', [`unit_price_${list.currency}`]: '', [`cost_${list.currency}`]: centsText(list.totalCents) };
  return Papa.unparse([...data, total], { newline: '\n' });
}
