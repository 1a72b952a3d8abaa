import type { Migration } from '../migrate.ts';

// A workshop's price list: one row per workshop, its items kept whole as JSONB. The list is
// always read and replaced whole (a table edit or a CSV upload), checked by the shared zod
// schema at the edge, so rows of their own would only add joins.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE TABLE price_lists (
      workshop_id uuid PRIMARY KEY REFERENCES workshops(id) ON DELETE CASCADE,
      currency text NOT NULL CHECK (currency ~ '^[A-Z]{3}$'),
      items jsonb NOT NULL DEFAULT '[]'::jsonb CHECK (jsonb_typeof(items) = 'array'),
      updated_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query('DROP TABLE price_lists');
};
