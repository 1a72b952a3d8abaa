import type { Migration } from '../migrate.ts';

// The session table connect-pg-simple expects (its documented schema), created here rather
// than by the store so every schema change goes through migrations.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE TABLE "session" (
      "sid" varchar NOT NULL PRIMARY KEY,
      "sess" json NOT NULL,
      "expire" timestamp(6) NOT NULL
    );
    CREATE INDEX "IDX_session_expire" ON "session" ("expire");
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query('DROP TABLE IF EXISTS "session"');
};
