import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../shared/constants';
import { bookings, events, repairGroups } from '../../server/src/db/schema/index';
import { seedDemo } from '../../server/src/seed/demo';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { Agent } from '../support/http';
import { startTestServer, TEST_SECRET } from '../support/server';

/** The demo has a Dutch-speaking group, so the languages can be seen working on first start. */
let db: TestDatabase;
let server: RunningServer;
beforeAll(async () => {
  db = await createTestDatabase();
  await seedDemo(db.db, { linkSecret: TEST_SECRET });
  server = await startTestServer(db.url);
}, 120_000);
afterAll(async () => {
  await server.stop();
  await db.drop();
});

describe('the Dutch demo group', () => {
  it('speaks Dutch by default, has a published session with bookings made in Dutch, and an organiser who reads Dutch', async () => {
    const [g] = await db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'herstelkring-kernebroek'));
    expect(g).toMatchObject({ defaultLanguage: 'nl', timeZone: 'Europe/Amsterdam', currency: 'EUR', country: 'NLD' });
    const [e] = await db.db.select().from(events).where(eq(events.groupId, g.id));
    expect(e.status).toBe('published');
    const booked = await db.db.select().from(bookings).where(eq(bookings.eventId, e.id));
    expect(booked.length).toBe(3);
    expect(new Set(booked.map((b) => b.language))).toEqual(new Set(['nl']));
    const organiser = new Agent(server.url);
    expect((await organiser.login('organisator@example.org', DEMO_PASSWORD)).status).toBe(200);
    const me = (await organiser.get('/api/auth/me')).json.user;
    expect(me.language).toBe('nl');
    expect(me.roles).toEqual([{ groupId: g.id, role: 'organiser', groupName: 'Herstelkring Kernebroek' }]);
    const settings = (await organiser.get(`/api/groups/${g.id}/settings`)).json;
    expect(settings.defaultLanguage).toBe('nl');
  });
});
