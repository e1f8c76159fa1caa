import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { argon2Runs, hashPassword, MAX_CONCURRENT_HASHES } from '../../server/src/auth/passwords';
import { sessions, users } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { memorySender, startTestServer } from '../support/server';

// Issue 14, findings 3 and 9: password hashing on demand, per-source limits, session lifetime, cookie, sign-up.
let db: TestDatabase;
let server: RunningServer;
const mail = memorySender();
let groupId: number;
let source = 0;
/** Each test comes from its own address, so the per-source budget of one does not spill into the next. */
const agent = () => new Agent(server.url, { 'x-forwarded-for': `198.51.100.${++source}` });

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, { TRUST_PROXY: '1', AUTH_RATE_MAX: '6' }, { sender: mail });
  groupId = await makeGroup(db.db);
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const linkToken = (text: string) => /\/verify-email\?token=([A-Za-z0-9_-]+)/.exec(text)?.[1];

describe('password hashes only after the cheap checks', () => {
  it('refuses a reset with a link that does not exist without hashing the new password', async () => {
    const before = argon2Runs.started;
    const res = await agent().post('/api/auth/password-reset/confirm', {
      token: 'x'.repeat(43),
      password: 'a new long password',
      confirm: 'a new long password',
    });
    expect(res.status).toBe(400);
    expect(res.json.error.code).toBe('link-invalid');
    expect(argon2Runs.started).toBe(before);
  });

  it('runs no more than a few hashes at once; the rest wait and all finish', async () => {
    argon2Runs.peak = 0;
    const hashes = await Promise.all(Array.from({ length: 12 }, (_, i) => hashPassword(`password number ${i}`)));
    expect(new Set(hashes).size).toBe(12);
    expect(argon2Runs.peak).toBeLessThanOrEqual(MAX_CONCURRENT_HASHES);
    expect(argon2Runs.active).toBe(0);
  });
});

describe('one budget per source address for every auth POST', () => {
  it('answers the seventh auth POST from one address 429 with Retry-After, whatever the e-mail', async () => {
    const a = agent();
    const statuses: number[] = [];
    const signup = (n: number) => ({
      name: 'Sprayer',
      email: `spray-${n}@example.org`,
      password: 'long enough pw',
      groupId,
      role: 'fixer',
    });
    statuses.push((await a.post('/api/auth/signup', signup(1))).status);
    statuses.push((await a.post('/api/auth/signup', signup(2))).status);
    statuses.push((await a.post('/api/auth/password-reset', { email: 'spray-3@example.org' })).status);
    statuses.push((await a.post('/api/auth/verify-email', { token: 'y'.repeat(43) })).status);
    statuses.push((await a.post('/api/auth/login', { email: 'spray-4@example.org', password: 'x' })).status);
    statuses.push((await a.post('/api/invites/not-a-real-invite/signup', signup(5))).status);
    const seventh = await a.post('/api/auth/signup', signup(6));
    expect(statuses).not.toContain(429);
    expect(seventh.status).toBe(429);
    expect(seventh.json.error.code).toBe('rate-limited');
    expect(Number(seventh.headers.get('retry-after'))).toBeGreaterThan(0);
    // Another address is not held back by this one.
    expect((await agent().post('/api/auth/signup', signup(7))).status).toBe(202);
  });
});

describe('sign-in sessions', () => {
  const setSignedInAt = (userId: number, at: number) =>
    db.db
      .update(sessions)
      .set({ data: sql`JSON_SET(${sessions.data}, '$.signedInAt', ${at})` })
      .where(sql`JSON_VALUE(${sessions.data}, '$.userId') = ${userId}`);

  it('end 12 hours after sign-in even while in use, and not before', async () => {
    const u = await makeUser(db.db);
    const a = agent();
    expect((await a.login(u.email, u.password)).status).toBe(200);
    await setSignedInAt(u.id, Date.now() - 11.9 * 3600_000);
    expect((await a.get('/api/auth/me')).json.user?.email).toBe(u.email);
    await setSignedInAt(u.id, Date.now() - 12.1 * 3600_000);
    expect((await a.get('/api/auth/me')).json.user).toBeNull();
    // Signing in again starts a new lifetime.
    expect((await a.login(u.email, u.password)).status).toBe(200);
    expect((await a.get('/api/auth/me')).json.user?.email).toBe(u.email);
  });

  it('use a __Host- cookie (Secure, Path=/, no Domain) when the site is served over HTTPS', async () => {
    const s = await startTestServer(db.url, { TRUST_PROXY: '1', COOKIE_HOST_PREFIX: '1' });
    try {
      const u = await makeUser(db.db);
      const a = new Agent(s.url, { 'x-forwarded-proto': 'https', 'x-forwarded-for': '203.0.113.40' });
      expect((await a.login(u.email, u.password)).status).toBe(200);
      const cookie = a.lastSetCookie.find((c) => c.startsWith('__Host-mendery.sid='));
      expect(cookie).toBeTruthy();
      expect(cookie).toMatch(/;\s*Secure/i);
      expect(cookie).toMatch(/;\s*Path=\/(;|$)/i);
      expect(cookie).not.toMatch(/Domain=/i);
      expect((await a.get('/api/auth/me')).json.user?.email).toBe(u.email);
      const out = await a.post('/api/auth/logout');
      expect(out.status).toBe(204);
      expect(a.lastSetCookie.find((c) => c.startsWith('__Host-mendery.sid='))).toMatch(/Expires=Thu, 01 Jan 1970/);
    } finally {
      await s.stop();
    }
  });
});

describe('signing up again for an address that is not confirmed yet', () => {
  it('does not keep the first signer’s password once the second signer confirms', async () => {
    const email = `twice-${Date.now()}@example.org`;
    const first = { name: 'First Signer', email, password: 'first signer pw', groupId, role: 'fixer' };
    const second = { ...first, name: 'Second Signer', password: 'second signer pw' };
    expect((await agent().post('/api/auth/signup', first)).status).toBe(202);
    expect((await agent().post('/api/auth/signup', second)).status).toBe(202);
    await server.ctx.outbox.drain();
    const links = mail.sent.filter((m) => m.to === email).map((m) => linkToken(m.text));
    expect(links).toHaveLength(2);
    expect(links.every(Boolean)).toBe(true);

    const owner = agent();
    expect((await owner.post('/api/auth/verify-email', { token: links[1] })).status).toBe(200);
    expect((await agent().login(email, 'first signer pw')).status).toBe(401);
    expect((await owner.login(email, 'second signer pw')).status).toBe(200);
    const [row] = await db.db.select().from(users).where(eq(users.email, email));
    expect(row.name).toBe('Second Signer');
    // The first signer's link died with the confirmation.
    expect((await agent().post('/api/auth/verify-email', { token: links[0] })).status).toBe(400);
  });
});
