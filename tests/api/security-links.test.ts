import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { events } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { memorySender, startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
let groupId: number;
let kettle: number;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, {}, { sender: memorySender() });
  groupId = await makeGroup(db.db);
  kettle = await categoryId(db.db, 'kettle');
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

describe('finding 10: the manage token travels in a header, not the URL', () => {
  it('shows, moves and cancels a booking with the token in X-Manage-Token only', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { slotCount: 2 });
    const a = new Agent(server.url);
    const body = {
      slotId: slotIds[0],
      visitor: visitor(),
      items: [{ categoryId: kettle, fault: 'It hums.' }],
      consent: true,
    };
    const { reference, manageToken } = (await a.post('/api/bookings', body)).json;
    const header = { 'x-manage-token': manageToken };
    const seen = await a.raw('GET', `/api/bookings/${reference}`, { headers: header });
    expect(seen.status).toBe(200);
    expect(seen.json).toMatchObject({ reference, status: 'confirmed' });
    // A wrong token in the header is refused like a wrong one in the query.
    const wrong = await a.raw('GET', `/api/bookings/${reference}`, { headers: { 'x-manage-token': 'x'.repeat(43) } });
    expect(wrong.status).toBe(404);
    const csrf = await a.token();
    const cancelled = await a.raw('DELETE', `/api/bookings/${reference}`, {
      headers: { ...header, 'x-csrf-token': csrf },
    });
    expect(cancelled.status).toBe(204);
    // Links already mailed keep working with ?token=.
    expect((await a.get(`/api/bookings/${reference}?token=${manageToken}`)).json.status).toBe('cancelled');
  });
});

const DAY = 86_400_000;

async function bookOne(email?: string) {
  const { eventId, slotIds } = await makeEvent(db.db, groupId, { slotCount: 2 });
  const a = new Agent(server.url);
  const who = email ? { ...visitor(), email } : visitor();
  const res = await a.post('/api/bookings', {
    slotId: slotIds[0],
    visitor: who,
    items: [{ categoryId: kettle, fault: 'It clicks off.' }],
    consent: true,
  });
  expect(res.status).toBe(201);
  return { a, eventId, reference: res.json.reference as string, token: res.json.manageToken as string };
}

describe('finding 10: a manage link runs out some days after its session', () => {
  it('answers 410 link-expired once the session ended more than MANAGE_LINK_DAYS (30) ago, not before', async () => {
    const { a, eventId, reference, token } = await bookOne();
    const read = () => a.raw('GET', `/api/bookings/${reference}`, { headers: { 'x-manage-token': token } });
    await db.db
      .update(events)
      .set({ startsAt: new Date(Date.now() - 29 * DAY - 3600_000), endsAt: new Date(Date.now() - 29 * DAY) })
      .where(eq(events.id, eventId));
    expect((await read()).status).toBe(200);
    await db.db
      .update(events)
      .set({ startsAt: new Date(Date.now() - 31 * DAY - 3600_000), endsAt: new Date(Date.now() - 31 * DAY) })
      .where(eq(events.id, eventId));
    const expired = await read();
    expect(expired.status).toBe(410);
    expect(expired.json.error.code).toBe('link-expired');
    expect(expired.json.error.message).toMatch(/run out/);
    // The personal-data download behind the same link runs out with it.
    const data = await a.raw('GET', `/api/bookings/${reference}/personal-data`, {
      headers: { 'x-manage-token': token },
    });
    expect(data.status).toBe(410);
    // Only the holder of the right token learns that the booking exists.
    const wrong = await a.raw('GET', `/api/bookings/${reference}`, { headers: { 'x-manage-token': 'y'.repeat(43) } });
    expect(wrong.status).toBe(404);
  });
});
