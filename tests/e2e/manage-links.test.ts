import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { events } from '../../server/src/db/schema/index';
import type { RunningServer } from '../../server/src/server';
import { launchBrowser, PHONE, shot } from '../support/browser';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { memorySender, startTestServer } from '../support/server';

/** Issue 14, finding 10, on a phone: a manage link that has run out, and asking for a fresh one. */
let db: TestDatabase;
let server: RunningServer;
let browser: Browser;
let groupId: number;
const mail = memorySender();
const DAY = 86_400_000;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url, {}, { sender: mail });
  groupId = await makeGroup(db.db);
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
  await db?.drop();
});

async function book(email: string) {
  const { eventId, slotIds } = await makeEvent(db.db, groupId, { slotCount: 2 });
  const res = await new Agent(server.url).post('/api/bookings', {
    slotId: slotIds[0],
    visitor: { ...visitor(), email },
    items: [{ categoryId: await categoryId(db.db, 'kettle'), fault: 'The lid will not stay shut.' }],
    consent: true,
  });
  expect(res.status).toBe(201);
  return { eventId, reference: res.json.reference as string, token: res.json.manageToken as string };
}

describe('manage links on a phone', () => {
  it('a link that has run out says so and offers the fresh-link form, which answers without telling', async () => {
    const email = `ran-out-${Date.now()}@example.org`;
    const { eventId, reference, token } = await book(email);
    await db.db
      .update(events)
      .set({ startsAt: new Date(Date.now() - 31 * DAY - 3600_000), endsAt: new Date(Date.now() - 31 * DAY) })
      .where(eq(events.id, eventId));
    const page = await browser.newPage({ viewport: PHONE });
    await page.goto(`${server.url}/bookings/${reference}?token=${encodeURIComponent(token)}`);
    await page.getByText('This link has run out').waitFor();
    await page.getByLabel('Your e-mail address').fill(email);
    const send = page.getByRole('button', { name: 'Mail me a fresh link' });
    expect((await send.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    await send.click();
    await page.getByText('a fresh link is on its way').waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    await page.screenshot({ path: shot('booking-link-ran-out-phone'), fullPage: true });
    await page.close();
  });

  it('opens a mailed #token= link, and moves an older ?token= link into the fragment without a request carrying it', async () => {
    const { reference, token } = await book(`fragment-${Date.now()}@example.org`);
    const page = await browser.newPage({ viewport: PHONE });
    const asked: string[] = [];
    page.on('request', (r) => asked.push(r.url()));
    await page.goto(`${server.url}/bookings/${reference}#token=${token}`);
    await page.getByRole('button', { name: 'Cancel my booking' }).waitFor();
    expect(asked.filter((u) => u.includes(token))).toEqual([]);

    await page.goto(`${server.url}/bookings/${reference}?token=${token}`);
    await page.getByRole('button', { name: 'Cancel my booking' }).waitFor();
    await page.waitForURL((u) => !u.search.includes('token='));
    expect(new URL(page.url()).hash).toBe(`#token=${token}`);
    await page.reload();
    await page.getByRole('button', { name: 'Cancel my booking' }).waitFor();
    await page.screenshot({ path: shot('booking-link-fragment-phone'), fullPage: true });
    await page.close();
  });
});
