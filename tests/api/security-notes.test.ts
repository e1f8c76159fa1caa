import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { shifts, venueBenches } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
let kettle: number;
const as: Record<'organiser' | 'host' | 'fixer' | 'outsider', Agent> = {} as never;
let slotId: number;
let groupId: number;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  kettle = await categoryId(db.db, 'kettle');
  groupId = await makeGroup(db.db, 'Sharing menders');
  const other = await makeGroup(db.db, 'Elsewhere menders');
  const ev = await makeEvent(db.db, groupId, { startsAt: new Date(Date.now() - 10 * 60_000), capacity: 10 });
  slotId = ev.slotIds[0];
  await db.db
    .insert(venueBenches)
    .values({ venueId: ev.venueId, name: 'Bench', seats: 2, equipment: ['multimeter'], position: 0 });
  const users = {
    organiser: await makeUser(db.db, { roles: [[groupId, 'organiser']] }),
    host: await makeUser(db.db, { roles: [[groupId, 'host']] }),
    fixer: await makeUser(db.db, { roles: [[groupId, 'fixer']] }),
    outsider: await makeUser(db.db, { roles: [[other, 'fixer']] }),
  };
  for (const [k, u] of Object.entries(users)) {
    as[k as keyof typeof as] = new Agent(server.url);
    expect((await as[k as keyof typeof as].login(u.email, u.password)).status).toBe(200);
  }
  await db.db.insert(shifts).values({
    eventId: ev.eventId,
    userId: users.fixer.id,
    coming: true,
    startsAt: new Date(Date.now() - 3600_000),
    endsAt: new Date(Date.now() + 4 * 3600_000),
  });
  expect((await as.organiser.send('PUT', `/api/groups/${groupId}/knowledge-sharing`, { share: true })).status).toBe(
    200,
  );
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

/** A visitor (invented) whose fault text carries their name, number and address; checked in, outcome with notes. */
async function repairedKettle() {
  const b = await new Agent(server.url).post('/api/bookings', {
    slotId,
    visitor: { name: 'Mira Okafor', email: 'mira.okafor@example.com', phone: '07700 900456' },
    items: [
      {
        categoryId: kettle,
        brand: 'Brewmaster',
        model: 'BK-77',
        mains: false,
        fault: 'Mira Okafor: switch clicks off at once. Call 07700 900456 or mira.okafor@example.com',
      },
    ],
    consent: true,
  });
  expect(b.status).toBe(201);
  const c = await as.host.post(`/api/bookings/${b.json.reference}/check-in`, {});
  const id = c.json.items[0].id as number;
  const o = await as.organiser.post(`/api/items/${id}/outcome`, {
    outcome: 'advice',
    notes: 'Told Mira the thermostat disc is worn.',
  });
  expect(o.status).toBe(200);
  return { id, reference: b.json.reference as string, manageToken: b.json.manageToken as string };
}

describe('shared repair notes', () => {
  it('reach another group’s volunteers without the visitor’s name, phone number or e-mail address', async () => {
    const { id } = await repairedKettle();
    const found = (await as.outsider.get(`/api/knowledge?categoryId=${kettle}&brand=Brewmaster&model=BK-77`)).json;
    const entry = found.find((e: { itemId: number }) => e.itemId === id);
    expect(entry).toBeDefined();
    const text = JSON.stringify(entry);
    for (const personal of ['Mira', 'Okafor', '07700', '900456', 'mira.okafor@example.com'])
      expect(text).not.toContain(personal);
    expect(entry.symptom).toBe('[name]: switch clicks off at once. Call [number] or [e-mail]');
    expect(entry.notes).toBe('Told [name] the thermostat disc is worn.');
  });
});
