import { eq, sql } from 'drizzle-orm';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bookings, outbox } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/** Issue 14, finding 2: anonymous bookings and waiting-list joins have limits; a stranger's address gets few mails. */
let db: TestDatabase;
let server: RunningServer;
let dataDir: string;
let groupId: number;
let kettle: number;
let n = 0;
// Each test's visitors come from their own address (the server trusts one proxy hop), so counts stay apart.
const from = () => ({ 'x-forwarded-for': `203.0.113.${++n}` });

beforeAll(async () => {
  db = await createTestDatabase();
  dataDir = mkdtempSync(path.join(os.tmpdir(), 'mendery-limits-'));
  // The limits are the defaults: 10 per address and 5 per e-mail in 15 minutes, 2 per session, 6 mails an hour.
  server = await startTestServer(db.url, { TRUST_PROXY: '1', DATA_DIR: dataDir }, { shippedLimits: true });
  groupId = await makeGroup(db.db);
  kettle = await categoryId(db.db, 'kettle');
});
afterAll(async () => {
  await server.stop();
  await db.drop();
  rmSync(dataDir, { recursive: true, force: true });
});

const form = (
  slotId: number,
  who = visitor(),
  items = [{ categoryId: kettle, fault: 'It switches off before boiling.' }],
) => ({
  slotId,
  visitor: who,
  items,
  consent: true,
});
const mailsTo = async (email: string) => (await db.db.select().from(outbox).where(eq(outbox.toAddress, email))).length;

describe('finding 2: limits on anonymous bookings', () => {
  it('refuses the 11th of 40 bookings in a row from one address with 429 and Retry-After; 10 are stored', async () => {
    const { eventId, slotIds } = await makeEvent(db.db, groupId, { capacity: 50, slotCount: 1 });
    const a = new Agent(server.url, from());
    const statuses: number[] = [];
    let refused: Awaited<ReturnType<Agent['post']>> | undefined;
    for (let i = 0; i < 40; i++) {
      const r = await a.post('/api/bookings', form(slotIds[0]));
      statuses.push(r.status);
      if (r.status === 429) refused ??= r;
    }
    expect(statuses.slice(0, 10)).toEqual(Array(10).fill(201));
    expect(statuses.slice(10)).toEqual(Array(30).fill(429));
    expect(refused!.json.error.code).toBe('rate-limited');
    expect(Number(refused!.headers.get('retry-after'))).toBeGreaterThan(0);
    const [{ c }] = (await db.db
      .select({ c: sql<number>`COUNT(*)` })
      .from(bookings)
      .where(eq(bookings.eventId, eventId))) as { c: number }[];
    expect(Number(c)).toBe(10);
    // Waiting-list joins count against the same address.
    const w = await a.post(`/api/events/${eventId}/waitlist`, form(slotIds[0]));
    expect(w.status).toBe(429);
  });

  it('refuses a 6th request for one e-mail address from 6 different addresses within the window', async () => {
    const who = visitor();
    const statuses: number[] = [];
    for (let i = 0; i < 6; i++) {
      const { slotIds } = await makeEvent(db.db, groupId);
      statuses.push((await new Agent(server.url, from()).post('/api/bookings', form(slotIds[0], who))).status);
    }
    expect(statuses).toEqual([201, 201, 201, 201, 201, 429]);
  });

  it('holds an e-mail address to 2 bookings per session (409 booking-cap), and cancelling one frees the way', async () => {
    const { slotIds } = await makeEvent(db.db, groupId);
    const who = visitor();
    const first = await new Agent(server.url, from()).post('/api/bookings', form(slotIds[0], who));
    const second = await new Agent(server.url, from()).post('/api/bookings', form(slotIds[1], who));
    // The address's case does not make it another address.
    const upper = { ...who, email: who.email.toUpperCase() };
    const third = await new Agent(server.url, from()).post('/api/bookings', form(slotIds[2], upper));
    expect([first.status, second.status, third.status]).toEqual([201, 201, 409]);
    expect(third.json.error.code).toBe('booking-cap');
    expect(third.json.error.message).toMatch(/already has 2 bookings for this session/);
    const a = new Agent(server.url, from());
    expect((await a.delete(`/api/bookings/${first.json.reference}?token=${first.json.manageToken}`)).status).toBe(204);
    expect((await new Agent(server.url, from()).post('/api/bookings', form(slotIds[2], who))).status).toBe(201);
  });

  it('holds an e-mail address to 2 open waiting-list places per session', async () => {
    const { eventId, slotIds } = await makeEvent(db.db, groupId, { capacity: 0 });
    const who = visitor();
    const join = (slotId: number) =>
      new Agent(server.url, from()).post(`/api/events/${eventId}/waitlist`, form(slotId, who));
    const statuses = [(await join(slotIds[0])).status, (await join(slotIds[1])).status];
    const third = await join(slotIds[2]);
    expect([...statuses, third.status]).toEqual([201, 201, 409]);
    expect(third.json.error.code).toBe('waitlist-cap');
  });

  it('sends one address at most 6 mails an hour from the public forms, then refuses with 429 mail-limit', async () => {
    // A second app on the same database, with the per-e-mail request limit out of the way, so the mail count decides.
    const app = await startTestServer(
      db.url,
      { TRUST_PROXY: '1', BOOKING_EMAIL_RATE_MAX: '100' },
      { shippedLimits: true },
    );
    try {
      const who = visitor();
      const statuses: number[] = [];
      for (let i = 0; i < 4; i++) {
        const { slotIds } = await makeEvent(db.db, groupId);
        statuses.push((await new Agent(app.url, from()).post('/api/bookings', form(slotIds[0], who))).status);
      }
      // Waiting-list notes count too, and the address's case does not make it another mailbox.
      const full = await makeEvent(db.db, groupId, { capacity: 0 });
      for (let i = 0; i < 2; i++) {
        const upper = { ...who, email: who.email.toUpperCase() };
        const r = await new Agent(app.url, from()).post(
          `/api/events/${full.eventId}/waitlist`,
          form(full.slotIds[i], upper),
        );
        statuses.push(r.status);
      }
      expect(statuses).toEqual([201, 201, 201, 201, 201, 201]);
      expect(await mailsTo(who.email)).toBe(6);
      const { slotIds } = await makeEvent(db.db, groupId);
      const last = await new Agent(app.url, from()).post('/api/bookings', form(slotIds[0], who));
      expect(last.status).toBe(429);
      expect(last.json.error.code).toBe('mail-limit');
      expect(await mailsTo(who.email)).toBe(6);
    } finally {
      await app.stop();
    }
  });

  it('does not count a mail that was never sent: a refused booking leaves the allowance as it was', async () => {
    const who = visitor();
    const full = await makeEvent(db.db, groupId, { capacity: 0 });
    for (let i = 0; i < 3; i++)
      expect((await new Agent(server.url, from()).post('/api/bookings', form(full.slotIds[0], who))).status).toBe(409);
    // A form the route refuses (no items; a malformed Idempotency-Key) sends no mail either.
    const bad = new Agent(server.url, from());
    expect((await bad.post('/api/bookings', { ...form(full.slotIds[0], who), items: [] })).status).toBe(400);
    const badKey = await bad.raw('POST', '/api/bookings', {
      body: form(full.slotIds[0], who),
      headers: { 'x-csrf-token': await bad.token(), 'idempotency-key': 'no' },
    });
    expect(badKey.status).toBe(400);
    // Refused by the address's limit (counted in the same statement as the mail): no mail counted either.
    const busy = new Agent(server.url, from());
    const open = await makeEvent(db.db, groupId, { capacity: 50, slotCount: 1 });
    for (let i = 0; i < 10; i++) expect((await busy.post('/api/bookings', form(open.slotIds[0]))).status).toBe(201);
    const limited = await busy.post('/api/bookings', form(open.slotIds[0], who));
    expect(limited.status).toBe(429);
    expect(limited.headers.get('ratelimit-policy')).toMatch(/q=10/);
    const { rateLimits } = await import('../../server/src/db/schema/index');
    const [row] = await db.db
      .select()
      .from(rateLimits)
      .where(eq(rateLimits.key, `visitor-mail:${who.email}`));
    expect(row?.hits ?? 0).toBe(0);
  });

  it('caps the photos of one booking at 6 in all, whatever the items', async () => {
    const { slotIds } = await makeEvent(db.db, groupId);
    const toaster = await categoryId(db.db, 'toaster');
    const items = [1, 2, 3].map(() => ({ categoryId: toaster, fault: 'One side stays cold.' }));
    const b = (await new Agent(server.url, from()).post('/api/bookings', form(slotIds[0], visitor(), items))).json;
    const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#23395d' } })
      .png()
      .toBuffer();
    const upload = async (itemId: number, count: number) => {
      const agent = new Agent(server.url, from());
      const csrf = await agent.token();
      const body = new FormData();
      for (let i = 0; i < count; i++)
        body.append('photos', new Blob([new Uint8Array(png)], { type: 'image/png' }), `p${i}.png`);
      const res = await fetch(
        `${server.url}/api/bookings/${b.reference}/items/${itemId}/photos?token=${b.manageToken}`,
        {
          method: 'POST',
          body,
          headers: { cookie: agent.cookieHeader(), 'x-csrf-token': csrf },
        },
      );
      return { status: res.status, json: await res.json() };
    };
    expect((await upload(b.itemIds[0], 3)).status).toBe(201);
    expect((await upload(b.itemIds[1], 3)).status).toBe(201);
    const seventh = await upload(b.itemIds[2], 1);
    expect(seventh.status).toBe(400);
    expect(seventh.json.error.message).toMatch(/at most 6 photos in all; this one has 6/);
  });
});
