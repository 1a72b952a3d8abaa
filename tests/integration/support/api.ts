/**
 * Helpers for the accounts and designs suites: the real app with its own mail catcher, and
 * signed-in clients that carry their session cookie and CSRF token like the browser does.
 */
import request from 'supertest';
import type { Express } from 'express';
import type pg from 'pg';
import { randomUUID } from 'node:crypto';
import { createApp } from '../../../server/app.ts';
import { createSequelize } from '../../../server/db/sequelize.ts';
import { startMailCatcher, type MailCatcher } from '../../../server/fakes/mailCatcher.ts';
import { createSmtpMailer } from '../../../server/features/mail/mailer.ts';
import { testConfig } from '../../support/testApp.ts';

export const PASSWORD = 'correct horse battery staple';

/** The app against the test database, mailing to its own loopback catcher. */
export async function startApi(overrides: Record<string, string> = {}) {
  const config = testConfig(overrides);
  const mailbox = await startMailCatcher();
  const sequelize = createSequelize(config.databaseUrl, config.dbTimeoutMs);
  const mailer = createSmtpMailer({ ...config.smtp, host: '127.0.0.1', port: mailbox.port });
  const app = createApp({ config, sequelize, mailer, mailbox });
  return {
    app, config, sequelize, mailbox,
    close: async () => {
      await sequelize.close();
      await (app.locals.sessionPool as pg.Pool).end();
      await mailbox.close();
    },
  };
}

export type Api = Awaited<ReturnType<typeof startApi>>;

/** A browser-like client: one cookie jar and the CSRF token for its session. */
export class Client {
  readonly agent: ReturnType<typeof request.agent>;
  csrf = '';
  user: { id: string; email: string; name: string } | null = null;
  /** `casewright.sid=…` as last set by the server (on sign-in; sessions do not roll). */
  sessionCookie = '';

  /** Remember the session cookie a response set. */
  keepCookie(res: request.Response): void {
    const set = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('casewright.sid='));
    if (set) this.sessionCookie = set.split(';')[0]!;
  }

  constructor(app: Express) {
    this.agent = request.agent(app);
  }

  /** Fetch a CSRF token for the current session. */
  async refreshCsrf(): Promise<this> {
    const res = await this.agent.get('/api/auth/csrf');
    if (res.status !== 200) throw new Error(`GET /api/auth/csrf answered ${res.status}`);
    this.csrf = res.body.csrfToken;
    return this;
  }

  get(path: string) {
    return this.agent.get(path);
  }
  /** A string body goes as `text/csv` (the price-list upload); anything else as JSON. */
  post(path: string, body?: unknown) {
    const req = this.agent.post(path).set('x-csrf-token', this.csrf);
    return typeof body === 'string' ? req.type('text/csv').send(body) : req.send(body as object);
  }
  put(path: string, body?: unknown) {
    return this.agent.put(path).set('x-csrf-token', this.csrf).send(body as object);
  }
  patch(path: string, body?: unknown) {
    return this.agent.patch(path).set('x-csrf-token', this.csrf).send(body as object);
  }
  delete(path: string) {
    return this.agent.delete(path).set('x-csrf-token', this.csrf);
  }
  /** Send any method; used by the authorisation matrix. */
  send(method: 'get' | 'post' | 'put' | 'patch' | 'delete', path: string, body?: unknown) {
    if (method === 'put') return this.put(path, body);
    return method === 'get' ? this.get(path) : method === 'post' ? this.post(path, body) : method === 'patch' ? this.patch(path, body) : this.delete(path);
  }

  async login(email: string, password = PASSWORD) {
    if (!this.csrf) await this.refreshCsrf();
    const res = await this.post('/api/auth/login', { email, password });
    if (res.status === 200) {
      this.csrf = res.body.csrfToken;
      this.user = res.body.user;
      this.keepCookie(res);
    }
    return res;
  }
}

/** A unique e-mail for this run, so test files never collide in the shared database. */
export function uniqueEmail(label: string): string {
  return `${label}-${randomUUID().slice(0, 8)}@test.example`;
}

/** Register a new account and return its signed-in client. */
export async function signUp(app: Express, label: string, name = `Test ${label}`): Promise<Client> {
  const client = await new Client(app).refreshCsrf();
  const res = await client.post('/api/auth/register', { email: uniqueEmail(label), name, password: PASSWORD });
  if (res.status !== 201) throw new Error(`register answered ${res.status}: ${JSON.stringify(res.body)}`);
  client.csrf = res.body.csrfToken;
  client.user = res.body.user;
  client.keepCookie(res);
  return client;
}

/** An anonymous client that already holds a CSRF token (so refusals are about sign-in, not CSRF). */
export function anonymous(app: Express): Promise<Client> {
  return new Client(app).refreshCsrf();
}

/** The link in the newest message to `to`, matching `pattern` (whose first group is the token). */
export function tokenFromMail(mailbox: MailCatcher, to: string, pattern: RegExp): string {
  const mail = mailbox.messages(to)[0];
  if (!mail) throw new Error(`no mail to ${to}`);
  const match = pattern.exec(mail.text);
  if (!match?.[1]) throw new Error(`no link matching ${pattern} in: ${mail.text}`);
  return match[1];
}

/** Mail delivery is asynchronous on the catcher's side; wait until a message to `to` arrives. */
export async function waitForMail(mailbox: MailCatcher, to: string, count = 1): Promise<void> {
  for (let i = 0; i < 200; i++) {
    if (mailbox.messages(to).length >= count) return;
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
  throw new Error(`no mail to ${to} arrived`);
}

/** A chest spec; `width` in mm when given. */
export function chestSpec(params: Record<string, unknown> = {}) {
  return { schemaVersion: 1 as const, kind: 'chest' as const, params };
}

/** Reads the newest invitation link sent to an address from the app's mail catcher. */
export function invitationTokens(mailbox: MailCatcher) {
  return async (email: string): Promise<string> => {
    await waitForMail(mailbox, email);
    return tokenFromMail(mailbox, email, /invitations\/([A-Za-z0-9_-]{43})/);
  };
}
