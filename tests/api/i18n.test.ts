import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/**
 * The server answers a bad request in the language of its Accept-Language header (RFC 9110 §12.5.4), English when
 * there is none or none it speaks. The expected words are the catalogs' (locales/<language>/validation.json).
 */
let db: TestDatabase;
let server: RunningServer;
let slotId: number;
let kettle: number;
beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  const groupId = await makeGroup(db.db);
  ({
    slotIds: [slotId],
  } = await makeEvent(db.db, groupId));
  kettle = await categoryId(db.db, 'kettle');
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

/** A booking with an empty name, a fault of two letters and no consent. */
const badBooking = () => ({
  slotId,
  visitor: { ...visitor(), name: '  ' },
  items: [{ categoryId: kettle, fault: 'no' }],
});

async function refusedIn(acceptLanguage?: string) {
  const agent = new Agent(server.url, acceptLanguage ? { 'accept-language': acceptLanguage } : {});
  const res = await agent.post('/api/bookings', badBooking());
  expect(res.status, res.text).toBe(400);
  return res.json.error as { code: string; message: string; fields: Record<string, string> };
}

describe('validation answers in the request’s language', () => {
  it('answers in English without Accept-Language', async () => {
    const e = await refusedIn();
    expect(e.code).toBe('invalid');
    expect(e.message).toBe('Some fields need attention.');
    expect(e.fields['visitor.name']).toBe('Enter your name.');
    expect(e.fields['items.0.fault']).toBe('Describe what is wrong in a few words.');
    expect(e.fields.consent).toBe('Tick the box to accept the house rules.');
  });

  it('answers in Dutch for nl-BE', async () => {
    const e = await refusedIn('nl-BE,nl;q=0.9,en;q=0.5');
    expect(e.message).toBe('Een paar velden moeten nog worden aangepast.');
    expect(e.fields['visitor.name']).toBe('Vul je naam in.');
    expect(e.fields['items.0.fault']).toBe('Beschrijf in een paar woorden wat er mis is.');
    expect(e.fields.consent).toBe('Vink het vakje aan om de huisregels te accepteren.');
  });

  it('answers in German for de', async () => {
    const e = await refusedIn('de');
    expect(e.fields['visitor.name']).toBe('Bitte geben Sie Ihren Namen ein.');
    expect(e.fields['items.0.fault']).toBe('Bitte beschreiben Sie in ein paar Worten, was nicht funktioniert.');
    expect(e.fields.consent).toBe('Bitte setzen Sie das Häkchen, um die Hausregeln anzunehmen.');
  });

  it('answers in French for a header that prefers fr by q-value', async () => {
    const e = await refusedIn('en;q=0.4, fr-CA;q=0.9');
    expect(e.message).toBe('Certains champs sont à corriger.');
    expect(e.fields['visitor.name']).toBe('Indiquez votre nom.');
    expect(e.fields['items.0.fault']).toBe('Décrivez en quelques mots ce qui ne va pas.');
  });

  it('answers in English for a language it does not speak, and names an unknown route in the language asked for', async () => {
    const e = await refusedIn('pt-BR');
    expect(e.fields['visitor.name']).toBe('Enter your name.');
    const agent = new Agent(server.url, { 'accept-language': 'de' });
    const missing = await agent.get('/api/no-such-route');
    expect(missing.status).toBe(404);
    expect(missing.json.error.message).toBe('Keine API-Route GET /no-such-route.');
  });

  it('an e-mail address the shared rule refuses reads in the language (fresh-link form)', async () => {
    const agent = new Agent(server.url, { 'accept-language': 'nl' });
    const res = await agent.post('/api/bookings/new-link', { email: 'not-an-address' });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.email).toBe('Dat lijkt geen e-mailadres.');
  });

  it('answers the shared schemas’ own checks in the language (a cut reset link, two passwords that differ)', async () => {
    const words = {
      en: ['The link is incomplete.', 'The two passwords differ.'],
      nl: ['De link is onvolledig.', 'De twee wachtwoorden zijn niet gelijk.'],
      de: ['Der Link ist unvollständig.', 'Die beiden Passwörter stimmen nicht überein.'],
      fr: ['Le lien est incomplet.', 'Les deux mots de passe sont différents.'],
    };
    for (const [lang, [incomplete, differ]] of Object.entries(words)) {
      const agent = new Agent(server.url, { 'accept-language': lang });
      const cut = await agent.post('/api/auth/password-reset/confirm', {
        token: 'short',
        password: 'a-long-enough-password',
        confirm: 'a-long-enough-password',
      });
      expect(cut.status, cut.text).toBe(400);
      expect(cut.json.error.fields.token, lang).toBe(incomplete);
      const twice = await agent.post('/api/auth/password-reset/confirm', {
        token: 'x'.repeat(40),
        password: 'a-long-enough-password',
        confirm: 'another-password-here',
      });
      expect(twice.status, twice.text).toBe(400);
      expect(twice.json.error.fields.confirm, lang).toBe(differ);
    }
  });
});
