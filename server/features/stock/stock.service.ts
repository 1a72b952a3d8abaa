/** A workshop's stock: read by members, replaced whole by its owners and designers. */
import { QueryTypes, type Sequelize } from 'sequelize';
import { DEFAULT_STOCK_SETTINGS, type StockSettings } from '../../../shared/materials/stockSettings.ts';
import type { StockResponse } from '../../../shared/schemas/stock.ts';
import type { Models } from '../../db/models/index.ts';

type Row = { stock: Partial<StockSettings>; updatedAt: Date; updatedBy: string | null };

export function createStockService(sequelize: Sequelize, models: Models) {
  return {
    /** The workshop's stock; the usual stock when none was saved. */
    async get(workshopId: string): Promise<StockResponse> {
      const rows = await sequelize.query<Row>(
        `SELECT s.stock, s.updated_at AS "updatedAt", u.name AS "updatedBy"
         FROM workshop_stock s LEFT JOIN users u ON u.id = s.updated_by WHERE s.workshop_id = :workshopId`,
        { type: QueryTypes.SELECT, replacements: { workshopId } },
      );
      const row = rows[0];
      if (!row) return { stock: DEFAULT_STOCK_SETTINGS, updatedAt: null, updatedBy: null };
      // A field added to the stock since this row was saved takes its default.
      return { stock: { ...DEFAULT_STOCK_SETTINGS, ...row.stock }, updatedAt: row.updatedAt.toISOString(), updatedBy: row.updatedBy };
    },

    /** Replaces the whole stock (already checked by `stockBody`). */
    async replace(workshopId: string, stock: StockSettings, userId: string): Promise<StockResponse> {
      await models.WorkshopStock.upsert({ workshopId, stock, updatedBy: userId });
      return this.get(workshopId);
    },
  };
}
