/**
 * PostgreSQL going away under a serving app: requests answer 503 JSON instead of hanging or
 * crashing the process, and the app recovers on its own when the database comes back. Uses a
 * throwaway cluster of its own so the shared test database is never stopped.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort, startCluster, stopCluster } from '../../scripts/lib/postgres.mjs';
import { createSequelize } from '../../server/db/sequelize.ts';
import { migrate } from '../../server/db/migrate.ts';
import { PASSWORD, chestSpec, signUp, startApi, type Api, type Client } from './support/api.ts';

let base: string;
let dataDir: string;
let port: number;
let api: Api;
let designer: Client;
let designId: string;

beforeAll(async () => {
  base = mkdtempSync(join(tmpdir(), 'casewright-faults-'));
  dataDir = join(base, 'pg');
  port = await freePort();
  const cluster = await startCluster({ dataDir, port, durable: false, database: 'casewright_faults' });
  const sequelize = createSequelize(cluster.url);
  await migrate(sequelize);
  await sequelize.close();
  api = await startApi({ DATABASE_URL: cluster.url, DB_TIMEOUT_MS: '1000' });
  designer = await signUp(api.app, 'faults');
  const workshopId = (await designer.post('/api/workshops', { name: 'Fault shop' })).body.id;
  designId = (await designer.post(`/api/workshops/${workshopId}/designs`, { title: 'Outage chest', spec: chestSpec() })).body.id;
}, 120_000);

afterAll(async () => {
  await api?.close();
  stopCluster(dataDir);
  rmSync(base, { recursive: true, force: true });
});

async function eventually(check: () => Promise<boolean>, attempts = 60): Promise<boolean> {
  for (let i = 0; i < attempts; i++) {
    if (await check()) return true;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  return false;
}

describe('a database outage', () => {
  it('answers 503 JSON while PostgreSQL is down, and recovers by itself when it is back', async () => {
    expect((await designer.get(`/api/designs/${designId}`)).status).toBe(200);

    stopCluster(dataDir);

    const read = await designer.get(`/api/designs/${designId}`);
    expect(read.status).toBe(503);
    expect(read.headers['content-type']).toMatch(/json/);
    expect(read.body.error.code).toBe('database_unavailable');

    const write = await designer.post(`/api/designs/${designId}/revisions`, { baseRevision: 1, spec: chestSpec({ width: 1100 }) });
    expect(write.status).toBe(503);
    expect(write.body.error.code).toBe('database_unavailable');

    const signIn = await designer.post('/api/auth/login', { email: designer.user!.email, password: PASSWORD });
    expect(signIn.status).toBe(503);

    expect((await designer.get('/api/health')).status).toBe(503);

    await startCluster({ dataDir, port, durable: false, database: 'casewright_faults' });

    // The same app, never restarted: its pools reconnect on their own.
    expect(await eventually(async () => (await designer.get(`/api/designs/${designId}`)).status === 200)).toBe(true);
    const saved = await designer.post(`/api/designs/${designId}/revisions`, { baseRevision: 1, spec: chestSpec({ width: 1100 }) });
    expect(saved.status).toBe(201);
    expect(saved.body.number).toBe(2);
  });
});
