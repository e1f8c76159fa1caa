import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeEvent, makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/**
 * The API's refusals, not only its validation answers, follow Accept-Language: the words are the catalogs'
 * (locales/<language>/problems.json); the English is what the server throws.
 */
let db: TestDatabase;
let server: RunningServer;
let eventId: number;
let groupId: number;
beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  groupId = await makeGroup(db.db);
  ({ eventId } = await makeEvent(db.db, groupId));
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const agentIn = (lang?: string) => new Agent(server.url, lang ? { 'accept-language': lang } : {});

describe('refusals in the request’s language', () => {
  it('says a missing session is missing in English, German and French', async () => {
    const missing = eventId + 10_000;
    const en = await agentIn().get(`/api/events/${missing}`);
    expect(en.status).toBe(404);
    const de = await agentIn('de-AT').get(`/api/events/${missing}`);
    const fr = await agentIn('fr').get(`/api/events/${missing}`);
    expect([de.status, fr.status]).toEqual([404, 404]);
    expect(en.json.error.message).toMatch(/was not found\.$/);
    expect(de.json.error.message).toMatch(/wurde nicht gefunden\.$/);
    expect(fr.json.error.message).toMatch(/introuvable\.$/);
    expect(de.json.error.code).toBe(en.json.error.code);
  });

  it('refuses a wrong password in Dutch', async () => {
    const res = await agentIn('nl-BE').login('nobody@example.org', 'not-the-password-1');
    expect(res.status).toBe(401);
    expect(res.json.error.message).toBe('Dit e-mailadres en wachtwoord horen niet bij een account.');
  });

  it('names a role and a status inside a refusal in the reader’s words', async () => {
    const organiser = agentIn('de');
    const me = await makeUser(db.db, { roles: [[groupId, 'organiser']] });
    const fixer = await makeUser(db.db, { roles: [[groupId, 'fixer']] });
    await organiser.login(me.email, me.password);
    const twice = await organiser.post(`/api/groups/${groupId}/invites`, { email: fixer.email, role: 'fixer' });
    expect(twice.status).toBe(409);
    expect(twice.json.error.message).toMatch(
      new RegExp(`^${fixer.email} ist bereits bei .+ als „Reparateur“ dabei\\.$`),
    );
    const english = new Agent(server.url);
    await english.login(me.email, me.password);
    const again = await english.post(`/api/events/${eventId}/publish`);
    expect(again.status).toBe(409);
    expect(again.json.error.message).toBe(
      'This session is “Open for booking” and cannot change to “Open for booking”.',
    );
    const fr = await agentIn('fr').get('/api/nowhere');
    expect(fr.json.error.message).toBe('Aucune route d’API GET /nowhere.');
  });
});
