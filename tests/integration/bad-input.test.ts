import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, anonymous, chestSpec, invitationTokens, signUp, startApi, tokenFromMail, waitForMail, type Api } from './support/api.ts';
import { makeDesign, makeShop, type Shop } from './support/world.ts';
import { JSON_BODY_LIMIT, createApp } from '../../server/app.ts';
import { createSequelize } from '../../server/db/sequelize.ts';

let api: Api;
let shop: Shop;
beforeAll(async () => {
  api = await startApi();
  shop = await makeShop(api.app, 'bad-input', invitationTokens(api.mailbox));
});
afterAll(() => api.close());

const PAYLOADS = [
  "Robert'); DROP TABLE designs; --",
  "' OR '1'='1",
  '<script>alert("x")</script>',
  '<img src=x onerror=alert(1)>',
  '%_\\ ${7*7} {{7*7}}',
];

async function count(table: string): Promise<number> {
  const [rows] = await api.sequelize.query(`SELECT count(*)::int AS n FROM ${table}`);
  return (rows as { n: number }[])[0]!.n;
}

describe('malformed and mistyped requests', () => {
  it('answers malformed JSON with 400 malformed_json', async () => {
    const res = await shop.designer.agent
      .post(`/api/workshops/${shop.workshopId}/designs`)
      .set('x-csrf-token', shop.designer.csrf)
      .set('Content-Type', 'application/json')
      .send('{"title": "half a chest",');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed_json');
  });

  it('names the field of a wrong type (400)', async () => {
    const designId = await makeDesign(shop.designer, shop.workshopId, 'Types');
    const cases: [string, unknown, string][] = [
      [`/api/workshops/${shop.workshopId}/designs`, { title: 42, spec: chestSpec() }, 'title'],
      [`/api/workshops/${shop.workshopId}/designs`, { title: 'x', spec: { schemaVersion: 1, kind: 'sofa', params: {} } }, 'spec.kind'],
      [`/api/workshops/${shop.workshopId}/designs`, { title: 'x', spec: { schemaVersion: 2, kind: 'chest', params: {} } }, 'spec.schemaVersion'],
      [`/api/workshops/${shop.workshopId}/designs`, { title: 'x', spec: chestSpec(), extra: true }, ''],
      [`/api/designs/${designId}/revisions`, { baseRevision: 'one', spec: chestSpec() }, 'baseRevision'],
      [`/api/designs/${designId}/revisions`, { baseRevision: 0, spec: chestSpec() }, 'baseRevision'],
      [`/api/designs/${designId}/approvals`, { revision: 1, decision: 'maybe' }, 'decision'],
      [`/api/designs/${designId}/comments`, { body: '' }, 'body'],
      [`/api/designs/${designId}/comments`, { body: 'a\u0000b' }, 'body'],
    ];
    for (const [path, body, field] of cases) {
      const client = path.endsWith('/approvals') ? shop.reviewer : shop.designer;
      const res = await client.post(path, body);
      expect(res.status, `${path} ${JSON.stringify(body)}`).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(res.body.error.details[0].path).toBe(field);
    }
    const badId = await shop.designer.get('/api/designs/not-a-uuid');
    expect(badId.status).toBe(400);
    expect(badId.body.error.details[0].path).toBe('designId');
  });

  it(`refuses a body over ${JSON_BODY_LIMIT} with 413`, async () => {
    const huge = 'x'.repeat(600 * 1024);
    const res = await shop.designer.post(`/api/workshops/${shop.workshopId}/designs`, { title: 'Huge', spec: chestSpec({ note: huge }) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });
});

describe('hostile text', () => {
  it('stores SQL and script payloads as plain text in every text field and returns them verbatim, escaped in JSON', async () => {
    const before = await count('designs');
    for (const payload of PAYLOADS) {
      const person = await (await anonymous(api.app)).post('/api/auth/register', { email: `p${Math.random().toString(36).slice(2)}@test.example`, name: payload, password: 'long enough password' });
      expect(person.body.user.name).toBe(payload);
      const workshop = await shop.owner.post('/api/workshops', { name: payload });
      expect(workshop.body.name).toBe(payload);
      const created = await shop.designer.post(`/api/workshops/${shop.workshopId}/designs`, { title: payload, spec: chestSpec(), message: payload });
      expect(created.status).toBe(201);
      expect(created.body.title).toBe(payload);
      expect(created.body.head.message).toBe(payload);
      // The raw answer carries no markup: <, > and & are \u escapes inside JSON strings.
      expect(created.text).not.toMatch(/[<>]/);
      expect(created.headers['content-type']).toMatch(/^application\/json/);
      const comment = await shop.reviewer.post(`/api/designs/${created.body.id}/comments`, { body: payload, partId: payload });
      expect(comment.body).toMatchObject({ body: payload, partId: payload });
      const found = await shop.reviewer.get(`/api/workshops/${shop.workshopId}/designs?q=${encodeURIComponent(payload)}`);
      expect(found.status).toBe(200);
      expect(found.body.designs.map((d: { title: string }) => d.title)).toContain(payload);
    }
    // Every table is still there and holds what was written.
    expect(await count('designs')).toBe(before + PAYLOADS.length);
    expect(await count('users')).toBeGreaterThan(0);
  });
});

describe('nothing half-written', () => {
  it('leaves no design behind when the engine refuses its first revision', async () => {
    const before = await count('designs');
    const res = await shop.designer.post(`/api/workshops/${shop.workshopId}/designs`, { title: 'Impossible', spec: chestSpec({ width: -5 }) });
    expect(res.status).toBe(400);
    expect(await count('designs')).toBe(before);
  });

  it('leaves no revision behind when a save is refused as stale', async () => {
    const designId = await makeDesign(shop.designer, shop.workshopId, 'Stale');
    await shop.designer.post(`/api/designs/${designId}/revisions`, { baseRevision: 1, spec: chestSpec({ width: 1100 }) });
    const before = await count('revisions');
    expect((await shop.designer.post(`/api/designs/${designId}/revisions`, { baseRevision: 1, spec: chestSpec({ width: 1200 }) })).status).toBe(409);
    expect(await count('revisions')).toBe(before);
  });

  it('stores no invitation when its e-mail cannot be sent', async () => {
    // The same app code with a mailer that has nowhere to send.
    const sequelize = createSequelize(api.config.databaseUrl, api.config.dbTimeoutMs);
    const noMail = createApp({ config: api.config, sequelize });
    try {
      const owner = new Client(noMail);
      expect((await owner.login(shop.owner.user!.email)).status).toBe(200);
      const before = await count('invitations');
      const res = await owner.post(`/api/workshops/${shop.workshopId}/invitations`, { email: 'lost@test.example', role: 'designer' });
      expect(res.status).toBe(503);
      expect(res.body.error.code).toBe('mail_unavailable');
      expect(await count('invitations')).toBe(before);
    } finally {
      await sequelize.close();
      await noMail.locals.sessionPool.end();
    }
  });

  it('keeps a reset token usable when the new password is refused', async () => {
    const person = await signUp(api.app, 'half-reset');
    const asker = await anonymous(api.app);
    await asker.post('/api/auth/password-reset', { email: person.user!.email });
    await waitForMail(api.mailbox, person.user!.email);
    const token = tokenFromMail(api.mailbox, person.user!.email, /token=([A-Za-z0-9_-]{43})/);
    expect((await asker.post('/api/auth/password-reset/confirm', { token, password: 'short' })).status).toBe(400);
    expect((await asker.post('/api/auth/password-reset/confirm', { token, password: 'long enough this time' })).status).toBe(204);
  });
});
