import { eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Locator } from 'playwright-core';
import { bookingItems, bookings, events } from '../../server/src/db/schema/index';
import { TODAY_TITLE } from '../../server/src/seed/demo-today';
import { ITEM_STATUS_LABELS, type ItemStatus } from '../../shared/event-day/constants';
import { DESKTOP, launchBrowser, shot, signedIn } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

let app: DemoApp;
let browser: Browser;
let eventId: number;

/** Of the demo's four visitors still to come, one arrives, one does not, one takes the item away. */
async function mixStates() {
  const { db } = app.db;
  const itemOf = async (reference: string) => {
    const [r] = await db
      .select({ id: bookingItems.id })
      .from(bookingItems)
      .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
      .where(eq(bookings.reference, reference));
    return r.id;
  };
  await db
    .update(bookingItems)
    .set({ status: 'checked-in', checkedInAt: new Date(), queueNumber: 4, tagCode: 'KD5D2' })
    .where(eq(bookingItems.id, await itemOf('T5N-9WZ')));
  await db
    .update(bookingItems)
    .set({ status: 'no-show' })
    .where(eq(bookingItems.id, await itemOf('T6P-2XC')));
  await db
    .update(bookingItems)
    .set({ status: 'withdrawn' })
    .where(eq(bookingItems.id, await itemOf('T7Q-3YD')));
}

/** What the database holds: items of the session's standing bookings, by status. */
async function statusesInDatabase() {
  const rows = await app.db.db
    .select({ status: bookingItems.status })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .where(inArray(bookings.eventId, [eventId]));
  const counts: Partial<Record<ItemStatus, number>> = {};
  for (const r of rows) counts[r.status] = (counts[r.status] ?? 0) + 1;
  return counts;
}

/** Each tally on a screen as label → number: the smallest elements whose text is a number and a few words. */
function tallies(region: Locator) {
  return region.evaluate((root) => {
    const pair = /^\s*(\d+)\s*(\D+?)\s*$/;
    const out: Record<string, number> = {};
    for (const el of root.querySelectorAll('*')) {
      const m = pair.exec(el.textContent ?? '');
      if (!m || [...el.children].some((c) => pair.test(c.textContent ?? ''))) continue;
      out[m[2]] = Number(m[1]);
    }
    return out;
  });
}

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
  const [e] = await app.db.db.select().from(events).where(eq(events.title, TODAY_TITLE));
  eventId = e.id;
  await mixStates();
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('the live view and the reception desk count the day alike', () => {
  it('shows the same word and the same number for each state on both screens', { timeout: 60_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'organiser', DESKTOP);
    await page.goto(`${app.server.url}/events/${eventId}/live`);
    const live = page.getByRole('region', { name: 'Counts' });
    await live.getByText(/\d/).first().waitFor();
    const onLive = await tallies(live);
    await page.screenshot({ path: shot('live-tallies') });

    await page.goto(`${app.server.url}/desk/${eventId}`);
    await page.getByRole('heading', { name: 'Reception desk' }).waitFor();
    const onDesk = await tallies(page.getByLabel(/^Items today/).first());
    await page.screenshot({ path: shot('desk-tallies') });

    expect(onDesk).toEqual(onLive);
    // Both agree with the database, state by state, each under its status's own label.
    const db = await statusesInDatabase();
    expect(Object.keys(db).length).toBe(7);
    for (const [status, n] of Object.entries(db)) expect(onLive[ITEM_STATUS_LABELS[status as ItemStatus]]).toBe(n);
    await context.close();
  });

  it('fits the tallies on the reception tablet at 820 px', { timeout: 60_000 }, async () => {
    const { context, page } = await signedIn(browser, app.server.url, 'host', { width: 820, height: 1180 });
    await page.goto(`${app.server.url}/desk/${eventId}`);
    await page.getByRole('heading', { name: 'Reception desk' }).waitFor();
    expect(Object.keys(await tallies(page.getByLabel(/^Items today/).first())).length).toBe(7);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(820);
    await page.screenshot({ path: shot('desk-tallies-tablet') });
    await context.close();
  });
});
