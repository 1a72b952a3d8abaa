/**
 * Hardware and finish for the cost: the maker sets how many of each priced item the piece
 * takes; finish sold by volume starts at what the finishing schedule calls for.
 */
import { finishAreaM2, finishLitres } from '../../shared/drawing/finishing.ts';
import type { PieceResult } from '../../shared/engine/types.ts';
import type { ExtraItem } from '../../shared/materials/cost.ts';
import type { PriceList, UnitPrice } from '../../shared/materials/priceList.ts';

// US liquid measures (NIST Handbook 44, Appendix C).
const LITRES_PER: Record<string, number> = { quart: 0.946353, qt: 0.946353, gallon: 3.785412, gal: 3.785412, litre: 1, liter: 1, l: 1, pint: 0.473176 };

/** The hardware and finish rows of `list`. */
export function unitItems(list: PriceList): UnitPrice[] {
  return list.items.filter((i): i is UnitPrice => i.kind === 'hardware' || i.kind === 'finish');
}

/**
 * Starting quantities by price key: the first finish sold by volume covers the finishing
 * schedule's coats; everything else starts at 0 for the maker to set.
 */
export function suggestedQuantities(result: PieceResult, list: PriceList): Record<string, number> {
  const litres = finishLitres(finishAreaM2(result));
  const quantities: Record<string, number> = {};
  let finishChosen = false;
  for (const item of unitItems(list)) {
    const perUnit = LITRES_PER[item.unit.trim().toLowerCase()];
    const suggest = item.kind === 'finish' && perUnit !== undefined && !finishChosen;
    if (suggest) finishChosen = true;
    quantities[`${item.kind}:${item.itemId}`] = suggest ? Math.ceil(litres / perUnit) : 0;
  }
  return quantities;
}

/** The extras to cost: items with a quantity above 0. */
export function extrasOf(list: PriceList, quantities: Readonly<Record<string, number>>): ExtraItem[] {
  return unitItems(list)
    .map((item) => ({ kind: item.kind, itemId: item.itemId, quantity: quantities[`${item.kind}:${item.itemId}`] ?? 0 }))
    .filter((e) => Number.isFinite(e.quantity) && e.quantity > 0);
}
