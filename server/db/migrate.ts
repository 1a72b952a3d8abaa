/**
 * Schema changes are migrations (never `sync({ alter })`): files in `migrations/` named
 * `NNNN-what-it-does.ts`, each exporting `up` and `down`, applied in name order by Umzug and
 * recorded in the `SequelizeMeta` table.
 */
import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

export type MigrationContext = { queryInterface: QueryInterface; sequelize: Sequelize };
export type Migration = (params: { context: MigrationContext }) => Promise<void>;

const folder = join(dirname(fileURLToPath(import.meta.url)), 'migrations');

export function createMigrator(sequelize: Sequelize) {
  const files = readdirSync(folder).filter((f) => /^\d{4}-.+\.ts$/.test(f)).sort();
  return new Umzug<MigrationContext>({
    migrations: files.map((file) => ({
      name: file.replace(/\.ts$/, ''),
      up: async ({ context }) => (await import(pathToFileURL(join(folder, file)).href)).up({ context }),
      down: async ({ context }) => (await import(pathToFileURL(join(folder, file)).href)).down({ context }),
    })),
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    storage: new SequelizeStorage({ sequelize }),
    logger: undefined,
  });
}

/** Apply every pending migration; returns the names applied. */
export async function migrate(sequelize: Sequelize): Promise<string[]> {
  // Two processes starting at once must not both migrate.
  await sequelize.query('SELECT pg_advisory_lock(727274)');
  try {
    const applied = await createMigrator(sequelize).up();
    return applied.map((m) => m.name);
  } finally {
    await sequelize.query('SELECT pg_advisory_unlock(727274)');
  }
}
