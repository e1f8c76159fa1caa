import { randomUUID } from 'node:crypto';
import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bookings, idempotencyKeys } from '../../server/src/db/schema/index';
import { forgetIdempotencyKeys } from '../../server/src/features/bookings/jobs';
import { errorHandler } from '../../server/src/http/errors';
import { redactUrl } from '../../server/src/http/redact';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, makeUser, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/** Issue 14, findings 7 and 10: what a booking's secrets are bound to, and where they must not end up. */
let db: TestDatabase;
let server: RunningServer;
let groupId: number;
let kettle: number;
const log: string[] = [];

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, {}, { log: (l) => log.push(l) });
  groupId = await makeGroup(db.db);
  kettle = await categoryId(db.db, 'kettle');
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const form = (slotId: number) => ({
  slotId,
  visitor: visitor(),
  items: [{ categoryId: kettle, fault: 'It switches off before boiling.' }],
  consent: true,
});
const bookingCount = async (slotId: number) =>
  Number(
    (
      (await db.db
        .select({ n: sql<number>`COUNT(*)` })
        .from(bookings)
        .where(eq(bookings.slotId, slotId))) as {
        n: number;
      }[]
    )[0].n,
  );

describe('finding 7: an Idempotency-Key replays only the same form, and only for a day', () => {
  it('answers 422 and never the stored answer (with its manage token) when the key comes with another form', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { capacity: 10, slotCount: 1 });
    const a = new Agent(server.url);
    const token = await a.token();
    const key = randomUUID();
    const send = (body: unknown) =>
      a.raw('POST', '/api/bookings', { body, headers: { 'x-csrf-token': token, 'idempotency-key': key } });
    const first = await send(form(slotIds[0]));
    expect(first.status).toBe(201);
    const other = await send(form(slotIds[0]));
    expect(other.status).toBe(422);
    expect(other.json.error.code).toBe('idempotency-key-reused');
    expect(other.text).not.toContain(first.json.manageToken);
    expect(other.text).not.toContain(first.json.reference);
    expect(await bookingCount(slotIds[0])).toBe(1);
  });

  it('still replays the first answer for the same key and the same form', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { capacity: 10, slotCount: 1 });
    const a = new Agent(server.url);
    const token = await a.token();
    const key = randomUUID();
    const body = form(slotIds[0]);
    const send = () =>
      a.raw('POST', '/api/bookings', { body, headers: { 'x-csrf-token': token, 'idempotency-key': key } });
    const first = await send();
    const again = await send();
    expect(again.status).toBe(201);
    expect(again.headers.get('idempotent-replayed')).toBe('true');
    expect(again.json.reference).toBe(first.json.reference);
  });

  it('books anew once the key is older than 24 hours, and the daily job forgets such keys', async () => {
    const { slotIds } = await makeEvent(db.db, groupId, { capacity: 10, slotCount: 1 });
    const a = new Agent(server.url);
    const token = await a.token();
    const key = randomUUID();
    const body = form(slotIds[0]);
    const send = () =>
      a.raw('POST', '/api/bookings', { body, headers: { 'x-csrf-token': token, 'idempotency-key': key } });
    const first = await send();
    expect(first.status).toBe(201);
    await db.db
      .update(idempotencyKeys)
      .set({ createdAt: new Date(Date.now() - 25 * 3600_000) })
      .where(eq(idempotencyKeys.key, `booking:${key}`));
    const later = await send();
    expect(later.status).toBe(201);
    expect(later.headers.get('idempotent-replayed')).toBeNull();
    expect(later.json.reference).not.toBe(first.json.reference);
    expect(await bookingCount(slotIds[0])).toBe(2);

    const old = `booking:old-${randomUUID()}`;
    await db.db
      .insert(idempotencyKeys)
      .values({ key: old, scope: 'booking', createdAt: new Date(Date.now() - 25 * 3600_000) });
    await forgetIdempotencyKeys(server.ctx);
    expect(await db.db.select().from(idempotencyKeys).where(eq(idempotencyKeys.key, old))).toEqual([]);
    expect(
      await db.db
        .select()
        .from(idempotencyKeys)
        .where(eq(idempotencyKeys.key, `booking:${key}`)),
    ).toHaveLength(1);
  });
});

describe('finding 10: secrets stay out of logs and caches, and health names no versions', () => {
  it('the error log writes a URL with its manage token and secret path segments redacted', () => {
    const lines: string[] = [];
    const handler = errorHandler((msg) => lines.push(msg));
    const res = { headersSent: false, status: () => res, json: () => res, set: () => res } as never;
    const url = '/api/bookings/T5N-9WZ/items/3/photos?token=s3cr3t-manage-token&x=1';
    handler(new Error('boom'), { method: 'POST', originalUrl: url } as never, res, () => {});
    handler(
      new Error('boom'),
      { method: 'POST', originalUrl: '/api/waiting-list/offer-secret/claim' } as never,
      res,
      () => {},
    );
    expect(lines.join('\n')).not.toContain('s3cr3t-manage-token');
    expect(lines.join('\n')).not.toContain('offer-secret');
    expect(lines[0]).toContain('/api/bookings/T5N-9WZ/items/3/photos?token=[redacted]&x=1');
    expect(redactUrl('/api/photos/4?size=s&token=abc#x')).toBe('/api/photos/4?size=s&token=[redacted]#x');
    expect(redactUrl('/api/invites/inv-secret/accept')).toBe('/api/invites/[redacted]/accept');
  });

  it('/api/health answers ok without the database version', async () => {
    const res = await new Agent(server.url).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.json).toEqual({ ok: true });
    expect(res.text).not.toMatch(/mariadb|\d+\.\d+\.\d+/i);
  });

  it('answers full of personal data say Cache-Control: no-store', async () => {
    const { eventId, slotIds } = await makeEvent(db.db, groupId);
    const visitorAgent = new Agent(server.url);
    const booked = await visitorAgent.post('/api/bookings', form(slotIds[0]));
    expect(booked.status).toBe(201);
    const admin = await makeUser(db.db, { admin: true });
    const a = new Agent(server.url);
    expect((await a.login(admin.email, admin.password)).status).toBe(200);
    const urls = [
      `/api/bookings/${booked.json.reference}?token=${booked.json.manageToken}`,
      `/api/events/${eventId}/bookings`,
      `/api/exports/records.csv?groupId=${groupId}`,
      `/api/exports/open-repair-data.csv?groupId=${groupId}`,
      '/api/admin/mailbox',
      '/api/admin/users',
    ];
    for (const url of urls) {
      const res = await a.get(url);
      expect(res.status, `${url}: ${res.text.slice(0, 200)}`).toBe(200);
      expect(res.headers.get('cache-control'), url).toContain('no-store');
    }
  });
});
