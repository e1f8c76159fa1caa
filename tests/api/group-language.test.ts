import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bookings } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/** A group's own language: set by its organiser, and the language of the mails to visitors registered at the desk. */
let db: TestDatabase;
let server: RunningServer;
let groupId: number;
let organiser: Agent;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  groupId = await makeGroup(db.db);
  const o = await makeUser(db.db, { roles: [[groupId, 'organiser']] });
  organiser = new Agent(server.url, { 'accept-language': 'nl' });
  await organiser.login(o.email, o.password);
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

describe('the group’s language', () => {
  it('is English until the organiser sets it, is saved, and refuses a language Mendery does not speak', async () => {
    const settings = () => organiser.get(`/api/groups/${groupId}/settings`);
    expect((await settings()).json.defaultLanguage).toBe('en');
    const bad = await organiser.send('PUT', `/api/groups/${groupId}/settings`, { defaultLanguage: 'xx' });
    expect(bad.status).toBe(400);
    // The organiser's request asks for Dutch: the field error is the catalog's Dutch line.
    expect(bad.json.error.fields.defaultLanguage).toBe('Kies een van de talen in de lijst.');
    expect((await settings()).json.defaultLanguage).toBe('en');
    const ok = await organiser.send('PUT', `/api/groups/${groupId}/settings`, { defaultLanguage: 'de' });
    expect(ok.status, ok.text).toBeLessThan(300);
    expect((await settings()).json.defaultLanguage).toBe('de');
  });

  it('is the language of a walk-in registered at the desk, whatever the desk’s own language', async () => {
    await organiser.send('PUT', `/api/groups/${groupId}/settings`, { defaultLanguage: 'fr' });
    const { eventId, slotIds } = await makeEvent(db.db, groupId, {
      startsAt: new Date(Date.now() - 15 * 60_000),
      slotCount: 4,
    });
    const res = await organiser.post(`/api/events/${eventId}/walk-ins`, {
      slotId: slotIds[0],
      visitor: { name: 'Noémie Valcourt', email: 'noemie@example.org' },
      items: [{ categoryId: await categoryId(db.db, 'lamp'), fault: 'La lampe clignote.' }],
      consent: true,
      consentName: 'Noémie Valcourt',
    });
    expect(res.status, res.text).toBe(201);
    const [b] = await db.db.select().from(bookings).where(eq(bookings.visitorEmail, 'noemie@example.org'));
    expect(b.language).toBe('fr');
  });
});
