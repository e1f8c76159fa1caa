import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

let db: TestDatabase;
beforeAll(async () => {
  db = await createTestDatabase();
});
afterAll(async () => {
  await db.drop();
});

describe('sessions stored in MariaDB', () => {
  it('survive a restart of the server process', async () => {
    const u = await makeUser(db.db);
    const first = await startTestServer(db.url);
    const a = new Agent(first.url);
    expect((await a.login(u.email, u.password)).status).toBe(200);
    await first.stop();

    const second = await startTestServer(db.url);
    try {
      a.base = second.url;
      const me = await a.get('/api/auth/me');
      expect(me.status).toBe(200);
      expect(me.json.user.email).toBe(u.email);
    } finally {
      await second.stop();
    }
  });

  it('are shared by two processes serving the same database', async () => {
    const u = await makeUser(db.db);
    const [one, two] = await Promise.all([startTestServer(db.url), startTestServer(db.url)]);
    try {
      const a = new Agent(one.url);
      await a.login(u.email, u.password);
      a.base = two.url;
      const me = await a.get('/api/auth/me');
      expect(me.status).toBe(200);
      expect(me.json.user.email).toBe(u.email);
    } finally {
      await Promise.all([one.stop(), two.stop()]);
    }
  });

  it('end after the idle timeout, and each request pushes the timeout back', async () => {
    const u = await makeUser(db.db);
    // 0.05 minutes = 3 s idle timeout.
    const server = await startTestServer(db.url, { SESSION_IDLE_MINUTES: '0.05' });
    try {
      const active = new Agent(server.url);
      const idle = new Agent(server.url);
      await active.login(u.email, u.password);
      await idle.login(u.email, u.password);
      for (let i = 0; i < 4; i++) {
        await new Promise((r) => setTimeout(r, 1000));
        const me = await active.get('/api/auth/me');
        expect(me.status).toBe(200);
        expect(me.json.user.email).toBe(u.email);
      }
      // Over 4 s have passed: longer than the timeout for the idle one, about 1 s at a time for the active one.
      // Signed out is not an error: /auth/me answers 200 with no user (issue 12).
      const idleMe = await idle.get('/api/auth/me');
      expect(idleMe.status).toBe(200);
      expect(idleMe.json.user).toBeNull();
    } finally {
      await server.stop();
    }
  });
});
