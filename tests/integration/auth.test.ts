import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { Client, PASSWORD, anonymous, signUp, startApi, tokenFromMail, uniqueEmail, waitForMail, type Api } from './support/api.ts';
import { LOGIN_ATTEMPTS } from '../../server/auth/rateLimit.ts';

let api: Api;
beforeAll(async () => {
  api = await startApi();
});
afterAll(() => api.close());

function sessionCookie(res: request.Response): string {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  const found = cookies.find((c) => c.startsWith('casewright.sid='));
  if (!found) throw new Error(`no session cookie in ${JSON.stringify(cookies)}`);
  return found;
}

describe('POST /api/auth/register', () => {
  it('creates the account, signs it in and sets an httpOnly SameSite=Lax session cookie', async () => {
    const client = await anonymous(api.app);
    const email = uniqueEmail('register');
    const res = await client.post('/api/auth/register', { email: email.toUpperCase(), name: 'Ada Plane', password: PASSWORD });
    expect(res.status).toBe(201);
    expect(res.body.user.email).toBe(email);
    expect(res.body.workshops).toEqual([]);
    const cookie = sessionCookie(res);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);
    const me = await client.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.name).toBe('Ada Plane');
  });

  it('never stores the password itself, only an argon2id hash', async () => {
    const client = await signUp(api.app, 'hash');
    const [row] = await api.sequelize.query('SELECT password_hash FROM users WHERE id = :id', { replacements: { id: client.user!.id }, plain: false });
    const hash = (row as { password_hash: string }[])[0]!.password_hash;
    expect(hash.startsWith('$argon2id$')).toBe(true);
    expect(hash).not.toContain(PASSWORD);
  });

  it('refuses a second account with the same e-mail in any letter case (409)', async () => {
    const first = await signUp(api.app, 'twice');
    const again = await anonymous(api.app);
    const res = await again.post('/api/auth/register', { email: first.user!.email.toUpperCase(), name: 'Other', password: PASSWORD });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('email_taken');
  });

  it('names the field and the limit for a short password and a bad e-mail (400)', async () => {
    const client = await anonymous(api.app);
    const short = await client.post('/api/auth/register', { email: uniqueEmail('short'), name: 'A', password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.details).toContainEqual(expect.objectContaining({ path: 'password', message: 'must be at least 10 characters' }));
    const bad = await client.post('/api/auth/register', { email: 'not-an-email', name: 'A', password: PASSWORD });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('email');
  });
});

describe('POST /api/auth/login', () => {
  it('signs in with the right password and refuses a wrong one with 401', async () => {
    const owner = await signUp(api.app, 'login');
    const client = new Client(api.app);
    const wrong = await client.login(owner.user!.email, 'not the password');
    expect(wrong.status).toBe(401);
    expect(wrong.body.error.code).toBe('invalid_credentials');
    const right = await client.login(owner.user!.email);
    expect(right.status).toBe(200);
    expect(right.body.user.id).toBe(owner.user!.id);
    expect((await client.get('/api/auth/me')).status).toBe(200);
  });

  it('answers an unknown e-mail exactly like a wrong password', async () => {
    const res = await new Client(api.app).login(uniqueEmail('nobody'));
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid_credentials');
  });

  it(`rate-limits an address and e-mail after ${LOGIN_ATTEMPTS} failed attempts, even with the right password (429)`, async () => {
    const victim = await signUp(api.app, 'limited');
    const attacker = new Client(api.app);
    for (let i = 0; i < LOGIN_ATTEMPTS; i++) expect((await attacker.login(victim.user!.email, `guess-${i}`)).status).toBe(401);
    const blocked = await attacker.login(victim.user!.email);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('too_many_attempts');
    // Another account from the same address is not locked out by it.
    const other = await signUp(api.app, 'unlimited');
    expect((await new Client(api.app).login(other.user!.email)).status).toBe(200);
  });
});

describe('CSRF protection', () => {
  it('refuses a state-changing request without the x-csrf-token header (403)', async () => {
    const client = await signUp(api.app, 'csrf');
    const res = await client.agent.post('/api/workshops').send({ name: 'No token' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it("refuses another session's token", async () => {
    const mine = await signUp(api.app, 'csrf-mine');
    const theirs = await signUp(api.app, 'csrf-theirs');
    const res = await mine.agent.post('/api/workshops').set('x-csrf-token', theirs.csrf).send({ name: 'Stolen token' });
    expect(res.status).toBe(403);
  });

  it('lets reads through without a token', async () => {
    const client = await signUp(api.app, 'csrf-read');
    expect((await client.agent.get('/api/workshops')).status).toBe(200);
  });
});

describe('sessions', () => {
  it('sign-out ends the session on the server: the old cookie no longer works', async () => {
    const client = await signUp(api.app, 'logout');
    const cookie = client.sessionCookie;
    expect(cookie).toMatch(/^casewright\.sid=/);
    const out = await client.post('/api/auth/logout');
    expect(out.status).toBe(204);
    expect((await client.get('/api/auth/me')).status).toBe(401);
    // Replaying the cookie captured before sign-out (as a thief would) is refused too.
    const replay = await request(api.app).get('/api/auth/me').set('Cookie', cookie);
    expect(replay.status).toBe(401);
  });

  it('survives a server restart: a new app on the same database accepts the cookie', async () => {
    const client = await signUp(api.app, 'restart');
    const cookie = client.sessionCookie;
    expect((await request(api.app).get('/api/auth/me').set('Cookie', cookie)).status).toBe(200);
    const restarted = await startApi();
    try {
      const me = await request(restarted.app).get('/api/auth/me').set('Cookie', cookie);
      expect(me.status).toBe(200);
      expect(me.body.user.id).toBe(client.user!.id);
    } finally {
      await restarted.close();
    }
  });

  it('marks the cookie Secure in production (behind a TLS-terminating proxy)', async () => {
    const prod = await startApi({ NODE_ENV: 'production', SESSION_SECRET: 'a-production-secret-of-at-least-32-chars', TRUST_PROXY: '1' });
    try {
      const res = await request(prod.app).get('/api/auth/csrf').set('X-Forwarded-Proto', 'https');
      expect(res.status).toBe(200);
      expect(sessionCookie(res)).toMatch(/;\s*Secure/i);
      // The inbox of the mail catcher is a development tool only.
      expect((await request(prod.app).get('/api/dev/mail')).status).toBe(404);
    } finally {
      await prod.close();
    }
  });
});

describe('password reset', () => {
  const resetLink = /reset-password\?token=([A-Za-z0-9_-]{43})/;

  it('e-mails a one-time link that sets a new password, ends old sessions, and then stops working', async () => {
    const owner = await signUp(api.app, 'reset');
    const email = owner.user!.email;
    const asker = await anonymous(api.app);
    expect((await asker.post('/api/auth/password-reset', { email })).status).toBe(202);
    await waitForMail(api.mailbox, email);
    const token = tokenFromMail(api.mailbox, email, resetLink);

    const newPassword = 'a brand new password 2';
    expect((await asker.post('/api/auth/password-reset/confirm', { token, password: newPassword })).status).toBe(204);
    expect((await owner.get('/api/auth/me')).status).toBe(401);
    expect((await new Client(api.app).login(email, PASSWORD)).status).toBe(401);
    expect((await new Client(api.app).login(email, newPassword)).status).toBe(200);

    const reused = await asker.post('/api/auth/password-reset/confirm', { token, password: 'and yet another one 3' });
    expect(reused.status).toBe(400);
    expect(reused.body.error.code).toBe('invalid_token');
  });

  it('refuses an expired token', async () => {
    const owner = await signUp(api.app, 'reset-expired');
    const email = owner.user!.email;
    const asker = await anonymous(api.app);
    await asker.post('/api/auth/password-reset', { email });
    await waitForMail(api.mailbox, email);
    const token = tokenFromMail(api.mailbox, email, resetLink);
    await api.sequelize.query(`UPDATE password_resets SET expires_at = now() - interval '1 second' WHERE user_id = :id`, { replacements: { id: owner.user!.id } });
    const res = await asker.post('/api/auth/password-reset/confirm', { token, password: 'too late a password' });
    expect(res.status).toBe(400);
    expect((await new Client(api.app).login(email, PASSWORD)).status).toBe(200);
  });

  it('answers an unknown e-mail the same way and sends nothing', async () => {
    const email = uniqueEmail('reset-nobody');
    const res = await (await anonymous(api.app)).post('/api/auth/password-reset', { email });
    expect(res.status).toBe(202);
    expect(api.mailbox.messages(email)).toEqual([]);
  });
});
