import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatDay } from '../../shared/format';
import { bookings, events, outbox, repairGroups, slots } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, makeUser, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/**
 * Mails about a booking go out in the language the visitor booked in (kept on the booking), whoever sends them: the
 * visitor's own confirmation, an organiser's cancellation of the session, the waiting list's offer. Dates follow
 * CLDR's patterns for each language (German "Samstag, 12. Dezember 2026": weekday, day with a full stop, month).
 */
let db: TestDatabase;
let server: RunningServer;
let groupId: number;
let tz: string;
let organiser: Agent;
let kettle: number;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  groupId = await makeGroup(db.db);
  [{ timeZone: tz }] = await db.db.select().from(repairGroups).where(eq(repairGroups.id, groupId));
  const o = await makeUser(db.db, { roles: [[groupId, 'organiser']] });
  organiser = new Agent(server.url, { 'accept-language': 'en-GB,en;q=0.9' });
  await organiser.login(o.email, o.password);
  kettle = await categoryId(db.db, 'kettle');
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const mailsTo = (email: string) => db.db.select().from(outbox).where(eq(outbox.toAddress, email)).orderBy(outbox.id);

async function book(slotId: number, acceptLanguage?: string) {
  const v = visitor();
  const res = await new Agent(server.url, acceptLanguage ? { 'accept-language': acceptLanguage } : {}).post(
    '/api/bookings',
    { slotId, visitor: v, items: [{ categoryId: kettle, fault: 'Schaltet sich sofort wieder ab.' }], consent: true },
  );
  expect(res.status, res.text).toBe(201);
  return { ...v, ...(res.json as { reference: string; manageToken: string }) };
}

describe('mails in the booking’s language', () => {
  it('confirms a booking made in German in German, with a German date and the kind of item in German', async () => {
    const { slotIds } = await makeEvent(db.db, groupId);
    const b = await book(slotIds[0], 'de-DE,de;q=0.9,en;q=0.5');
    const [row] = await db.db.select().from(bookings).where(eq(bookings.reference, b.reference));
    expect(row.language).toBe('de');
    const [slot] = await db.db.select().from(slots).where(eq(slots.id, slotIds[0]));
    const [m] = await mailsTo(b.email);
    expect(m.subject).toBe(`Gebucht: ${(await eventTitle(row.eventId)) ?? ''} — ${b.reference}`);
    const day = formatDay(slot.startsAt, tz, 'de');
    expect(day).toMatch(
      /^(Montag|Dienstag|Mittwoch|Donnerstag|Freitag|Samstag|Sonntag), \d{1,2}\. [A-ZÄÖÜ][a-zäöü]+ \d{4}$/,
    );
    expect(m.text).toContain(`Hallo ${b.name},`);
    expect(m.text).toContain(`Ihre Buchungsnummer ist ${b.reference}.`);
    expect(m.text).toContain(`Wann: ${day}, `);
    expect(m.text).toContain('Sie bringen mit: Wasserkocher');
    expect(m.text).not.toMatch(/You are bringing|Please bring|If the button/);
    expect(m.html).toContain('<html lang="de">');
  });

  it('keeps English for a booking made without Accept-Language', async () => {
    const { slotIds } = await makeEvent(db.db, groupId);
    const b = await book(slotIds[0]);
    const [m] = await mailsTo(b.email);
    expect(m.subject.startsWith('Booked: ')).toBe(true);
    expect(m.text).toContain('You are bringing: Kettle');
  });

  it('writes to each visitor in their own language when an organiser who reads English cancels the session', async () => {
    const { eventId, slotIds } = await makeEvent(db.db, groupId);
    const de = await book(slotIds[0], 'de');
    const nl = await book(slotIds[0], 'nl-BE');
    const en = await book(slotIds[0], 'en');
    const res = await organiser.post(`/api/events/${eventId}/cancel`, { reason: 'The hall roof is leaking.' });
    expect(res.status, res.text).toBe(200);
    const last = async (email: string) => (await mailsTo(email)).at(-1)!;
    const toDe = await last(de.email);
    expect(toDe.subject).toMatch(/^Abgesagt: .* am (Montag|Dienstag|Mittwoch|Donnerstag|Freitag|Samstag|Sonntag), /);
    expect(toDe.text).toContain(`Ihre Buchung ${de.reference} ist storniert`);
    // The organiser's own words stay as written; the line around them is the visitor's language.
    expect(toDe.text).toContain('Das Orga-Team schreibt: The hall roof is leaking.');
    const toNl = await last(nl.email);
    expect(toNl.subject).toMatch(/^Afgezegd: .* op (maandag|dinsdag|woensdag|donderdag|vrijdag|zaterdag|zondag) /);
    expect(toNl.text).toContain(`Je boeking ${nl.reference} is geannuleerd`);
    expect((await last(en.email)).subject).toMatch(/^Cancelled: /);
  });

  it('offers a freed place in French to a visitor who joined the waiting list in French, and books it in French', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { capacity: 1, slotCount: 1 });
    const first = await book(slotIds[0], 'en');
    const waiting = visitor();
    const fr = new Agent(server.url, { 'accept-language': 'fr-BE,fr;q=0.9' });
    const [{ eventId }] = await db.db.select().from(slots).where(eq(slots.id, slotIds[0]));
    const join = await fr.post(`/api/events/${eventId}/waitlist`, {
      slotId: slotIds[0],
      visitor: waiting,
      items: [{ categoryId: kettle, fault: 'Ne chauffe plus du tout.' }],
      consent: true,
    });
    expect(join.status, join.text).toBe(201);
    expect((await mailsTo(waiting.email))[0].subject).toMatch(/^Liste d’attente : /);
    // The first visitor cancels from an English page: the offer still goes out in French.
    const cancel = await new Agent(server.url, { 'accept-language': 'en' }).delete(
      `/api/bookings/${first.reference}?token=${first.manageToken}`,
    );
    expect(cancel.status, cancel.text).toBe(204);
    const offer = (await mailsTo(waiting.email)).find((m) => m.subject.startsWith('Une place s’est libérée'));
    expect(offer, 'offer mail').toBeTruthy();
    const link = /\/waiting-list\/([\w-]+)/.exec(offer!.text)![1];
    const claim = await new Agent(server.url).post(`/api/waiting-list/${link}/claim`, {});
    expect(claim.status, claim.text).toBe(201);
    const [row] = await db.db.select().from(bookings).where(eq(bookings.reference, claim.json.reference));
    expect(row.language).toBe('fr');
    expect((await mailsTo(waiting.email)).at(-1)!.subject).toMatch(/^Réservé : /);
  });
});

async function eventTitle(eventId: number) {
  const [e] = await db.db.select({ title: events.title }).from(events).where(eq(events.id, eventId));
  return e?.title;
}
