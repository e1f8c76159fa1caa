import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupCode } from '../../server/src/auth/setup';
import { sessions, users } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeGroup, makeUser, PASSWORD } from '../support/factories';
import { Agent } from '../support/http';
import { memorySender, startTestServer, TEST_SECRET } from '../support/server';

// Issue 14, finding 9: changing one's password, and new passwords checked against a list of common ones.
let db: TestDatabase;
let server: RunningServer;
const mail = memorySender();
let groupId: number;
let source = 0;
const agent = () => new Agent(server.url, { 'x-forwarded-for': `203.0.113.${++source}` });
/** "password123" and "1234567890" are in the common-passwords list of @zxcvbn-ts/language-common 4.1.3. */
const COMMON = ['password123', 'Password123', '1234567890'];

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, { TRUST_PROXY: '1' }, { sender: mail });
  groupId = await makeGroup(db.db);
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const sessionsOf = async (userId: number) =>
  (
    await db.db
      .select()
      .from(sessions)
      .where(sql`JSON_VALUE(${sessions.data}, '$.userId') = ${userId}`)
  ).length;

describe('a signed-in person changes their password', () => {
  it('refuses a wrong current password with 403 and keeps the old one', async () => {
    const u = await makeUser(db.db);
    const a = agent();
    await a.login(u.email, PASSWORD);
    const res = await a.post('/api/auth/password', {
      currentPassword: 'not my password',
      password: 'a fresh long secret',
      confirm: 'a fresh long secret',
    });
    expect(res.status).toBe(403);
    expect(res.json.error.code).toBe('wrong-password');
    expect(res.json.error.fields.currentPassword).toBeTruthy();
    expect((await agent().login(u.email, PASSWORD)).status).toBe(200);
  });

  it('refuses a common password with 400 and says why', async () => {
    const u = await makeUser(db.db);
    const a = agent();
    await a.login(u.email, PASSWORD);
    for (const password of COMMON) {
      const res = await a.post('/api/auth/password', { currentPassword: PASSWORD, password, confirm: password });
      expect(res.status).toBe(400);
      expect(res.json.error.code).toBe('password-common');
      expect(res.json.error.fields.password).toMatch(/often used or have leaked/);
    }
  });

  it('asks to be signed in', async () => {
    const res = await agent().post('/api/auth/password', { currentPassword: PASSWORD, password: 'x', confirm: 'x' });
    expect(res.status).toBe(401);
  });

  it('changes it, ends every other sign-in, keeps this one and mails a notice', async () => {
    const u = await makeUser(db.db);
    const here = agent();
    const phone = agent();
    const laptop = agent();
    for (const a of [here, phone, laptop]) expect((await a.login(u.email, PASSWORD)).status).toBe(200);
    expect(await sessionsOf(u.id)).toBe(3);

    const res = await here.post('/api/auth/password', {
      currentPassword: PASSWORD,
      password: 'a fresh long secret',
      confirm: 'a fresh long secret',
    });
    expect(res.status).toBe(200);
    expect(await sessionsOf(u.id)).toBe(1);
    expect((await here.get('/api/auth/me')).json.user?.id).toBe(u.id);
    expect((await phone.get('/api/auth/me')).json.user).toBeNull();
    expect((await laptop.get('/api/auth/me')).json.user).toBeNull();
    expect((await agent().login(u.email, PASSWORD)).status).toBe(401);
    expect((await agent().login(u.email, 'a fresh long secret')).status).toBe(200);

    await server.ctx.outbox.drain();
    const notice = mail.sent.find((m) => m.to === u.email && /password was changed/.test(m.subject));
    expect(notice?.text).toMatch(/every other device signed in to it was signed out/);
  });
});

describe('new passwords are checked against the list of common ones', () => {
  it('refuses one at sign-up before anything is stored or mailed', async () => {
    const email = `common-${Date.now()}@example.org`;
    const res = await agent().post('/api/auth/signup', {
      name: 'Common Choice',
      email,
      password: 'password123',
      groupId,
      role: 'fixer',
    });
    expect(res.status).toBe(400);
    expect(res.json.error.code).toBe('password-common');
    expect(await db.db.select().from(users).where(eq(users.email, email))).toHaveLength(0);
  });

  it('refuses one when a reset link is used, and leaves the link usable', async () => {
    const u = await makeUser(db.db);
    expect((await agent().post('/api/auth/password-reset', { email: u.email })).status).toBe(202);
    await server.ctx.outbox.drain();
    const token = mail.sent
      .filter((m) => m.to === u.email)
      .map((m) => /reset-password\?token=([A-Za-z0-9_-]+)/.exec(m.text)?.[1])
      .find(Boolean);
    expect(token).toBeTruthy();
    const common = await agent().post('/api/auth/password-reset/confirm', {
      token,
      password: '1234567890',
      confirm: '1234567890',
    });
    expect(common.status).toBe(400);
    expect(common.json.error.code).toBe('password-common');
    const own = 'my very own secret';
    const ok = await agent().post('/api/auth/password-reset/confirm', { token, password: own, confirm: own });
    expect(ok.status).toBe(200);
  });

  it('refuses one at first-admin setup', async () => {
    const empty = await createTestDatabase();
    const s = await startTestServer(empty.url, {}, { log: () => {} });
    try {
      const res = await new Agent(s.url).post('/api/auth/first-admin', {
        name: 'First Admin',
        email: 'first@example.org',
        password: 'qwertyuiop',
        confirm: 'qwertyuiop',
        setupCode: setupCode(TEST_SECRET),
      });
      expect(res.status).toBe(400);
      expect(res.json.error.code).toBe('password-common');
    } finally {
      await s.stop();
      await empty.drop();
    }
  });
});
