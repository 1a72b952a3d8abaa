/**
 * Builds the Express app without listening, so tests drive it with supertest and
 * `index.ts` only binds a port. Order: security headers → body parsing → API routes →
 * API 404 → built client → one error middleware.
 */
import express, { type Express, type Router } from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Sequelize } from 'sequelize';
import type { Config } from './config.ts';
import { apiNotFound, errorMiddleware } from './http/errorMiddleware.ts';
import { healthRoutes } from './features/health/health.routes.ts';
import { apiFeatures } from './features/index.ts';
import { createAuth } from './auth/index.ts';
import { modelsFor } from './db/models/index.ts';
import type { MailCatcher } from './fakes/mailCatcher.ts';
import { createSmtpMailer, type Mailer } from './features/mail/mailer.ts';

/**
 * What the app is built from. `mailer` defaults to SMTP at `config.smtp`; `mailbox` is the local
 * mail catcher (development and tests), whose messages `GET /api/dev/mail` lists.
 */
export type AppDeps = { config: Config; sequelize: Sequelize; mailer?: Mailer; mailbox?: MailCatcher };

/** Largest JSON body the API accepts; a design spec is a few kilobytes. */
export const JSON_BODY_LIMIT = '512kb';

export function createApp(deps: AppDeps): Express {
  const { config, sequelize } = deps;
  const app = express();
  app.disable('x-powered-by');
  // JSON answers escape <, > and & so stored text can never be read as markup.
  app.set('json escape', true);
  if (config.trustProxy > 0) app.set('trust proxy', config.trustProxy);

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          'worker-src': ["'self'", 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'connect-src': ["'self'"],
          'upgrade-insecure-requests': config.isProduction ? [] : null,
        },
      },
      hsts: config.isProduction,
    }),
  );

  const api: Router = express.Router();
  api.use(express.json({ limit: JSON_BODY_LIMIT }));
  api.use(healthRoutes(sequelize, config.dbTimeoutMs));
  const models = modelsFor(sequelize);
  const auth = createAuth(config, models);
  api.use(...auth.middleware);
  // The session store's pool, for whoever shuts the app down.
  app.locals.sessionPool = auth.sessionPool;
  const mailer = deps.mailer ?? createSmtpMailer(config.smtp);
  const publicUrl = (config.publicUrl ?? `http://${config.host}:${config.port}`).replace(/\/$/, '');
  for (const mount of apiFeatures) mount(api, { ...deps, models, auth, mailer, publicUrl });
  api.use(apiNotFound);
  app.use('/api', api);

  const clientDir = resolve(config.clientDir);
  const indexHtml = join(clientDir, 'index.html');
  if (existsSync(indexHtml)) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // Client-side routes: every other GET gets the app shell.
    app.get('/{*splat}', (_req, res) => res.sendFile(indexHtml));
  }

  app.use(errorMiddleware);
  return app;
}
