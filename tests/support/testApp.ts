/**
 * Build the real Express app against the test database for integration and browser tests.
 * No mocks: the same `createApp` that `server/index.ts` serves.
 */
import { inject } from 'vitest';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createApp } from '../../server/app.ts';
import { loadConfig } from '../../server/config.ts';
import { createSequelize } from '../../server/db/sequelize.ts';

export function testConfig(overrides: Record<string, string> = {}) {
  return loadConfig({ NODE_ENV: 'test', DATABASE_URL: inject('databaseUrl'), CLIENT_DIR: 'dist', DB_TIMEOUT_MS: '1500', ...overrides });
}

/** A fresh app with its own connection pool; call `close()` in `afterAll`. */
export function buildTestApp(overrides: Record<string, string> = {}) {
  const config = testConfig(overrides);
  const sequelize = createSequelize(config.databaseUrl, config.dbTimeoutMs);
  const app = createApp({ config, sequelize });
  return { app, config, sequelize, close: () => sequelize.close() };
}

/** The app listening on a free loopback port, for the browser. */
export async function startTestServer(overrides: Record<string, string> = {}) {
  const built = buildTestApp(overrides);
  const server: Server = await new Promise((resolve) => {
    const s = built.app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  return {
    ...built,
    url: `http://127.0.0.1:${port}`,
    close: async () => {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await built.sequelize.close();
    },
  };
}
