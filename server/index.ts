/**
 * The API server: load configuration, apply migrations, listen on the configured host and
 * port, and shut down gracefully on SIGINT/SIGTERM (stop accepting, finish requests, close the
 * database pool).
 */
import { loadConfig } from './config.ts';
import { createSequelize } from './db/sequelize.ts';
import { migrate } from './db/migrate.ts';
import { createApp } from './app.ts';

const config = loadConfig();
const sequelize = createSequelize(config.databaseUrl, config.dbTimeoutMs);
await migrate(sequelize);
const app = createApp({ config, sequelize });

const server = app.listen(config.port, config.host, () => {
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.port;
  console.log(`[api] listening on http://${config.host}:${port}`);
});

let closing = false;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  console.log(`[api] ${signal}: shutting down`);
  const force = setTimeout(() => process.exit(1), 10_000);
  force.unref();
  server.close(async () => {
    await sequelize.close();
    process.exit(0);
  });
  server.closeAllConnections?.();
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
