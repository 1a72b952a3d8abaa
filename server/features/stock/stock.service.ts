/**
 * A workshop's stock: read by members, replaced whole by its owners and designers. A save names
 * the version it was edited from (the row's last-saved time to the microsecond) and is one
 * conditional write, so of two saves from the same version exactly one lands; the other gets a
 * 409 with the stock as it now is, and nothing of it is stored.
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import { DEFAULT_STOCK_SETTINGS, type StockSettings } from '../../../shared/materials/stockSettings.ts';
import type { StockResponse } from '../../../shared/schemas/stock.ts';
import { HttpError } from '../../http/HttpError.ts';

type Row = { stock: Partial<StockSettings>; updatedAt: Date; updatedBy: string | null; version: string };

/** The row's version as `stockVersionSchema` reads it: its last-saved time in UTC, to the microsecond. */
const VERSION_OF = `to_char(s.updated_at AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.US"Z"')`;

// Every save moves the version forward, even when two land within one microsecond of the clock
// (or the clock steps back), so a version never comes round again.
const NEXT_SAVED_AT = `GREATEST(clock_timestamp(), updated_at + interval '1 microsecond')`;

/** The 409 for a save that started from `version` when the stock is now `current`. */
function staleStock(current: StockResponse): HttpError {
  const who = current.updatedBy ?? 'Someone';
  const message = current.updatedAt
    ? `${who} saved the stock at ${current.updatedAt} while you were editing; nothing was saved. Load theirs, or save yours over it.`
    : 'The stock you started from is no longer stored; nothing was saved. Load the current stock, or save yours over it.';
  return new HttpError(409, 'stale_stock', message, { current });
}

/** The columns of a stock response, from a row `s` of workshop_stock (or a write's returned row). */
const SELECT_STOCK = `SELECT s.stock, s.updated_at AS "updatedAt", u.name AS "updatedBy", ${VERSION_OF} AS version`;

function toResponse(row: Row): StockResponse {
  // A field added to the stock since this row was saved takes its default.
  return { stock: { ...DEFAULT_STOCK_SETTINGS, ...row.stock }, updatedAt: row.updatedAt.toISOString(), updatedBy: row.updatedBy, version: row.version };
}

export function createStockService(sequelize: Sequelize) {
  /** The workshop's stock; the usual stock when none was saved. */
  async function get(workshopId: string): Promise<StockResponse> {
    const rows = await sequelize.query<Row>(
      `${SELECT_STOCK} FROM workshop_stock s LEFT JOIN users u ON u.id = s.updated_by WHERE s.workshop_id = :workshopId`,
      { type: QueryTypes.SELECT, replacements: { workshopId } },
    );
    return rows[0] ? toResponse(rows[0]) : { stock: DEFAULT_STOCK_SETTINGS, updatedAt: null, updatedBy: null, version: null };
  }

  return {
    get,

    /**
     * Replaces the whole stock (already checked by `stockBody`) when the stored version is still
     * `version` (null: none stored yet); otherwise a 409 carrying the current stock.
     */
    async replace(workshopId: string, stock: StockSettings, version: string | null, userId: string): Promise<StockResponse> {
      // One statement each: a concurrent save of the same row waits for this one and then finds
      // the version moved (PostgreSQL re-reads the row under READ COMMITTED), or the key taken.
      const write = version === null
        ? `INSERT INTO workshop_stock (workshop_id, stock, updated_by, created_at, updated_at)
           VALUES (:workshopId, :stock::jsonb, :userId, clock_timestamp(), clock_timestamp())
           ON CONFLICT (workshop_id) DO NOTHING RETURNING *`
        : `UPDATE workshop_stock SET stock = :stock::jsonb, updated_by = :userId, updated_at = ${NEXT_SAVED_AT}
           WHERE workshop_id = :workshopId AND updated_at = :version::timestamptz RETURNING *`;
      const rows = await sequelize.query<Row>(
        `WITH s AS (${write}) ${SELECT_STOCK} FROM s LEFT JOIN users u ON u.id = s.updated_by`,
        { type: QueryTypes.SELECT, replacements: { workshopId, stock: JSON.stringify(stock), userId, version } },
      );
      if (rows[0]) return toResponse(rows[0]);
      throw staleStock(await get(workshopId));
    },
  };
}
