import { count, eq } from 'drizzle-orm';
import sharp from 'sharp';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { crc32 } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eventBenches, itemPhotos, sessions, venueBenches } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
let dataDir: string;
let tmpDir: string;
let slotId: number;
let eventId: number;
let venueId: number;
const a = () => new Agent(server.url);

beforeAll(async () => {
  // Uploads stream to files under this process's temporary directory; point it somewhere only this file uses.
  tmpDir = mkdtempSync(path.join(os.tmpdir(), 'mendery-upl-tmp-'));
  process.env.TMPDIR = tmpDir;
  db = await createTestDatabase();
  dataDir = mkdtempSync(path.join(os.tmpdir(), 'mendery-upl-data-'));
  server = await startTestServer(db.url, { DATA_DIR: dataDir });
  const groupId = await makeGroup(db.db);
  const ev = await makeEvent(db.db, groupId, { capacity: 10 });
  [slotId] = ev.slotIds;
  eventId = ev.eventId;
  venueId = ev.venueId;
});
afterAll(async () => {
  await server.stop();
  await db.drop();
  rmSync(dataDir, { recursive: true, force: true });
  rmSync(tmpDir, { recursive: true, force: true });
});

async function newBooking() {
  const r = await a().post('/api/bookings', {
    slotId,
    visitor: visitor(),
    items: [{ categoryId: await categoryId(db.db, 'toaster'), fault: 'One side stays cold.' }],
    consent: true,
  });
  expect(r.status).toBe(201);
  return r.json as { reference: string; manageToken: string; itemIds: number[] };
}

async function upload(b: { reference: string; manageToken: string; itemIds: number[] }, files: Buffer[]) {
  const agent = a();
  const csrf = await agent.token();
  const form = new FormData();
  files.forEach((f, i) => form.append('photos', new Blob([new Uint8Array(f)], { type: 'image/png' }), `p${i}.png`));
  const res = await fetch(
    `${server.url}/api/bookings/${b.reference}/items/${b.itemIds[0]}/photos?token=${b.manageToken}`,
    { method: 'POST', body: form, headers: { cookie: agent.cookieHeader(), 'x-csrf-token': csrf } },
  );
  return { status: res.status, json: await res.json().catch(() => null) };
}

const png = () =>
  sharp({ create: { width: 64, height: 48, channels: 3, background: '#23395d' } })
    .png()
    .toBuffer();

/** A real 1×1 PNG from sharp whose header is rewritten to declare width × height, with the header's CRC fixed. */
async function bomb(width: number, height: number) {
  const small = await sharp({ create: { width: 1, height: 1, channels: 3, background: '#000' } })
    .png()
    .toBuffer();
  const out = Buffer.from(small);
  // PNG layout (RFC 2083 §3.2, §4.1.1): 8-byte signature, then IHDR: length, "IHDR", width, height, ..., CRC.
  expect(out.toString('latin1', 12, 16)).toBe('IHDR');
  out.writeUInt32BE(width, 16);
  out.writeUInt32BE(height, 20);
  out.writeUInt32BE(crc32(out.subarray(12, 29)), 29);
  return out;
}

const photoCount = async (itemId: number) =>
  (await db.db.select({ n: count() }).from(itemPhotos).where(eq(itemPhotos.itemId, itemId)))[0].n;

describe('photo uploads', () => {
  it('keeps the three-photo limit when ten uploads of three photos arrive at once: three stored, the rest 409', async () => {
    const b = await newBooking();
    const three = [await png(), await png(), await png()];
    const results = await Promise.all(Array.from({ length: 10 }, () => upload(b, three)));
    const statuses = results.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(9);
    for (const r of results.filter((x) => x.status === 409)) expect(r.json.error.code).toBe('too-many-photos');
    expect(await photoCount(b.itemIds[0])).toBe(3);
  });

  it('refuses a small PNG that declares 12,000 × 12,000 pixels before decoding it, with a 413', async () => {
    const b = await newBooking();
    const file = await bomb(12_000, 12_000);
    expect(file.length).toBeLessThan(200);
    expect(await sharp(file).metadata()).toMatchObject({ width: 12_000, height: 12_000 });
    const res = await upload(b, [file]);
    expect(res.status).toBe(413);
    expect(res.json.error.code).toBe('photo-too-large');
    expect(await photoCount(b.itemIds[0])).toBe(0);
  });

  it('streams uploads through temporary files and removes them once answered, stored or refused', async () => {
    const b = await newBooking();
    expect((await upload(b, [await png()])).status).toBe(201);
    expect((await upload(b, [Buffer.from('not a picture at all '.repeat(30))])).status).toBe(415);
    const dir = path.join(tmpDir, 'mendery-uploads');
    expect(readdirSync(tmpDir)).toContain('mendery-uploads');
    // Removal runs as the answer closes; give it a moment to finish.
    for (let i = 0; i < 50 && readdirSync(dir).length; i++) await new Promise((r) => setTimeout(r, 20));
    expect(readdirSync(dir)).toEqual([]);
  });
});

describe('anonymous CSRF tokens', () => {
  const sessionRows = async () => (await db.db.select({ n: count() }).from(sessions))[0].n;

  it('writes no session row for 20 anonymous token fetches, and the token still lets a visitor book', async () => {
    const before = await sessionRows();
    const agents = Array.from({ length: 20 }, () => a());
    for (const agent of agents) expect(typeof (await agent.token())).toBe('string');
    expect(await sessionRows()).toBe(before);
    const r = await agents[0].post('/api/bookings', {
      slotId,
      visitor: visitor(),
      items: [{ categoryId: await categoryId(db.db, 'toaster'), fault: 'Crumb tray stuck.' }],
      consent: true,
    });
    expect(r.status).toBe(201);
    expect(await sessionRows()).toBe(before);
  });

  it('refuses an anonymous POST with another caller’s token or none', async () => {
    const one = a();
    const other = a();
    await one.token();
    other.csrf = one.csrf;
    expect((await other.post('/api/bookings', {})).status).toBe(403);
    const bare = a();
    expect((await bare.raw('POST', '/api/bookings', { body: {} })).status).toBe(403);
    expect((await one.post('/api/bookings', {})).status).toBe(400);
  });
});

describe('the public hall queue', () => {
  it('takes no row lock and writes nothing, even before the venue’s layout is copied to the session', async () => {
    await db.db.insert(venueBenches).values({ venueId, name: 'Long table', seats: 2, equipment: [], position: 0 });
    const statements: string[] = [];
    const pool = server.ctx.database.pool as unknown as Record<string, (...args: unknown[]) => unknown>;
    const originals = { query: pool.query, execute: pool.execute, getConnection: pool.getConnection };
    const record = (sql: unknown) =>
      statements.push(String(typeof sql === 'string' ? sql : ((sql as { sql?: string })?.sql ?? '')));
    for (const name of ['query', 'execute'] as const)
      pool[name] = function (this: unknown, ...args: unknown[]) {
        record(args[0]);
        return originals[name].apply(this, args);
      };
    pool.getConnection = async function (this: unknown, ...args: unknown[]) {
      const conn = (await originals.getConnection.apply(this, args)) as Record<string, (...a: unknown[]) => unknown>;
      for (const name of ['query', 'execute'] as const) {
        const own = conn[name];
        conn[name] = function (this: unknown, ...a: unknown[]) {
          record(a[0]);
          return own.apply(this, a);
        };
      }
      return conn;
    };
    try {
      const r = await a().get(`/api/public/events/${eventId}/queue`);
      expect(r.status).toBe(200);
    } finally {
      Object.assign(pool, originals);
    }
    // The mail and reminder jobs share the pool and claim their rows with SKIP LOCKED; the display's own reads are
    // the ones about the session, its benches and its items.
    const mine = statements.filter((s) => /event_benches|`events`|booking_items/i.test(s) && !/skip locked/i.test(s));
    expect(mine.length).toBeGreaterThan(0);
    expect(mine.filter((s) => /for update|^\s*(insert|update|delete|savepoint)\b/i.test(s))).toEqual([]);
    const [{ n }] = await db.db.select({ n: count() }).from(eventBenches).where(eq(eventBenches.eventId, eventId));
    expect(n).toBe(0);
  });
});
