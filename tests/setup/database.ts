/**
 * Global set-up for the integration and browser projects: the real PostgreSQL.
 * `npm test` starts a throwaway cluster and passes DATABASE_URL; running vitest directly
 * (e.g. `npx vitest run --project integration`) starts one here in a temporary folder and
 * removes it afterwards. Migrations are applied once before any test file runs.
 */
import type { TestProject } from 'vitest/node';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort, startCluster } from '../../scripts/lib/postgres.mjs';
import { createSequelize } from '../../server/db/sequelize.ts';
import { migrate } from '../../server/db/migrate.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

export default async function setup(project: TestProject) {
  let teardown = async () => {};
  let url = process.env.DATABASE_URL;
  if (!url) {
    const base = mkdtempSync(join(tmpdir(), 'casewright-vitest-'));
    const cluster = await startCluster({ dataDir: join(base, 'pg'), port: await freePort(), durable: false, database: 'casewright_test' });
    url = cluster.url;
    teardown = async () => {
      cluster.stop();
      rmSync(base, { recursive: true, force: true });
    };
  }
  const sequelize = createSequelize(url);
  await migrate(sequelize);
  await sequelize.close();
  project.provide('databaseUrl', url);
  return teardown;
}
