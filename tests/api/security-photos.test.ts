import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { itemPhotos, repairGroups } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, makeUser, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

// Issue 14, finding 8: photos are named by random ids, so a volunteer cannot walk one group's photos by number.

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
