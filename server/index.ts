/**
 * The API server: load configuration, apply migrations, start the local mail catcher outside
 * production (unless SMTP_PORT points at a real server), listen on the configured host and
 * port, and shut down gracefully on SIGINT/SIGTERM (stop accepting, finish requests, close the
 * database pools and the catcher).
 */
import { loadConfig } from './config.ts';
import { createSequelize } from './db/sequelize.ts';
import { migrate } from './db/migrate.ts';
import { createApp } from './app.ts';
import { startMailCatcher } from './fakes/mailCatcher.ts';
import { createSmtpMailer } from './features/mail/mailer.ts';
import type pg from 'pg';

const config = loadConfig();
const sequelize = createSequelize(config.databaseUrl, config.dbTimeoutMs);
await migrate(sequelize);
const mailbox = !config.isProduction && config.smtp.port === 0 ? await startMailCatcher() : undefined;
if (mailbox) console.log(`[mail] local mail catcher on 127.0.0.1:${mailbox.port}; read it at /api/dev/mail`);
const mailer = mailbox ? createSmtpMailer({ ...config.smtp, host: '127.0.0.1', port: mailbox.port }) : undefined;
const app = createApp({ config, sequelize, mailer, mailbox });

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
    await (app.locals.sessionPool as pg.Pool).end();
    await mailbox?.close();
    process.exit(0);
  });
  server.closeAllConnections?.();
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
