/** A workshop's price list: read by members, replaced whole by its owner (from JSON or CSV). */
import { QueryTypes, type Sequelize } from 'sequelize';
import type { PriceList } from '../../../shared/materials/priceList.ts';
import { parsePriceListCsv, type PriceListCsvResult } from '../../../shared/materials/priceListCsv.ts';
import type { PriceListResponse } from '../../../shared/schemas/priceLists.ts';
import type { Models } from '../../db/models/index.ts';
import { HttpError } from '../../http/HttpError.ts';

/** The currency of a workshop that has never saved a price list. */
export const DEFAULT_CURRENCY = 'USD';

type Row = { currency: string; items: PriceList['items']; updatedAt: Date; updatedBy: string | null };

export function createPriceListService(sequelize: Sequelize, models: Models) {
  return {
    /** The workshop's list; an empty list in the default currency when none was saved. */
    async get(workshopId: string): Promise<PriceListResponse> {
      const rows = await sequelize.query<Row>(
        `SELECT p.currency, p.items, p.updated_at AS "updatedAt", u.name AS "updatedBy"
         FROM price_lists p LEFT JOIN users u ON u.id = p.updated_by WHERE p.workshop_id = :workshopId`,
        { type: QueryTypes.SELECT, replacements: { workshopId } },
      );
      const row = rows[0];
      if (!row) return { priceList: { currency: DEFAULT_CURRENCY, items: [] }, updatedAt: null, updatedBy: null };
      return { priceList: { currency: row.currency, items: row.items }, updatedAt: row.updatedAt.toISOString(), updatedBy: row.updatedBy };
    },

    /** Replaces the whole list (already checked by `priceListBody`). */
    async replace(workshopId: string, priceList: PriceList, userId: string): Promise<PriceListResponse> {
      await models.PriceList.upsert({ workshopId, currency: priceList.currency, items: priceList.items, updatedBy: userId });
      return this.get(workshopId);
    },

    /**
     * Replaces the list from CSV text, all or nothing: when any line is bad nothing is saved and
     * the answer is 400 `invalid_csv` with every bad line in `details.errors`.
     */
    async replaceFromCsv(workshopId: string, text: string, currency: string | undefined, userId: string): Promise<PriceListResponse> {
      const listCurrency = currency ?? (await this.get(workshopId)).priceList.currency;
      // PostgreSQL cannot store NUL; name the line that holds one instead of failing to save.
      const nul = text.indexOf('\u0000');
      const parsed: PriceListCsvResult =
        nul >= 0 ? { ok: false, errors: [{ line: text.slice(0, nul).split(/\r\n|\r|\n/).length, column: null, message: 'holds a NUL character' }] } : parsePriceListCsv(text, listCurrency);
      if (!parsed.ok) {
        const count = parsed.errors.length;
        const first = parsed.errors[0];
        const where = first ? ` First: line ${first.line}: ${first.message}.` : '';
        throw new HttpError(400, 'invalid_csv', `The price list was not saved: ${count} line${count === 1 ? ' has a problem' : 's have problems'}.${where}`, { errors: parsed.errors });
      }
      return this.replace(workshopId, parsed.priceList, userId);
    },
  };
}
