import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { events } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { readCalendar } from '../support/ical';
import { memorySender, startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
let groupId: number;
let kettle: number;
const mail = memorySender();

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, { NEW_LINK_RATE_MAX: '50' }, { sender: mail });
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

const mailsTo = (email: string) => mail.sent.filter((m) => m.to.toLowerCase() === email.toLowerCase());

describe('finding 10: a fresh manage link by e-mail', () => {
  it('mails a working link for each current booking, and the old link then stops working', async () => {
    const email = `fresh-${Date.now()}@example.org`;
    const first = await bookOne(email);
    const second = await bookOne(email);
    await server.ctx.outbox.drain();
    const before = mailsTo(email).length;
    const res = await new Agent(server.url).post('/api/bookings/new-link', { email: email.toUpperCase() });
    expect(res.status).toBe(202);
    await server.ctx.outbox.drain();
    const fresh = mailsTo(email).slice(before);
    expect(fresh).toHaveLength(2);
    for (const booked of [first, second]) {
      const m = fresh.find((x) => x.subject.includes(booked.reference))!;
      const token = /\/bookings\/[A-Z0-9-]+[?#]token=([A-Za-z0-9_-]+)/.exec(m.text)![1];
      expect(token).not.toBe(booked.token);
      const ok = await booked.a.raw('GET', `/api/bookings/${booked.reference}`, {
        headers: { 'x-manage-token': token },
      });
      expect(ok.status).toBe(200);
      const old = await booked.a.raw('GET', `/api/bookings/${booked.reference}`, {
        headers: { 'x-manage-token': booked.token },
      });
      expect(old.status).toBe(404);
      // Later mail and the calendar file carry the current link, not the revoked one.
      const ics = await booked.a.raw('GET', `/api/bookings/${booked.reference}/calendar`, {
        headers: { 'x-manage-token': token },
      });
      const { description } = readCalendar(ics.text).events[0];
      expect(description).toContain(token);
      expect(description).not.toContain(booked.token);
    }
  });

  it('answers an unknown address exactly as a known one, and mails it nothing', async () => {
    const known = `known-${Date.now()}@example.org`;
    await bookOne(known);
    const unknown = `nobody-${Date.now()}@example.org`;
    const a = new Agent(server.url);
    const k = await a.post('/api/bookings/new-link', { email: known });
    const u = await a.post('/api/bookings/new-link', { email: unknown });
    expect(u.status).toBe(202);
    expect(u.status).toBe(k.status);
    expect(u.text).toBe(k.text);
    await server.ctx.outbox.drain();
    expect(mailsTo(unknown)).toHaveLength(0);
  });

  it('mails no link for a booking whose session ended more than MANAGE_LINK_DAYS ago, and refuses a bad address', async () => {
    const email = `past-${Date.now()}@example.org`;
    const { eventId } = await bookOne(email);
    await db.db
      .update(events)
      .set({ startsAt: new Date(Date.now() - 40 * DAY - 3600_000), endsAt: new Date(Date.now() - 40 * DAY) })
      .where(eq(events.id, eventId));
    await server.ctx.outbox.drain();
    const before = mailsTo(email).length;
    const a = new Agent(server.url);
    expect((await a.post('/api/bookings/new-link', { email })).status).toBe(202);
    await server.ctx.outbox.drain();
    expect(mailsTo(email)).toHaveLength(before);
    expect((await a.post('/api/bookings/new-link', { email: 'not an address' })).status).toBe(400);
  });

  it('limits requests per e-mail address (NEW_LINK_EMAIL_RATE_MAX, 3 in the window)', async () => {
    const email = `often-${Date.now()}@example.org`;
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++)
      statuses.push((await new Agent(server.url).post('/api/bookings/new-link', { email })).status);
    expect(statuses).toEqual([202, 202, 202, 429]);
  });
});

describe('finding 10: mailed links carry the token in the fragment', () => {
  it('puts #token= and no ?token= in the confirmation mail and in a fresh-link mail', async () => {
    const email = `fragment-${Date.now()}@example.org`;
    const { reference, token } = await bookOne(email);
    await new Agent(server.url).post('/api/bookings/new-link', { email });
    await server.ctx.outbox.drain();
    const [confirmation, fresh] = mailsTo(email);
    expect(confirmation.subject).toMatch(/^Booked:/);
    expect(confirmation.text).toContain(`/bookings/${reference}#token=${token}`);
    expect(fresh.subject).toMatch(/^Your booking link:/);
    expect(fresh.text).toMatch(new RegExp(`/bookings/${reference}#token=[A-Za-z0-9_-]{43}`));
    for (const m of [confirmation, fresh]) {
      expect(m.text).not.toContain('?token=');
      expect(m.html).not.toContain('?token=');
    }
  });
});
