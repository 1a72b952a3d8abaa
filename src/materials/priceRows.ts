/**
 * The price-list editor's rows as text, and back: every field is text while it is edited, and
 * the whole list is checked by the shared schema before it is saved, each problem named by row.
 */
import type { PriceItem, PriceList } from '../../shared/materials/priceList.ts';
import { centsFromText, centsText } from '../../shared/materials/money.ts';
import { priceListBody } from '../../shared/schemas/priceLists.ts';

/** One row of the editor, every cell as typed. */
export interface PriceRow {
  kind: PriceItem['kind'];
  /** Species id, sheet-good id, or the workshop's own id for hardware and finish. */
  item: string;
  /** Lumber only: quarters, e.g. `4` for 4/4. */
  quarters: string;
  name: string;
  unit: string;
  price: string;
}

/** The rows of `list`. */
export function rowsOf(list: PriceList): PriceRow[] {
  return list.items.map((item) => {
    switch (item.kind) {
      case 'lumber':
        return { kind: item.kind, item: item.speciesId, quarters: String(item.quarters), name: '', unit: 'bd ft', price: centsText(item.pricePerBoardFootCents) };
      case 'sheet':
        return { kind: item.kind, item: item.sheetId, quarters: '', name: '', unit: 'sheet', price: centsText(item.pricePerSheetCents) };
      default:
        return { kind: item.kind, item: item.itemId, quarters: '', name: item.name, unit: item.unit, price: centsText(item.pricePerUnitCents) };
    }
  });
}

/** The list the rows stand for, or the problems by row index (0-based) when any row is wrong. */
export function listOf(rows: readonly PriceRow[], currency: string): { ok: true; list: PriceList } | { ok: false; problems: Map<number, string[]> } {
  const problems = new Map<number, string[]>();
  const note = (i: number, message: string) => problems.set(i, [...(problems.get(i) ?? []), message]);
  const items = rows.map((row, i) => {
    const cents = centsFromText(row.price);
    if (cents === null) note(i, `price "${row.price}" is not a price; write it like 8.75`);
    const price = cents ?? 0;
    switch (row.kind) {
      case 'lumber':
        return { kind: row.kind, speciesId: row.item, quarters: Number(row.quarters), pricePerBoardFootCents: price };
      case 'sheet':
        return { kind: row.kind, sheetId: row.item, pricePerSheetCents: price };
      default:
        return { kind: row.kind, itemId: row.item, name: row.name.trim(), unit: row.unit.trim(), pricePerUnitCents: price };
    }
  });
  const checked = priceListBody.safeParse({ currency, items });
  if (!checked.success) {
    for (const issue of checked.error.issues) {
      const [where, index, field] = issue.path;
      if (where === 'items' && typeof index === 'number') note(index, `${FIELD_WORDS[String(field)] ?? String(field ?? 'row')}: ${issue.message}`);
      else note(-1, `${issue.path.join('.') || 'list'}: ${issue.message}`);
    }
  }
  return problems.size > 0 || !checked.success ? { ok: false, problems } : { ok: true, list: checked.data };
}

const FIELD_WORDS: Record<string, string> = {
  speciesId: 'species', sheetId: 'sheet good', itemId: 'item id', quarters: 'thickness', name: 'name', unit: 'unit',
  pricePerBoardFootCents: 'price', pricePerSheetCents: 'price', pricePerUnitCents: 'price', undefined: 'row',
};
