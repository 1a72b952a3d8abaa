/**
 * Global set-up for the integration and browser projects: the real PostgreSQL.
 * `npm test` starts a throwaway cluster and passes DATABASE_URL; running vitest directly
 * (e.g. `npx vitest run --project integration`) starts one here in a temporary folder and
 * removes it afterwards. Each project gets its own database in that cluster, because vitest runs
 * the projects side by side and the browser tests change the demo designs the integration tests
 * count. Migrations are applied once per database before any test file runs.
 */
import type { TestProject } from 'vitest/node';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort, startCluster } from '../../scripts/lib/postgres.mjs';
import { createSequelize } from '../../server/db/sequelize.ts';
import { migrate } from '../../server/db/migrate.ts';
import pg from 'pg';

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
  url = await databaseForProject(url, project.name);
  const sequelize = createSequelize(url);
  await migrate(sequelize);
  await sequelize.close();
  project.provide('databaseUrl', url);
  return teardown;
}

/** Create (once) and return the URL of `<database>_<project>` in the same cluster. */
async function databaseForProject(url: string, projectName: string): Promise<string> {
  const target = new URL(url);
  const name = `${target.pathname.slice(1)}_${projectName}`.replace(/[^a-z0-9_]/gi, '_');
  const admin = new pg.Client({ connectionString: url });
  await admin.connect();
  try {
    const found = await admin.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (found.rowCount === 0) await admin.query(`CREATE DATABASE "${name}"`);
  } finally {
    await admin.end();
  }
  target.pathname = `/${name}`;
  return target.toString();
}
