import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { itemPhotos, repairGroups } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, makeUser, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { signPath, signingKey, verifySignedPath } from '../../server/src/http/signed-url';
import { startTestServer, TEST_SECRET } from '../support/server';

// Issue 14, finding 8: photos are named by random ids, so a volunteer cannot walk one group's photos by number.
// Finding 10: the booking page loads photos and the calendar file by short-lived signed addresses, not the token.

let db: TestDatabase;
let server: RunningServer;
let dataDir: string;
let groupId: number;
let booking: { reference: string; manageToken: string; itemIds: number[] };
let organiser: Agent;
let outsider: Agent;
const uploaded: string[] = [];

const jpeg = () =>
  sharp({ create: { width: 64, height: 48, channels: 3, background: '#b8612f' } })
    .jpeg()
    .toBuffer();

async function upload(url: string, headers: Record<string, string>) {
  const form = new FormData();
  form.append('photos', new Blob([new Uint8Array(await jpeg())], { type: 'image/jpeg' }), 'bench.jpg');
  const res = await fetch(server.url + url, { method: 'POST', body: form, headers });
  expect(res.status).toBe(201);
  return ((await res.json()) as { id: string }[]).map((p) => p.id);
}

async function signedIn(roles: [number, 'organiser' | 'fixer'][]) {
  const u = await makeUser(db.db, { roles });
  const agent = new Agent(server.url);
  expect((await agent.login(u.email, u.password)).status).toBe(200);
  return agent;
}

beforeAll(async () => {
  db = await createTestDatabase();
  dataDir = mkdtempSync(path.join(os.tmpdir(), 'mendery-photo-ids-'));
  server = await startTestServer(db.url, { DATA_DIR: dataDir });
  // A group that shares its repair notes: its bench photos may be seen by every group's volunteers, by their id.
  groupId = await makeGroup(db.db, 'Sharing menders');
  await db.db.update(repairGroups).set({ shareKnowledge: true }).where(eq(repairGroups.id, groupId));
  const { slotIds } = await makeEvent(db.db, groupId);
  const anon = new Agent(server.url);
  booking = (
    await anon.post('/api/bookings', {
      slotId: slotIds[0],
      visitor: visitor(),
      items: [{ categoryId: await categoryId(db.db, 'toaster'), fault: 'One side stays cold.' }],
      consent: true,
    })
  ).json;
  organiser = await signedIn([[groupId, 'organiser']]);
  outsider = await signedIn([[await makeGroup(db.db, 'Other menders'), 'fixer']]);
  const csrf = await anon.token();
  uploaded.push(
    ...(await upload(`/api/bookings/${booking.reference}/items/${booking.itemIds[0]}/photos`, {
      cookie: anon.cookieHeader(),
      'x-csrf-token': csrf,
      'x-manage-token': booking.manageToken,
    })),
  );
  for (let i = 0; i < 3; i++)
    uploaded.push(
      ...(await upload(`/api/items/${booking.itemIds[0]}/photos`, {
        cookie: organiser.cookieHeader(),
        'x-csrf-token': organiser.csrf ?? (await organiser.token()),
      })),
    );
});
afterAll(async () => {
  await server.stop();
  await db.drop();
  rmSync(dataDir, { recursive: true, force: true });
});

describe('photo ids', () => {
  it('names every photo by 128 random bits (22 base64url characters), never by its row number', async () => {
    expect(uploaded).toHaveLength(4);
    for (const id of uploaded) expect(id).toMatch(/^[A-Za-z0-9_-]{22}$/);
    expect(new Set(uploaded).size).toBe(4);
    const rows = await db.db.select({ id: itemPhotos.id, publicId: itemPhotos.publicId }).from(itemPhotos);
    expect(rows.map((r) => r.publicId).sort()).toEqual([...uploaded].sort());
    for (const r of rows) expect(uploaded).not.toContain(String(r.id));
  });

  it('when a volunteer of another group walks /api/photos/1..50, finds nothing; by its real id the shared bench photo shows', async () => {
    let found = 0;
    for (let n = 1; n <= 50; n++) if ((await outsider.get(`/api/photos/${n}`)).status === 200) found++;
    expect(found).toBe(0);
    // The bench photos (the last three) of a sharing group are still there for the network, by their own ids.
    expect((await outsider.get(`/api/photos/${uploaded[3]}`)).status).toBe(200);
    expect((await outsider.get(`/api/photos/${uploaded[0]}`)).status).toBe(404);
  });

  it('the booking, the desk and the organiser’s list give the photos by the same random ids', async () => {
    const view = await new Agent(server.url).raw('GET', `/api/bookings/${booking.reference}`, {
      headers: { 'x-manage-token': booking.manageToken },
    });
    expect(view.json.items[0].photos.map((p: { id: string }) => p.id)).toEqual(uploaded);
    const desk = await organiser.get(`/api/items/${booking.itemIds[0]}`);
    expect(desk.json.photos.map((p: { id: string }) => p.id).sort()).toEqual([...uploaded].sort());
    for (const id of uploaded) expect((await organiser.get(`/api/photos/${id}`)).status).toBe(200);
  });
});

describe('signed addresses (a pure helper; the clock is an argument)', () => {
  const key = signingKey(TEST_SECRET);
  const t0 = Date.UTC(2026, 5, 1, 9, 58, 20);
  const url = signPath(key, '/api/photos/abc', t0);
  const [path, query] = url.split('?');
  const q = Object.fromEntries(new URLSearchParams(query));

  it('is good from signing until its expiry, 10 to 15 minutes later, and not from the expiry on', () => {
    const expires = Number(q.expires) * 1000;
    expect(path).toBe('/api/photos/abc');
    expect(expires - t0).toBeGreaterThanOrEqual(10 * 60_000);
    expect(expires - t0).toBeLessThanOrEqual(15 * 60_000);
    expect(verifySignedPath(key, path, q, t0)).toBe(true);
    expect(verifySignedPath(key, path, q, expires - 1)).toBe(true);
    expect(verifySignedPath(key, path, q, expires)).toBe(false);
    expect(verifySignedPath(key, path, q, expires + 3600_000)).toBe(false);
  });

  it('fails when the signature, the expiry or the path is changed, or signed with another key', () => {
    const flipped = q.sig.slice(0, -1) + (q.sig.endsWith('A') ? 'B' : 'A');
    expect(verifySignedPath(key, path, { ...q, sig: flipped }, t0)).toBe(false);
    expect(verifySignedPath(key, path, { ...q, expires: String(Number(q.expires) + 3600) }, t0)).toBe(false);
    expect(verifySignedPath(key, '/api/photos/abd', q, t0)).toBe(false);
    expect(verifySignedPath(signingKey(`${TEST_SECRET}x`), path, q, t0)).toBe(false);
    expect(verifySignedPath(key, path, { expires: [q.expires], sig: q.sig }, t0)).toBe(false);
    expect(verifySignedPath(key, path, {}, t0)).toBe(false);
  });
});

describe('the booking page asks for nothing with the manage token in its URL', () => {
  afterEach(() => vi.useRealTimers());
  const view = async () =>
    (
      await new Agent(server.url).raw('GET', `/api/bookings/${booking.reference}`, {
        headers: { 'x-manage-token': booking.manageToken },
      })
    ).json;

  it('gives signed photo and calendar addresses that work without the token, then fail after their expiry', async () => {
    const b = await view();
    const photoUrl: string = b.items[0].photos[0].url;
    const calendarUrl: string = b.calendarUrl;
    for (const u of [photoUrl, calendarUrl]) {
      expect(u).toMatch(/\?expires=\d+&sig=[A-Za-z0-9_-]{43}$/);
      expect(u).not.toContain(booking.manageToken);
      expect(u).not.toContain('token=');
    }
    expect(photoUrl.startsWith(`/api/photos/${uploaded[0]}?`)).toBe(true);
    const anon = new Agent(server.url);
    const photo = await fetch(server.url + photoUrl);
    expect(photo.status).toBe(200);
    expect(photo.headers.get('content-type')).toBe('image/jpeg');
    const cal = await anon.get(calendarUrl);
    expect(cal.status).toBe(200);
    expect(cal.text).toContain('BEGIN:VCALENDAR');
    // The server's clock moves past the expiry: both addresses are refused.
    const expires = Number(new URL(photoUrl, server.url).searchParams.get('expires')) * 1000;
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(expires + 1000);
    expect((await fetch(server.url + photoUrl)).status).toBe(404);
    expect((await anon.get(calendarUrl)).status).toBe(404);
  });

  it('refuses a tampered signature, and a signature moved to another photo or booking', async () => {
    const b = await view();
    const photoUrl: string = b.items[0].photos[0].url;
    const sig = new URL(photoUrl, server.url).searchParams.get('sig')!;
    const tampered = photoUrl.replace(sig, (sig[0] === 'A' ? 'B' : 'A') + sig.slice(1));
    expect((await fetch(server.url + tampered)).status).toBe(404);
    const query = photoUrl.slice(photoUrl.indexOf('?'));
    expect((await fetch(`${server.url}/api/photos/${uploaded[1]}${query}`)).status).toBe(404);
    const calQuery = (b.calendarUrl as string).slice(b.calendarUrl.indexOf('?'));
    expect((await fetch(`${server.url}/api/bookings/ZZZ-ZZZ/calendar${calQuery}`)).status).toBe(404);
  });

  it('the copy of the visitor’s data, and erasing it, take the token in the X-Manage-Token header', async () => {
    const r = await new Agent(server.url).raw('GET', `/api/bookings/${booking.reference}/personal-data`, {
      headers: { 'x-manage-token': booking.manageToken },
    });
    expect(r.status).toBe(200);
    expect(r.headers.get('cache-control')).toBe('no-store');
    expect(r.json.you).toMatchObject({ name: expect.stringContaining('Visitor') });
    const wrong = await new Agent(server.url).raw('GET', `/api/bookings/${booking.reference}/personal-data`, {
      headers: { 'x-manage-token': `x${booking.manageToken}` },
    });
    expect(wrong.status).toBe(404);
    const anon = new Agent(server.url);
    const erase = await anon.raw('DELETE', `/api/bookings/${booking.reference}/personal-data`, {
      headers: { 'x-manage-token': booking.manageToken, 'x-csrf-token': await anon.token() },
    });
    expect(erase.status).toBe(204);
  });
});
