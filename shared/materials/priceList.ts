/**
 * A workshop's price list: solid wood by species and stock thickness (per board foot), sheet
 * goods (per sheet), hardware and finish items (per unit of sale). The zod schema checks a list
 * sent to or read from the server; prices are whole cents.
 */
import { z } from 'zod';
import { SHEET_GOOD_IDS } from '../wood/sheetGoods.ts';
import { SPECIES_IDS } from '../wood/species.ts';

/** The most a single price may be, in cents ($1,000,000): beyond it a value is a typing mistake. */
export const MAX_PRICE_CENTS = 100_000_000;

const cents = z.number().int().min(0).max(MAX_PRICE_CENTS);
const itemId = z.string().regex(/^[a-z0-9][a-z0-9-]{0,62}$/, 'lower-case letters, digits and dashes');

/** Solid wood: price per board foot of one species at one stock thickness. */
export const lumberPriceSchema = z.object({
  kind: z.literal('lumber'),
  speciesId: z.enum(SPECIES_IDS as [string, ...string[]]),
  /** Stock thickness in quarters of an inch, 4 for 4/4. */
  quarters: z.number().int().min(1).max(64),
  pricePerBoardFootCents: cents,
});

/** A sheet good: price per full sheet. */
export const sheetPriceSchema = z.object({
  kind: z.literal('sheet'),
  sheetId: z.enum(SHEET_GOOD_IDS as [string, ...string[]]),
  pricePerSheetCents: cents,
});

/** Hardware or finish sold by a unit such as `each`, `pair` or `quart`. */
export const unitPriceSchema = z.object({
  kind: z.enum(['hardware', 'finish']),
  itemId,
  name: z.string().min(1).max(120),
  unit: z.string().min(1).max(30),
  pricePerUnitCents: cents,
});

/** One row of a price list. */
export const priceItemSchema = z.discriminatedUnion('kind', [lumberPriceSchema, sheetPriceSchema, unitPriceSchema]);

/** A price list; `currency` is an ISO 4217 code such as `USD`. */
export const priceListSchema = z.object({
  currency: z.string().regex(/^[A-Z]{3}$/, 'a three-letter currency code such as USD'),
  items: z.array(priceItemSchema).max(5000),
});

export type LumberPrice = z.infer<typeof lumberPriceSchema>;
export type SheetPrice = z.infer<typeof sheetPriceSchema>;
export type UnitPrice = z.infer<typeof unitPriceSchema>;
export type PriceItem = z.infer<typeof priceItemSchema>;
export type PriceList = z.infer<typeof priceListSchema>;

/** The key that makes a price row unique: no two rows may price the same thing. */
export function priceKey(item: PriceItem): string {
  switch (item.kind) {
    case 'lumber':
      return `lumber:${item.speciesId}:${item.quarters}`;
    case 'sheet':
      return `sheet:${item.sheetId}`;
    default:
      return `${item.kind}:${item.itemId}`;
  }
}

/** Looks up the price row for `key` (see {@link priceKey}); null when the list has none. */
export function findPrice(list: PriceList, key: string): PriceItem | null {
  return list.items.find((item) => priceKey(item) === key) ?? null;
}
