/**
 * Sessions kept in PostgreSQL (connect-pg-simple, in the `session` table the first migration
 * made), so any number of API processes can serve the same users and a restart signs nobody out.
 * Cookies are httpOnly and SameSite=Lax, and Secure in production; a session lasts two weeks
 * from sign-in.
 */
import type { RequestHandler } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import pg from 'pg';
import type { Config } from '../config.ts';
import { HttpError } from '../http/HttpError.ts';

export const SESSION_COOKIE = 'casewright.sid';
const TWO_WEEKS_MS = 14 * 24 * 60 * 60 * 1000;

/** The session store's own small pool; it must never crash the process when PostgreSQL goes away. */
export function createSessionPool(config: Config): pg.Pool {
  const pool = new pg.Pool({
    connectionString: config.databaseUrl,
    max: 10,
    connectionTimeoutMillis: config.dbTimeoutMs,
    idleTimeoutMillis: 10_000,
    allowExitOnIdle: true,
    application_name: 'casewright-sessions',
  });
  // An idle client whose server went away emits here; the next query reconnects.
  pool.on('error', () => {});
  return pool;
}

export function sessionMiddleware(config: Config, pool: pg.Pool): RequestHandler {
  const PgStore = connectPgSimple(session);
  const store = new PgStore({
    pool,
    tableName: 'session',
    createTableIfMissing: false,
    pruneSessionInterval: config.env === 'test' ? false : 15 * 60,
    errorLog: () => {},
  });
  const inner = session({
    name: SESSION_COOKIE,
    store,
    secret: config.sessionSecret,
    resave: false,
    saveUninitialized: false,
    // Not rolling: renewing the expiry would write the session row on every request.
    rolling: false,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.isProduction, maxAge: TWO_WEEKS_MS, path: '/' },
  });
  // A store failure is a database outage: answer 503 like every other database error.
  return (req, res, next) =>
    inner(req, res, (error?: unknown) => {
      if (error) return next(new HttpError(503, 'database_unavailable', 'The database is not reachable right now; try again in a moment.'));
      next();
    });
}
