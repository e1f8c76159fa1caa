import { randomUUID } from 'node:crypto';
import { and, eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REFERENCE_PATTERN } from '../../shared/booking/reference';
import {
  bookingItems,
  bookings,
  groupExclusions,
  outbox,
  slots,
  waitlistEntries,
} from '../../server/src/db/schema/index';
import { expireOffers, sendReminders } from '../../server/src/features/bookings/jobs';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { memorySender, startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
let groupId: number;
let kettle: number;
let clothing: number;
const mail = memorySender();

beforeAll(async () => {
  db = await createTestDatabase();
  // Hundreds of bookings from one test address: startTestServer raises the limits, which have their own test file.
  server = await startTestServer(db.url, { DB_POOL_SIZE: '20' }, { sender: mail });
  groupId = await makeGroup(db.db);
  kettle = await categoryId(db.db, 'kettle');
  clothing = await categoryId(db.db, 'clothing');
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const item = (categoryId = kettle) => ({ categoryId, fault: 'It switches off before boiling.' });
const bookingBody = (
  slotId: number,
  items: { categoryId: number; fault: string; hazards?: string[] }[] = [item()],
) => ({ slotId, visitor: visitor(), items, consent: true });
const slotRow = async (id: number) => (await db.db.select().from(slots).where(eq(slots.id, id)))[0];

describe('booking a slot', () => {
  it('books, answers a reference and a manage token, counts the place and queues the confirmation mail', async () => {
    const { slotIds } = await makeEvent(db.db, groupId);
    const a = new Agent(server.url);
    const body = bookingBody(slotIds[0]);
    const res = await a.post('/api/bookings', body);
    expect(res.status).toBe(201);
    expect(res.json.reference).toMatch(REFERENCE_PATTERN);
    expect(res.json.manageToken.length).toBeGreaterThanOrEqual(40);
    expect((await slotRow(slotIds[0])).booked).toBe(1);
    const [queued] = await db.db.select().from(outbox).where(eq(outbox.toAddress, body.visitor.email));
    expect(queued.subject).toContain(res.json.reference);
    expect(queued.text).toContain(`/bookings/${res.json.reference}#token=${res.json.manageToken}`);
    expect(queued.html).toContain('cid:booking-qr');
    expect(queued.attachments?.[0]).toMatchObject({ cid: 'booking-qr', contentType: 'image/png' });
  });

  it('never exceeds the capacity: 200 simultaneous bookings on 5 places give five 201s and 195 409s', async () => {
    const { eventId, slotIds } = await makeEvent(db.db, groupId, { capacity: 5, slotCount: 1 });
    const agent = new Agent(server.url);
    await agent.token();
    const results = await Promise.all(
      Array.from({ length: 200 }, () => agent.post('/api/bookings', bookingBody(slotIds[0]))),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(5);
    expect(statuses.filter((s) => s === 409)).toHaveLength(195);
    expect(results.find((r) => r.status === 409)!.json.error.code).toBe('slot-full');
    const event = await agent.get(`/api/events/${eventId}`);
    expect(event.json.slots[0]).toMatchObject({ id: slotIds[0], capacity: 5, booked: 5 });
    const [{ n }] = (await db.db
      .select({ n: sql<number>`COUNT(*)` })
      .from(bookings)
      .where(eq(bookings.slotId, slotIds[0]))) as { n: number }[];
    expect(Number(n)).toBe(5);
    // Once the outbox has run: one confirmation mail per confirmed booking, none for the refused ones.
    await server.ctx.outbox.drain();
    const refs = results.filter((r) => r.status === 201).map((r) => r.json.reference as string);
    const confirmations = mail.sent.filter((m) => refs.some((ref) => m.subject.endsWith(`— ${ref}`)));
    expect(confirmations.map((m) => m.subject.split('— ')[1]).sort()).toEqual([...refs].sort());
  });

  it('takes one place per item, and refuses a booking whose items do not fit', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { capacity: 3, slotCount: 1 });
    const a = new Agent(server.url);
    expect((await a.post('/api/bookings', bookingBody(slotIds[0], [item(), item()]))).status).toBe(201);
    expect((await a.post('/api/bookings', bookingBody(slotIds[0], [item(), item()]))).status).toBe(409);
    expect((await slotRow(slotIds[0])).booked).toBe(2);
  });

  it('holds per-skill limits: at most 2 textile items in a slot even with room left', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { capacity: 6, slotCount: 1, skillLimits: { textiles: 2 } });
    const a = new Agent(server.url);
    expect((await a.post('/api/bookings', bookingBody(slotIds[0], [item(clothing)]))).status).toBe(201);
    const over = (await a.post('/api/bookings', bookingBody(slotIds[0], [item(clothing), item(clothing)]))).json.error;
    expect(over.code).toBe('skill-full');
    expect(over.message).toContain('the fixers can take 2 textiles items; only 1 is left and you are booking 2');
    expect((await a.post('/api/bookings', bookingBody(slotIds[0], [item(clothing), item()]))).status).toBe(201);
    expect((await slotRow(slotIds[0])).booked).toBe(3);
  });

  it('books once when the same form is sent twice with one Idempotency-Key, even at the same moment', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { capacity: 10, slotCount: 1 });
    const a = new Agent(server.url);
    const token = await a.token();
    const body = bookingBody(slotIds[0]);
    const key = randomUUID();
    const send = () =>
      a.raw('POST', '/api/bookings', { body, headers: { 'x-csrf-token': token, 'idempotency-key': key } });
    const results = await Promise.all(Array.from({ length: 20 }, send));
    expect(results.map((r) => (r.status === 201 ? 201 : `${r.status} ${r.text}`))).toEqual(Array(20).fill(201));
    expect(new Set(results.map((r) => r.json.reference)).size).toBe(1);
    expect(results.filter((r) => r.headers.get('idempotent-replayed') === 'true')).toHaveLength(19);
    expect((await slotRow(slotIds[0])).booked).toBe(1);
    const later = await send();
    expect(later.json.reference).toBe(results[0].json.reference);
  });

  it('refuses an excluded category with the reason and a suggestion, and writes nothing', async () => {
    const other = await makeGroup(db.db);
    const { applyDefaultExclusions } = await import('../../server/src/core/screening');
    await applyDefaultExclusions(db.db, other);
    const { slotIds } = await makeEvent(db.db, other, { slotCount: 1 });
    const res = await new Agent(server.url).post(
      '/api/bookings',
      bookingBody(slotIds[0], [item(await categoryId(db.db, 'microwave'))]),
    );
    expect(res.status).toBe(422);
    expect(res.json.error.code).toBe('item-refused');
    expect(res.json.error.fields['items.0.categoryId']).toMatch(/high-voltage capacitor.*appliance repairer/);
    expect((await slotRow(slotIds[0])).booked).toBe(0);
  });

  it('refuses a swollen lithium battery whatever the category', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { slotCount: 1 });
    const res = await new Agent(server.url).post(
      '/api/bookings',
      bookingBody(slotIds[0], [{ ...item(await categoryId(db.db, 'phone')), hazards: ['swollen-battery'] }]),
    );
    expect(res.status).toBe(422);
    expect(res.json.error.fields['items.0.hazards']).toMatch(/swollen lithium battery/);
  });

  it('says why an item is refused in the request’s language (problems.hazard.*, problems.notTaken, categories)', async () => {
    const other = await makeGroup(db.db, 'Flickwerk Nord');
    const { applyDefaultExclusions } = await import('../../server/src/core/screening');
    await applyDefaultExclusions(db.db, other);
    await db.db.insert(groupExclusions).values({ groupId: other, categoryId: await categoryId(db.db, 'phone') });
    const { slotIds } = await makeEvent(db.db, other, { slotCount: 1 });
    const refused = async (lang: string, slug: string, hazards: string[] = []) =>
      (
        await new Agent(server.url, { 'accept-language': lang }).post(
          '/api/bookings',
          bookingBody(slotIds[0], [{ ...item(await categoryId(db.db, slug)), hazards }]),
        )
      ).json.error.fields;
    // locales/de/problems.json: the hazard's reason and suggestion.
    expect((await refused('de-DE', 'kettle', ['gas']))['items.0.hazards']).toBe(
      'Gasgeräte dürfen nur von einem zugelassenen Fachbetrieb gewartet werden. Wenden Sie sich an einen zugelassenen Fachbetrieb in Ihrer Nähe.',
    );
    // locales/fr/categories.json: the kind's own refusal.
    expect((await refused('fr', 'microwave'))['items.0.categoryId']).toMatch(/^Un four à micro-ondes contient/);
    // locales/nl/problems.json: the group's exclusion, the kind named in Dutch.
    expect((await refused('nl', 'phone'))['items.0.categoryId']).toMatch(
      /^Flickwerk Nord neemt dit soort voorwerpen niet aan \(\S/,
    );
    expect((await refused('en', 'phone'))['items.0.categoryId']).toMatch(
      /^Flickwerk Nord does not take this kind of item \(.+\)\. Look for another group’s event that takes it/,
    );
    expect((await slotRow(slotIds[0])).booked).toBe(0);
  });

  it('answers invalid input with 400 and a message per field, and writes nothing', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { slotCount: 1 });
    const before = await db.db.select({ n: sql<number>`COUNT(*)` }).from(bookings);
    const res = await new Agent(server.url).post('/api/bookings', {
      slotId: slotIds[0],
      visitor: { name: '', email: 'x' },
      items: [{ categoryId: kettle, fault: '' }],
      consent: false,
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields).sort()).toEqual([
      'consent',
      'items.0.fault',
      'visitor.email',
      'visitor.name',
    ]);
    expect(await db.db.select({ n: sql<number>`COUNT(*)` }).from(bookings)).toEqual(before);
  });

  it('refuses bookings for a draft event', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { status: 'draft', slotCount: 1 });
    const res = await new Agent(server.url).post('/api/bookings', bookingBody(slotIds[0]));
    expect(res.status).toBe(409);
    expect(res.json.error.code).toBe('not-bookable');
  });
});

describe('managing a booking with its link', () => {
  it('shows the booking only with the right token', async () => {
    const { slotIds } = await makeEvent(db.db, groupId);
    const a = new Agent(server.url);
    const { reference, manageToken } = (await a.post('/api/bookings', bookingBody(slotIds[0]))).json;
    expect((await a.get(`/api/bookings/${reference}`)).status).toBe(404);
    expect((await a.get(`/api/bookings/${reference}?token=wrong-token-of-the-right-length-0000000000`)).status).toBe(
      404,
    );
    const ok = await a.get(`/api/bookings/${reference}?token=${manageToken}`);
    expect(ok.status).toBe(200);
    expect(ok.json).toMatchObject({ reference, status: 'confirmed', slot: { id: slotIds[0] } });
    expect(ok.json.qr).toMatch(/^data:image\/png;base64,/);
    // Typed in lower case without the hyphen, the reference still finds it.
    expect((await a.get(`/api/bookings/${reference.replace('-', '').toLowerCase()}?token=${manageToken}`)).status).toBe(
      200,
    );
    expect(
      (await a.raw('DELETE', `/api/bookings/${reference}?token=nope`, { headers: { 'x-csrf-token': await a.token() } }))
        .status,
    ).toBe(404);
  });

  it('cancelling frees the place', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { capacity: 1, slotCount: 1 });
    const a = new Agent(server.url);
    const { reference, manageToken } = (await a.post('/api/bookings', bookingBody(slotIds[0]))).json;
    expect((await a.post('/api/bookings', bookingBody(slotIds[0]))).status).toBe(409);
    expect((await a.delete(`/api/bookings/${reference}?token=${manageToken}`)).status).toBe(204);
    expect((await slotRow(slotIds[0])).booked).toBe(0);
    expect((await a.get(`/api/bookings/${reference}?token=${manageToken}`)).json.status).toBe('cancelled');
    expect((await a.post('/api/bookings', bookingBody(slotIds[0]))).status).toBe(201);
  });

  it('moves to another slot of the same event, freeing the old place', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { capacity: 1 });
    const a = new Agent(server.url);
    const { reference, manageToken } = (await a.post('/api/bookings', bookingBody(slotIds[0]))).json;
    const moved = await a.post(`/api/bookings/${reference}/move?token=${manageToken}`, { slotId: slotIds[2] });
    expect(moved.status).toBe(200);
    expect(moved.json.slot.id).toBe(slotIds[2]);
    expect([(await slotRow(slotIds[0])).booked, (await slotRow(slotIds[2])).booked]).toEqual([0, 1]);
    expect((await a.post(`/api/bookings/${reference}/move?token=${manageToken}`, { slotId: slotIds[2] })).status).toBe(
      200,
    );
    const other = (await a.post('/api/bookings', bookingBody(slotIds[1]))).json;
    expect(
      (await a.post(`/api/bookings/${other.reference}/move?token=${other.manageToken}`, { slotId: slotIds[2] })).json
        .error.code,
    ).toBe('slot-full');
  });
});

describe('the waiting list', () => {
  it('offers a freed place to the first in line, holds it, and books it when claimed', async () => {
    const { eventId, slotIds } = await makeEvent(db.db, groupId, { capacity: 1, slotCount: 1 });
    const a = new Agent(server.url);
    const first = (await a.post('/api/bookings', bookingBody(slotIds[0]))).json;
    expect((await a.post(`/api/events/${eventId}/waitlist`, bookingBody(slotIds[0]))).json.position).toBe(1);
    const second = bookingBody(slotIds[0]);
    expect((await a.post(`/api/events/${eventId}/waitlist`, second)).json.position).toBe(2);

    await a.delete(`/api/bookings/${first.reference}?token=${first.manageToken}`);
    await server.ctx.outbox.drain();
    expect(await slotRow(slotIds[0])).toMatchObject({ booked: 0, held: 1 });
    // The held place is not free to a new booking.
    expect((await a.post('/api/bookings', bookingBody(slotIds[0]))).status).toBe(409);

    const offers = mail.sent.filter((m) => m.subject.startsWith('A place is free'));
    const token = /\/waiting-list\/([A-Za-z0-9_-]+)/.exec(offers.at(-1)!.text)![1];
    expect((await a.get(`/api/waiting-list/${token}`)).json.status).toBe('offered');
    const claimed = await a.post(`/api/waiting-list/${token}/claim`);
    expect(claimed.status).toBe(201);
    expect(claimed.json.reference).toMatch(REFERENCE_PATTERN);
    expect(await slotRow(slotIds[0])).toMatchObject({ booked: 1, held: 0 });
    expect((await a.post(`/api/waiting-list/${token}/claim`)).status).toBe(409);
    const waiting = await db.db
      .select()
      .from(waitlistEntries)
      .where(eq(waitlistEntries.slotId, slotIds[0]))
      .orderBy(waitlistEntries.id);
    expect(waiting.map((w) => w.status)).toEqual(['claimed', 'waiting']);
    expect(waiting[1].visitorEmail).toBe(second.visitor.email);
  });

  it('passes an offer that ran out to the next in line', async () => {
    const { eventId, slotIds } = await makeEvent(db.db, groupId, { capacity: 1, slotCount: 1 });
    const a = new Agent(server.url);
    const first = (await a.post('/api/bookings', bookingBody(slotIds[0]))).json;
    await a.post(`/api/events/${eventId}/waitlist`, bookingBody(slotIds[0]));
    await a.post(`/api/events/${eventId}/waitlist`, bookingBody(slotIds[0]));
    await a.delete(`/api/bookings/${first.reference}?token=${first.manageToken}`);
    await db.db
      .update(waitlistEntries)
      .set({ offerExpiresAt: sql`NOW(3) - INTERVAL 1 SECOND` })
      .where(and(eq(waitlistEntries.slotId, slotIds[0]), eq(waitlistEntries.status, 'offered')));
    expect(await expireOffers(server.ctx)).toBe(1);
    const rows = await db.db
      .select()
      .from(waitlistEntries)
      .where(eq(waitlistEntries.slotId, slotIds[0]))
      .orderBy(waitlistEntries.id);
    expect(rows.map((w) => w.status)).toEqual(['expired', 'offered']);
    expect((await slotRow(slotIds[0])).held).toBe(1);
  });

  it('refuses to queue for a slot that still has room', async () => {
    const { eventId, slotIds } = await makeEvent(db.db, groupId, { capacity: 2, slotCount: 1 });
    const res = await new Agent(server.url).post(`/api/events/${eventId}/waitlist`, bookingBody(slotIds[0]));
    expect(res.status).toBe(409);
    expect(res.json.error.code).toBe('places-free');
  });
});

describe('the reminder the day before', () => {
  it('goes once to bookings made before the last day, through the outbox', async () => {
    const soon = new Date(Date.now() + 20 * 3600_000);
    const { slotIds } = await makeEvent(db.db, groupId, { startsAt: soon, slotCount: 2 });
    const a = new Agent(server.url);
    const early = bookingBody(slotIds[0]);
    const late = bookingBody(slotIds[1]);
    const e = (await a.post('/api/bookings', early)).json;
    await a.post('/api/bookings', late);
    await db.db
      .update(bookings)
      .set({ createdAt: sql`NOW(3) - INTERVAL 3 DAY` })
      .where(eq(bookings.reference, e.reference));
    expect(await sendReminders(server.ctx)).toBe(1);
    expect(await sendReminders(server.ctx)).toBe(0);
    const reminders = await db.db
      .select()
      .from(outbox)
      .where(sql`${outbox.subject} LIKE 'Tomorrow:%'`);
    expect(reminders.map((r) => r.toAddress)).toEqual([early.visitor.email]);
    expect(reminders[0].text).toContain(`/bookings/${e.reference}#token=${e.manageToken}`);
  });
});

describe('what is coming', () => {
  it('shows the organiser every booking with its items and counts by category', async () => {
    const { eventId, slotIds } = await makeEvent(db.db, groupId);
    const a = new Agent(server.url);
    await a.post('/api/bookings', bookingBody(slotIds[0], [item(), item(clothing)]));
    await a.post('/api/bookings', bookingBody(slotIds[1]));
    const { makeUser } = await import('../support/factories');
    const organiser = await makeUser(db.db, { roles: [[groupId, 'organiser']] });
    const o = new Agent(server.url);
    await o.login(organiser.email, organiser.password);
    const res = await o.get(`/api/events/${eventId}/bookings`);
    expect(res.status).toBe(200);
    expect(res.json.summary).toMatchObject({
      items: 3,
      bookings: 2,
      byCategory: [
        { name: 'Kettle', count: 2 },
        { name: 'Clothing', count: 1 },
      ],
    });
    const [{ n }] = (await db.db
      .select({ n: sql<number>`COUNT(*)` })
      .from(bookingItems)
      .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
      .where(eq(bookings.eventId, eventId))) as { n: number }[];
    expect(Number(n)).toBe(3);
  });
});
