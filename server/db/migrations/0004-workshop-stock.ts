import type { Migration } from '../migrate.ts';

// A workshop's stock: one row per workshop, kept whole as JSONB (sheet and board sizes for
// sale, offcuts, boards on hand with their defects, kerf and trim). Like the price list it is
// always read and replaced whole, checked by the shared zod schema at the edge, and a workshop
// without a row uses the usual stock.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE TABLE workshop_stock (
      workshop_id uuid PRIMARY KEY REFERENCES workshops(id) ON DELETE CASCADE,
      stock jsonb NOT NULL CHECK (jsonb_typeof(stock) = 'object'),
      updated_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query('DROP TABLE workshop_stock');
};
