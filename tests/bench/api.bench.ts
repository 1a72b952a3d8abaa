/**
 * API under load: autocannon on loopback against a throwaway PostgreSQL seeded with the demo,
 * 50 connections for 10 s per scenario (BENCH_API_SECONDS to change it). Scenarios: reading a
 * design with its head revision, and saving revisions (each connection saves onto a design no
 * other connection is saving at that moment, so every save is a real new revision, not a 409).
 * Prints requests per second, p50/p95/p99 latency and the error count. Figures only; nothing
 * here asserts speed.
 */
import autocannon from 'autocannon';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { readFileSync } from 'node:fs';
import type pg from 'pg';
import { freePort, startCluster } from '../../scripts/lib/postgres.mjs';
import { createApp } from '../../server/app.ts';
import { loadConfig } from '../../server/config.ts';
import { createSequelize } from '../../server/db/sequelize.ts';
import { migrate } from '../../server/db/migrate.ts';
import { DEMO_WORKSHOP, seedDemo } from '../../server/db/seed.ts';

const CONNECTIONS = 50;
const SAVE_DESIGNS = 64;

type Session = { cookie: string; csrf: string };

/** Keep the name=value part of each Set-Cookie, merged over what the jar already has. */
function mergeCookies(jar: string, response: Response): string {
  const cookies = new Map(jar ? jar.split('; ').map((c) => c.split('=') as [string, string]) : []);
  for (const line of response.headers.getSetCookie()) {
    const [pair] = line.split(';');
    const eq = pair!.indexOf('=');
    cookies.set(pair!.slice(0, eq), pair!.slice(eq + 1));
  }
  return [...cookies].map(([k, v]) => `${k}=${v}`).join('; ');
}

async function signIn(base: string, email: string, password: string): Promise<Session> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  let cookie = mergeCookies('', csrfRes);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken, cookie },
    body: JSON.stringify({ email, password }),
  });
  if (login.status !== 200) throw new Error(`sign-in answered ${login.status}`);
  cookie = mergeCookies(cookie, login);
  const body = (await login.json()) as { csrfToken: string };
  return { cookie, csrf: body.csrfToken };
}

async function call<T>(base: string, session: Session, method: string, path: string, body?: unknown): Promise<T> {
  const res = await fetch(`${base}${path}`, {
    method,
    headers: { 'content-type': 'application/json', 'x-csrf-token': session.csrf, cookie: session.cookie },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}

function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

async function load(name: string, seconds: number, options: Omit<autocannon.Options, 'url' | 'connections' | 'duration'> & { url: string }): Promise<string> {
  const latencies: number[] = [];
  const instance = autocannon({ ...options, connections: CONNECTIONS, duration: seconds, pipelining: 1 });
  instance.on('response', (_client: unknown, _status: number, _bytes: number, responseTime: number) => latencies.push(responseTime));
  const result = await instance;
  latencies.sort((a, b) => a - b);
  const errors = result.errors + result.non2xx;
  const fmt = (ms: number) => `${ms.toFixed(1)} ms`.padStart(9);
  return `  ${name.padEnd(30)} ${result.requests.average.toFixed(0).padStart(6)} req/s  p50 ${fmt(percentile(latencies, 50))}  p95 ${fmt(percentile(latencies, 95))}  p99 ${fmt(percentile(latencies, 99))}  requests ${String(result.requests.total).padStart(6)}  errors ${errors} (non-2xx ${result.non2xx}, timeouts ${result.timeouts})`;
}

/**
 * autocannon drops its sockets when the time is up, but handlers already running go on; wait for
 * the database pool to go idle before closing it under them.
 */
async function settle(sequelize: ReturnType<typeof createSequelize>): Promise<void> {
  const pool = (sequelize.connectionManager as unknown as { pool?: { using: number; waiting: number } }).pool;
  for (let i = 0; i < 300 && pool && pool.using + pool.waiting > 0; i++) await new Promise((resolve) => setTimeout(resolve, 100));
}

export async function benchApi(): Promise<string> {
  const seconds = Number(process.env.BENCH_API_SECONDS ?? 10);
  const folder = mkdtempSync(join(tmpdir(), 'casewright-bench-'));
  const cluster = await startCluster({ dataDir: join(folder, 'pg'), port: await freePort(), durable: false, database: 'casewright_bench' });
  const config = loadConfig({ NODE_ENV: 'development', DATABASE_URL: cluster.url, HOST: '127.0.0.1', PORT: '0', DB_TIMEOUT_MS: '5000', CLIENT_DIR: join(folder, 'no-client') });
  const sequelize = createSequelize(config.databaseUrl, config.dbTimeoutMs);
  let server: Server | undefined;
  const app = createApp({ config, sequelize });
  try {
    await migrate(sequelize);
    await seedDemo(sequelize);
    server = await new Promise<Server>((resolve) => {
      const s = app.listen(0, '127.0.0.1', () => resolve(s));
    });
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    const demo = JSON.parse(readFileSync(new URL('../../server/db/demo-accounts.json', import.meta.url), 'utf8')) as { password: string; accounts: { role: string; email: string }[] };
    const designer = await signIn(base, demo.accounts.find((a) => a.role === 'designer')!.email, demo.password);

    const me = await call<{ workshops: { id: string; name: string }[] }>(base, designer, 'GET', '/api/auth/me');
    const workshopId = me.workshops.find((w) => w.name === DEMO_WORKSHOP)!.id;
    const listing = await call<{ designs: { id: string; title: string }[] }>(base, designer, 'GET', `/api/workshops/${workshopId}/designs?kind=chest`);
    const chestId = listing.designs.find((d) => d.title === 'Blanket chest, white oak')!.id;
    const chest = await call<{ headRevision: { spec: { params: Record<string, unknown> } } }>(base, designer, 'GET', `/api/designs/${chestId}`);
    const spec = chest.headRevision.spec;

    // Designs to save onto: each is checked out by one connection at a time.
    const free: { id: string; head: number }[] = [];
    for (let i = 0; i < SAVE_DESIGNS; i++) {
      const made = await call<{ id: string }>(base, designer, 'POST', `/api/workshops/${workshopId}/designs`, { title: `Load chest ${i}`, spec });
      free.push({ id: made.id, head: 1 });
    }
    const headers = { cookie: designer.cookie, 'x-csrf-token': designer.csrf, 'content-type': 'application/json' };
    const width = Number(spec.params.width);

    const lines = [`  ${CONNECTIONS} connections, ${seconds} s per scenario, 127.0.0.1; PostgreSQL ${cluster.port} (throwaway, fsync off)`];
    lines.push(await load('GET design with head revision', seconds, { url: `${base}/api/designs/${chestId}`, headers }));
    await settle(sequelize);
    let n = 0;
    lines.push(
      await load('POST revision (save)', seconds, {
        url: base,
        requests: [
          {
            method: 'POST',
            headers,
            setupRequest: (request: autocannon.Request, context: Record<string, unknown>) => {
              const design = free.shift()!;
              context.design = design;
              n += 1;
              const next = { ...spec, params: { ...spec.params, width: width + (n % 50) } };
              return { ...request, path: `/api/designs/${design.id}/revisions`, body: JSON.stringify({ baseRevision: design.head, spec: next, message: `load ${n}` }) };
            },
            onResponse: (status: number, body: string, context: Record<string, unknown>) => {
              const design = context.design as { id: string; head: number };
              if (status === 201) design.head = (JSON.parse(body) as { number: number }).number;
              else if (status === 409) design.head = (JSON.parse(body) as { error: { details: { head: { number: number } } } }).error.details.head.number;
              free.push(design);
            },
          },
        ],
      }),
    );
    await settle(sequelize);
    return lines.join('\n');
  } finally {
    if (server) {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server!.close(() => resolve()));
    }
    await sequelize.close();
    await (app.locals.sessionPool as pg.Pool).end();
    cluster.stop();
    rmSync(folder, { recursive: true, force: true });
  }
}
