import { count, eq } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../shared/constants';
import { argon2Runs } from '../../server/src/auth/passwords';
import { setupCode } from '../../server/src/auth/setup';
import { settings, users } from '../../server/src/db/schema/index';
import { seedDemo } from '../../server/src/seed/demo';
import { demoChoice, prepareData } from '../../server/src/seed/first-run';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { Agent } from '../support/http';
import { startTestServer, TEST_SECRET } from '../support/server';

// Issue 14, finding 1: a production start must not load the demo, nor keep its published password.
const made: TestDatabase[] = [];
afterAll(async () => {
  await Promise.all(made.map((d) => d.drop()));
});
const fresh = async () => {
  const d = await createTestDatabase();
  made.push(d);
  return d;
};
const quiet = { linkSecret: TEST_SECRET, log: () => {} };
const userCount = async (d: TestDatabase) => (await d.db.select({ n: count() }).from(users))[0].n;

describe('which starts load the demo', () => {
  it('a local start loads it with the published password; production only when DEMO=1, and then privately', () => {
    expect(demoChoice({})).toBe('published');
    expect(demoChoice({ NODE_ENV: 'development' })).toBe('published');
    expect(demoChoice({ DEMO: '0' })).toBe('none');
    expect(demoChoice({ NODE_ENV: 'production' })).toBe('none');
    expect(demoChoice({ DATABASE_URL: 'mysql://app@db.internal/mendery' })).toBe('none');
    expect(demoChoice({ PUBLIC_URL: 'https://repair.example.org' })).toBe('none');
    expect(demoChoice({ NODE_ENV: 'production', DEMO: '1' })).toBe('private');
    expect(demoChoice({ NODE_ENV: 'production', DEMO: '0' })).toBe('none');
  });

  it('a production start on an empty database creates no account at all', async () => {
    const d = await fresh();
    expect(await prepareData(d.db, { NODE_ENV: 'production' }, quiet)).toBe('none');
    expect(await userCount(d)).toBe(0);
    const [seeded] = await d.db.select().from(settings).where(eq(settings.key, 'seeded'));
    expect(seeded.value).toBe(false);
  });

  it('production with DEMO=1 loads the demo, but the published password does not sign in', async () => {
    const d = await fresh();
    const lines: string[] = [];
    await prepareData(d.db, { NODE_ENV: 'production', DEMO: '1' }, { ...quiet, log: (l) => lines.push(l) });
    expect(await userCount(d)).toBeGreaterThan(0);
    const password = /private password for its accounts: (\S+)/.exec(lines.join('\n'))?.[1];
    expect(password).toBeTruthy();
    const s = await startTestServer(d.url, { NODE_ENV: 'production' });
    try {
      expect((await new Agent(s.url).login('admin@example.org', DEMO_PASSWORD)).status).toBe(401);
      expect((await new Agent(s.url).login('admin@example.org', password!)).status).toBe(200);
      // The sign-in page shows the published password only while it works.
      expect((await new Agent(s.url).get('/api/public/config')).json.demo).toBe(false);
    } finally {
      await s.stop();
    }
  });

  it('a production start closes the published password of a demo loaded earlier', async () => {
    const d = await fresh();
    await seedDemo(d.db, { linkSecret: TEST_SECRET });
    await prepareData(d.db, { NODE_ENV: 'production' }, quiet);
    const s = await startTestServer(d.url, { NODE_ENV: 'production' });
    try {
      expect((await new Agent(s.url).login('admin@example.org', DEMO_PASSWORD)).status).toBe(401);
      expect((await new Agent(s.url).login('organiser@example.org', DEMO_PASSWORD)).status).toBe(401);
    } finally {
      await s.stop();
    }
  });
});

describe('first-admin setup on an empty installation', () => {
  it('prints a setup code, refuses setup without it or with a wrong one before hashing, and works once', async () => {
    const d = await fresh();
    await prepareData(d.db, { NODE_ENV: 'production' }, quiet);
    const log: string[] = [];
    const s = await startTestServer(d.url, {}, { log: (l) => log.push(l) });
    try {
      const code = setupCode(TEST_SECRET);
      expect(log.join('\n')).toContain(`Setup code: ${code}`);
      const admin = { name: 'Olwen Firstadmin', email: 'olwen@example.org', password: 'first admin secret' };
      const body = (setup?: string) => ({ ...admin, confirm: admin.password, setupCode: setup });
      const a = new Agent(s.url);

      const without = await a.post('/api/auth/first-admin', body());
      expect(without.status).toBe(400);
      expect(without.json.error.fields.setupCode).toBeTruthy();
      const hashesBefore = argon2Runs.started;
      const wrong = await a.post('/api/auth/first-admin', body(code.slice(0, -1) + (code.endsWith('A') ? 'B' : 'A')));
      expect(wrong.status).toBe(403);
      expect(wrong.json.error.code).toBe('setup-code');
      expect(argon2Runs.started).toBe(hashesBefore);
      expect(await userCount(d)).toBe(0);

      const right = await a.post('/api/auth/first-admin', body(code));
      expect(right.status).toBe(201);
      expect(right.json.user).toMatchObject({ email: admin.email, admin: true });

      // Once set up, a second attempt is refused before any hash, even with the right code.
      const again = argon2Runs.started;
      const second = await new Agent(s.url).post('/api/auth/first-admin', {
        ...body(code),
        email: 'other@example.org',
      });
      expect(second.status).toBe(409);
      expect(argon2Runs.started).toBe(again);
      expect(await userCount(d)).toBe(1);
    } finally {
      await s.stop();
    }
  });
});
