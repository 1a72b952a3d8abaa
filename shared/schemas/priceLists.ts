/**
 * A workshop's price list on the wire: the whole list as the owner saves it (rows checked by
 * `priceListSchema`, no two rows pricing the same thing), the list as members read it, and the
 * line-by-line errors of a CSV upload that was refused.
 */
import { z } from 'zod';
import { priceKey, priceListSchema } from '../materials/priceList.ts';
import { timestampSchema } from './common.ts';

/** The body of `PUT /workshops/:workshopId/price-list`: the whole list, each thing priced once. */
export const priceListBody = priceListSchema.strict().superRefine((list, ctx) => {
  const seen = new Map<string, number>();
  list.items.forEach((item, index) => {
    // PostgreSQL cannot store NUL in JSONB; refuse it here with a 400 naming the row.
    if (item.kind === 'hardware' || item.kind === 'finish') {
      for (const field of ['name', 'unit'] as const) {
        if (item[field].includes('\u0000')) ctx.addIssue({ code: 'custom', path: ['items', index, field], message: 'must not contain NUL characters' });
      }
    }
    const key = priceKey(item);
    const first = seen.get(key);
    if (first === undefined) seen.set(key, index);
    else ctx.addIssue({ code: 'custom', path: ['items', index], message: `prices the same thing as items[${first}] (${key})` });
  });
});

/** The query of the CSV upload: the currency of its prices, default the list's current one. */
export const priceListCsvQuery = z.strictObject({
  currency: z.string().regex(/^[A-Z]{3}$/, 'a three-letter currency code such as USD').optional(),
});

/** A workshop's price list as members read it; `updatedAt` is null when none has been saved. */
export const priceListResponse = z.object({
  priceList: priceListSchema,
  updatedAt: timestampSchema.nullable(),
  updatedBy: z.string().nullable(),
});
export type PriceListResponse = z.infer<typeof priceListResponse>;

/** One refused line of an uploaded CSV; `line` counts from 1, the header being line 1. */
export const csvLineErrorSchema = z.object({ line: z.number().int(), column: z.string().nullable(), message: z.string() });

/** The `details` of a refused CSV upload (400 `invalid_csv`): every bad line; nothing was saved. */
export const priceListCsvErrors = z.object({ errors: z.array(csvLineErrorSchema) });
