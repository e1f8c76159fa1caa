import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { totpCodeAt } from '../../server/src/auth/totp';
import { users } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeUser, PASSWORD } from '../support/factories';
import { Agent } from '../support/http';
import { memorySender, startTestServer } from '../support/server';

// Issue 14, finding 9: admins turn on two-step sign-in with an authenticator app (TOTP, RFC 6238).
let db: TestDatabase;
let server: RunningServer;
const mail = memorySender();
let source = 0;
const agent = () => new Agent(server.url, { 'x-forwarded-for': `192.0.2.${++source}` });
const now = () => Math.floor(Date.now() / 1000);
/** A code one 30-second step away from now, so it differs from the one the set-up spent. */
const codeAt = (secret: string, steps: number) => totpCodeAt(secret, now() + steps * 30);
const wrongOf = (code: string) => String((Number(code) + 1) % 1_000_000).padStart(6, '0');

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, { TRUST_PROXY: '1' }, { sender: mail });
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

/** An admin with two-step sign-in on; returns the secret their app holds. */
async function adminWithTwoFactor() {
  const u = await makeUser(db.db, { admin: true });
  const a = agent();
  await a.login(u.email, PASSWORD);
  const setup = await a.post('/api/auth/two-factor/setup');
  expect(setup.status).toBe(200);
  const secret: string = setup.json.secret;
  expect((await a.post('/api/auth/two-factor/enable', { code: await codeAt(secret, 0) })).status).toBe(200);
  return { u, secret, a };
}

describe('setting up two-step sign-in', () => {
  it('shows a QR code and the secret, and is not on until a first code is right', async () => {
    const u = await makeUser(db.db, { admin: true });
    const a = agent();
    await a.login(u.email, PASSWORD);
    expect((await a.get('/api/auth/two-factor')).json).toEqual({ enabled: false, available: true });
    const setup = await a.post('/api/auth/two-factor/setup');
    expect(setup.status).toBe(200);
    expect(setup.json.secret).toMatch(/^[A-Z2-7]{32}$/);
    expect(setup.json.uri).toContain(`secret=${setup.json.secret}`);
    expect(setup.json.qr).toMatch(/^data:image\/png;base64,/);

    // The secret is not in the database as such: only sealed.
    const [row] = await db.db.select().from(users).where(eq(users.id, u.id));
    expect(row.totpPending).toBeTruthy();
    expect(row.totpPending).not.toContain(setup.json.secret);

    const wrong = await a.post('/api/auth/two-factor/enable', { code: wrongOf(await codeAt(setup.json.secret, 0)) });
    expect(wrong.status).toBe(400);
    expect(wrong.json.error.code).toBe('code-wrong');
    expect((await a.get('/api/auth/two-factor')).json.enabled).toBe(false);

    const right = await a.post('/api/auth/two-factor/enable', { code: await codeAt(setup.json.secret, 0) });
    expect(right.status).toBe(200);
    expect((await a.get('/api/auth/two-factor')).json.enabled).toBe(true);
    const [after] = await db.db.select().from(users).where(eq(users.id, u.id));
    expect(after.totpSecret).not.toContain(setup.json.secret);
  });

  it('is for admins only', async () => {
    const u = await makeUser(db.db);
    const a = agent();
    await a.login(u.email, PASSWORD);
    expect((await a.post('/api/auth/two-factor/setup')).status).toBe(403);
  });
});

describe('signing in with two-step sign-in on', () => {
  it('asks for a code after the password and is signed out until the code is right', async () => {
    const { u, secret } = await adminWithTwoFactor();
    const a = agent();
    const first = await a.login(u.email, PASSWORD);
    expect(first.status).toBe(200);
    expect(first.json).toEqual({ user: null, needsCode: true });
    expect((await a.get('/api/auth/me')).json.user).toBeNull();
    expect((await a.get('/api/admin/users')).status).toBe(401);

    const code = await codeAt(secret, 1);
    const wrong = await a.post('/api/auth/login/code', { code: wrongOf(code) });
    expect(wrong.status).toBe(401);
    expect(wrong.json.error.code).toBe('code-wrong');
    expect((await a.get('/api/auth/me')).json.user).toBeNull();

    const right = await a.post('/api/auth/login/code', { code });
    expect(right.status).toBe(200);
    expect(right.json.user.id).toBe(u.id);
    a.csrf = null;
    expect((await a.get('/api/auth/me')).json.user.id).toBe(u.id);

    // The same code does not open a second sign-in.
    const b = agent();
    await b.login(u.email, PASSWORD);
    expect((await b.post('/api/auth/login/code', { code })).status).toBe(401);
  });

  it('refuses a code without a password first, and stops after 5 wrong codes', async () => {
    const { u, secret } = await adminWithTwoFactor();
    const stranger = await agent().post('/api/auth/login/code', { code: '123456' });
    expect(stranger.status).toBe(400);
    expect(stranger.json.error.code).toBe('sign-in-again');

    const a = agent();
    await a.login(u.email, PASSWORD);
    const code = await codeAt(secret, 1);
    for (let i = 0; i < 5; i++)
      expect((await a.post('/api/auth/login/code', { code: wrongOf(code) })).status).toBe(401);
    const sixth = await a.post('/api/auth/login/code', { code });
    expect(sixth.status).toBe(400);
    expect(sixth.json.error.code).toBe('sign-in-again');
  });
});

describe('turning two-step sign-in off', () => {
  it('needs the password and a code', async () => {
    // The session that turned it on stays signed in; the code spent at set-up was this step's, so use the next.
    const { u, secret, a } = await adminWithTwoFactor();
    const noPassword = await a.post('/api/auth/two-factor/disable', {
      password: 'not my password',
      code: await codeAt(secret, 1),
    });
    expect(noPassword.status).toBe(403);
    const badCode = await a.post('/api/auth/two-factor/disable', {
      password: PASSWORD,
      code: wrongOf(await codeAt(secret, 1)),
    });
    expect(badCode.status).toBe(403);
    expect((await a.get('/api/auth/two-factor')).json.enabled).toBe(true);

    const off = await a.post('/api/auth/two-factor/disable', { password: PASSWORD, code: await codeAt(secret, 1) });
    expect(off.status).toBe(200);
    expect((await a.get('/api/auth/two-factor')).json.enabled).toBe(false);
    const plain = await agent().login(u.email, PASSWORD);
    expect(plain.json.user?.id).toBe(u.id);
  });
});
