import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { authTokens, users } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { memorySender, startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
const mail = memorySender();
let groupId: number;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, { LOGIN_RATE_MAX: '3', TRUST_PROXY: '1' }, { sender: mail });
  groupId = await makeGroup(db.db);
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const linkToken = (text: string, path: string) => new RegExp(`${path}\\?token=([A-Za-z0-9_-]+)`).exec(text)?.[1];

describe('sign-in', () => {
  it('signs in, answers me with the user and roles, and signs out', async () => {
    const u = await makeUser(db.db, {
      roles: [
        [groupId, 'organiser'],
        [groupId, 'fixer'],
      ],
    });
    const a = new Agent(server.url);
    const login = await a.login(u.email, u.password);
    expect(login.status).toBe(200);
    expect(login.json.user).toMatchObject({ id: u.id, email: u.email, admin: false });
    expect(login.json.user.roles.map((r: { role: string }) => r.role).sort()).toEqual(['fixer', 'organiser']);
    expect(login.json.user.roles[0].groupId).toBe(groupId);

    const me = await a.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.json.user.email).toBe(u.email);

    const out = await a.post('/api/auth/logout');
    expect(out.status).toBe(204);
    // Signed out is not an error: /auth/me answers 200 with no user (issue 12), so anonymous pages log no 401.
    const after = await a.get('/api/auth/me');
    expect(after.status).toBe(200);
    expect(after.json.user).toBeNull();
  });

  it('gives the same answer for an unknown e-mail and a wrong password', async () => {
    const u = await makeUser(db.db);
    const wrong = await new Agent(server.url).login(u.email, 'not the password');
    const unknown = await new Agent(server.url).login(`nobody-${u.id}@example.org`, 'not the password');
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(unknown.json).toEqual(wrong.json);
    expect(wrong.json.error.code).toBe('invalid-credentials');
  });

  it('answers 429 once an address and source have failed too often', async () => {
    const u = await makeUser(db.db);
    const a = new Agent(server.url, { 'x-forwarded-for': '203.0.113.7' });
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) statuses.push((await a.login(u.email, 'wrong guess')).status);
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
    const limited = await a.login(u.email, u.password);
    expect(limited.status).toBe(429);
    expect(limited.json.error.code).toBe('rate-limited');
    // Another source is not held back by this one's failures.
    const elsewhere = new Agent(server.url, { 'x-forwarded-for': '198.51.100.9' });
    expect((await elsewhere.login(u.email, u.password)).status).toBe(200);
  });

  it('starts a session only at sign-in, and the anonymous CSRF token stops working', async () => {
    const u = await makeUser(db.db);
    const a = new Agent(server.url);
    const before = await a.token();
    // An anonymous token is bound to its own cookie, not to a session: there is no session until sign-in.
    expect(a.cookies.get('mendery.sid')).toBeUndefined();
    await a.raw('POST', '/api/auth/login', {
      body: { email: u.email, password: u.password },
      headers: { 'x-csrf-token': before },
    });
    expect(a.cookies.get('mendery.sid')).toBeTruthy();
    const stale = await a.raw('POST', '/api/auth/logout', { headers: { 'x-csrf-token': before } });
    expect(stale.status).toBe(403);
    const fresh = await a.token();
    expect((await a.raw('POST', '/api/auth/logout', { headers: { 'x-csrf-token': fresh } })).status).toBe(204);
  });

  it('sets the cookie HttpOnly and SameSite=Lax, and Secure behind an HTTPS proxy', async () => {
    const u = await makeUser(db.db);
    const plain = new Agent(server.url);
    await plain.login(u.email, u.password);
    const cookie = plain.lastSetCookie.find((c) => c.startsWith('mendery.sid='))!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);
    const https = new Agent(server.url, { 'x-forwarded-proto': 'https' });
    await https.login(u.email, u.password);
    expect(https.lastSetCookie.find((c) => c.startsWith('mendery.sid='))).toMatch(/Secure/);
  });

  it('refuses an unverified account with a reason, only when the password is right', async () => {
    const u = await makeUser(db.db, { verified: false });
    expect((await new Agent(server.url).login(u.email, u.password)).json.error.code).toBe('email-unverified');
    expect((await new Agent(server.url).login(u.email, 'wrong')).json.error.code).toBe('invalid-credentials');
  });
});

describe('CSRF', () => {
  it('refuses a state-changing request without the token, and with another session’s token', async () => {
    const a = new Agent(server.url);
    const none = await a.raw('POST', '/api/auth/login', { body: { email: 'x@example.org', password: 'y' } });
    expect(none.status).toBe(403);
    expect(none.json.error.code).toBe('csrf');
    const other = await new Agent(server.url).token();
    await a.token();
    const foreign = await a.raw('POST', '/api/auth/login', {
      body: { email: 'x@example.org', password: 'y' },
      headers: { 'x-csrf-token': other },
    });
    expect(foreign.status).toBe(403);
  });
});

describe('volunteer sign-up and e-mail links', () => {
  it('mails a confirmation link; confirming lets the volunteer sign in with a pending role', async () => {
    const a = new Agent(server.url);
    const email = `new-${Date.now()}@example.org`;
    const res = await a.post('/api/auth/signup', {
      name: 'Nell Tester',
      email,
      password: 'long enough pw',
      groupId,
      role: 'fixer',
    });
    expect(res.status).toBe(202);
    await server.ctx.outbox.drain();
    const m = mail.sent.find((x) => x.to === email)!;
    expect(m.subject).toMatch(/Confirm your e-mail/);
    expect((await a.login(email, 'long enough pw')).json.error.code).toBe('email-unverified');
    const token = linkToken(m.text, '/verify-email')!;
    expect((await a.post('/api/auth/verify-email', { token })).status).toBe(200);
    expect((await a.post('/api/auth/verify-email', { token })).status).toBe(400);
    const login = await a.login(email, 'long enough pw');
    expect(login.status).toBe(200);
    expect(login.json.user.roles).toEqual([]);
  });

  it('answers a sign-up for a taken address like any other, and tells the owner by mail', async () => {
    const u = await makeUser(db.db);
    const res = await new Agent(server.url).post('/api/auth/signup', {
      name: 'Someone',
      email: u.email,
      password: 'long enough pw',
      groupId,
      role: 'host',
    });
    expect(res.status).toBe(202);
    await server.ctx.outbox.drain();
    expect(mail.sent.find((x) => x.to === u.email)?.subject).toMatch(/already have/);
  });

  it('refuses invalid sign-up fields with a message per field and writes nothing', async () => {
    const res = await new Agent(server.url).post('/api/auth/signup', {
      name: '',
      email: 'nope',
      password: 'short',
      groupId: 0,
      role: 'boss',
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields).sort()).toEqual(['email', 'groupId', 'name', 'password', 'role']);
    const [{ n }] = (await db.db
      .select({ n: sql<number>`COUNT(*)` })
      .from(users)
      .where(eq(users.email, 'nope'))) as { n: number }[];
    expect(Number(n)).toBe(0);
  });

  it('resets a password with a single-use link, and signs out the old sessions', async () => {
    const u = await makeUser(db.db);
    const old = new Agent(server.url);
    await old.login(u.email, u.password);
    const a = new Agent(server.url);
    expect((await a.post('/api/auth/password-reset', { email: u.email })).status).toBe(202);
    await server.ctx.outbox.drain();
    const token = linkToken(mail.sent.filter((x) => x.to === u.email).at(-1)!.text, '/reset-password')!;
    const ok = await a.post('/api/auth/password-reset/confirm', {
      token,
      password: 'a brand new secret',
      confirm: 'a brand new secret',
    });
    expect(ok.status).toBe(200);
    expect(
      (
        await a.post('/api/auth/password-reset/confirm', {
          token,
          password: 'another new secret',
          confirm: 'another new secret',
        })
      ).status,
    ).toBe(400);
    expect((await new Agent(server.url).login(u.email, 'a brand new secret')).status).toBe(200);
    expect((await new Agent(server.url).login(u.email, u.password)).status).toBe(401);
    // Signed out is not an error: /auth/me answers 200 with no user (issue 12).
    const oldMe = await old.get('/api/auth/me');
    expect(oldMe.status).toBe(200);
    expect(oldMe.json.user).toBeNull();
  });

  it('refuses a reset link after its hour is up', async () => {
    const u = await makeUser(db.db);
    const a = new Agent(server.url);
    await a.post('/api/auth/password-reset', { email: u.email });
    await server.ctx.outbox.drain();
    const token = linkToken(mail.sent.filter((x) => x.to === u.email).at(-1)!.text, '/reset-password')!;
    const [row] = await db.db.select().from(authTokens).where(eq(authTokens.userId, u.id));
    expect(row.expiresAt.getTime() - row.createdAt.getTime()).toBeGreaterThan(3599_000);
    expect(row.expiresAt.getTime() - row.createdAt.getTime()).toBeLessThanOrEqual(3601_000);
    await db.db
      .update(authTokens)
      .set({ expiresAt: sql`NOW(3) - INTERVAL 1 SECOND` })
      .where(eq(authTokens.id, row.id));
    const res = await a.post('/api/auth/password-reset/confirm', {
      token,
      password: 'a brand new secret',
      confirm: 'a brand new secret',
    });
    expect(res.status).toBe(400);
    expect(res.json.error.code).toBe('link-invalid');
  });

  it('answers a reset request for an unknown address exactly like a known one, and sends nothing', async () => {
    const before = mail.sent.length;
    const a = await new Agent(server.url).post('/api/auth/password-reset', { email: 'nobody-here@example.org' });
    const u = await makeUser(db.db);
    const b = await new Agent(server.url).post('/api/auth/password-reset', { email: u.email });
    await server.ctx.outbox.drain();
    expect(a.status).toBe(b.status);
    expect(a.json).toEqual(b.json);
    expect(mail.sent.slice(before).map((m) => m.to)).toEqual([u.email]);
  });
});
