/**
 * The sign-in layer every feature route sits behind: the PostgreSQL session, passport's user
 * from that session, and the CSRF check on state-changing requests.
 */
import type { RequestHandler } from 'express';
import type pg from 'pg';
import type { Config } from '../config.ts';
import type { Models } from '../db/models/index.ts';
import { createCsrf, type Csrf } from './csrf.ts';
import { createPassport } from './passport.ts';
import { createSessionPool, sessionMiddleware } from './session.ts';
import { parseCookies } from './cookies.ts';
import { hashCostFor } from './password.ts';

export interface Auth {
  passport: ReturnType<typeof createPassport>;
  csrf: Csrf;
  sessionPool: pg.Pool;
  /** Mounted in order on the API router, after the health route and before every feature. */
  middleware: RequestHandler[];
}

export function createAuth(config: Config, models: Models): Auth {
  const sessionPool = createSessionPool(config);
  const passport = createPassport(models, hashCostFor(config.env));
  const csrf = createCsrf(config);
  const restoreUser = passport.session() as RequestHandler;
  return {
    passport,
    csrf,
    sessionPool,
    middleware: [parseCookies, sessionMiddleware(config, sessionPool), restoreUser, csrf.protect],
  };
}
