import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { buildTestApp } from '../support/testApp.ts';

const ctx = buildTestApp();
afterAll(() => ctx.close());

describe('GET /api/health', () => {
  it('reports the database as up with a measured latency', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('ok');
    expect(res.body.database.state).toBe('up');
    expect(res.body.database.latencyMs).toBeGreaterThanOrEqual(0);
  });
});

describe('unknown /api routes', () => {
  it('answer 404 in the JSON error shape', async () => {
    const res = await request(ctx.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('not_found');
    expect(res.body.error.message).toContain('/api/no-such-thing');
  });
});

describe('the database being unreachable', () => {
  it('turns health into a 503 JSON answer instead of a hang', async () => {
    // A port nothing listens on: the same app code against a database that is down.
    const down = buildTestApp({ DATABASE_URL: 'postgres://postgres:x@127.0.0.1:9/nothing' });
    const res = await request(down.app).get('/api/health');
    await down.close();
    expect(res.status).toBe(503);
    expect(res.body.database.state).toBe('down');
    expect(res.body.error.code).toBe('database_unavailable');
  });
});
