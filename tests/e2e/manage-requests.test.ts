import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Request } from 'playwright-core';
import type { RunningServer } from '../../server/src/server';
import { launchBrowser, PHONE, shot } from '../support/browser';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/** Issue 14, finding 10: on the visitor's booking page, no request the page makes carries the manage token. */
let db: TestDatabase;
let server: RunningServer;
let browser: Browser;
let dataDir: string;
let booking: { reference: string; manageToken: string; itemIds: number[] };

beforeAll(async () => {
  db = await createTestDatabase();
  dataDir = mkdtempSync(path.join(os.tmpdir(), 'mendery-manage-requests-'));
  server = await startTestServer(db.url, { DATA_DIR: dataDir });
  browser = await launchBrowser();
  const { slotIds } = await makeEvent(db.db, await makeGroup(db.db));
  const a = new Agent(server.url);
  booking = (
    await a.post('/api/bookings', {
      slotId: slotIds[0],
      visitor: visitor(),
      items: [{ categoryId: await categoryId(db.db, 'kettle'), fault: 'The lid will not stay shut.' }],
      consent: true,
    })
  ).json;
  const form = new FormData();
  const jpeg = await sharp({ create: { width: 320, height: 240, channels: 3, background: '#23395d' } })
    .jpeg()
    .toBuffer();
  form.append('photos', new Blob([new Uint8Array(jpeg)], { type: 'image/jpeg' }), 'kettle.jpg');
  const up = await fetch(`${server.url}/api/bookings/${booking.reference}/items/${booking.itemIds[0]}/photos`, {
    method: 'POST',
    body: form,
    headers: { cookie: a.cookieHeader(), 'x-csrf-token': a.csrf!, 'x-manage-token': booking.manageToken },
  });
  expect(up.status).toBe(201);
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
  await db?.drop();
  rmSync(dataDir, { recursive: true, force: true });
});

describe('the booking page at phone width', () => {
  it('shows the photo, downloads the calendar file and the data copy, and puts the token in no request URL', async () => {
    const page = await browser.newPage({ viewport: PHONE, acceptDownloads: true });
    const requests: Request[] = [];
    const downloads: string[] = [];
    page.on('request', (r) => requests.push(r));
    // The mailed link itself (the page's own address) is the manage link; what matters is what the page then asks.
    const pageUrl = `${server.url}/bookings/${booking.reference}?token=${encodeURIComponent(booking.manageToken)}`;
    await page.goto(pageUrl);
    await page.getByRole('heading', { name: 'Your details' }).waitFor();
    const img = page.locator('img[src^="/api/photos/"]').first();
    await img.waitFor();
    // The element is in the page before its bytes have arrived: wait for the decoded image, not just the tag.
    await expect
      .poll(() => img.evaluate((el: HTMLImageElement) => el.complete && el.naturalWidth), { timeout: 10_000 })
      .toBe(320);
    const withToken = () =>
      [...requests.filter((r) => r.url() !== pageUrl).map((r) => r.url()), ...downloads].filter(
        (u) => u.includes('token=') || u.includes(booking.manageToken),
      );
    expect(withToken()).toEqual([]);

    // Chromium hands a download to its download manager, which the page's request events do not see.
    const ics = page.waitForEvent('download');
    await page.getByRole('link', { name: 'Add to calendar' }).click();
    downloads.push((await ics).url());
    expect(readFileSync((await (await ics).path())!, 'utf8')).toContain('BEGIN:VCALENDAR');
    const copy = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Download my details' }).click();
    expect(JSON.parse(readFileSync((await (await copy).path())!, 'utf8')).booking.reference).toBe(booking.reference);
    await page.screenshot({ path: shot('booking-manage-requests-phone'), fullPage: true });
    await page.close();

    const asked = [...requests.map((r) => r.url()), ...downloads];
    expect(asked.some((u) => u.includes('/api/photos/'))).toBe(true);
    expect(asked.some((u) => u.includes(`/api/bookings/${booking.reference}/calendar`))).toBe(true);
    expect(asked.some((u) => u.includes(`/api/bookings/${booking.reference}/personal-data`))).toBe(true);
    expect(withToken()).toEqual([]);
  });
});
