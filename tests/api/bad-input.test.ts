import express from 'express';
import { gzipSync } from 'node:zlib';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import { errorHandler } from '../../server/src/http/errors';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, makeUser, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/**
 * Refusals are 4xx, never 5xx: each case below answered 500 before its fix (a review's repro list, issue 14,
 * "Faults and bad input" 1-8 and 11).
 */
let db: TestDatabase;
let server: RunningServer;
let groupId: number;
let eventId: number;
let slotIds: number[];
let organiser: Agent;
beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  groupId = await makeGroup(db.db);
  ({ eventId, slotIds } = await makeEvent(db.db, groupId, { capacity: 0 }));
  const o = await makeUser(db.db, { roles: [[groupId, 'organiser']] });
  organiser = new Agent(server.url);
  expect((await organiser.login(o.email, o.password)).status).toBe(200);
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const noServerError = (r: { status: number; text: string }) => {
  expect(r.status, r.text).toBeGreaterThanOrEqual(400);
  expect(r.status, r.text).toBeLessThan(500);
};

describe('bad input is refused with a 4xx', () => {
  it('1. a group name that exists answers 409 (the driver code sits in the cause of the ORM error)', async () => {
    const admin = await makeUser(db.db, { admin: true });
    const a = new Agent(server.url);
    await a.login(admin.email, admin.password);
    const first = await a.post('/api/admin/groups', { name: 'Millbrook Menders', town: 'Millbrook' });
    expect(first.status).toBe(201);
    const again = await a.post('/api/admin/groups', { name: 'Millbrook Menders', town: 'Millbrook' });
    expect(again.status).toBe(409);
    expect(again.json.error.fields.name).toMatch(/exists/);
  });

  it('2. an impossible date on an event answers 400 on create and on edit', async () => {
    const venue = await organiser.post('/api/venues', {
      groupId,
      name: 'Test hall',
      address: '1 Test Row',
      town: 'Testbury',
    });
    expect(venue.status).toBe(201);
    const create = await organiser.post('/api/events', {
      groupId,
      venueId: venue.json.id,
      title: 'A session',
      startsAt: 'tomorrow',
      endsAt: '2030-01-01T12:00:00Z',
      slotMinutes: 30,
      slotCapacity: 4,
    });
    expect(create.status).toBe(400);
    expect(create.json.error.fields.startsAt).toMatch(/ISO 8601/);
    const edit = await organiser.send('PATCH', `/api/events/${eventId}`, { startsAt: 'tomorrow', endsAt: 'later' });
    expect(edit.status).toBe(400);
    expect(Object.keys(edit.json.error.fields).sort()).toEqual(['endsAt', 'startsAt']);
  });

  it('3. an unsupported charset answers 415 and a broken gzip body 400', async () => {
    const a = new Agent(server.url);
    const token = await a.token();
    const charset = await a.raw('POST', '/api/auth/login', {
      rawBody: '{}',
      headers: { 'x-csrf-token': token, 'content-type': 'application/json; charset=koi8-r' },
    });
    expect(charset.status).toBe(415);
    expect(charset.json.error.code).toBe('unsupported');
    const gz = gzipSync(Buffer.from('{"email":"a@b.c"}')).subarray(0, 12);
    const res = await fetch(`${server.url}/api/auth/login`, {
      method: 'POST',
      headers: {
        'x-csrf-token': token,
        'content-type': 'application/json',
        'content-encoding': 'gzip',
        cookie: a.cookieHeader(),
      },
      body: gz,
    });
    expect(res.status).toBe(400);
    const encoding = await fetch(`${server.url}/api/auth/login`, {
      method: 'POST',
      headers: {
        'x-csrf-token': token,
        'content-type': 'application/json',
        'content-encoding': 'zstd-ish',
        cookie: a.cookieHeader(),
      },
      body: '{}',
    });
    expect(encoding.status).toBe(415);
  });

  it('4. a path parameter that cannot be decoded answers 400 on every kind of route', async () => {
    for (const path of ['/api/events/%ff', '/api/bookings/%E0%A4%A', '/api/public/tags/%ff', '/api/invites/%c3']) {
      const r = await organiser.get(path);
      noServerError(r);
      expect(r.status, path).toBe(400);
    }
  });

  it('5. an e-mail address of 176-320 characters gets an answer below 500 on login, signup and reset', async () => {
    const a = new Agent(server.url);
    for (const length of [176, 200, 320]) {
      const email = `${'a'.repeat(length - 12)}@example.org`;
      for (const [path, body] of [
        ['/api/auth/login', { email, password: 'x' }],
        ['/api/auth/signup', { email, password: 'a long enough password', name: 'Someone' }],
        ['/api/auth/password-reset', { email }],
      ] as const) {
        const r = await a.post(path, body);
        expect(r.status, `${path} ${length}: ${r.text}`).toBeLessThan(500);
        if (length > 254) expect(r.status).toBe(400);
      }
    }
  });

  it('6. an Idempotency-Key that would not fit its column answers 400', async () => {
    const a = new Agent(server.url);
    const token = await a.token();
    for (const length of [93, 100]) {
      const r = await a.raw('POST', '/api/bookings', {
        body: {
          slotId: slotIds[0],
          visitor: visitor(),
          items: [{ categoryId: await categoryId(db.db, 'kettle'), fault: 'Will not heat.' }],
          consent: true,
        },
        headers: { 'x-csrf-token': token, 'idempotency-key': 'k'.repeat(length) },
      });
      expect(r.status, r.text).toBe(400);
      expect(r.json.error.fields['Idempotency-Key']).toMatch(/characters/);
    }
  });

  it('7. an empty salvage update answers 400 and changes nothing', async () => {
    const part = await organiser.post(`/api/groups/${groupId}/salvage`, {
      type: 'capacitor',
      value: '100 µF 25 V',
      quantity: 2,
      box: 'A1',
    });
    expect(part.status, part.text).toBe(201);
    const r = await organiser.send('PATCH', `/api/salvage/${part.json.id}`, {});
    expect(r.status).toBe(400);
    expect(JSON.stringify(r.json.error)).toMatch(/at least one of quantity/i);
  });

  it('8. a lone surrogate in any text answers 400 (waiting list name, brand and model)', async () => {
    const kettle = await categoryId(db.db, 'kettle');
    const base = {
      slotId: slotIds[0],
      visitor: visitor(),
      items: [{ categoryId: kettle, fault: 'Will not heat.', brand: 'Brand', model: 'Model' }],
      consent: true,
    };
    const a = new Agent(server.url);
    for (const body of [
      { ...base, visitor: { ...base.visitor, name: 'Ann \ud800' } },
      { ...base, items: [{ ...base.items[0], brand: '\udfff' }] },
      { ...base, items: [{ ...base.items[0], model: 'X\ud800Y' }] },
    ]) {
      const r = await a.post(`/api/events/${eventId}/waitlist`, body);
      expect(r.status, r.text).toBe(400);
      expect(r.json.error.code).toBe('bad-text');
    }
  });
});

describe('11. a database failure answers 503 even when the ORM wraps the driver error', () => {
  it('reads the code from the cause', async () => {
    const app = express();
    const cause = Object.assign(new Error('Connection lost'), { code: 'PROTOCOL_CONNECTION_LOST' });
    app.get('/wrapped', () => {
      throw new Error('Failed query: select 1', { cause });
    });
    const dup = Object.assign(new Error('Duplicate entry'), { code: 'ER_DUP_ENTRY' });
    app.get('/dup', () => {
      throw new Error('Failed query: insert', { cause: dup });
    });
    app.use(errorHandler(() => {}));
    const s = app.listen(0, '127.0.0.1');
    await new Promise((r) => s.once('listening', r));
    const base = `http://127.0.0.1:${(s.address() as AddressInfo).port}`;
    const r = await fetch(`${base}/wrapped`);
    expect(r.status).toBe(503);
    expect(r.headers.get('retry-after')).toMatch(/^\d+$/);
    expect((await fetch(`${base}/dup`)).status).toBe(409);
    s.close();
  });
});
