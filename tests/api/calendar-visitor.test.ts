import { eq, like } from 'drizzle-orm';
import { TZDate } from '@date-fns/tz';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bookings, events, outbox, slots, venues } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { readCalendar } from '../support/ical';
import { startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
let groupId: number;
let kettle: number;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  groupId = await makeGroup(db.db);
  kettle = await categoryId(db.db, 'kettle');
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const book = async (a: Agent, slotId: number) => {
  const res = await a.post('/api/bookings', {
    slotId,
    visitor: visitor(),
    items: [{ categoryId: kettle, fault: 'It switches off before boiling.', brand: 'Brava', model: 'K200' }],
    consent: true,
  });
  expect(res.status).toBe(201);
  return res.json as { reference: string; manageToken: string };
};
const calendarPath = (reference: string, token: string) =>
  `/api/bookings/${reference}/calendar?token=${encodeURIComponent(token)}`;
const slotRow = async (id: number) => (await db.db.select().from(slots).where(eq(slots.id, id)))[0];
const venueRow = async (id: number) => (await db.db.select().from(venues).where(eq(venues.id, id)))[0];
const nextYear = new Date().getUTCFullYear() + 1;

describe("the visitor's calendar file", () => {
  it('is written in the language the visitor booked in', async () => {
    const { slotIds } = await makeEvent(db.db, groupId);
    const { reference, manageToken } = await book(new Agent(server.url, { 'accept-language': 'de-DE' }), slotIds[2]);
    // Fetched from an English browser, the file still speaks the booking's German.
    const [e] = readCalendar((await new Agent(server.url).get(calendarPath(reference, manageToken))).text).events;
    expect(e.summary).toMatch(/^Reparaturtermin: /);
    expect(e.description).toContain(`Buchungsnummer: ${reference}`);
    expect(e.description).toContain('Sie bringen mit: Wasserkocher');
    expect(e.description).toContain('Ihre Buchungsseite (verschieben oder stornieren): ');
  });

  it('holds the booked slot, the venue, the reference and the booking page, as ical.js reads it', async () => {
    const { eventId, venueId, slotIds } = await makeEvent(db.db, groupId);
    const a = new Agent(server.url);
    const { reference, manageToken } = await book(a, slotIds[1]);

    const res = await new Agent(server.url).get(calendarPath(reference, manageToken));
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/calendar; charset=utf-8');
    expect(res.headers.get('content-disposition')).toBe(`attachment; filename="mendery-${reference}.ics"`);
    expect(res.headers.get('set-cookie')).toBeNull();

    const cal = readCalendar(res.text);
    // RFC 5545 §3.7.4: VERSION is 2.0; §3.6.1: one VEVENT per booked slot.
    expect(cal.version).toBe('2.0');
    expect(cal.events).toHaveLength(1);
    const [e] = cal.events;
    const slot = await slotRow(slotIds[1]);
    const venue = await venueRow(venueId);
    const [event] = await db.db.select().from(events).where(eq(events.id, eventId));
    // RFC 5545 §3.8.2.4 DTSTART and §3.8.2.2 DTEND: the slot's own times, as UTC instants (§3.3.5 form 2).
    expect(e.start.toISOString()).toBe(slot.startsAt.toISOString());
    expect(e.end.toISOString()).toBe(slot.endsAt.toISOString());
    expect(e.startIsUtc).toBe(true);
    // RFC 5545 §3.8.1.7 LOCATION: venue name and address.
    expect(e.location).toBe(`${venue.name}, ${venue.address}, ${venue.town}`);
    // RFC 5545 §3.8.4.6 URL: the booking page the confirmation mail links to.
    const [confirmation] = await db.db
      .select()
      .from(outbox)
      .where(like(outbox.subject, `%${reference}%`));
    const mailedLink = confirmation.text.match(/https?:\/\/\S+\/bookings\/\S+/)![0];
    expect(e.url).toBe(mailedLink);
    expect(e.url.endsWith(`/bookings/${reference}#token=${manageToken}`)).toBe(true);
    // RFC 5545 §3.8.1.5 DESCRIPTION: the reference and what is brought.
    expect(e.description).toContain(`Booking reference: ${reference}`);
    expect(e.description).toContain('Kettle — Brava K200');
    expect(e.summary).toBe(`Repair slot: ${event.title}`);
    // RFC 5545 §3.8.4.7 UID and §3.8.7.2 DTSTAMP are required in a VEVENT.
    expect(e.uid).toMatch(new RegExp(`^booking-${reference}@`));
    expect(e.stamp).toBeInstanceOf(Date);
  });

  it('keeps the UID when the booking moves, and then holds the new slot', async () => {
    const { slotIds } = await makeEvent(db.db, groupId);
    const a = new Agent(server.url);
    const { reference, manageToken } = await book(a, slotIds[0]);
    const before = readCalendar((await a.get(calendarPath(reference, manageToken))).text).events[0];
    expect((await a.post(`/api/bookings/${reference}/move?token=${manageToken}`, { slotId: slotIds[2] })).status).toBe(
      200,
    );
    const after = readCalendar((await a.get(calendarPath(reference, manageToken))).text).events[0];
    expect(after.uid).toBe(before.uid);
    expect(after.start.toISOString()).toBe((await slotRow(slotIds[2])).startsAt.toISOString());
    expect(after.end.toISOString()).toBe((await slotRow(slotIds[2])).endsAt.toISOString());
  });

  it('is right in British summer and winter time: 10:00 in London is 09:00Z in July and 10:00Z in January', async () => {
    // UK civil time: BST is UTC+1 from the last Sunday of March to the last Sunday of October, GMT (UTC+0) otherwise
    // (Summer Time Act 1972 with the EU summer-time directive 2000/84/EC dates).
    for (const [month, utcHour] of [
      [6, 9],
      [0, 10],
    ] as const) {
      const startsAt = new Date(new TZDate(nextYear, month, 15, 10, 0, 0, 'Europe/London').getTime());
      const { slotIds } = await makeEvent(db.db, groupId, { startsAt, slotCount: 1 });
      const a = new Agent(server.url);
      const { reference, manageToken } = await book(a, slotIds[0]);
      const [e] = readCalendar((await a.get(calendarPath(reference, manageToken))).text).events;
      expect(e.start.getUTCHours()).toBe(utcHour);
      expect(e.start.toISOString()).toBe(
        `${nextYear}-${String(month + 1).padStart(2, '0')}-15T${utcHour}:00:00.000Z`.replace('T9:', 'T09:'),
      );
      expect(new Intl.DateTimeFormat('en-GB', { timeZone: 'Europe/London', timeStyle: 'short' }).format(e.start)).toBe(
        '10:00',
      );
    }
  });

  it('answers 404 without the token, with a wrong token or reference (400 for a broken escape), never saying who booked', async () => {
    const { slotIds } = await makeEvent(db.db, groupId);
    const a = new Agent(server.url);
    const { reference, manageToken } = await book(a, slotIds[0]);
    const [row] = await db.db.select().from(bookings).where(eq(bookings.reference, reference));
    for (const path of [
      `/api/bookings/${reference}/calendar`,
      calendarPath(reference, 'x'.repeat(manageToken.length)),
      calendarPath(reference, ''),
      calendarPath('ZZZ', manageToken),
    ]) {
      const res = await new Agent(server.url).get(path);
      expect(res.status, path).toBe(404);
      expect(res.json.error.code).toBe('not-found');
      expect(res.text).not.toContain(row.visitorName);
    }
    const broken = await a.get(calendarPath('%E0%A4%A', manageToken));
    expect(broken.status).toBe(400);
    expect(broken.json.error.code).toBe('bad-url');
  });

  it('answers 409 for a cancelled booking instead of a file with a visit that will not happen', async () => {
    const { slotIds } = await makeEvent(db.db, groupId);
    const a = new Agent(server.url);
    const { reference, manageToken } = await book(a, slotIds[0]);
    expect((await a.delete(`/api/bookings/${reference}?token=${manageToken}`)).status).toBe(204);
    const res = await a.get(calendarPath(reference, manageToken));
    expect(res.status).toBe(409);
    expect(res.json.error).toMatchObject({ code: 'cancelled', message: 'This booking is cancelled.' });
  });
});
