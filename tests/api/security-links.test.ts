import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
