/**
 * The cost of a piece from a price list: lumber by the board foot of the boards laid out,
 * sheets by the sheet, hardware and finish by their unit. Each material line shows its waste
 * factor: what is bought over what ends up in the finished parts, less one. Lines without a
 * price are kept, marked, and left out of the totals, so a missing price is never a zero.
 */
import { InputError } from '../errors.ts';
import { costCents } from './money.ts';
import { findPrice, type PriceList } from './priceList.ts';
import type { MaterialsTakeoff } from './takeoff.ts';

/** A hardware or finish item the piece needs, by the id it has in the price list. */
export interface ExtraItem {
  kind: 'hardware' | 'finish';
  itemId: string;
  quantity: number;
}

/** One costed line. */
export interface CostLine {
  category: 'lumber' | 'sheet' | 'hardware' | 'finish';
  /** The price-list key of the line, e.g. `lumber:white-oak:4`. */
  key: string;
  description: string;
  /** Board feet for lumber, sheets for sheet goods, units for the rest. */
  quantity: number;
  unit: string;
  unitPriceCents: number | null;
  costCents: number | null;
  /** Bought over finished, less one (0.4 = 40 % more than the finished parts); null for hardware and finish. */
  wasteFactor: number | null;
}

/** The costed piece: lines, totals by category (cents), and the keys with no price. */
export interface CostReport {
  currency: string;
  lines: CostLine[];
  totals: { lumber: number; sheet: number; hardware: number; finish: number; total: number };
  missingPrices: string[];
}

/** Costs `takeoff` plus `extras` from `priceList`. */
export function costOf(takeoff: MaterialsTakeoff, priceList: PriceList, extras: readonly ExtraItem[] = []): CostReport {
  const lines: CostLine[] = [];
  for (const b of takeoff.boards) {
    const key = `lumber:${b.speciesId}:${b.quarters}`;
    const price = findPrice(priceList, key);
    const unitPrice = price?.kind === 'lumber' ? price.pricePerBoardFootCents : null;
    const bf = b.layout.boardFeetBought;
    lines.push({
      category: 'lumber', key, description: `${b.speciesName} ${b.quarters}/4`, quantity: bf, unit: 'bd ft',
      unitPriceCents: unitPrice, costCents: unitPrice === null ? null : costCents(bf, unitPrice),
      wasteFactor: b.layout.boardFeetFinished > 0 ? bf / b.layout.boardFeetFinished - 1 : null,
    });
  }
  for (const s of takeoff.sheets) {
    const key = `sheet:${s.sheetId}`;
    const price = findPrice(priceList, key);
    const unitPrice = price?.kind === 'sheet' ? price.pricePerSheetCents : null;
    const count = s.layout.sheets.length;
    lines.push({
      category: 'sheet', key, description: s.sheetName, quantity: count, unit: 'sheet',
      unitPriceCents: unitPrice, costCents: unitPrice === null ? null : costCents(count, unitPrice),
      wasteFactor: s.layout.yield > 0 ? 1 / s.layout.yield - 1 : null,
    });
  }
  extras.forEach((extra, i) => {
    if (!Number.isFinite(extra.quantity) || extra.quantity <= 0) {
      throw new InputError(`extras[${i}].quantity`, `must be a number above 0 (got ${String(extra.quantity)})`, 'greater than 0');
    }
    const key = `${extra.kind}:${extra.itemId}`;
    const price = findPrice(priceList, key);
    const unitPrice = price && (price.kind === 'hardware' || price.kind === 'finish') ? price : null;
    lines.push({
      category: extra.kind, key, description: unitPrice?.name ?? extra.itemId, quantity: extra.quantity, unit: unitPrice?.unit ?? 'each',
      unitPriceCents: unitPrice?.pricePerUnitCents ?? null, costCents: unitPrice === null ? null : costCents(extra.quantity, unitPrice.pricePerUnitCents),
      wasteFactor: null,
    });
  });
  const sumOf = (category: CostLine['category']) => lines.filter((l) => l.category === category).reduce((s, l) => s + (l.costCents ?? 0), 0);
  const totals = { lumber: sumOf('lumber'), sheet: sumOf('sheet'), hardware: sumOf('hardware'), finish: sumOf('finish'), total: 0 };
  totals.total = totals.lumber + totals.sheet + totals.hardware + totals.finish;
  return { currency: priceList.currency, lines, totals, missingPrices: lines.filter((l) => l.costCents === null).map((l) => l.key) };
}
