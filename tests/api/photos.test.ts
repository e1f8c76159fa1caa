import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { itemPhotos } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, makeUser, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
let dataDir: string;
let groupId: number;
let booking: { reference: string; manageToken: string; itemIds: number[] };
const a = () => new Agent(server.url);

beforeAll(async () => {
  db = await createTestDatabase();
  dataDir = mkdtempSync(path.join(os.tmpdir(), 'mendery-photos-'));
  server = await startTestServer(db.url, { DATA_DIR: dataDir });
  groupId = await makeGroup(db.db);
  const { slotIds } = await makeEvent(db.db, groupId);
  booking = (
    await a().post('/api/bookings', {
      slotId: slotIds[0],
      visitor: visitor(),
      items: [{ categoryId: await categoryId(db.db, 'toaster'), fault: 'One side stays cold.' }],
      consent: true,
    })
  ).json;
});
afterAll(async () => {
  await server.stop();
  await db.drop();
  rmSync(dataDir, { recursive: true, force: true });
});

async function upload(files: { name: string; type: string; data: Buffer }[], token = booking.manageToken) {
  const agent = a();
  const csrf = await agent.token();
  const form = new FormData();
  for (const f of files) form.append('photos', new Blob([new Uint8Array(f.data)], { type: f.type }), f.name);
  const res = await fetch(
    `${server.url}/api/bookings/${booking.reference}/items/${booking.itemIds[0]}/photos?token=${token}`,
    { method: 'POST', body: form, headers: { cookie: agent.cookieHeader(), 'x-csrf-token': csrf } },
  );
  return { status: res.status, json: await res.json().catch(() => null) };
}

// Real images made by libvips (through sharp), with camera metadata that must not survive.
const jpeg = () =>
  sharp({ create: { width: 2400, height: 1800, channels: 3, background: '#b8612f' } })
    .withExif({ IFD0: { Artist: 'Somebody', Copyright: 'Where it was taken' } })
    .jpeg()
    .toBuffer();
const png = () =>
  sharp({ create: { width: 640, height: 480, channels: 4, background: '#23395d' } })
    .png()
    .toBuffer();

describe('item photos', () => {
  it('accepts a real JPEG, stores it resized to 1600 px with its metadata gone', async () => {
    const original = await jpeg();
    expect((await sharp(original).metadata()).exif).toBeDefined();
    const res = await upload([{ name: 'toaster.jpg', type: 'image/jpeg', data: original }]);
    expect(res.status).toBe(201);
    expect(res.json[0]).toMatchObject({ width: 1600, height: 1200 });
    const [row] = await db.db.select().from(itemPhotos).where(eq(itemPhotos.publicId, res.json[0].id));
    const stored = await server.ctx.storage.get(row.storageKey);
    const meta = await sharp(stored!).metadata();
    expect(meta).toMatchObject({ format: 'jpeg', width: 1600, height: 1200 });
    expect(meta.exif).toBeUndefined();
    // The visitor sees it with the token; the group's organiser with a session; nobody else.
    expect(
      (await fetch(`${server.url}/api/photos/${row.publicId}?token=${booking.manageToken}`)).headers.get(
        'content-type',
      ),
    ).toBe('image/jpeg');
    expect((await fetch(`${server.url}/api/photos/${row.publicId}`)).status).toBe(404);
    const o = await makeUser(db.db, { roles: [[groupId, 'organiser']] });
    const org = a();
    await org.login(o.email, o.password);
    expect((await org.get(`/api/photos/${row.publicId}`)).status).toBe(200);
  });

  it('accepts a real PNG', async () => {
    const res = await upload([{ name: 'back.png', type: 'image/png', data: await png() }]);
    expect(res.status).toBe(201);
    expect(res.json[0]).toMatchObject({ width: 640, height: 480 });
  });

  it('refuses a text file renamed to .jpg, judging by its bytes', async () => {
    const res = await upload([
      {
        name: 'holiday.jpg',
        type: 'image/jpeg',
        data: Buffer.from('This is not a picture at all, only words.\n'.repeat(20)),
      },
    ]);
    expect(res.status).toBe(415);
    expect(res.json.error.code).toBe('photo-type');
    expect(res.json.error.message).toContain('holiday.jpg');
  });

  it('refuses a file over 8 MB', async () => {
    const big = Buffer.concat([await jpeg(), Buffer.alloc(8 * 1024 * 1024)]);
    const res = await upload([{ name: 'huge.jpg', type: 'image/jpeg', data: big }]);
    expect(res.status).toBe(413);
    expect(res.json.error.code).toBe('photo-too-large');
  });

  it('refuses a fourth photo for one item, and any upload without the token', async () => {
    expect((await upload([{ name: 'x.png', type: 'image/png', data: await png() }], 'wrong-token')).status).toBe(404);
    const third = await upload([{ name: 'c.png', type: 'image/png', data: await png() }]);
    expect(third.status).toBe(201);
    const fourth = await upload([{ name: 'd.png', type: 'image/png', data: await png() }]);
    expect(fourth.status).toBe(409);
    expect(fourth.json.error.code).toBe('too-many-photos');
  });
});
